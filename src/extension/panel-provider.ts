/**
 * The side panel (a webview view). It remembers the last message of each kind so that a panel
 * that was hidden and re-shown (or reloaded) gets its content back, and it validates everything
 * the webview sends before handing it on.
 */
import * as vscode from 'vscode';
import { parsePanelMessage, type FromPanel, type PanelProgress, type ToPanel } from './messages';
import { makeNonce, PANEL_RESOURCE_FOLDERS, panelHtml } from './panel-html';
import { VIEW_ID } from './ids';

type Remembered = Partial<Record<ToPanel['type'], ToPanel>>;

/** The only files the panel loads. */
export function panelResources(extensionUri: vscode.Uri): { script: vscode.Uri; style: vscode.Uri } {
  return { script: vscode.Uri.joinPath(extensionUri, 'dist', 'webview', 'panel.js'), style: vscode.Uri.joinPath(extensionUri, 'media', 'panel.css') };
}

export function panelResourceRoots(extensionUri: vscode.Uri): vscode.Uri[] {
  return PANEL_RESOURCE_FOLDERS.map((folder) => vscode.Uri.joinPath(extensionUri, ...folder));
}

export class SummaryPanel implements vscode.WebviewViewProvider, vscode.Disposable {
  private view: vscode.WebviewView | undefined;
  private readonly remembered: Remembered = {};
  /** Jobs showing progress, oldest first; the panel shows the newest. */
  private readonly progress = new Map<number, PanelProgress>();
  private nextProgress = 1;
  private readonly disposables: vscode.Disposable[] = [];
  /** The options the webview was given (the in-editor tests check its resource roots). */
  get webviewOptions(): vscode.WebviewOptions | undefined {
    return this.view?.webview.options;
  }
  /** The last summary the panel was sent (the in-editor tests check its new-pick marks). */
  get shownSummary(): import('./messages').PanelSummary | undefined {
    const message = this.remembered.summary;
    return message?.type === 'summary' ? message.summary : undefined;
  }
  /** The last digest the panel was sent: null once dismissed, undefined before any. */
  get shownDigest(): import('./messages').PanelDigest | null | undefined {
    const message = this.remembered.digest;
    return message?.type === 'digest' ? message.digest : undefined;
  }
  /** The last abstract check the panel was sent: null once dismissed or closed, undefined before any. */
  get shownCheck(): import('./messages').PanelAbstractCheck | null | undefined {
    const message = this.remembered.abstractCheck;
    return message?.type === 'abstractCheck' ? message.check : undefined;
  }
  /** Messages rejected so far (tests read it through the extension's API). */
  rejectedMessages = 0;

  constructor(
    private readonly extensionUri: vscode.Uri,
    private readonly onMessage: (message: FromPanel) => void,
    private readonly log: vscode.LogOutputChannel,
    /** Called each time the panel's view is made, before its page loads: a good moment to start the engine host and send the panel its wording. */
    private readonly onOpen: () => void = () => undefined,
  ) {}

  resolveWebviewView(view: vscode.WebviewView): void {
    this.view = view;
    this.onOpen();
    const { script, style } = panelResources(this.extensionUri);
    view.webview.options = { enableScripts: true, enableCommandUris: false, localResourceRoots: panelResourceRoots(this.extensionUri) };
    view.webview.html = panelHtml({
      cspSource: view.webview.cspSource,
      nonce: makeNonce(),
      scriptUri: view.webview.asWebviewUri(script).toString(),
      styleUri: view.webview.asWebviewUri(style).toString(),
    });
    view.webview.onDidReceiveMessage((raw: unknown) => this.receive(raw), undefined, this.disposables);
    view.onDidDispose(() => {
      if (this.view === view) this.view = undefined;
    }, undefined, this.disposables);
  }

  private receive(raw: unknown): void {
    const parsed = parsePanelMessage(raw);
    if (!parsed.ok) {
      this.rejectedMessages += 1;
      this.log.warn(`Ignored a message from the panel (${parsed.reason}).`);
      return;
    }
    if (parsed.message.type === 'ready') {
      this.replay();
      if (this.focusWhenReady) void this.view?.webview.postMessage({ type: 'focus' } satisfies ToPanel);
      this.focusWhenReady = false;
      return;
    }
    this.onMessage(parsed.message);
  }

  post(message: ToPanel): void {
    // An announcement is said once, never replayed.
    if (message.type !== 'announce') this.remembered[message.type] = message;
    if (message.type === 'summary' || message.type === 'clear') {
      // A new summary replaces any earlier notice about the old one.
      delete this.remembered.notice;
      if (message.type === 'clear') delete this.remembered.summary;
    }
    void this.view?.webview.postMessage(message);
  }

  /** Overlapping jobs (a cancelled request and its successor) each hold a token; progress ends with the last. */
  beginProgress(progress: PanelProgress): number {
    const token = this.nextProgress++;
    this.progress.set(token, progress);
    this.postProgress();
    return token;
  }

  updateProgress(token: number, progress: PanelProgress): void {
    if (!this.progress.has(token)) return;
    this.progress.set(token, progress);
    this.postProgress();
  }

  endProgress(token: number): void {
    if (this.progress.delete(token)) this.postProgress();
  }

  private postProgress(): void {
    const newest = [...this.progress.values()].at(-1) ?? null;
    this.post({ type: 'progress', progress: newest });
  }

  /** Makes the panel visible; `focus`: move the keyboard focus into it (Show Summary Panel), else it stays in the editor. */
  async show(focus = false): Promise<void> {
    if (this.view && !focus) {
      this.view.show(true);
      return;
    }
    if (focus && this.view) {
      this.view.show(false);
      void this.view.webview.postMessage({ type: 'focus' } satisfies ToPanel);
      return;
    }
    // A panel that is not there yet gets the focus once its script says it is ready.
    this.focusWhenReady = focus;
    await vscode.commands.executeCommand(`${VIEW_ID}.focus`);
  }

  private focusWhenReady = false;

  private replay(): void {
    for (const type of ['text', 'controls', 'summary', 'notice', 'abstractCheck', 'digest', 'progress'] as const) {
      const message = this.remembered[type];
      if (message) void this.view?.webview.postMessage(message);
    }
  }

  dispose(): void {
    for (const disposable of this.disposables) disposable.dispose();
    this.disposables.length = 0;
  }
}
