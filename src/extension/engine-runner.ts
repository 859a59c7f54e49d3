/**
 * The engine side of the protocol, shared by both hosts (engine-worker.ts for Node's worker
 * threads, engine-worker-web.ts for Web Workers): keeps the last model it was sent, runs one job
 * per message and reports its stages. Jobs run synchronously; the client cancels one by
 * terminating the whole host, so there is nothing to interrupt here. No host API is used.
 */
import { checkAbstract } from '../core/index';
import { loadModel } from '../core/index';
import { createSummarySession, parseDocument, startDigest, summarize, type SummarySession } from '../core/index';
import type { EngineStage, FromEngine, ToEngine } from './engine-protocol';

interface CachedModel {
  readonly key: string;
  readonly model?: unknown;
  readonly problem?: string;
}

/**
 * Sessions kept, the least recently used forgotten first: each holds one text and its parsed
 * pieces (a few times the text's size), so a handful of open documents re-read only what an edit
 * touched. Besides the count, the texts kept together stay under ENGINE_SESSION_CHARS (the one in
 * use is always kept), so a few very large documents do not hold hundreds of megabytes.
 */
export const ENGINE_SESSIONS = 4;
export const ENGINE_SESSION_CHARS = 2_000_000;

/** Returns the host's message handler; `post` sends a reply to the extension. */
export function engineRunner(post: (message: FromEngine) => void): (message: ToEngine) => void {
  let cached: CachedModel | undefined;
  const sessions = new Map<string, { readonly session: SummarySession; chars: number }>();
  const sessionFor = (name: string, chars: number): SummarySession => {
    const kept = sessions.get(name) ?? { session: createSummarySession(), chars };
    kept.chars = chars;
    sessions.delete(name);
    sessions.set(name, kept);
    let total = 0;
    for (const { chars: size } of sessions.values()) total += size;
    for (const [oldest, { chars: size }] of sessions) {
      if (oldest === name || (sessions.size <= ENGINE_SESSIONS && total <= ENGINE_SESSION_CHARS)) break;
      sessions.delete(oldest);
      total -= size;
    }
    return kept.session;
  };

  const modelFor = (key: string | undefined): { model?: unknown; problem?: string } => {
    if (key === undefined) return {};
    if (cached?.key !== key) throw new Error(`the engine host was not sent model ${key}`);
    return cached;
  };

  return (message) => {
    if (message.type === 'model') {
      // Validated once here, not per job.
      try {
        const loaded = loadModel(message.model);
        cached = loaded.ok ? { key: message.key, model: loaded.model } : { key: message.key, problem: loaded.error };
      } catch (error) {
        cached = { key: message.key, problem: `invalid sentence model: ${error instanceof Error ? error.message : String(error)}` };
      }
      return;
    }
    const { id, task } = message;
    const started = performance.now();
    try {
      if (task.kind === 'summarize') {
        const { model, problem } = modelFor(message.modelKey);
        const request = { ...task.options, ...(model !== undefined ? { model } : {}), onStage: (stage: EngineStage) => post({ type: 'stage', id, stage }) };
        const session = task.session === undefined ? undefined : sessionFor(task.session, task.text.length);
        // A session gives the same summary as summarize() (test/unit/session.test.ts), reading less.
        const summary = session ? session.summarize(task.text, request) : summarize(task.text, request);
        const update = session?.lastUpdate;
        const reading = update ? { read: update.read, pieces: update.pieces, piecesRead: update.piecesRead, ...(update.reused ? { reused: true as const } : {}) } : undefined;
        // The extension has the text already; sending it back would only double the copy.
        const slim = { ...summary, document: { ...summary.document, text: '' } };
        post({ type: 'done', id, result: { kind: 'summarize', summary: slim, elapsedMs: performance.now() - started, ...(problem ? { modelProblem: problem } : {}), ...(reading ? { reading } : {}) } });
      } else if (task.kind === 'headings') {
        const headings = parseDocument(task.text, { format: task.format })
          .sections.filter((s) => s.heading.length > 0)
          .map((s) => ({ heading: s.heading, depth: s.depth }));
        post({ type: 'done', id, result: { kind: 'headings', headings, elapsedMs: performance.now() - started } });
      } else if (task.kind === 'digest') {
        const { model, problem } = modelFor(message.modelKey);
        const builder = startDigest({ ...task.options, ...(model !== undefined ? { model } : {}) });
        for (const [k, document] of task.documents.entries()) {
          builder.add(document.file, document.text, document.format);
          post({ type: 'progress', id, done: k + 1, total: task.documents.length });
        }
        post({ type: 'done', id, result: { kind: 'digest', digest: builder.finish(), elapsedMs: performance.now() - started, ...(problem ? { modelProblem: problem } : {}) } });
      } else {
        const report = checkAbstract(task.text, task.options);
        post({ type: 'done', id, result: { kind: 'checkAbstract', report, elapsedMs: performance.now() - started } });
      }
    } catch (error) {
      post({ type: 'failed', id, error: error instanceof Error ? error.message : String(error) });
    }
  };
}
