/**
 * Loads the trained sentence model named by `tersely.modelFile`. Workspace Trust: in an
 * untrusted workspace no model file is read at all (package.json also marks the setting as
 * restricted, so a workspace cannot set it there). The engine's size cap and validation apply
 * here, before the model is sent; a refused file gives one clear message (naming the file and the
 * reason) and the engine's built-in model is used. Read through the editor's file system API, so the same
 * code works in the desktop editor and in the browser editor's web worker.
 */
import * as vscode from 'vscode';
import { loadModel, MODEL_LIMITS } from '../core/index';
import type { EngineModel } from './engine-protocol';

/** The engine's own cap on a model file (MODEL_LIMITS), checked before anything is read. */
const MAX_MODEL_BYTES = MODEL_LIMITS.maxFileBytes;

export type ModelValidator = (json: unknown) => { ok: true; model: unknown } | { ok: false; error: string };

/** The engine's full validation (own properties, known features, finite counts), so a bad file is refused here, once. */
const engineValidation: ModelValidator = (json) => {
  const loaded = loadModel(json);
  return loaded.ok ? { ok: true, model: json } : { ok: false, error: loaded.error };
};

export class ModelFiles {
  private cache: EngineModel | undefined;
  private readonly reported = new Set<string>();

  constructor(
    private readonly log: vscode.LogOutputChannel,
    private readonly validate: ModelValidator = engineValidation,
  ) {}

  /**
   * The model for the engine with a key that changes when the file does (the engine host keeps
   * the model under that key), or undefined for the built-in one.
   */
  async load(setting: string): Promise<EngineModel | undefined> {
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
        this.fail(setting, `the file has ${stat.size.toLocaleString('en')} bytes, more than the ${MAX_MODEL_BYTES.toLocaleString('en')} a model file may have`);
        return undefined;
      }
      const key = `${uri.toString()}@${stat.mtime}:${stat.size}`;
      if (this.cache?.key === key) return this.cache;
      const bytes = await vscode.workspace.fs.readFile(uri);
      // The file may have grown between stat and read.
      if (bytes.byteLength > MAX_MODEL_BYTES) {
        this.fail(setting, `the file has more than the ${MAX_MODEL_BYTES.toLocaleString('en')} bytes a model file may have`);
        return undefined;
      }
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
      this.log.info(`Loaded the sentence model from ${uri.toString(true)}.`);
      return this.cache;
    } catch (error) {
      this.fail(setting, error instanceof Error ? error.message : String(error));
      return undefined;
    }
  }

  private resolve(setting: string): vscode.Uri | undefined {
    const folder = vscode.workspace.workspaceFolders?.[0];
    if (setting.startsWith('/') || /^[a-zA-Z]:[\\/]/.test(setting)) {
      // An absolute path lives where the workspace does (a remote or browser workspace is not `file:`).
      const path = vscode.Uri.file(setting).path;
      return folder ? folder.uri.with({ path, query: '', fragment: '' }) : vscode.Uri.file(setting);
    }
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
