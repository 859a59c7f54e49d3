/** Status bar item shown while a summary is on screen: words kept and sections covered. */
import * as vscode from 'vscode';
import type { SummaryStats } from '../core/index';
import { VIEW_ID } from './ids';
import { ENGLISH, type Wording } from './wording';

export function statusText(stats: SummaryStats, live: boolean, wording: Wording = ENGLISH): { text: string; tooltip: string } {
  const { t, count } = wording;
  const text = `${live ? '$(sync) ' : ''}$(list-selection) ${t('{0} of {1} words · {2}/{3} sections', count(stats.wordsOut), count(stats.wordsIn), count(stats.sectionsCovered), count(stats.sectionsWithContent))}`;
  const tooltip = t(
    'Tersely summary: {0} sentences, {1} of {2} words; covers {3} of {4} sections{5}. Click to show the panel.',
    count(stats.sentencesOut),
    count(stats.wordsOut),
    count(stats.wordsIn),
    count(stats.sectionsCovered),
    count(stats.sectionsWithContent),
    live ? t('; live updates on') : '',
  );
  return { text, tooltip };
}

export class SummaryStatus implements vscode.Disposable {
  private readonly item = vscode.window.createStatusBarItem('tersely.summaryStatus', vscode.StatusBarAlignment.Right, 100);

  constructor() {
    this.item.name = 'Tersely Summary';
    this.item.command = `${VIEW_ID}.focus`;
  }

  show(stats: SummaryStats, live: boolean, wording?: Wording): void {
    const { text, tooltip } = statusText(stats, live, wording);
    this.item.text = text;
    this.item.tooltip = tooltip;
    this.item.show();
  }

  hide(): void {
    this.item.hide();
  }

  get text(): string {
    return this.item.text;
  }

  dispose(): void {
    this.item.dispose();
  }
}
