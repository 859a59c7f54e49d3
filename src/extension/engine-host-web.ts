/**
 * The browser editor's engine host: a Web Worker running dist/engine-worker-web.js. In the web
 * extension host the extension's files sit behind a remote URI, and a worker started from that
 * URI is refused; so the script's bytes are read once (through the editor's file system API,
 * passed in as `read`), wrapped in a Blob, and every worker starts from that Blob's URL.
 * No editor API here: tested under Node.
 */
import type { FromEngine, ToEngine } from './engine-protocol';
import type { StartHost } from './worker-client';

/** The part of a DOM Worker this adapter uses. */
export interface DomWorker {
  postMessage(message: ToEngine): void;
  terminate(): void;
  onmessage: ((event: { readonly data: unknown }) => void) | null;
  onerror: ((event: { readonly message?: string; preventDefault?(): void }) => void) | null;
  onmessageerror: ((event: unknown) => void) | null;
}

export interface ObjectUrls {
  createObjectURL(blob: Blob): string;
  revokeObjectURL(url: string): void;
}

/** One Blob URL for the engine script, made on first use; a failed read is tried again next time. */
export class BlobScript {
  private pending: Promise<string> | undefined;
  private made: string | undefined;

  constructor(
    private readonly read: () => PromiseLike<Uint8Array>,
    private readonly urls: ObjectUrls = URL,
  ) {}

  url(): Promise<string> {
    if (!this.pending) {
      const pending = Promise.resolve(this.read()).then((bytes) => {
        this.made = this.urls.createObjectURL(new Blob([bytes as Uint8Array<ArrayBuffer>], { type: 'text/javascript' }));
        return this.made;
      });
      pending.catch(() => {
        if (this.pending === pending) this.pending = undefined;
      });
      this.pending = pending;
    }
    return this.pending;
  }

  dispose(): void {
    if (this.made) this.urls.revokeObjectURL(this.made);
    this.made = undefined;
    this.pending = undefined;
  }
}

const startDomWorker = (url: string): DomWorker => new Worker(url, { name: 'Tersely engine' }) as unknown as DomWorker;

/** Messages posted before the worker exists (the script is still being read) wait in order. */
export function webWorkerHost(scriptUrl: () => Promise<string>, create: (url: string) => DomWorker = startDomWorker): StartHost {
  return (listener) => {
    let worker: DomWorker | undefined;
    let live = true;
    const queue: ToEngine[] = [];
    const fail = (error: Error): void => {
      if (!live) return;
      live = false;
      worker?.terminate();
      listener.failed(error);
    };
    scriptUrl().then(
      (url) => {
        if (!live) return;
        try {
          worker = create(url);
        } catch (error) {
          fail(new Error(`the engine worker did not start: ${error instanceof Error ? error.message : String(error)}`));
          return;
        }
        worker.onmessage = (event) => {
          if (live) listener.message(event.data as FromEngine);
        };
        // The runner answers every job itself, so an error event means the script itself broke.
        worker.onerror = (event) => {
          event.preventDefault?.();
          fail(new Error(`the engine worker failed: ${event.message || 'script error'}`));
        };
        worker.onmessageerror = () => fail(new Error('the engine worker sent a message that could not be read'));
        for (const message of queue.splice(0)) worker.postMessage(message);
      },
      (error: unknown) => fail(new Error(`could not read the engine script: ${error instanceof Error ? error.message : String(error)}`)),
    );
    return {
      post: (message) => {
        if (!live) return;
        if (worker) worker.postMessage(message);
        else queue.push(message);
      },
      terminate: () => {
        live = false;
        queue.length = 0;
        worker?.terminate();
      },
    };
  };
}
