/**
 * The extension's one context object. It owns every disposable (features register theirs
 * through `own` or `disposables`), the settings reader, the engine clients and the summaries
 * on screen; each feature lives in a file of its own and reaches the others through it.
 */
import * as vscode from 'vscode';
import { formatLength, METHOD_INFO } from '../core/index';
import { AbstractCheck } from './abstract-check';
import { Digester } from './digester';
import { watchEditors } from './editor-events';
import { EditorView } from './editor-view';
import type { EngineHosts } from './engine-hosts';
import { OUTPUT_CHANNEL, VIEW_ID } from './ids';
import { LiveMode } from './live-mode';
import type { PanelControls } from './messages';
import { editorWording, localizedPanelText } from './localize';
import { ModelFiles } from './model-file';
import { TemplateLookups } from './template-files';
import { FocusState } from './recent-focuses';
import { handlePanelMessage } from './panel-actions';
import { SummaryPanel } from './panel-provider';
import { Debouncer, RequestSequencer } from './scheduling';
import { SettingsAccess } from './settings-access';
import { isSummarizable, SummaryStore } from './summaries';
import { SummaryActions } from './summary-actions';
import { Summarizer } from './summarizer';
import { EngineClient } from './worker-client';

export class TerselyContext implements vscode.Disposable {
  /** Everything the extension created; disposed in reverse order. */
  readonly disposables: vscode.Disposable[] = [];
  readonly log: vscode.LogOutputChannel;
  readonly settings: SettingsAccess;
  readonly store = new SummaryStore();
  readonly sequencer = new RequestSequencer();
  readonly debouncer = new Debouncer();
  readonly models: ModelFiles;
  /** The summaries' lane of engine work. */
  readonly engine: EngineClient;
  readonly panel: SummaryPanel;
  readonly live: LiveMode;
  readonly editorView: EditorView;
  readonly summarizer: Summarizer;
  readonly actions: SummaryActions;
  readonly abstractCheck: AbstractCheck;
  readonly digester: Digester;
  readonly focus: FocusState;
  /** The team's templates, looked up once per folder and setting until one of their files changes. */
  readonly templates: TemplateLookups;
  /** Every user-visible string goes through this (the editor's localization API). */
  readonly wording = editorWording();

  constructor(extension: vscode.ExtensionContext, hosts: EngineHosts) {
    this.log = this.own(vscode.window.createOutputChannel(OUTPUT_CHANNEL, { log: true }));
    this.settings = new SettingsAccess(this.log);
    this.own({ dispose: () => this.debouncer.dispose() });
    // Owned before the engines, so it is disposed after them.
    this.own(hosts);
    this.engine = this.ownEngine(hosts);
    this.models = new ModelFiles(this.log);
    this.templates = this.own(new TemplateLookups());
    // The panel's wording and controls are made when it opens, not here: translating them was
    // about 9 of 15 ms of activation in the browser editor's extension host.
    this.panel = this.own(
      new SummaryPanel(extension.extensionUri, (message) => void handlePanelMessage(this, message), this.log, () => {
        this.engine.warm();
        this.panel.post({ type: 'text', text: localizedPanelText() });
        this.panel.post({ type: 'controls', controls: this.controls() });
      }),
    );
    this.live = new LiveMode(this, extension.workspaceState);
    this.focus = new FocusState(extension.workspaceState);
    this.editorView = new EditorView(this);
    this.summarizer = new Summarizer(this);
    this.actions = new SummaryActions(this);
    this.abstractCheck = new AbstractCheck(this, this.ownEngine(hosts));
    this.digester = new Digester(this, this.ownEngine(hosts));
    this.own(vscode.window.registerWebviewViewProvider(VIEW_ID, this.panel));
    watchEditors(this);
  }

  own<T extends vscode.Disposable>(disposable: T): T {
    this.disposables.push(disposable);
    return disposable;
  }

  private ownEngine(hosts: EngineHosts): EngineClient {
    const client = new EngineClient(hosts.lane(), (line) => this.log.debug(line));
    this.own({ dispose: () => client.dispose() });
    return client;
  }

  controls(): PanelControls {
    const { summary } = this.settings.read();
    const { t } = this.wording;
    return {
      length: formatLength(summary.budget),
      method: summary.method,
      methods: METHOD_INFO.map((m) => ({ value: m.name, label: t(m.label), detail: t(m.detail) })),
      balance: summary.balance,
      live: this.live.on,
      focus: this.focus.current,
      recentFocuses: this.focus.recent,
    };
  }

  /** Sets the focus of the next summaries (empty: general), remembers it and shows it in the panel's controls. */
  async useFocus(raw: string): Promise<string> {
    const focus = await this.focus.set(raw);
    this.panel.post({ type: 'controls', controls: this.controls() });
    return focus;
  }

  /** As `useFocus`, then summarizes the target editor again. */
  async setFocus(raw: string): Promise<string> {
    const focus = await this.useFocus(raw);
    const editor = this.targetEditor();
    if (editor) await this.summarizer.summarize(editor, 'document', 'refresh');
    return focus;
  }

  /** The editor a command acts on: the active one, else the one whose summary the panel shows. */
  targetEditor(): vscode.TextEditor | undefined {
    const active = vscode.window.activeTextEditor;
    if (active && isSummarizable(active.document)) return active;
    const visible = vscode.window.visibleTextEditors;
    return visible.find((editor) => editor.document.uri.toString() === this.store.panelKey) ?? visible.find((e) => isSummarizable(e.document));
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
