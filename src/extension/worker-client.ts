/**
 * The extension's side of the engine protocol, whichever host runs the engine. At most one job
 * runs; a newer job (or an abort) cancels the running one by terminating its host, and a fresh
 * host starts for the next job. Replies to jobs that are no longer running are ignored. Each host
 * is sent the model once (again only when it changes). The host itself is behind `StartHost`, a
 * small adapter (engine-host-node.ts, engine-host-web.ts). No editor API here: tested under Node.
 */
import type { EngineModel, EngineResult, EngineStage, EngineTask, FromEngine, ToEngine } from './engine-protocol';

export class CancelledError extends Error {
  constructor() {
    super('cancelled');
    this.name = 'CancelledError';
  }
}

/** What the client hears from a host. */
export interface HostListener {
  message(message: FromEngine): void;
  /** The host failed to start, crashed or exited: it is gone. */
  failed(error: Error): void;
}

/** A started host. After `terminate` it delivers nothing more. */
export interface HostConnection {
  post(message: ToEngine): void;
  terminate(): void;
}

export type StartHost = (listener: HostListener) => HostConnection;

export interface RunOptions {
  readonly signal?: AbortSignal;
  readonly onStage?: (stage: EngineStage) => void;
  /** A digest job's documents read so far. */
  readonly onProgress?: (done: number, total: number) => void;
}

interface RunningJob {
  readonly id: number;
  readonly resolve: (result: EngineResult) => void;
  readonly reject: (error: Error) => void;
  readonly onStage: ((stage: EngineStage) => void) | undefined;
  readonly onProgress: ((done: number, total: number) => void) | undefined;
  readonly detach: () => void;
}

interface LiveHost {
  readonly connection: HostConnection;
  /** Key of the model this host holds. */
  modelKey: string | undefined;
}

export class EngineClient {
  private host: LiveHost | null = null;
  private running: RunningJob | null = null;
  private model: EngineModel | undefined;
  private nextId = 1;
  private disposed = false;
  /** Hosts started so far (for the output channel and tests). */
  startedHosts = 0;

  constructor(
    private readonly startHost: StartHost,
    private readonly log: (line: string) => void = () => undefined,
  ) {}

  run(task: EngineTask, options: RunOptions = {}): Promise<EngineResult> {
    const { signal, onStage, onProgress } = options;
    if (this.disposed) return Promise.reject(new Error('The engine has been shut down.'));
    if (signal?.aborted) return Promise.reject(new CancelledError());
    this.cancel();
    let host: LiveHost;
    try {
      host = this.ensureHost();
    } catch (error) {
      return Promise.reject(error instanceof Error ? error : new Error(String(error)));
    }
    const id = this.nextId++;
    return new Promise<EngineResult>((resolve, reject) => {
      const onAbort = (): void => {
        if (this.running?.id === id) this.cancel();
      };
      signal?.addEventListener('abort', onAbort, { once: true });
      this.running = { id, resolve, reject, onStage, onProgress, detach: () => signal?.removeEventListener('abort', onAbort) };
      const modelKey = task.kind === 'summarize' || task.kind === 'digest' ? this.model?.key : undefined;
      host.connection.post(modelKey !== undefined ? { type: 'job', id, task, modelKey } : { type: 'job', id, task });
    });
  }

  /** The model summarize and digest jobs use from now on (undefined: the built-in one). Sent to the host only when it changes. */
  useModel(model: EngineModel | undefined): void {
    this.model = model;
    if (this.host) this.sendModel(this.host);
  }

  /** Starts a host ahead of the first job (loading the engine takes a moment on a cold start). */
  warm(): void {
    if (this.disposed) return;
    try {
      this.ensureHost();
    } catch (error) {
      // The next job reports it to the person; here it is only noted.
      this.log(`engine: could not start a host: ${error instanceof Error ? error.message : String(error)}`);
    }
  }

  /** Cancels the running job, if any: its promise rejects with CancelledError and its host ends. */
  cancel(): void {
    const running = this.running;
    if (!running) return;
    this.running = null;
    running.detach();
    const host = this.host;
    this.host = null;
    if (host) {
      this.log(`engine: job ${running.id} cancelled, host stopped`);
      host.connection.terminate();
    }
    running.reject(new CancelledError());
  }

  dispose(): void {
    this.disposed = true;
    this.cancel();
    this.host?.connection.terminate();
    this.host = null;
  }

  private sendModel(host: LiveHost): void {
    if (!this.model || host.modelKey === this.model.key) return;
    host.modelKey = this.model.key;
    host.connection.post({ type: 'model', key: this.model.key, model: this.model.model });
  }

  private ensureHost(): LiveHost {
    if (this.host) {
      this.sendModel(this.host);
      return this.host;
    }
    let self: LiveHost | null = null;
    const isCurrent = (): boolean => self !== null && self === this.host;
    const connection = this.startHost({
      message: (message) => {
        if (isCurrent()) this.receive(message);
      },
      failed: (error) => {
        // A host that fails before `startHost` returns is reported once the job is registered.
        if (self === null) queueMicrotask(() => isCurrent() && this.hostFailed(error));
        else if (isCurrent()) this.hostFailed(error);
      },
    });
    const host: LiveHost = { connection, modelKey: undefined };
    self = host;
    this.host = host;
    this.startedHosts += 1;
    this.sendModel(host);
    return host;
  }

  private receive(message: FromEngine): void {
    const running = this.running;
    if (!running || message.id !== running.id) {
      this.log(`engine: ignored a message about job ${message.id}, which is no longer running`);
      return;
    }
    if (message.type === 'stage') {
      running.onStage?.(message.stage);
      return;
    }
    if (message.type === 'progress') {
      running.onProgress?.(message.done, message.total);
      return;
    }
    this.running = null;
    running.detach();
    if (message.type === 'done') running.resolve(message.result);
    else running.reject(new Error(message.error));
  }

  private hostFailed(error: Error): void {
    const host = this.host;
    this.host = null;
    host?.connection.terminate();
    const running = this.running;
    this.running = null;
    running?.detach();
    this.log(`engine: host failed: ${error.message}`);
    running?.reject(error);
  }
}
