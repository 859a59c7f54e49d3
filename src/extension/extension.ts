/** Entry point: activation only builds the context and registers commands (no engine work). */
import type * as vscode from 'vscode';
import { registerCommands } from './commands';
import { TerselyContext, type TerselyApi } from './tersely-context';

let active: TerselyContext | undefined;

export function activate(extension: vscode.ExtensionContext): TerselyApi {
  const started = performance.now();
  const context = new TerselyContext(extension);
  active = context;
  extension.subscriptions.push(context, ...registerCommands(context));
  context.log.info(`Activated in ${(performance.now() - started).toFixed(1)} ms.`);
  return context.api();
}

export function deactivate(): void {
  active?.dispose();
  active = undefined;
}
