/**
 * The side panel (a webview view). It remembers the last message of each kind so that a panel
 * that was hidden and re-shown (or reloaded) gets its content back, and it validates everything
 * the webview sends before handing it on.
 */
import * as vscode from 'vscode';
import { parsePanelMessage, type FromPanel, type PanelProgress, type ToPanel } from './messages';
import { makeNonce, panelHtml } from './panel-html';
import { VIEW_ID } from './ids';

type Remembered = Partial<Record<ToPanel['type'], ToPanel>>;

export class SummaryPanel implements vscode.WebviewViewProvider, vscode.Disposable {
  private view: vscode.WebviewView | undefined;
  private readonly remembered: Remembered = {};
  /** Jobs showing progress, oldest first; the panel shows the newest. */
  private readonly progress = new Map<number, PanelProgress>();
  private nextProgress = 1;
  private readonly disposables: vscode.Disposable[] = [];
  /** Messages rejected so far (tests read it through the extension's API). */
  rejectedMessages = 0;

  constructor(
    private readonly extensionUri: vscode.Uri,
    private readonly onMessage: (message: FromPanel) => void,
    private readonly log: vscode.LogOutputChannel,
    /** Called when the panel opens: a good moment to start the engine host. */
    private readonly onFirstShow: () => void = () => undefined,
  ) {}

  resolveWebviewView(view: vscode.WebviewView): void {
    this.view = view;
    this.onFirstShow();
    const media = vscode.Uri.joinPath(this.extensionUri, 'media');
    const dist = vscode.Uri.joinPath(this.extensionUri, 'dist');
    view.webview.options = { enableScripts: true, enableCommandUris: false, localResourceRoots: [media, dist] };
    view.webview.html = panelHtml({
      cspSource: view.webview.cspSource,
      nonce: makeNonce(),
      scriptUri: view.webview.asWebviewUri(vscode.Uri.joinPath(dist, 'webview.js')).toString(),
      styleUri: view.webview.asWebviewUri(vscode.Uri.joinPath(media, 'panel.css')).toString(),
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
      return;
    }
    this.onMessage(parsed.message);
  }

  post(message: ToPanel): void {
    this.remembered[message.type] = message;
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

  /** Makes the panel visible without taking focus from the editor when possible. */
  async show(): Promise<void> {
    if (this.view) {
      this.view.show(true);
      return;
    }
    await vscode.commands.executeCommand(`${VIEW_ID}.focus`);
  }

  private replay(): void {
    for (const type of ['controls', 'summary', 'notice', 'abstractCheck', 'progress'] as const) {
      const message = this.remembered[type];
      if (message) void this.view?.webview.postMessage(message);
    }
  }

  dispose(): void {
    for (const disposable of this.disposables) disposable.dispose();
    this.disposables.length = 0;
  }
}
