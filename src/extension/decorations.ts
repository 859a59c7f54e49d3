/** Highlights of the picked sentences: one decoration type, coloured by contributed theme colours. */
import * as vscode from 'vscode';
import { COLOR_IDS } from './ids';

export class SummaryHighlights implements vscode.Disposable {
  private readonly picked = vscode.window.createTextEditorDecorationType({
    backgroundColor: new vscode.ThemeColor(COLOR_IDS.pickedBackground),
    border: '1px solid',
    borderColor: new vscode.ThemeColor(COLOR_IDS.pickedBorder),
    borderRadius: '2px',
    overviewRulerColor: new vscode.ThemeColor(COLOR_IDS.pickedRuler),
    overviewRulerLane: vscode.OverviewRulerLane.Center,
    // Typing at either edge should not stretch a highlight over new text.
    rangeBehavior: vscode.DecorationRangeBehavior.ClosedClosed,
  });

  show(editor: vscode.TextEditor, ranges: readonly vscode.Range[]): void {
    editor.setDecorations(this.picked, ranges);
  }

  clear(editor: vscode.TextEditor): void {
    editor.setDecorations(this.picked, []);
  }

  dispose(): void {
    this.picked.dispose();
  }
}
