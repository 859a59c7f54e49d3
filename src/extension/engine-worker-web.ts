/**
 * The engine host for the browser editor: a Web Worker started by the web extension from a Blob
 * URL of this bundle (engine-host-web.ts). Same protocol and runner as the Node worker thread.
 */
import type { FromEngine, ToEngine } from './engine-protocol';
import { engineRunner } from './engine-runner';
import { warmUpEngine } from './engine-warm-up';

interface WorkerScope {
  postMessage(message: FromEngine): void;
  onmessage: ((event: MessageEvent<ToEngine>) => void) | null;
}

const scope = globalThis as unknown as WorkerScope;
const handle = engineRunner((message) => scope.postMessage(message));
scope.onmessage = (event) => handle(event.data);
setTimeout(warmUpEngine, 0);
