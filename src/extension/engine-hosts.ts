/**
 * Which engine host an entry point uses: extension.ts (desktop editor) runs the engine in Node
 * worker threads, extension-web.ts (browser editor) in Web Workers. Both speak engine-protocol.ts
 * through the same client; only this choice differs.
 */
import type * as vscode from 'vscode';
import type { StartHost } from './worker-client';

export type EngineHostKind = 'node worker thread' | 'web worker';

export interface EngineHosts extends vscode.Disposable {
  readonly kind: EngineHostKind;
  /** Starts hosts for one lane of work (each lane has its own, so one never cancels the other). */
  lane(): StartHost;
}

/** Where the extension runs, seen from inside: the browser editor's web worker has no `process` but has `importScripts`. */
export interface RuntimeReport {
  readonly hasProcess: boolean;
  readonly hasImportScripts: boolean;
  readonly engineHost: EngineHostKind;
}

export function runtimeReport(engineHost: EngineHostKind): RuntimeReport {
  return {
    hasProcess: typeof process !== 'undefined',
    hasImportScripts: typeof (globalThis as { importScripts?: unknown }).importScripts === 'function',
    engineHost,
  };
}

export function describeRuntime(report: RuntimeReport): string {
  const where = report.hasProcess ? 'the Node extension host' : 'the web worker extension host (no process)';
  return `in ${where}; engine in a ${report.engineHost}`;
}
