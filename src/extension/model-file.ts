/**
 * Loads the trained sentence model named by `tersely.modelFile`. Workspace Trust: in an
 * untrusted workspace no model file is read at all (package.json also marks the setting as
 * restricted, so a workspace cannot set it there). A malformed file gives one clear message and
 * the engine's built-in model is used.
 */
import * as vscode from 'vscode';

const MAX_MODEL_BYTES = 20 * 1024 * 1024;

export type ModelValidator = (json: unknown) => { ok: true; model: unknown } | { ok: false; error: string };

/** Until a stricter validator is plugged in, only the outer shape is checked here. */
export const shapeOnly: ModelValidator = (json) =>
  typeof json === 'object' && json !== null && !Array.isArray(json) ? { ok: true, model: json } : { ok: false, error: 'the file is not a JSON object' };

export class ModelFiles {
  private cache: { key: string; model: unknown } | undefined;
  private readonly reported = new Set<string>();

  constructor(
    private readonly log: vscode.LogOutputChannel,
    private readonly validate: ModelValidator = shapeOnly,
  ) {}

  /** The model to pass to the engine, or undefined for the built-in one. */
  async load(setting: string): Promise<unknown> {
    if (!setting) return undefined;
    if (!vscode.workspace.isTrusted) {
      this.once(`untrusted:${setting}`, () => this.log.info('tersely.modelFile is ignored: this workspace is not trusted.'));
      return undefined;
    }
    const uri = this.resolve(setting);
    if (!uri) {
      this.fail(setting, 'a relative path needs an open workspace folder');
      return undefined;
    }
    try {
      const stat = await vscode.workspace.fs.stat(uri);
      if (stat.size > MAX_MODEL_BYTES) {
        this.fail(setting, `the file is larger than ${MAX_MODEL_BYTES / 1024 / 1024} MB`);
        return undefined;
      }
      const key = `${uri.toString()}@${stat.mtime}:${stat.size}`;
      if (this.cache?.key === key) return this.cache.model;
      const bytes = await vscode.workspace.fs.readFile(uri);
      let json: unknown;
      try {
        json = JSON.parse(new TextDecoder().decode(bytes));
      } catch {
        this.fail(setting, 'the file is not valid JSON');
        return undefined;
      }
      const checked = this.validate(json);
      if (!checked.ok) {
        this.fail(setting, checked.error);
        return undefined;
      }
      this.cache = { key, model: checked.model };
      this.log.info(`Loaded the sentence model from ${uri.fsPath}.`);
      return checked.model;
    } catch (error) {
      this.fail(setting, error instanceof Error ? error.message : String(error));
      return undefined;
    }
  }

  private resolve(setting: string): vscode.Uri | undefined {
    if (setting.startsWith('/') || /^[a-zA-Z]:[\\/]/.test(setting)) return vscode.Uri.file(setting);
    const folder = vscode.workspace.workspaceFolders?.[0];
    return folder ? vscode.Uri.joinPath(folder.uri, setting) : undefined;
  }

  /** Reports a model the engine rejected (once per file and reason). */
  reportProblem(setting: string, reason: string): void {
    this.fail(setting, reason);
  }

  private fail(setting: string, reason: string): void {
    this.once(`fail:${setting}:${reason}`, () => {
      const message = `Tersely could not use the model file "${setting}": ${reason}. The built-in model is used instead.`;
      this.log.warn(message);
      void vscode.window.showWarningMessage(message);
    });
  }

  private once(key: string, action: () => void): void {
    if (this.reported.has(key)) return;
    this.reported.add(key);
    action();
  }
}
