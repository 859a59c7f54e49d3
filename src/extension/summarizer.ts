/**
 * Summarizing a document or a selection: the size guard, the engine request (settings and text
 * per request; the model only when it changed), progress, and the rule that only the newest
 * result for the document version on screen may show. Also showing, forgetting and refreshing.
 */
import * as vscode from 'vscode';
import type { Span, Summary } from '../core/index';
import type { TerselyContext } from './context';
import type { EngineStage } from './engine-protocol';
import { buildPanelSummary, previousPicksFor } from './panel-model';
import { startProgress } from './progress';
import { CONTEXT_KEYS } from './ids';
import { checkedSpan } from './ranges';
import { formatFor, settingKeyOf, toEngineOptions } from './settings';
import type { Scope, ShownSummary } from './summaries';
import { CancelledError } from './worker-client';

export type Trigger = 'command' | 'live' | 'switch' | 'refresh';

export type SummarizeOutcome =
  | { readonly kind: 'shown'; readonly shown: ShownSummary }
  | { readonly kind: 'tooLarge' | 'empty' | 'stale' | 'cancelled' | 'failed' | 'noEditor' };

export class Summarizer {
  /** Document key of the job the engine is running. */
  private runningKey: string | undefined;
  /** Templates sent with the last request (the in-editor tests read it through the API). */
  templatesInUse = 0;
  /** Template problems already shown, so each is said once. */
  private readonly toldTemplateProblems = new Set<string>();

  constructor(private readonly context: TerselyContext) {}

  /** Starts the engine host ahead of the first summary, then sends it the model the settings name. */
  async prepare(): Promise<void> {
    const { engine, models, settings, templates } = this.context;
    engine.warm();
    // The templates of the document on screen, looked up now so the first summary need not wait.
    const document = vscode.window.activeTextEditor?.document;
    if (document) void templates.read(settings.read().host.templateFiles, document.uri);
    engine.useModel(await models.load(settings.read().host.modelFile));
  }

  async summarize(editor: vscode.TextEditor, scope: Scope, trigger: Trigger, selection?: Span): Promise<SummarizeOutcome> {
    const { engine, log, models, sequencer, store } = this.context;
    const document = editor.document;
    const key = document.uri.toString();
    const settings = this.context.settings.read();
    this.context.debouncer.cancel(key);

    let text = document.getText();
    let baseOffset = 0;
    let selectionSpan: Span | null = null;
    if (scope === 'selection') {
      const span = selection ?? { start: document.offsetAt(editor.selection.start), end: document.offsetAt(editor.selection.end) };
      if (span.end <= span.start) return this.explain('empty', this.context.wording.t('Select some text first, then run Summarize Selection.'), trigger);
      selectionSpan = span;
      baseOffset = span.start;
      text = text.slice(span.start, span.end);
    }
    const maxChars = settings.summary.maxChars;
    if (text.length > maxChars) {
      this.forget(document);
      const { t, count } = this.context.wording;
      const message =
        scope === 'selection'
          ? t('This selection has {0} characters, more than the {1} set in tersely.{2}, so Tersely did not summarize it.', count(text.length), count(maxChars), settingKeyOf('maxChars')!)
          : t('This document has {0} characters, more than the {1} set in tersely.{2}, so Tersely did not summarize it.', count(text.length), count(maxChars), settingKeyOf('maxChars')!);
      return this.explain('tooLarge', message, trigger);
    }

    const ticket = sequencer.issue(key, document.version);
    engine.useModel(await models.load(settings.host.modelFile));
    const format = formatFor(document.languageId, document.fileName);
    const templatesStarted = performance.now();
    const { templates, problems } = await this.context.templates.read(settings.host.templateFiles, document.uri);
    const templatesMs = performance.now() - templatesStarted;
    for (const problem of problems) this.tellTemplateProblem(problem);
    this.templatesInUse = templates.length;
    // Live mode keeps the picks it showed unless a new sentence is clearly better (less churn while typing).
    const before = store.get(key);
    const previous = trigger === 'live' && before && before.scope === scope ? before.summary.sentences.map((p) => p.text) : undefined;
    const progress = startProgress(this.context.panel, 'summarize', this.context.wording);
    this.runningKey = key;
    const requested = performance.now();
    let begun: number | undefined;
    const onStage = (stage: EngineStage): void => {
      begun ??= performance.now();
      progress.stage(stage);
    };
    let summary: Summary;
    try {
      const result = await engine.run({ kind: 'summarize', text, session: `${key}#${scope}`, options: { ...toEngineOptions(settings, format, baseOffset), focus: this.context.focus.current, ...(templates.length > 0 ? { templates } : {}), ...(previous ? { previous } : {}) } }, { onStage });
      if (result.kind !== 'summarize') return { kind: 'failed' };
      summary = result.summary;
      if (result.modelProblem) models.reportProblem(settings.host.modelFile, result.modelProblem);
      const waited = begun === undefined ? '' : `; the engine host began after ${(begun - requested).toFixed(0)} ms`;
      const reading = result.reading;
      const read = !reading ? '' : reading.reused ? '; read unchanged, summary reused' : `; read ${reading.read === 'pieces' ? `${reading.piecesRead} of ${reading.pieces} pieces` : reading.read}`;
      log.info(
        `Summarized ${document.fileName} v${document.version} (${text.length} characters) in ${result.elapsedMs.toFixed(0)} ms in the engine, ${(performance.now() - requested).toFixed(0)} ms in all${waited}${read}; templates looked up in ${templatesMs.toFixed(0)} ms.`,
      );
    } catch (error) {
      if (error instanceof CancelledError) return { kind: 'cancelled' };
      const message = error instanceof Error ? error.message : String(error);
      log.error(`Summary failed: ${message}`);
      return this.explain('failed', this.context.wording.t('Tersely could not summarize this document: {0}', message), trigger);
    } finally {
      progress.end();
      if (this.runningKey === key) this.runningKey = undefined;
    }

    // Only the newest request for the document version on screen may show its result.
    if (!sequencer.isFresh(ticket, document.isClosed ? undefined : document.version)) {
      log.debug(`Dropped a stale result for ${document.fileName} v${ticket.version}.`);
      return { kind: 'stale' };
    }
    const previousPicks = previousPicksFor(before, { scope, version: ticket.version, summary }, trigger === 'live');
    const shown = store.add({
      key,
      uri: document.uri,
      version: ticket.version,
      scope,
      selection: selectionSpan,
      format,
      documentName: vscode.workspace.asRelativePath(document.uri, false),
      summary: this.withCheckedSpans(summary, document.getText()),
    });
    this.display(shown, { previousPicks, fresh: true });
    if (summary.refused) this.context.panel.post({ type: 'notice', kind: 'tooLarge', text: summary.refused });
    return { kind: 'shown', shown };
  }

