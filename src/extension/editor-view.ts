/**
 * What a summary looks like in the editor: highlights on the picked sentences, a hover on each
 * (why it was picked, in words), a faint mark on sentences that may not stand alone (and, when
 * `tersely.problemsView` asks, Problems entries with quick fixes), and the status bar item. A summary shows only while its document is at the version it was made from.
 */
import * as vscode from 'vscode';
import type { Summary } from '../core/index';
import type { TerselyContext } from './context';
import { SummaryHighlights } from './decorations';
import { RepairQuickFixes, standAloneDiagnostics } from './diagnostics';
import { rangeOf } from './editor-ranges';
import { convergenceOf, describePick } from './hover-text';
import { DIAGNOSTIC_SOURCE, STAND_ALONE_CODE } from './ids';
import { checkedSpan, spanAt } from './ranges';
import { SummaryStatus } from './status-bar';
import { isCurrent, type ShownSummary } from './summaries';

export class EditorView {
  private readonly highlights: SummaryHighlights;
  private readonly status: SummaryStatus;
  private readonly diagnostics: vscode.DiagnosticCollection;

  constructor(private readonly context: TerselyContext) {
    this.highlights = context.own(new SummaryHighlights());
    this.status = context.own(new SummaryStatus());
    this.diagnostics = context.own(vscode.languages.createDiagnosticCollection(DIAGNOSTIC_SOURCE));
    context.own(vscode.languages.registerHoverProvider('*', { provideHover: (document, position) => this.hoverAt(document, position) }));
    context.own(
      vscode.languages.registerCodeActionsProvider('*', new RepairQuickFixes((document, diagnostic) => this.warningFor(document, diagnostic)), {
        providedCodeActionKinds: RepairQuickFixes.kinds,
      }),
    );
  }

  get statusText(): string {
    return this.status.text;
  }

  /** Highlights and warnings for the summary, or none when it is cleared or out of date. */
  apply(shown: ShownSummary): void {
    const editors = vscode.window.visibleTextEditors.filter((editor) => editor.document.uri.toString() === shown.key);
    for (const editor of editors) {
      if (!shown.highlighted || editor.document.version !== shown.version) {
        this.highlights.clear(editor);
        continue;
      }
      const text = editor.document.getText();
      this.highlights.show(
        editor,
        shown.summary.sentences.map((pick) => rangeOf(editor.document, pick.span)),
        shown.summary.warnings.map((w) => checkedSpan(w.span, text)).filter((span) => span !== null).map((span) => rangeOf(editor.document, span)),
      );
    }
    const document = editors[0]?.document ?? vscode.workspace.textDocuments.find((d) => d.uri.toString() === shown.key);
    // Notes belong to the summary (panel and editor mark); the Problems view only when asked.
    if (document && shown.highlighted && document.version === shown.version && this.context.settings.read().host.problemsView) {
      this.diagnostics.set(document.uri, standAloneDiagnostics(document, shown.summary));
    } else {
      this.diagnostics.delete(shown.uri);
    }
  }

  /** The summary no longer matches its document (or was cleared): it leaves the editor. */
  unhighlight(shown: ShownSummary): void {
    shown.highlighted = false;
    this.apply(shown);
  }

  forgetDocument(uri: vscode.Uri): void {
    this.diagnostics.delete(uri);
  }

  clearDiagnostics(): void {
    this.diagnostics.clear();
  }

  /** A setting changed: Problems entries follow `tersely.problemsView` at once. */
  settingsChanged(): void {
    for (const shown of this.context.store.all()) this.apply(shown);
  }

  /** The status bar follows the active editor's summary (else the panel's). */
  updateStatus(): void {
    const { store } = this.context;
    const editor = vscode.window.activeTextEditor;
    const shown = editor ? store.get(editor.document.uri.toString()) : store.inPanel();
    if (shown && shown.highlighted && isCurrent(shown)) this.status.show(shown.summary.stats, this.context.live.on, this.context.wording);
    else this.status.hide();
  }

  private hoverAt(document: vscode.TextDocument, position: vscode.Position): vscode.Hover | undefined {
    const shown = this.context.store.get(document.uri.toString());
    if (!shown || !shown.highlighted || document.version !== shown.version) return undefined;
    const picks = shown.summary.sentences;
    const at = spanAt(
      picks.map((pick) => pick.span),
      document.offsetAt(position),
    );
    if (at < 0) return undefined;
    const pick = picks[at]!;
    const markdown = new vscode.MarkdownString(describePick(pick, shown.summary, this.context.wording, convergenceOf(shown.summary)));
    markdown.isTrusted = false;
    markdown.supportHtml = false;
    return new vscode.Hover(markdown, rangeOf(document, pick.span));
  }

  private warningFor(document: vscode.TextDocument, diagnostic: vscode.Diagnostic): { summaryId: number; index: number; warning: Summary['warnings'][number] } | undefined {
    const shown = this.context.store.get(document.uri.toString());
    if (!shown || document.version !== shown.version || diagnostic.code !== STAND_ALONE_CODE) return undefined;
    const start = document.offsetAt(diagnostic.range.start);
    const end = document.offsetAt(diagnostic.range.end);
    const index = shown.summary.warnings.findIndex((warning) => warning.span.start === start && warning.span.end === end);
    return index >= 0 ? { summaryId: shown.id, index, warning: shown.summary.warnings[index]! } : undefined;
  }
}
