/**
 * The engine host for the desktop editor: a Node worker thread, so that a long document never
 * freezes the extension host. The extension bundle itself carries no engine code.
 */
import { parentPort } from 'node:worker_threads';
import type { FromEngine, ToEngine } from './engine-protocol';
import { engineRunner } from './engine-runner';
import { warmUpEngine } from './engine-warm-up';

const port = parentPort;
if (port) {
  const handle = engineRunner((message: FromEngine) => port.postMessage(message));
  port.on('message', (message: ToEngine) => handle(message));
  setTimeout(warmUpEngine, 0);
}
