/** Status bar item shown while a summary is on screen: compression and sections covered. */
import * as vscode from 'vscode';
import type { SummaryStats } from '../core/index';
import { VIEW_ID } from './ids';

export function statusText(stats: SummaryStats, live: boolean): { text: string; tooltip: string } {
  const percent = Math.round(stats.compression * 100);
  const text = `${live ? '$(sync) ' : ''}$(list-selection) ${percent}% · ${stats.sectionsCovered}/${stats.sectionsWithContent} sections`;
  const tooltip =
    `Tersely summary: ${stats.sentencesOut} sentences, ${stats.wordsOut} of ${stats.wordsIn} words (${percent}%); ` +
    `${stats.sectionsCovered} of ${stats.sectionsWithContent} sections covered${live ? '; live updates on' : ''}. Click to show the panel.`;
  return { text, tooltip };
}

export class SummaryStatus implements vscode.Disposable {
  private readonly item = vscode.window.createStatusBarItem('tersely.summaryStatus', vscode.StatusBarAlignment.Right, 100);

  constructor() {
    this.item.name = 'Tersely Summary';
    this.item.command = `${VIEW_ID}.focus`;
  }

  show(stats: SummaryStats, live: boolean): void {
    const { text, tooltip } = statusText(stats, live);
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
