/**
 * The extension's one context object: it owns every disposable, the engine client and the
 * summaries on screen, and carries out what commands and the panel ask for. Listeners are
 * registered with an owner here, so deactivation leaves nothing behind.
 */
import * as vscode from 'vscode';
import { Worker } from 'node:worker_threads';
import type { DocumentFormat, Span, Summary } from '../core/index';
import { SummaryHighlights } from './decorations';
import { RepairQuickFixes, standAloneDiagnostics, type RepairArgs } from './diagnostics';
import { describePick } from './hover-text';
import { abstractView } from './abstract-view';
import { ABSTRACT_CODE, CONTEXT_KEYS, DIAGNOSTIC_SOURCE, OUTPUT_CHANNEL, STAND_ALONE_CODE, VIEW_ID } from './ids';
import type { FromPanel, PanelControls } from './messages';
import { ModelFiles } from './model-file';
import { buildPanelSummary } from './panel-model';
import { SummaryPanel } from './panel-provider';
import { checkedSpan, spanAt } from './ranges';
import { applyRepair } from '../core/index';
import { Debouncer, RequestSequencer } from './scheduling';
import { formatFor, parseSettings, toEngineOptions, type SettingKey, type TerselySettings } from './settings';
import { SummaryStatus } from './status-bar';
import { planInsertion, summaryForClipboard } from './summary-text';
import { CancelledError, EngineClient } from './worker-client';

/** How long a request may run before progress is shown (the issue asks for ~300 ms). */
const PROGRESS_DELAY_MS = 300;
const SETTINGS_REFRESH_DELAY_MS = 50;

export type Scope = 'document' | 'selection';
export type Trigger = 'command' | 'live' | 'switch' | 'refresh';

/** A summary on screen for one document version. */
export interface ShownSummary {
  readonly id: number;
  readonly key: string;
  readonly uri: vscode.Uri;
  readonly version: number;
  readonly scope: Scope;
  readonly selection: Span | null;
  readonly format: DocumentFormat;
  readonly documentName: string;
  summary: Summary;
  highlighted: boolean;
}

export type SummarizeOutcome =
  | { readonly kind: 'shown'; readonly shown: ShownSummary }
  | { readonly kind: 'tooLarge' | 'empty' | 'stale' | 'cancelled' | 'failed' | 'noEditor' };

/** What the in-editor tests can observe (the API `activate` returns). */
export interface TerselyApi {
  inspect(uri: vscode.Uri): { id: number; version: number; scope: Scope; spans: Span[]; highlighted: boolean; warnings: number } | undefined;
  readonly live: boolean;
  readonly statusText: string;
  readonly rejectedPanelMessages: number;
  readonly engineThreads: number;
}

function isSummarizable(document: vscode.TextDocument): boolean {
  // Output panes, git views and the like are not documents people write.
  return ['file', 'untitled', 'vscode-remote', 'vscode-userdata'].includes(document.uri.scheme);
}

export class TerselyContext implements vscode.Disposable {
  readonly log: vscode.LogOutputChannel;
  private readonly disposables: vscode.Disposable[] = [];
  private readonly engine: EngineClient;
  /** A second lane, so a live summary never cancels an abstract check (or the other way round). */
  private readonly abstractEngine: EngineClient;
  private readonly abstractDiagnostics: vscode.DiagnosticCollection;
  private readonly sequencer = new RequestSequencer();
  private readonly debouncer = new Debouncer();
  private readonly shown = new Map<string, ShownSummary>();
  private readonly highlights: SummaryHighlights;
  private readonly status: SummaryStatus;
  private readonly diagnostics: vscode.DiagnosticCollection;
  private readonly models: ModelFiles;
  readonly panel: SummaryPanel;
  /** Document key of the summary the panel shows. */
  private panelKey: string | undefined;
  /** Document key of the job the engine is running. */
  private runningKey: string | undefined;
  private nextSummaryId = 1;
  private liveMode: boolean;