  /** Stops the engine's job when it is about a document that just closed. */
  cancelFor(key: string): void {
    if (this.runningKey === key) this.context.engine.cancel();
  }

  /** Shown summary for the editor's document at its current version, summarizing first if needed. */
  async currentOrNew(editor: vscode.TextEditor): Promise<ShownSummary | undefined> {
    const shown = this.context.store.get(editor.document.uri.toString());
    if (shown && shown.version === editor.document.version) return shown;
    const outcome = await this.summarize(editor, 'document', 'command');
    return outcome.kind === 'shown' ? outcome.shown : undefined;
  }

  /** Puts a summary in the editor and the panel. */
  display(shown: ShownSummary, how: { previousPicks?: ReadonlySet<string>; fresh?: boolean } = {}): void {
    const { editorView, panel, store, wording } = this.context;
    store.panelKey = shown.key;
    editorView.apply(shown);
    const built = buildPanelSummary(shown.summary, shown.id, shown.documentName, shown.scope, { wording, previousPicks: how.previousPicks });
    panel.post({ type: 'summary', summary: built });
    if (how.fresh) {
      const count = wording.count(shown.summary.sentences.length);
      panel.post({
        type: 'announce',
        text: built.changed > 0 ? wording.t('Summary ready: {0} sentences, {1} new since the edit.', count, built.changed) : wording.t('Summary ready: {0} sentences.', count),
      });
    }
    editorView.updateStatus();
    void vscode.commands.executeCommand('setContext', CONTEXT_KEYS.hasSummary, true);
  }

  forget(document: vscode.TextDocument): void {
    const { editorView, panel, store } = this.context;
    const key = document.uri.toString();
    const shown = store.get(key);
    if (shown) editorView.unhighlight(shown);
    store.delete(key);
    editorView.forgetDocument(document.uri);
    if (store.panelKey === key) {
      panel.post({ type: 'clear' });
      store.panelKey = undefined;
    }
    editorView.updateStatus();
  }

  clearHighlights(): void {
    const { editorView, sequencer, store } = this.context;
    sequencer.invalidate();
    for (const shown of store.all()) editorView.unhighlight(shown);
    editorView.clearDiagnostics();
    editorView.updateStatus();
  }

  /** Summarizes again what the panel shows (after a setting changed). */
  async refresh(): Promise<void> {
    const shown = this.context.store.inPanel();
    if (!shown) return;
    const editor = vscode.window.visibleTextEditors.find((e) => e.document.uri.toString() === shown.key);
    if (!editor) return;
    const sameText = editor.document.version === shown.version;
    if (shown.scope === 'selection' && shown.selection && sameText) await this.summarize(editor, 'selection', 'refresh', shown.selection);
    else await this.summarize(editor, 'document', 'refresh');
  }

  /** Drops any sentence whose span does not fit the text on screen (a defect upstream; never shown wrong). */
  private withCheckedSpans(summary: Summary, text: string): Summary {
    const sentences = summary.sentences.filter((pick) => {
      const ok = checkedSpan(pick.span, text) !== null;
      if (!ok) this.context.log.error(`Engine returned a span outside the document: [${pick.span.start}, ${pick.span.end}).`);
      return ok;
    });
    return sentences.length === summary.sentences.length ? summary : { ...summary, sentences };
  }

  /** Logs a template problem and shows it once per session (digests report theirs here too). */
  tellTemplateProblem(problem: string): void {
    this.context.log.warn(problem);
    if (this.toldTemplateProblems.has(problem)) return;
    this.toldTemplateProblems.add(problem);
    void vscode.window.showWarningMessage(this.context.wording.t('Tersely: {0} (tersely.templateFiles)', problem));
  }

  private explain(kind: 'tooLarge' | 'empty' | 'failed', message: string, trigger: Trigger): SummarizeOutcome {
    this.context.panel.post({ type: 'notice', kind: kind === 'failed' ? 'error' : kind === 'tooLarge' ? 'tooLarge' : 'info', text: message });
    if (trigger === 'command') void vscode.window.showInformationMessage(message);
    return { kind };
  }
}
