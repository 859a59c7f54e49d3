/** Entry point for the desktop editor (package.json `main`): the engine runs in Node worker threads. */
import * as vscode from 'vscode';
import { activateWith } from './activate';
import type { TerselyApi } from './api';
import { nodeWorkerScript } from './engine-host-node';

export function activate(extension: vscode.ExtensionContext): TerselyApi {
  const script = vscode.Uri.joinPath(extension.extensionUri, 'dist', 'engine-worker.cjs').fsPath;
  return activateWith(extension, { kind: 'node worker thread', lane: () => nodeWorkerScript(script), dispose: () => undefined });
}