  constructor(private readonly extension: vscode.ExtensionContext) {
    this.log = this.own(vscode.window.createOutputChannel(OUTPUT_CHANNEL, { log: true }));
    const workerPath = vscode.Uri.joinPath(extension.extensionUri, 'dist', 'engine-worker.cjs').fsPath;
    this.engine = new EngineClient(() => new Worker(workerPath), (line) => this.log.debug(line));
    this.own({ dispose: () => this.engine.dispose() });
    this.abstractEngine = new EngineClient(() => new Worker(workerPath), (line) => this.log.debug(line));
    this.own({ dispose: () => this.abstractEngine.dispose() });
    this.abstractDiagnostics = this.own(vscode.languages.createDiagnosticCollection(`${DIAGNOSTIC_SOURCE} abstract`));
    this.own({ dispose: () => this.debouncer.dispose() });
    this.highlights = this.own(new SummaryHighlights());
    this.status = this.own(new SummaryStatus());
    this.diagnostics = this.own(vscode.languages.createDiagnosticCollection(DIAGNOSTIC_SOURCE));
    this.models = new ModelFiles(this.log);
    this.panel = this.own(new SummaryPanel(extension.extensionUri, (message) => void this.onPanelMessage(message), this.log, () => this.engine.warm()));
    this.liveMode = extension.workspaceState.get<boolean>('tersely.live', false);

    this.own(vscode.window.registerWebviewViewProvider(VIEW_ID, this.panel));
    this.own(
      vscode.languages.registerHoverProvider('*', {
        provideHover: (document, position) => this.hoverAt(document, position),
      }),
    );
    this.own(
      vscode.languages.registerCodeActionsProvider('*', new RepairQuickFixes((document, diagnostic) => this.warningFor(document, diagnostic)), {
        providedCodeActionKinds: RepairQuickFixes.kinds,
      }),
    );
    this.watchEditors();
    void vscode.commands.executeCommand('setContext', CONTEXT_KEYS.liveMode, this.liveMode);
    this.panel.post({ type: 'controls', controls: this.controls() });
  }

  private own<T extends vscode.Disposable>(disposable: T): T {
    this.disposables.push(disposable);
    return disposable;
  }

  get live(): boolean {
    return this.liveMode;
  }

  // ---------- settings ----------

  settings(): TerselySettings {
    const configuration = vscode.workspace.getConfiguration('tersely');
    const { settings, problems } = parseSettings((key) => configuration.get(key));
    for (const problem of problems) this.log.warn(problem);
    return settings;
  }

  private controls(): PanelControls {
    const settings = this.settings();
    return { unit: settings.length.unit, value: settings.length.value, method: settings.method, balance: settings.balance.enabled, live: this.liveMode };
  }

  /** Writes where the user's value lives now (workspace folder, workspace or user settings). */
  private async updateSetting(key: SettingKey, value: unknown): Promise<void> {
    const configuration = vscode.workspace.getConfiguration('tersely');
    const inspected = configuration.inspect(key);
    const target =
      inspected?.workspaceFolderValue !== undefined
        ? vscode.ConfigurationTarget.WorkspaceFolder
        : inspected?.workspaceValue !== undefined
          ? vscode.ConfigurationTarget.Workspace
          : vscode.ConfigurationTarget.Global;
    await configuration.update(key, value, target);
  }

  // ---------- summarizing ----------

  /** The editor a command acts on: the active one, else the one whose summary the panel shows. */
  targetEditor(): vscode.TextEditor | undefined {
    const active = vscode.window.activeTextEditor;
    if (active && isSummarizable(active.document)) return active;
    return vscode.window.visibleTextEditors.find((editor) => editor.document.uri.toString() === this.panelKey) ?? vscode.window.visibleTextEditors.find((e) => isSummarizable(e.document));
  }

