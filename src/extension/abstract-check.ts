/**
 * Check Abstract: compares a document's own abstract with its body in the engine host (a lane of
 * its own, so a live summary never cancels a check or the other way round) and shows the
 * findings in the panel and, where they have a place in the text, in the Problems view.
 */
import * as vscode from 'vscode';
import type { AbstractReport } from '../core/index';
import { abstractView } from './abstract-view';
import type { TerselyContext } from './context';
import { rangeOf } from './editor-ranges';
import { ABSTRACT_CODE, DIAGNOSTIC_SOURCE } from './ids';
import { startProgress } from './progress';
import { checkedSpan } from './ranges';
import { formatFor } from './settings';
import { CancelledError, type EngineClient } from './worker-client';

export class AbstractCheck {
  private readonly diagnostics: vscode.DiagnosticCollection;

  constructor(
    private readonly context: TerselyContext,
    private readonly engine: EngineClient,
  ) {
    this.diagnostics = context.own(vscode.languages.createDiagnosticCollection(`${DIAGNOSTIC_SOURCE} abstract`));
  }

  async run(editor: vscode.TextEditor): Promise<{ ok: boolean; findings: number } | undefined> {
    const { panel } = this.context;
    const document = editor.document;
    const settings = this.context.settings.read();
    const text = document.getText();
    if (text.length > settings.maxDocumentSize) {
      void vscode.window.showInformationMessage(`This document is larger than tersely.maxDocumentSize (${settings.maxDocumentSize.toLocaleString('en')} characters).`);
      return undefined;
    }
    const version = document.version;
    const progress = startProgress(panel, 'checkAbstract');
    let report: AbstractReport;
    try {
      const result = await this.engine.run({ kind: 'checkAbstract', text, options: { format: formatFor(document.languageId, document.fileName), language: settings.language } });
      if (result.kind !== 'checkAbstract') return undefined;
      report = result.report;
    } catch (error) {
      if (error instanceof CancelledError) return undefined;
      const message = error instanceof Error ? error.message : String(error);
      void vscode.window.showErrorMessage(`Tersely could not check the abstract: ${message}`);
      return undefined;
    } finally {
      progress.end();
    }
    if (document.isClosed || document.version !== version) return undefined;
    const view = abstractView(report, vscode.workspace.asRelativePath(document.uri, false));
    const diagnostics: vscode.Diagnostic[] = [];
    for (const finding of view.findings) {
      const span = checkedSpan(finding.span, text);
      if (!span) continue;
      const diagnostic = new vscode.Diagnostic(rangeOf(document, span), finding.message, vscode.DiagnosticSeverity.Information);
      diagnostic.source = DIAGNOSTIC_SOURCE;
      diagnostic.code = ABSTRACT_CODE;
      diagnostics.push(diagnostic);
    }
    this.diagnostics.set(document.uri, diagnostics);
    panel.post({ type: 'abstractCheck', check: view.panel });
    void panel.show();
    if (!report.ok) void vscode.window.showInformationMessage(report.error);
    return { ok: report.ok, findings: view.findings.length };
  }
}
