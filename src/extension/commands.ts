/**
 * Every command in one table, registered in one loop. A command whose preconditions fail says
 * why instead of throwing. Handlers return a small result so tests inside the editor can check
 * what happened.
 */
import * as vscode from 'vscode';
import type { RepairArgs } from './diagnostics';
import type { TerselyContext } from './context';
import type { CommandId } from './ids';
import type { SummarizeOutcome } from './summarizer';

type CommandHandler = (context: TerselyContext, ...args: unknown[]) => unknown;

function withEditor<T>(context: TerselyContext, action: (editor: vscode.TextEditor) => T): T | undefined {
  const editor = context.targetEditor();
  if (!editor) {
    void vscode.window.showInformationMessage('Open a Markdown or text document first: Tersely summarizes the active editor.');
    return undefined;
  }
  return action(editor);
}

function isRepairArgs(value: unknown): value is RepairArgs {
  if (typeof value !== 'object' || value === null) return false;
  const { summaryId, warning, repair } = value as Record<string, unknown>;
  return [summaryId, warning, repair].every((n) => typeof n === 'number' && Number.isInteger(n) && n >= 0);
}

function outcomeResult(outcome: SummarizeOutcome): { kind: string; sentences?: number; id?: number } {
  return outcome.kind === 'shown' ? { kind: outcome.kind, sentences: outcome.shown.summary.sentences.length, id: outcome.shown.id } : { kind: outcome.kind };
}

const COMMANDS: Readonly<Record<CommandId, CommandHandler>> = {
  'tersely.summarizeDocument': (context) =>
    withEditor(context, async (editor) => {
      void context.panel.show();
      return outcomeResult(await context.summarizer.summarize(editor, 'document', 'command'));
    }),
  'tersely.summarizeSelection': (context) =>
    withEditor(context, async (editor) => {
      void context.panel.show();
      return outcomeResult(await context.summarizer.summarize(editor, 'selection', 'command'));
    }),
  'tersely.summarizeWithFocus': (context, focus) =>
    withEditor(context, async (editor) => {
      // A focus passed in (tests, keybindings; empty = back to general) wins; otherwise the selected words.
      const words = typeof focus === 'string' ? focus : editor.document.getText(editor.selection);
      if (typeof focus !== 'string' && words.trim() === '') {
        void vscode.window.showInformationMessage(context.wording.t('Select a few words first: they become the focus of the summary.'));
        return { kind: 'empty' };
      }
      void context.panel.show();
      const used = await context.useFocus(words);
      return { ...outcomeResult(await context.summarizer.summarize(editor, 'document', 'command')), focus: used };
    }),
  'tersely.insertSummary': (context, where) => withEditor(context, (editor) => context.actions.insertSummary(editor, typeof where === 'string' ? where : undefined)),
  'tersely.copySummary': (context) => context.actions.copySummary(context.targetEditor()),
  'tersely.clearHighlights': (context) => {
    context.summarizer.clearHighlights();
    context.digester.clearHighlights();
  },
  'tersely.toggleLive': (context) => context.live.toggle(),
  'tersely.checkAbstract': (context, heading) => withEditor(context, (editor) => context.abstractCheck.run(editor, typeof heading === 'string' ? heading : undefined)),
  'tersely.digestOpenDocuments': (context) => context.digester.digestOpenDocuments(),
  'tersely.digestFiles': (context, clicked, selected) => context.digester.digestFiles(clicked, selected),
  'tersely.showPanel': (context) => context.panel.show(true),
  'tersely.applyRepair': (context, args) => {
    if (!isRepairArgs(args)) {
      context.log.warn('tersely.applyRepair was called without a valid repair.');
      return false;
    }
    return context.actions.repair(args);
  },
};

export function registerCommands(context: TerselyContext): vscode.Disposable[] {
  return Object.entries(COMMANDS).map(([id, handler]) => vscode.commands.registerCommand(id, (...args: unknown[]) => handler(context, ...args)));
}