  async summarize(editor: vscode.TextEditor, scope: Scope, trigger: Trigger, selection?: Span): Promise<SummarizeOutcome> {
    const document = editor.document;
    const key = document.uri.toString();
    const settings = this.settings();
    this.debouncer.cancel(key);

    let text = document.getText();
    let baseOffset = 0;
    let selectionSpan: Span | null = null;
    if (scope === 'selection') {
      const span = selection ?? { start: document.offsetAt(editor.selection.start), end: document.offsetAt(editor.selection.end) };
      if (span.end <= span.start) return this.explain('empty', 'Select some text first, then run Summarize Selection.', trigger);
      selectionSpan = span;
      baseOffset = span.start;
      text = text.slice(span.start, span.end);
    }
    if (text.length > settings.maxDocumentSize) {
      this.forget(document);
      const message = `This ${scope === 'selection' ? 'selection' : 'document'} has ${text.length.toLocaleString('en')} characters, more than the ${settings.maxDocumentSize.toLocaleString('en')} set in tersely.maxDocumentSize, so Tersely did not summarize it.`;
      return this.explain('tooLarge', message, trigger);
    }

    const ticket = this.sequencer.issue(key, document.version);
    const model = await this.models.load(settings.modelFile);
    const format = formatFor(document.languageId, document.fileName);
    const progress = this.startProgress();
    this.runningKey = key;
    let summary: Summary;
    try {
      const result = await this.engine.run({ kind: 'summarize', text, options: toEngineOptions(settings, format, baseOffset, model) });
      if (result.kind !== 'summarize') return { kind: 'failed' };
      summary = result.summary;
      if (result.modelProblem) this.models.reportProblem(settings.modelFile, result.modelProblem);
      this.log.info(`Summarized ${document.fileName} v${document.version} (${text.length} characters) in ${result.elapsedMs.toFixed(0)} ms.`);
    } catch (error) {
      if (error instanceof CancelledError) return { kind: 'cancelled' };
      const message = error instanceof Error ? error.message : String(error);
      this.log.error(`Summary failed: ${message}`);
      return this.explain('failed', `Tersely could not summarize this document: ${message}`, trigger);
    } finally {
      progress.end();
      if (this.runningKey === key) this.runningKey = undefined;
    }

    // Only the newest request for the document version on screen may show its result.
    if (!this.sequencer.isFresh(ticket, document.isClosed ? undefined : document.version)) {
      this.log.debug(`Dropped a stale result for ${document.fileName} v${ticket.version}.`);
      return { kind: 'stale' };
    }
    const shown: ShownSummary = {
      id: this.nextSummaryId++,
      key,
      uri: document.uri,
      version: ticket.version,
      scope,
      selection: selectionSpan,
      format,
      documentName: vscode.workspace.asRelativePath(document.uri, false),
      summary: this.withCheckedSpans(summary, document.getText()),
      highlighted: true,
    };
    this.shown.set(key, shown);
    this.display(shown);
    if (summary.refused) this.panel.post({ type: 'notice', kind: 'tooLarge', text: summary.refused });
    return { kind: 'shown', shown };
  }

  /** Drops any sentence whose span does not fit the text on screen (a defect upstream; never shown wrong). */
  private withCheckedSpans(summary: Summary, text: string): Summary {
    const sentences = summary.sentences.filter((pick) => {
      const ok = checkedSpan(pick.span, text) !== null;
      if (!ok) this.log.error(`Engine returned a span outside the document: [${pick.span.start}, ${pick.span.end}).`);
      return ok;
    });
    return sentences.length === summary.sentences.length ? summary : { ...summary, sentences };
  }

  private explain(kind: 'tooLarge' | 'empty' | 'failed', message: string, trigger: Trigger): SummarizeOutcome {
    this.panel.post({ type: 'notice', kind: kind === 'failed' ? 'error' : kind === 'tooLarge' ? 'tooLarge' : 'info', text: message });
    if (trigger === 'command') void vscode.window.showInformationMessage(message);
    return { kind };
  }

  private startProgress(): { end(): void } {
    let finish: () => void = () => undefined;
    const finished = new Promise<void>((resolve) => (finish = resolve));
    let busy = false;
    const timer = setTimeout(() => {
      busy = true;
      this.panel.busy(true);
      void vscode.window.withProgress({ location: { viewId: VIEW_ID } }, () => finished);
      void vscode.window.withProgress({ location: vscode.ProgressLocation.Window, title: 'Tersely: summarizing…' }, () => finished);
    }, PROGRESS_DELAY_MS);
    return {
      end: () => {
        clearTimeout(timer);
        finish();
        if (busy) this.panel.busy(false);
      },
    };
  }

  // ---------- what is on screen ----------

  private isCurrent(shown: ShownSummary): boolean {
    const document = vscode.workspace.textDocuments.find((d) => d.uri.toString() === shown.key);
    return document !== undefined && !document.isClosed && document.version === shown.version;
  }

  private display(shown: ShownSummary): void {
    this.panelKey = shown.key;
    this.applyHighlights(shown);
    this.panel.post({ type: 'summary', summary: buildPanelSummary(shown.summary, shown.id, shown.documentName, shown.scope) });
    this.updateStatus();
    void vscode.commands.executeCommand('setContext', CONTEXT_KEYS.hasSummary, true);
  }

