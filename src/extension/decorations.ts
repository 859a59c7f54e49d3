/**
 * How picked sentences look in the editor, built on the theme: a thin underline and a bar at the
 * left edge of each line they touch, both in the theme's accent (contributed colours that default
 * to the focus border; the high-contrast themes' own active border), plus an overview-ruler mark.
 * A sentence the summary notes may not stand alone gets a faint dotted mark of its own.
 */
import * as vscode from 'vscode';
import { COLOR_IDS } from './ids';

export class SummaryHighlights implements vscode.Disposable {
  private readonly picked = vscode.window.createTextEditorDecorationType({
    borderStyle: 'solid',
    borderWidth: '0 0 1px 0',
    borderColor: new vscode.ThemeColor(COLOR_IDS.pickedUnderline),
    overviewRulerColor: new vscode.ThemeColor(COLOR_IDS.pickedRuler),
    overviewRulerLane: vscode.OverviewRulerLane.Center,
    // Typing at either edge should not stretch a highlight over new text.
    rangeBehavior: vscode.DecorationRangeBehavior.ClosedClosed,
  });

  private readonly bar = vscode.window.createTextEditorDecorationType({
    isWholeLine: true,
    borderStyle: 'solid',
    borderWidth: '0 0 0 3px',
    borderColor: new vscode.ThemeColor(COLOR_IDS.pickedBar),
  });

  private readonly note = vscode.window.createTextEditorDecorationType({
    // The workbench exposes every theme colour as a CSS variable; a dotted line stays faint.
    textDecoration: 'underline dotted var(--vscode-tersely-noteMark)',
    rangeBehavior: vscode.DecorationRangeBehavior.ClosedClosed,
  });

  show(editor: vscode.TextEditor, ranges: readonly vscode.Range[], notes: readonly vscode.Range[]): void {
    editor.setDecorations(this.picked, ranges);
    const lines = new Set<number>();
    for (const range of ranges) for (let line = range.start.line; line <= range.end.line; line++) lines.add(line);
    editor.setDecorations(
      this.bar,
      [...lines].map((line) => new vscode.Range(line, 0, line, 0)),
    );
    editor.setDecorations(this.note, notes);
  }

  clear(editor: vscode.TextEditor): void {
    editor.setDecorations(this.picked, []);
    editor.setDecorations(this.bar, []);
    editor.setDecorations(this.note, []);
  }

  dispose(): void {
    this.picked.dispose();
    this.bar.dispose();
    this.note.dispose();
  }
}
