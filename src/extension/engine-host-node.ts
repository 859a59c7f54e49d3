/** The desktop editor's engine host: a Node worker thread running dist/engine-worker.cjs. */
import { Worker } from 'node:worker_threads';
import type { FromEngine } from './engine-protocol';
import type { StartHost } from './worker-client';

/** `create` starts the thread (tests pass a stand-in script). */
export function nodeWorkerHost(create: () => Worker): StartHost {
  return (listener) => {
    const worker = create();
    let live = true;
    const fail = (error: Error): void => {
      if (!live) return;
      live = false;
      listener.failed(error);
    };
    worker.on('message', (message: FromEngine) => {
      if (live) listener.message(message);
    });
    worker.on('error', fail);
    worker.on('exit', (code) => fail(new Error(`the engine thread exited (code ${code})`)));
    return {
      post: (message) => worker.postMessage(message),
      terminate: () => {
        live = false;
        void worker.terminate();
      },
    };
  };
}

export function nodeWorkerScript(scriptPath: string): StartHost {
  return nodeWorkerHost(() => new Worker(scriptPath));
}
