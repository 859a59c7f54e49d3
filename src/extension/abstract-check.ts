/**
 * Check Abstract: compares a document's own abstract with its body in the engine host (a lane of
 * its own, so a live summary never cancels a check or the other way round). The abstract is the
 * selection when there is one, else the section the engine finds (Summary, Abstract, TL;DR), else
 * a heading the user picks. The result has its own place in the panel, bound to its document:
 * its lines are clickable, it is marked out of date when the document changes and removed when it
 * closes. Problems view entries only when `tersely.problemsView` asks.
 */
import * as vscode from 'vscode';
import type { AbstractReport, Span } from '../core/index';
import { abstractView } from './abstract-view';
import type { TerselyContext } from './context';
import { rangeOf } from './editor-ranges';
import { ABSTRACT_CODE, DIAGNOSTIC_SOURCE } from './ids';
import type { PanelAbstractCheck } from './messages';
import { startProgress } from './progress';
import { checkedSpan } from './ranges';
import { formatFor, settingKeyOf, toEngineOptions } from './settings';
import { CancelledError, type EngineClient } from './worker-client';

type Source = { readonly kind: 'heading'; readonly heading: string } | { readonly kind: 'opening' } | { readonly kind: 'text'; readonly text: string; readonly span: Span };

interface ShownCheck {
  readonly id: number;
  readonly key: string;
  readonly uri: vscode.Uri;
  readonly version: number;
  readonly places: readonly Span[];
  panel: PanelAbstractCheck;
}

export interface CheckOutcome {
  readonly ok: boolean;
  readonly findings: number;
  readonly id?: number;
}

export class AbstractCheck {
  private readonly diagnostics: vscode.DiagnosticCollection;
  private shown: ShownCheck | undefined;
  private nextId = 1;

  constructor(
    private readonly context: TerselyContext,
    private readonly engine: EngineClient,
  ) {
    this.diagnostics = context.own(vscode.languages.createDiagnosticCollection(`${DIAGNOSTIC_SOURCE} abstract`));
  }

  /** `heading`: the abstract's heading when the caller already knows it (tests, the picker). */
  async run(editor: vscode.TextEditor, heading?: string): Promise<CheckOutcome | undefined> {
    const document = editor.document;
    const selection = editor.selection;
    let source: Source | undefined;
    if (typeof heading === 'string' && heading.length > 0) source = { kind: 'heading', heading };
    else if (!selection.isEmpty) {
      const span = { start: document.offsetAt(selection.start), end: document.offsetAt(selection.end) };
      source = { kind: 'text', text: document.getText(selection), span };
    }
    const first = await this.check(editor, source);
    if (!first || first.report.ok || source || (first.report.reason !== 'noAbstract' && first.report.reason !== 'missingHeading')) return first && this.show(editor, first);
    // No abstract section found: let the user pick one (or the opening text).
    const picked = await this.pickSource(document);
    if (!picked) return this.show(editor, first);
    const second = await this.check(editor, picked);
    return second && this.show(editor, second);
  }

  private async check(editor: vscode.TextEditor, source: Source | undefined): Promise<{ report: AbstractReport; version: number; text: string } | undefined> {
    const { panel, wording } = this.context;
    const document = editor.document;
    const settings = this.context.settings.read();
    let text = document.getText();
    const maxChars = settings.summary.maxChars;
    if (text.length > maxChars) {
      void vscode.window.showInformationMessage(
        wording.t('This document has {0} characters, more than the {1} set in tersely.{2}, so Tersely did not check it.', wording.count(text.length), wording.count(maxChars), settingKeyOf('maxChars')!),
      );
      return undefined;
    }
    // A selected abstract is blanked out of the body (same length, so every offset stays right).
    if (source?.kind === 'text') text = text.slice(0, source.span.start) + source.text.replace(/[^\r\n]/g, ' ') + text.slice(source.span.end);
    const format = formatFor(document.languageId, document.fileName);
    const { budget: _budget, ...options } = toEngineOptions(settings, format, 0);
    const abstract = source === undefined ? undefined : source.kind === 'text' ? { kind: 'text' as const, text: source.text, format } : source;
    const version = document.version;
    const progress = startProgress(panel, 'checkAbstract', wording);
    try {
      const result = await this.engine.run({ kind: 'checkAbstract', text, options: { ...options, ...(abstract ? { abstract } : {}) } });
      if (result.kind !== 'checkAbstract') return undefined;
      if (document.isClosed || document.version !== version) return undefined;
      return { report: result.report, version, text };
    } catch (error) {
      if (error instanceof CancelledError) return undefined;
      const message = error instanceof Error ? error.message : String(error);
      void vscode.window.showErrorMessage(wording.t('Tersely could not check the abstract: {0}', message));
      return undefined;
    } finally {
      progress.end();
    }
  }