  private applyHighlights(shown: ShownSummary): void {
    const editors = vscode.window.visibleTextEditors.filter((editor) => editor.document.uri.toString() === shown.key);
    for (const editor of editors) {
      if (!shown.highlighted || editor.document.version !== shown.version) {
        this.highlights.clear(editor);
        continue;
      }
      const ranges = shown.summary.sentences.map((pick) => new vscode.Range(editor.document.positionAt(pick.span.start), editor.document.positionAt(pick.span.end)));
      this.highlights.show(editor, ranges);
    }
    const document = editors[0]?.document ?? vscode.workspace.textDocuments.find((d) => d.uri.toString() === shown.key);
    if (document && shown.highlighted && document.version === shown.version) {
      this.diagnostics.set(document.uri, standAloneDiagnostics(document, shown.summary));
    } else {
      this.diagnostics.delete(shown.uri);
    }
  }

  private updateStatus(): void {
    const editor = vscode.window.activeTextEditor;
    const shown = editor ? this.shown.get(editor.document.uri.toString()) : this.panelKey ? this.shown.get(this.panelKey) : undefined;
    if (shown && shown.highlighted && this.isCurrent(shown)) this.status.show(shown.summary.stats, this.liveMode);
    else this.status.hide();
  }

  /** The document changed or closed: its summary no longer matches, so it leaves the editor. */
  private unhighlight(shown: ShownSummary): void {
    shown.highlighted = false;
    this.applyHighlights(shown);
  }

  private forget(document: vscode.TextDocument): void {
    const key = document.uri.toString();
    const shown = this.shown.get(key);
    if (shown) this.unhighlight(shown);
    this.shown.delete(key);
    this.diagnostics.delete(document.uri);
    if (this.panelKey === key) {
      this.panel.post({ type: 'clear' });
      this.panelKey = undefined;
    }
    this.updateStatus();
  }

  clearHighlights(): void {
    this.sequencer.invalidate();
    for (const shown of this.shown.values()) this.unhighlight(shown);
    this.diagnostics.clear();
    this.updateStatus();
  }

  // ---------- editor events ----------

  private watchEditors(): void {
    vscode.workspace.onDidChangeTextDocument(
      (event) => {
        if (event.contentChanges.length === 0 || !isSummarizable(event.document)) return;
        const key = event.document.uri.toString();
        const active = vscode.window.activeTextEditor;
        if (this.liveMode && active?.document === event.document) {
          this.debouncer.schedule(key, this.settings().liveDelayMs, () => {
            const editor = vscode.window.visibleTextEditors.find((e) => e.document === event.document);
            if (editor) void this.summarize(editor, 'document', 'live');
          });
          return;
        }
        const shown = this.shown.get(key);
        if (shown?.highlighted) {
          this.unhighlight(shown);
          if (this.panelKey === key) this.panel.post({ type: 'notice', kind: 'stale', text: 'The document changed since this summary. Summarize again to refresh it.' });
          this.updateStatus();
        }
      },
      undefined,
      this.disposables,
    );

    vscode.window.onDidChangeActiveTextEditor(
      (editor) => {
        if (!editor || !isSummarizable(editor.document)) return;
        const shown = this.shown.get(editor.document.uri.toString());
        if (this.liveMode) {
          // Switching editors follows at once; only typing waits for a pause.
          if (!shown || !this.isCurrent(shown) || shown.scope !== 'document') void this.summarize(editor, 'document', 'switch');
          else this.display(shown);
          return;
        }
        if (shown && this.isCurrent(shown)) this.display(shown);
        this.updateStatus();
      },
      undefined,
      this.disposables,
    );

    vscode.window.onDidChangeVisibleTextEditors(
      () => {
        for (const shown of this.shown.values()) if (shown.highlighted) this.applyHighlights(shown);
      },
      undefined,
      this.disposables,
    );

    vscode.workspace.onDidCloseTextDocument(
      (document) => {
        const key = document.uri.toString();
        this.debouncer.cancel(key);
        if (this.runningKey === key) this.engine.cancel();
        if (this.shown.has(key)) this.forget(document);
      },
      undefined,
      this.disposables,
    );

    vscode.workspace.onDidChangeConfiguration(
      (event) => {
        if (!event.affectsConfiguration('tersely')) return;
        this.panel.post({ type: 'controls', controls: this.controls() });
        this.debouncer.schedule('settings', SETTINGS_REFRESH_DELAY_MS, () => void this.refresh());
      },
      undefined,
      this.disposables,
    );

    vscode.workspace.onDidGrantWorkspaceTrust(() => void this.refresh(), undefined, this.disposables);
  }

