/**
 * Activation, shared by both entry points: build the context and register the commands. No
 * engine work happens here; the engine host starts right after activation returns.
 */
import type * as vscode from 'vscode';
import { testApi, type TerselyApi } from './api';
import { registerCommands } from './commands';
import { TerselyContext } from './context';
import { describeRuntime, runtimeReport, type EngineHosts } from './engine-hosts';

export function activateWith(extension: vscode.ExtensionContext, hosts: EngineHosts): TerselyApi {
  const started = performance.now();
  const context = new TerselyContext(extension, hosts);
  extension.subscriptions.push(context, ...registerCommands(context));
  // Started after activation returns, so activation never waits for the engine host.
  const timer = setTimeout(() => {
    context.summarizer.prepare().catch((error: unknown) => context.log.warn(`The engine host did not start ahead of time: ${String(error)}`));
  }, 0);
  context.own({ dispose: () => clearTimeout(timer) });
  const activationMs = performance.now() - started;
  const runtime = runtimeReport(hosts.kind);
  context.log.info(`Activated in ${activationMs.toFixed(1)} ms, ${describeRuntime(runtime)}.`);
  return testApi(context, runtime, activationMs);
}
