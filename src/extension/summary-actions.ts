/**
 * What a person can do with a summary on screen: jump to a sentence, apply a repair (to the
 * summary, never the document), insert it as one undoable edit, copy it as Markdown.
 */
import * as vscode from 'vscode';
import type { TerselyContext } from './context';
import type { RepairArgs } from './diagnostics';
import { rangeOf } from './editor-ranges';
import { applyRepair } from '../core/index';
import { isCurrent } from './summaries';
import { planInsertion, summaryForClipboard } from './summary-text';

export class SummaryActions {
  constructor(private readonly context: TerselyContext) {}

  async reveal(summaryId: number, sentence: number): Promise<boolean> {
    const shown = this.context.store.byId(summaryId);
    if (!shown || !isCurrent(shown)) {
      this.context.panel.post({ type: 'notice', kind: 'stale', text: 'The document changed since this summary. Summarize again before jumping to a sentence.' });
      return false;
    }
    const pick = shown.summary.sentences.find((p) => p.sentence === sentence);
    if (!pick) {
      this.context.log.warn(`The panel asked for sentence ${sentence}, which is not in summary ${summaryId}.`);
      return false;
    }
    const document = await vscode.workspace.openTextDocument(shown.uri);
    if (document.version !== shown.version) return false;
    const range = rangeOf(document, pick.span);
    const column = vscode.window.visibleTextEditors.find((e) => e.document === document)?.viewColumn;
    const editor = await vscode.window.showTextDocument(document, { viewColumn: column, selection: range, preserveFocus: false });
    editor.revealRange(range, vscode.TextEditorRevealType.InCenterIfOutsideViewport);
    return true;
  }

  async repair(args: RepairArgs): Promise<boolean> {
    const shown = this.context.store.byId(args.summaryId);
    if (!shown || !isCurrent(shown)) {
      void vscode.window.showInformationMessage('That summary is out of date; summarize again to repair it.');
      return false;
    }
    const outcome = applyRepair(shown.summary, args.warning, args.repair);
    if (!outcome.ok) {
      void vscode.window.showInformationMessage(outcome.reason);
      return false;
    }
    shown.summary = outcome.summary;
    this.context.summarizer.display(shown);
    vscode.window.setStatusBarMessage(`Tersely: ${outcome.description}`, 4000);
    return true;
  }

  async insertSummary(editor: vscode.TextEditor): Promise<{ inserted: boolean; offset: number; placement: string } | undefined> {
    const shown = await this.context.summarizer.currentOrNew(editor);
    if (!shown) return undefined;
    if (shown.summary.sentences.length === 0) {
      void vscode.window.showInformationMessage('The summary is empty, so there is nothing to insert.');
      return undefined;
    }
    const document = editor.document;
    const plan = planInsertion(shown.summary, document.getText(), shown.format, document.offsetAt(editor.selection.active), shown.scope);
    // One edit with undo stops on both sides: a single Undo removes the whole block.
    const inserted = await editor.edit((builder) => builder.insert(document.positionAt(plan.offset), plan.text), { undoStopBefore: true, undoStopAfter: true });
    return { inserted, offset: plan.offset, placement: plan.placement };
  }

  async copySummary(editor: vscode.TextEditor | undefined): Promise<string | undefined> {
    const shown = editor ? await this.context.summarizer.currentOrNew(editor) : this.context.store.inPanel();
    if (!shown) {
      void vscode.window.showInformationMessage('There is no summary to copy yet: run Summarize Document first.');
      return undefined;
    }
    const markdown = summaryForClipboard(shown.summary);
    await vscode.env.clipboard.writeText(markdown);
    vscode.window.setStatusBarMessage(`Tersely: copied a summary of ${shown.summary.sentences.length} sentences.`, 4000);
    return markdown;
  }
}
