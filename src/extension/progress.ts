/**
 * Progress for engine work. A quick job shows nothing; one that takes longer than
 * PROGRESS_DELAY_MS shows its stage by name in the panel and in the window's status area, and
 * follows the stages the engine host reports until it ends.
 */
import * as vscode from 'vscode';
import type { EngineStage } from './engine-protocol';
import { VIEW_ID } from './ids';
import { progressLabel, SUMMARY_STAGES, type PanelProgress, type ProgressStage } from './messages';
import type { Wording } from './wording';
import type { SummaryPanel } from './panel-provider';

/** How long a request may run before progress is shown (~300 ms, issue 12). */
const PROGRESS_DELAY_MS = 300;

export interface Progress {
  stage(stage: EngineStage): void;
  end(): void;
}

export function startProgress(panel: SummaryPanel, task: PanelProgress['task'], wording: Wording): Progress {
  const make = (stage: ProgressStage): PanelProgress => ({
    task,
    stage,
    label: progressLabel({ task, stage }, wording.t),
    stages: SUMMARY_STAGES.map((entry) => wording.t(entry.label)),
  });
  let current: PanelProgress = make(task === 'summarize' ? 'waiting' : 'checkingAbstract');
  let report: ((message: string) => void) | undefined;
  let finish: () => void = () => undefined;
  const finished = new Promise<void>((resolve) => (finish = resolve));
  let token: number | undefined;
  const timer = setTimeout(() => {
    token = panel.beginProgress(current);
    void vscode.window.withProgress({ location: { viewId: VIEW_ID } }, () => finished);
    void vscode.window.withProgress({ location: vscode.ProgressLocation.Window, title: 'Tersely' }, (progress) => {
      report = (message) => progress.report({ message });
      report(current.label);
      return finished;
    });
  }, PROGRESS_DELAY_MS);
  return {
    stage: (stage: ProgressStage) => {
      current = make(stage);
      if (token === undefined) return;
      panel.updateProgress(token, current);
      report?.(current.label);
    },
    end: () => {
      clearTimeout(timer);
      finish();
      if (token !== undefined) panel.endProgress(token);
    },
  };
}