  /** Summarizes again what the panel shows (after a setting changed). */
  private async refresh(): Promise<void> {
    const shown = this.panelKey ? this.shown.get(this.panelKey) : undefined;
    if (!shown) return;
    const editor = vscode.window.visibleTextEditors.find((e) => e.document.uri.toString() === shown.key);
    if (!editor) return;
    const sameText = editor.document.version === shown.version;
    if (shown.scope === 'selection' && shown.selection && sameText) await this.summarize(editor, 'selection', 'refresh', shown.selection);
    else await this.summarize(editor, 'document', 'refresh');
  }

  // ---------- hover, quick fixes ----------

  private hoverAt(document: vscode.TextDocument, position: vscode.Position): vscode.Hover | undefined {
    const shown = this.shown.get(document.uri.toString());
    if (!shown || !shown.highlighted || document.version !== shown.version) return undefined;
    const picks = shown.summary.sentences;
    const at = spanAt(
      picks.map((pick) => pick.span),
      document.offsetAt(position),
    );
    if (at < 0) return undefined;
    const pick = picks[at]!;
    const markdown = new vscode.MarkdownString(describePick(pick, shown.summary.stats.sentencesIn, shown.summary.method));
    markdown.isTrusted = false;
    markdown.supportHtml = false;
    return new vscode.Hover(markdown, new vscode.Range(document.positionAt(pick.span.start), document.positionAt(pick.span.end)));
  }

  private warningFor(document: vscode.TextDocument, diagnostic: vscode.Diagnostic): { summaryId: number; index: number; warning: Summary['warnings'][number] } | undefined {
    const shown = this.shown.get(document.uri.toString());
    if (!shown || document.version !== shown.version || diagnostic.code !== STAND_ALONE_CODE) return undefined;
    const start = document.offsetAt(diagnostic.range.start);
    const end = document.offsetAt(diagnostic.range.end);
    const index = shown.summary.warnings.findIndex((warning) => warning.span.start === start && warning.span.end === end);
    return index >= 0 ? { summaryId: shown.id, index, warning: shown.summary.warnings[index]! } : undefined;
  }

  // ---------- actions ----------

  private findShown(summaryId: number): ShownSummary | undefined {
    for (const shown of this.shown.values()) if (shown.id === summaryId) return shown;
    return undefined;
  }

  /** Shown summary for the editor's document at its current version, summarizing first if needed. */
  async currentOrNew(editor: vscode.TextEditor): Promise<ShownSummary | undefined> {
    const shown = this.shown.get(editor.document.uri.toString());
    if (shown && shown.version === editor.document.version) return shown;
    const outcome = await this.summarize(editor, 'document', 'command');
    return outcome.kind === 'shown' ? outcome.shown : undefined;
  }

  async reveal(summaryId: number, sentence: number): Promise<boolean> {
    const shown = this.findShown(summaryId);
    if (!shown || !this.isCurrent(shown)) {
      this.panel.post({ type: 'notice', kind: 'stale', text: 'The document changed since this summary. Summarize again before jumping to a sentence.' });
      return false;
    }
    const pick = shown.summary.sentences.find((p) => p.sentence === sentence);
    if (!pick) {
      this.log.warn(`The panel asked for sentence ${sentence}, which is not in summary ${summaryId}.`);
      return false;
    }
    const document = await vscode.workspace.openTextDocument(shown.uri);
    if (document.version !== shown.version) return false;
    const range = new vscode.Range(document.positionAt(pick.span.start), document.positionAt(pick.span.end));
    const column = vscode.window.visibleTextEditors.find((e) => e.document === document)?.viewColumn;
    const editor = await vscode.window.showTextDocument(document, { viewColumn: column, selection: range, preserveFocus: false });
    editor.revealRange(range, vscode.TextEditorRevealType.InCenterIfOutsideViewport);
    return true;
  }

  async repair(args: RepairArgs): Promise<boolean> {
    const shown = this.findShown(args.summaryId);
    if (!shown || !this.isCurrent(shown)) {
      void vscode.window.showInformationMessage('That summary is out of date; summarize again to repair it.');
      return false;
    }
    const outcome = applyRepair(shown.summary, args.warning, args.repair);
    if (!outcome.ok) {
      void vscode.window.showInformationMessage(outcome.reason);
      return false;
    }
    shown.summary = outcome.summary;
    this.display(shown);
    vscode.window.setStatusBarMessage(`Tersely: ${outcome.description}`, 4000);
    return true;
  }

