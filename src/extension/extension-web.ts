/**
 * Entry point for the browser editor (package.json `browser`): the extension runs in the editor's
 * web worker extension host and the engine in Web Workers started from a Blob URL of the bundled
 * engine script, read through the editor's file system API. No Node built-ins may reach this
 * bundle (the build fails if one does).
 */
import * as vscode from 'vscode';
import { activateWith } from './activate';
import type { TerselyApi } from './api';
import { BlobScript, webWorkerHost } from './engine-host-web';

export function activate(extension: vscode.ExtensionContext): TerselyApi {
  const script = new BlobScript(() => vscode.workspace.fs.readFile(vscode.Uri.joinPath(extension.extensionUri, 'dist', 'engine-worker-web.js')));
  return activateWith(extension, { kind: 'web worker', lane: () => webWorkerHost(() => script.url()), dispose: () => script.dispose() });
}
