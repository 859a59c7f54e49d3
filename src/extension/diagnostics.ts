/**
 * Coherence warnings (and abstract-check findings) in the Problems view, at information level:
 * they describe the summary, not mistakes in the document. Quick fixes apply a repair to the
 * SUMMARY through a command; they never carry an edit to the document.
 */
import * as vscode from 'vscode';
import type { StandAloneWarning, Summary } from '../core/index';
import { rangeOf } from './editor-ranges';
import { DIAGNOSTIC_SOURCE, STAND_ALONE_CODE } from './ids';
import { repairLabel } from './panel-model';
import { checkedSpan } from './ranges';

export interface RepairArgs {
  readonly summaryId: number;
  readonly warning: number;
  readonly repair: number;
}

export function standAloneDiagnostics(document: vscode.TextDocument, summary: Summary): vscode.Diagnostic[] {
  const text = document.getText();
  const diagnostics: vscode.Diagnostic[] = [];
  summary.warnings.forEach((warning: StandAloneWarning) => {
    const span = checkedSpan(warning.span, text);
    if (!span) return;
    const diagnostic = new vscode.Diagnostic(rangeOf(document, span), `Summary sentence may not stand alone: ${warning.message}`, vscode.DiagnosticSeverity.Information);
    diagnostic.source = DIAGNOSTIC_SOURCE;
    diagnostic.code = STAND_ALONE_CODE;
    diagnostic.relatedInformation = warning.context
      .map((index) => summary.document.sentences[index])
      .filter((sentence) => sentence !== undefined)
      .map((sentence) => checkedSpan(sentence.span, text))
      .filter((contextSpan) => contextSpan !== null)
      .slice(0, 3)
      .map(
        (contextSpan) =>
          new vscode.DiagnosticRelatedInformation(
            new vscode.Location(document.uri, rangeOf(document, contextSpan)),
            'The context the sentence relies on',
          ),
      );
    diagnostics.push(diagnostic);
  });
  return diagnostics;
}

/** Looks up, for a diagnostic handed back by the editor, the summary warning it stands for. */
export type WarningLookup = (document: vscode.TextDocument, diagnostic: vscode.Diagnostic) => { summaryId: number; index: number; warning: StandAloneWarning } | undefined;

export class RepairQuickFixes implements vscode.CodeActionProvider {
  static readonly kinds = [vscode.CodeActionKind.QuickFix];

  constructor(private readonly lookup: WarningLookup) {}

  provideCodeActions(document: vscode.TextDocument, _range: vscode.Range, context: vscode.CodeActionContext): vscode.CodeAction[] {
    const actions: vscode.CodeAction[] = [];
    for (const diagnostic of context.diagnostics) {
      if (diagnostic.source !== DIAGNOSTIC_SOURCE || diagnostic.code !== STAND_ALONE_CODE) continue;
      const found = this.lookup(document, diagnostic);
      if (!found) continue;
      found.warning.repairs.forEach((repair, index) => {
        const action = new vscode.CodeAction(`Tersely summary: ${repairLabel(repair, found.warning)}`, vscode.CodeActionKind.QuickFix);
        action.diagnostics = [diagnostic];
        const args: RepairArgs = { summaryId: found.summaryId, warning: found.index, repair: index };
        action.command = { command: 'tersely.applyRepair', title: action.title, arguments: [args] };
        actions.push(action);
      });
    }
    return actions;
  }
}
