/**
 * Talks to the engine worker. At most one job runs; a newer job (or an abort) cancels the running
 * one by terminating its thread, and a fresh thread starts for the next job. Replies to jobs that
 * are no longer running are ignored. No editor API here, so it is tested under Node.
 */
import type { Worker } from 'node:worker_threads';
import type { EngineJob, EngineReply, EngineResult, EngineTask } from './engine-protocol';

export class CancelledError extends Error {
  constructor() {
    super('cancelled');
    this.name = 'CancelledError';
  }
}

interface RunningJob {
  readonly id: number;
  readonly resolve: (result: EngineResult) => void;
  readonly reject: (error: Error) => void;
  readonly detach: () => void;
}

export class EngineClient {
  private worker: Worker | null = null;
  private running: RunningJob | null = null;
  private nextId = 1;
  private disposed = false;
  /** Threads started so far (for the output channel and tests). */
  startedWorkers = 0;

  constructor(
    private readonly createWorker: () => Worker,
    private readonly log: (line: string) => void = () => undefined,
  ) {}

  get busy(): boolean {
    return this.running !== null;
  }

  run(task: EngineTask, signal?: AbortSignal): Promise<EngineResult> {
    if (this.disposed) return Promise.reject(new Error('The engine has been shut down.'));
    if (signal?.aborted) return Promise.reject(new CancelledError());
    this.cancel();
    const worker = this.ensureWorker();
    const id = this.nextId++;
    return new Promise<EngineResult>((resolve, reject) => {
      const onAbort = (): void => {
        if (this.running?.id === id) this.cancel();
      };
      signal?.addEventListener('abort', onAbort, { once: true });
      this.running = { id, resolve, reject, detach: () => signal?.removeEventListener('abort', onAbort) };
      const job: EngineJob = { ...task, id };
      worker.postMessage(job);
    });
  }

  /** Starts the thread ahead of the first job (loading the engine takes a moment on a cold start). */
  warm(): void {
    if (!this.disposed) this.ensureWorker();
  }

  /** Cancels the running job, if any: its promise rejects with CancelledError and its thread ends. */
  cancel(): void {
    const running = this.running;
    if (!running) return;
    this.running = null;
    running.detach();
    const worker = this.worker;
    this.worker = null;
    if (worker) {
      this.log(`engine: job ${running.id} cancelled, thread stopped`);
      void worker.terminate();
    }
    running.reject(new CancelledError());
  }

  dispose(): void {
    this.disposed = true;
    this.cancel();
    void this.worker?.terminate();
    this.worker = null;
  }

  private ensureWorker(): Worker {
    if (this.worker) return this.worker;
    const worker = this.createWorker();
    this.worker = worker;
    this.startedWorkers += 1;
    worker.on('message', (reply: EngineReply) => {
      if (worker !== this.worker) return;
      const running = this.running;
      if (!running || reply.id !== running.id) {
        this.log(`engine: ignored a reply to job ${reply.id}, which is no longer running`);
        return;
      }
      this.running = null;
      running.detach();
      if (reply.ok) running.resolve(reply);
      else running.reject(new Error(reply.error));
    });
    const fail = (error: Error): void => {
      if (worker !== this.worker) return;
      this.worker = null;
      const running = this.running;
      this.running = null;
      running?.detach();
      this.log(`engine: thread failed: ${error.message}`);
      running?.reject(error);
    };
    worker.on('error', fail);
    worker.on('exit', (code) => fail(new Error(`the engine thread exited (code ${code})`)));
    return worker;
  }
}