  private async pickSource(document: vscode.TextDocument): Promise<Source | undefined> {
    const { t } = this.context.wording;
    // Parsed in the engine host, so the extension bundle carries no document parser.
    let found: readonly { heading: string; depth: number }[];
    try {
      const result = await this.engine.run({ kind: 'headings', text: document.getText(), format: formatFor(document.languageId, document.fileName) });
      if (result.kind !== 'headings') return undefined;
      found = result.headings;
    } catch (error) {
      if (error instanceof CancelledError) return undefined;
      const message = error instanceof Error ? error.message : String(error);
      void vscode.window.showErrorMessage(t('Tersely could not read the document’s headings: {0}', message));
      return undefined;
    }
    const headings: { label: string; source: Source }[] = found.map((s) => ({ label: `${'  '.repeat(Math.max(0, s.depth - 1))}${s.heading}`, source: { kind: 'heading', heading: s.heading } }));
    if (headings.length === 0) {
      void vscode.window.showInformationMessage(t('No section is headed Summary, Abstract or TL;DR, and the document has no headings. Select the abstract’s text and run Check Abstract again.'));
      return undefined;
    }
    // An introduction before the first heading often serves as the abstract (specifications).
    const opening: { label: string; source: Source } = { label: t('Opening text (before the first heading)'), source: { kind: 'opening' } };
    const choice = await vscode.window.showQuickPick([opening, ...headings], {
      title: t('Which section is the abstract?'),
      placeHolder: t('No section is headed Summary, Abstract or TL;DR. Pick the abstract’s heading or the opening text (or press Escape and select its text instead).'),
    });
    return choice?.source;
  }

  private show(editor: vscode.TextEditor, result: { report: AbstractReport; version: number; text: string }): CheckOutcome {
    const { panel, wording } = this.context;
    const document = editor.document;
    const view = abstractView(result.report, vscode.workspace.asRelativePath(document.uri, false), wording);
    const id = this.nextId++;
    const places = view.places.map((span) => checkedSpan(span, result.text) ?? { start: 0, end: 0 });
    this.shown = { id, key: document.uri.toString(), uri: document.uri, version: result.version, places, panel: { id, stale: false, ...view.panel } };
    this.diagnostics.clear();
    if (this.context.settings.read().host.problemsView) {
      const diagnostics = view.findings
        .map((finding) => ({ finding, span: checkedSpan(finding.span, result.text) }))
        .filter((entry): entry is { finding: (typeof view.findings)[number]; span: Span } => entry.span !== null)
        .map(({ finding, span }) => {
          const diagnostic = new vscode.Diagnostic(rangeOf(document, span), finding.message, vscode.DiagnosticSeverity.Information);
          diagnostic.source = DIAGNOSTIC_SOURCE;
          diagnostic.code = ABSTRACT_CODE;
          return diagnostic;
        });
      this.diagnostics.set(document.uri, diagnostics);
    }
    panel.post({ type: 'abstractCheck', check: this.shown.panel });
    panel.post({ type: 'announce', text: wording.t('Abstract check ready for {0}.', this.shown.panel.documentName) });
    void panel.show();
    if (!result.report.ok) void vscode.window.showInformationMessage(result.report.error);
    return { ok: result.report.ok, findings: view.findings.length, id };
  }

  /** Shows a place of the check in its document (the panel's clickable lines). */
  async reveal(checkId: number, target: number): Promise<boolean> {
    const shown = this.shown;
    const span = shown?.id === checkId ? shown.places[target] : undefined;
    if (!shown || !span) {
      this.context.log.warn(`The panel asked for place ${target} of abstract check ${checkId}, which is not shown.`);
      return false;
    }
    const document = await vscode.workspace.openTextDocument(shown.uri);
    if (document.version !== shown.version) {
      this.markStale(document);
      return false;
    }
    const range = rangeOf(document, span);
    const column = vscode.window.visibleTextEditors.find((e) => e.document === document)?.viewColumn;
    const editor = await vscode.window.showTextDocument(document, { viewColumn: column, selection: range, preserveFocus: false });
    editor.revealRange(range, vscode.TextEditorRevealType.InCenterIfOutsideViewport);
    return true;
  }

  /** The checked document changed: its lines may have moved. */
  markStale(document: vscode.TextDocument): void {
    const shown = this.shown;
    if (!shown || shown.key !== document.uri.toString() || shown.panel.stale || document.version === shown.version) return;
    shown.panel = { ...shown.panel, stale: true };
    this.diagnostics.delete(shown.uri);
    this.context.panel.post({ type: 'abstractCheck', check: shown.panel });
  }

  /** The user closed the check's part of the panel: it stays closed (no replay) and its Problems entries go. */
  dismiss(): void {
    if (!this.shown) return;
    this.diagnostics.delete(this.shown.uri);
    this.shown = undefined;
    this.context.panel.post({ type: 'abstractCheck', check: null });
  }

  /** The checked document closed: the check goes with it. */
  forget(document: vscode.TextDocument): void {
    if (this.shown?.key !== document.uri.toString()) return;
    this.shown = undefined;
    this.diagnostics.delete(document.uri);
    this.context.panel.post({ type: 'abstractCheck', check: null });
  }

  /** Problems entries go when the setting is switched off. */
  settingsChanged(): void {
    if (!this.context.settings.read().host.problemsView) this.diagnostics.clear();
  }
}
