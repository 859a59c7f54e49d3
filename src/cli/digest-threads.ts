/**
 * Reading a digest's documents on several threads: each worker thread runs this same bundle,
 * builds the engine request from the same flags and reads the files it is handed with the
 * engine's `digestReader`; the main thread adds what comes back to the digest in file order, so
 * the digest is the one a single thread makes. Only each document's kept sentences cross threads.
 */
import { availableParallelism } from 'node:os';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import { digestReader, type DigestReader, type DocumentFormat, type ReadForDigest } from '../core/index';
import { UsageError } from './args';
import { engineRequest } from './engine-request';
import { InputError, readInput } from './read-input';

/** What every reader thread needs: the parsed flags, the forced input format, the size cap. */
export interface ReaderSetup {
  readonly options: Readonly<Record<string, unknown>>;
  readonly inputFormat: DocumentFormat | undefined;
  readonly maxChars: number;
}

export type ReadOutcome =
  | { readonly index: number; readonly ok: true; readonly read: ReadForDigest }
  /** `input`: the file could not be read (reported, the digest goes on); otherwise an internal error. */
  | { readonly index: number; readonly ok: false; readonly input: boolean; readonly message: string };

const ROLE = 'tersely-digest-reader';
/** Fewer files than this are read on the main thread: starting a thread costs about as much as reading a few documents. */
export const THREADS_FROM_FILES = 8;
export const MAX_JOBS = 16;

/** Threads for a digest of `files` files: `--jobs N`, else one per core (at most four) from THREADS_FROM_FILES files on. */
export function jobsFor(flag: unknown, files: number): number {
  if (flag !== undefined) {
    const jobs = Number(flag);
    if (!Number.isInteger(jobs) || jobs < 1 || jobs > MAX_JOBS) throw new UsageError(`--jobs takes a whole number from 1 to ${MAX_JOBS}: "${String(flag)}"`);
    return Math.min(jobs, Math.max(1, files));
  }
  return files < THREADS_FROM_FILES ? 1 : Math.max(1, Math.min(4, availableParallelism(), files));
}

/** Reads one file as the digest's document number `index` (the same on any thread). */
export async function readOne(read: DigestReader, setup: ReaderSetup, index: number, path: string): Promise<ReadOutcome> {
  try {
    const input = await readInput(path, 'markdown', setup.maxChars);
    return { index, ok: true, read: read(index, input.name, input.text, setup.inputFormat ?? input.format) };
  } catch (error) {
    if (error instanceof InputError) return { index, ok: false, input: true, message: error.message };
    return { index, ok: false, input: false, message: error instanceof Error ? error.message : String(error) };
  }
}

/**
 * Reads `files` on `jobs` threads and calls `onRead` for each in file order. A thread is handed
 * the next file when it returns one, so a long document does not hold the others back.
 */
export async function readOnThreads(files: readonly string[], setup: ReaderSetup, jobs: number, onRead: (outcome: ReadOutcome) => void): Promise<void> {
  const waiting = new Map<number, ReadOutcome>();
  let next = 0;
  let flushed = 0;
  const workers: Worker[] = [];
  try {
    await new Promise<void>((resolve, reject) => {
      const handOut = (worker: Worker) => {
        if (next < files.length) worker.postMessage({ index: next, path: files[next++] });
      };
      for (let k = 0; k < jobs; k++) {
        const worker = new Worker(__filename, { workerData: { role: ROLE, setup } });
        workers.push(worker);
        worker.on('message', (outcome: ReadOutcome) => {
          waiting.set(outcome.index, outcome);
          while (waiting.has(flushed)) {
            const ready = waiting.get(flushed)!;
            waiting.delete(flushed++);
            try {
              onRead(ready);
            } catch (error) {
              reject(error);
              return;
            }
          }
          if (flushed === files.length) resolve();
          else handOut(worker);
        });
        worker.on('error', reject);
        worker.on('exit', (code) => {
          if (code !== 0 && flushed < files.length) reject(new Error(`a digest reader thread stopped (exit code ${code})`));
        });
        handOut(worker);
      }
    });
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
}

/** True (and the thread serves files) when this bundle was started as a digest reader thread. */
export function serveAsReaderThread(): boolean {
  const data = workerData as { role?: string; setup?: ReaderSetup } | null;
  if (isMainThread || data?.role !== ROLE || !parentPort || !data.setup) return false;
  const setup = data.setup;
  const port = parentPort;
  const ready = engineRequest(setup.options).then((request) => digestReader(request));
  port.on('message', (job: { index: number; path: string }) => {
    void ready.then(
      async (read) => port.postMessage(await readOne(read, setup, job.index, job.path)),
      (error: unknown) => port.postMessage({ index: job.index, ok: false, input: false, message: error instanceof Error ? error.message : String(error) } satisfies ReadOutcome),
    );
  });
  return true;
}
