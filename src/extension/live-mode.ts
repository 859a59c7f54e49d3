/**
 * Live Summary: when on, the summary follows typing (after a pause) and the active editor (at
 * once). The choice is kept per workspace.
 */
import * as vscode from 'vscode';
import type { TerselyContext } from './context';
import { CONTEXT_KEYS } from './ids';

const STATE_KEY = 'tersely.live';

export class LiveMode {
  private enabled: boolean;

  constructor(
    private readonly context: TerselyContext,
    private readonly workspaceState: vscode.Memento,
  ) {
    this.enabled = workspaceState.get<boolean>(STATE_KEY, false);
    void vscode.commands.executeCommand('setContext', CONTEXT_KEYS.liveMode, this.enabled);
  }

  get on(): boolean {
    return this.enabled;
  }

  async toggle(): Promise<boolean> {
    const { debouncer, panel, store, summarizer } = this.context;
    this.enabled = !this.enabled;
    await this.workspaceState.update(STATE_KEY, this.enabled);
    await vscode.commands.executeCommand('setContext', CONTEXT_KEYS.liveMode, this.enabled);
    panel.post({ type: 'controls', controls: this.context.controls() });
    vscode.window.setStatusBarMessage(`Tersely: live summary ${this.enabled ? 'on' : 'off'}`, 3000);
    if (this.enabled) {
      const editor = this.context.targetEditor();
      if (editor) await summarizer.summarize(editor, 'document', 'switch');
    } else {
      for (const key of store.keys()) debouncer.cancel(key);
    }
    this.context.editorView.updateStatus();
    return this.enabled;
  }
}