  async insertSummary(editor: vscode.TextEditor): Promise<{ inserted: boolean; offset: number; placement: string } | undefined> {
    const shown = await this.currentOrNew(editor);
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
    const shown = editor ? await this.currentOrNew(editor) : this.panelKey ? this.shown.get(this.panelKey) : undefined;
    if (!shown) {
      void vscode.window.showInformationMessage('There is no summary to copy yet: run Summarize Document first.');
      return undefined;
    }
    const markdown = summaryForClipboard(shown.summary);
    await vscode.env.clipboard.writeText(markdown);
    vscode.window.setStatusBarMessage(`Tersely: copied a summary of ${shown.summary.sentences.length} sentences.`, 4000);
    return markdown;
  }

  async toggleLive(): Promise<boolean> {
    this.liveMode = !this.liveMode;
    await this.extension.workspaceState.update('tersely.live', this.liveMode);
    await vscode.commands.executeCommand('setContext', CONTEXT_KEYS.liveMode, this.liveMode);
    this.panel.post({ type: 'controls', controls: this.controls() });
    vscode.window.setStatusBarMessage(`Tersely: live summary ${this.liveMode ? 'on' : 'off'}`, 3000);
    if (this.liveMode) {
      const editor = this.targetEditor();
      if (editor) await this.summarize(editor, 'document', 'switch');
    } else {
      for (const key of this.shown.keys()) this.debouncer.cancel(key);
    }
    this.updateStatus();
    return this.liveMode;
  }

  private async onPanelMessage(message: FromPanel): Promise<void> {
    switch (message.type) {
      case 'ready':
        return;
      case 'reveal':
        await this.reveal(message.summaryId, message.sentence);
        return;
      case 'applyRepair':
        await this.repair({ summaryId: message.summaryId, warning: message.warning, repair: message.repair });
        return;
      case 'setLength':
        await this.updateSetting('length.unit', message.unit);
        await this.updateSetting('length.value', message.value);
        return;
      case 'setMethod':
        await this.updateSetting('method', message.method);
        return;
      case 'setBalance':
        await this.updateSetting('balance.enabled', message.enabled);
        return;
      case 'command':
        await vscode.commands.executeCommand(`tersely.${message.command}`);
        return;
    }
  }

  async checkAbstract(editor: vscode.TextEditor): Promise<{ ok: boolean; findings: number } | undefined> {
    const document = editor.document;
    const settings = this.settings();
    const text = document.getText();
    if (text.length > settings.maxDocumentSize) {
      void vscode.window.showInformationMessage(`This document is larger than tersely.maxDocumentSize (${settings.maxDocumentSize.toLocaleString('en')} characters).`);
      return undefined;
    }
    const version = document.version;
    const progress = this.startProgress();
    let report;
    try {
      const result = await this.abstractEngine.run({ kind: 'checkAbstract', text, options: { format: formatFor(document.languageId, document.fileName), language: settings.language } });
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
    this.abstractDiagnostics.set(
      document.uri,
      view.findings
        .map((finding) => ({ finding, span: checkedSpan(finding.span, text) }))
        .filter((entry) => entry.span !== null)
        .map(({ finding, span }) => {
          const diagnostic = new vscode.Diagnostic(new vscode.Range(document.positionAt(span!.start), document.positionAt(span!.end)), finding.message, vscode.DiagnosticSeverity.Information);
          diagnostic.source = DIAGNOSTIC_SOURCE;
          diagnostic.code = ABSTRACT_CODE;
          return diagnostic;
        }),
    );
    this.panel.post({ type: 'abstractCheck', check: view.panel });
    void this.panel.show();
    if (!report.ok) void vscode.window.showInformationMessage(report.error);
    return { ok: report.ok, findings: view.findings.length };
  }

  api(): TerselyApi {
    const self = this;
    return {
      inspect(uri) {
        const shown = self.shown.get(uri.toString());
        if (!shown) return undefined;
        return {
          id: shown.id,
          version: shown.version,
          scope: shown.scope,
          spans: shown.summary.sentences.map((pick) => pick.span),
          highlighted: shown.highlighted,
          warnings: shown.summary.warnings.length,
        };
      },
      get live() {
        return self.liveMode;
      },
      get statusText() {
        return self.status.text;
      },
      get rejectedPanelMessages() {
        return self.panel.rejectedMessages;
      },
      get engineThreads() {
        return self.engine.startedWorkers;
      },
    };
  }

  dispose(): void {
    for (const disposable of this.disposables.reverse()) {
      try {
        disposable.dispose();
      } catch {
        // One failing disposable must not keep the others alive.
      }
    }
    this.disposables.length = 0;
  }
}

