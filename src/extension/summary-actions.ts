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
import { planInsertion, summaryForClipboard, type InsertTarget } from './summary-text';
import type { Summary } from '../core/index';

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

  /** Set while Insert Summary's own edit is applied, so the summary moves with the text instead of going stale. */
  pendingInsert: { readonly key: string; readonly offset: number; readonly length: number } | undefined;

  /**
   * Inserts the summary as one undoable edit where the user chooses: at the cursor, or under a
   * heading they pick (`where` skips the picker: 'cursor' or a heading's text). The summary on
   * screen stays valid: its places move with the inserted text.
   */
  async insertSummary(editor: vscode.TextEditor, where?: string): Promise<{ inserted: boolean; offset: number; placement: string } | undefined> {
    const { t } = this.context.wording;
    const shown = await this.context.summarizer.currentOrNew(editor);
    if (!shown) return undefined;
    if (shown.summary.sentences.length === 0) {
      void vscode.window.showInformationMessage(t('The summary is empty, so there is nothing to insert.'));
      return undefined;
    }
    const document = editor.document;
    const cursor = document.offsetAt(editor.selection.active);
    const target = where === undefined ? await this.pickTarget(shown.summary, document, cursor) : resolveTarget(shown.summary, where, cursor);
    if (!target) return undefined;
    const plan = planInsertion(shown.summary, document.getText(), shown.format, target, this.context.wording);
    this.pendingInsert = { key: shown.key, offset: plan.offset, length: plan.text.length };
    try {
      // One edit with undo stops on both sides: a single Undo removes the whole block.
      const inserted = await editor.edit((builder) => builder.insert(document.positionAt(plan.offset), plan.text), { undoStopBefore: true, undoStopAfter: true });
      return { inserted, offset: plan.offset, placement: plan.placement };
    } finally {
      this.pendingInsert = undefined;
    }
  }

  private async pickTarget(summary: Summary, document: vscode.TextDocument, cursor: number): Promise<InsertTarget | undefined> {
    const { t, count } = this.context.wording;
    const cursorItem = { label: t('At the cursor (line {0})', count(document.positionAt(cursor).line + 1)), target: { kind: 'cursor', offset: cursor } as InsertTarget };
    const headings = summary.document.sections
      .filter((section) => section.headingSpan !== null && section.heading.length > 0)
      .map((section) => ({
        label: t('Under “{0}”', section.heading),
        description: t('line {0}', count(document.positionAt(section.headingSpan!.start).line + 1)),
        target: { kind: 'heading', section: section.index } as InsertTarget,
      }));
    const choice = await vscode.window.showQuickPick([cursorItem, ...headings], { title: t('Insert the summary'), placeHolder: t('Where should the summary go? (one edit; Undo removes it)') });
    return choice?.target;
  }

  async copySummary(editor: vscode.TextEditor | undefined): Promise<string | undefined> {
    const { t, count } = this.context.wording;
    const shown = editor ? await this.context.summarizer.currentOrNew(editor) : this.context.store.inPanel();
    if (!shown) {
      void vscode.window.showInformationMessage(t('There is no summary to copy yet: run Summarize Document first.'));
      return undefined;
    }
    const document = vscode.workspace.textDocuments.find((d) => d.uri.toString() === shown.key && d.version === shown.version);
    const markdown = summaryForClipboard(shown.summary, document?.getText() ?? null, shown.format, shown.documentName, this.context.wording);
    await vscode.env.clipboard.writeText(markdown);
    vscode.window.setStatusBarMessage(t('Tersely: copied a summary of {0} sentences.', count(shown.summary.sentences.length)), 4000);
    return markdown;
  }
}

function resolveTarget(summary: Summary, where: string, cursor: number): InsertTarget | undefined {
  if (where === 'cursor') return { kind: 'cursor', offset: cursor };
  const section = summary.document.sections.find((s) => s.headingSpan !== null && s.heading === where);
  return section ? { kind: 'heading', section: section.index } : undefined;
}
