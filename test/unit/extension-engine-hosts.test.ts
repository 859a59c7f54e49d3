/**
 * Both engine hosts end to end under Node: the worker bundles are built in memory from the same
 * esbuild options as the shipped ones, then run in real threads — the Node bundle as a worker
 * thread, the web bundle from a Blob URL inside a DOM-Worker-shaped wrapper (Node has Blob URLs,
 * not DOM Workers). Results are compared with the engine run in this process.
 */
import assert from 'node:assert/strict';
import { resolveObjectURL } from 'node:buffer';
import { readFileSync } from 'node:fs';
import { Worker } from 'node:worker_threads';
import { build, type BuildOptions } from 'esbuild';
import { loadModel } from '../../src/core/index';
import { summarize } from '../../src/core/summarize';
import { nodeWorkerHost } from '../../src/extension/engine-host-node';
import { BlobScript, webWorkerHost, type DomWorker } from '../../src/extension/engine-host-web';
import type { EngineResult, EngineStage, FromEngine, ToEngine } from '../../src/extension/engine-protocol';
import { ENGINE_SESSION_CHARS, ENGINE_SESSIONS, engineRunner } from '../../src/extension/engine-runner';
import { parseSettings, toEngineOptions } from '../../src/extension/settings';
import { CancelledError, EngineClient } from '../../src/extension/worker-client';

const DEMO = readFileSync(new URL('../../media/demo/bike-share-rebalancing.md', import.meta.url), 'utf8');
const MODEL_JSON: unknown = JSON.parse(readFileSync(new URL('../../media/models/default-model.json', import.meta.url), 'utf8'));
const OPTIONS = toEngineOptions(parseSettings(() => undefined).settings, 'markdown', 0);

interface BuildEntries {
  ENTRIES: { in: string; out: string }[];
  buildOptions(entry: { in: string }): BuildOptions;
}

async function bundle(entryPath: string): Promise<string> {
  const { ENTRIES, buildOptions } = (await import('../../scripts/build-entries.mjs' as string)) as BuildEntries;
  const entry = ENTRIES.find((e) => e.in === entryPath);
  assert.ok(entry, `${entryPath} is a shipped entry`);
  const result = await build({ ...buildOptions(entry), sourcemap: false, write: false });
  return result.outputFiles![0]!.text;
}

function spans(result: EngineResult): string {
  assert.equal(result.kind, 'summarize');
  return JSON.stringify(result.kind === 'summarize' ? result.summary.sentences.map((p) => p.span) : null);
}

const expected = JSON.stringify(summarize(DEMO, OPTIONS).sentences.map((p) => p.span));

/** Runs a web-worker script in a Node thread, with `postMessage` / `onmessage` as a Web Worker has them. */
const WEB_SCOPE = `const { parentPort } = require('node:worker_threads');
globalThis.postMessage = (message) => parentPort.postMessage(message);
parentPort.on('message', (data) => globalThis.onmessage && globalThis.onmessage({ data }));
`;

/** A DOM-Worker-shaped object that, like a browser, loads its script from the Blob URL it is given. */
class BlobUrlWorker implements DomWorker {
  static readonly started: string[] = [];
  onmessage: DomWorker['onmessage'] = null;
  onerror: DomWorker['onerror'] = null;
  onmessageerror: DomWorker['onmessageerror'] = null;
  private thread: Worker | undefined;
  private readonly waiting: ToEngine[] = [];
  private stopped = false;

  constructor(url: string) {
    BlobUrlWorker.started.push(url);
    const blob = resolveObjectURL(url);
    if (!blob) throw new Error(`${url} is not a live Blob URL`);
    void blob.text().then((script) => {
      if (this.stopped) return;
      this.thread = new Worker(WEB_SCOPE + script, { eval: true });
      this.thread.on('message', (data) => this.onmessage?.({ data }));
      this.thread.on('error', (error) => this.onerror?.({ message: error.message }));
      for (const message of this.waiting.splice(0)) this.thread.postMessage(message);
    });
  }

  postMessage(message: ToEngine): void {
    if (this.thread) this.thread.postMessage(message);
    else this.waiting.push(message);
  }

  terminate(): void {
    this.stopped = true;
    void this.thread?.terminate();
  }
}

describe('engine hosts', function () {
  this.timeout(30_000);
  let nodeScript: string;
  let webScript: string;
  // Every client a test starts is stopped afterwards, also when the test times out, so no thread outlives it.
  const clients: EngineClient[] = [];
  const track = (client: EngineClient): EngineClient => (clients.push(client), client);
  afterEach(() => {
    for (const client of clients.splice(0)) client.dispose();
  });
  before(async function () {
    this.timeout(60_000);
    [nodeScript, webScript] = await Promise.all([bundle('src/extension/engine-worker.ts'), bundle('src/extension/engine-worker-web.ts')]);
  });

  describe('the runner both hosts share (in this process)', () => {
    function run(messages: ToEngine[]): FromEngine[] {
      const out: FromEngine[] = [];
      const handle = engineRunner((message) => out.push(message));
      for (const message of messages) handle(message);
      return out;
    }

    it('reports reading, ranking, checking, then the summary without the document text', () => {
      const out = run([{ type: 'job', id: 4, task: { kind: 'summarize', text: DEMO, options: OPTIONS } }]);
      assert.deepEqual(
        out.map((m) => (m.type === 'stage' ? m.stage : m.type)),
        ['reading', 'ranking', 'checking', 'done'],
      );
      assert.ok(out.every((m) => m.id === 4));
      const done = out.at(-1)!;
      assert.ok(done.type === 'done' && done.result.kind === 'summarize');
      assert.equal(done.result.summary.document.text, '');
      assert.equal(spans(done.result), expected);
    });

    it('keeps a session per document: after an edit it reads only the touched pieces, and the summary is the one summarize() gives', () => {
      const edited = DEMO.replace('## Risks\n', '## Risks\n\nA late paragraph says the depot crew can move forty bikes an hour when the vans are full.\n');
      assert.notEqual(edited, DEMO);
      const job = (id: number, text: string, session: string): ToEngine => ({ type: 'job', id, task: { kind: 'summarize', text, options: OPTIONS, session } });
      const out = run([job(1, DEMO, 'demo#document'), job(2, edited, 'demo#document'), job(3, edited, 'demo#document'), job(4, edited, 'other#document')]).filter((m) => m.type === 'done');
      const readings = out.map((m) => (m.type === 'done' && m.result.kind === 'summarize' ? m.result.reading : undefined));
      assert.equal(readings[0]!.read, 'whole');
      assert.equal(readings[1]!.read, 'pieces');
      assert.ok(readings[1]!.piecesRead < readings[1]!.pieces, JSON.stringify(readings[1]));
      assert.equal(readings[2]!.read, 'unchanged');
      assert.equal(readings[3]!.read, 'whole', 'another document has its own session');
      const editedSpans = JSON.stringify(summarize(edited, OPTIONS).sentences.map((p) => p.span));
      assert.equal(spans((out[0] as Extract<FromEngine, { type: 'done' }>).result), expected);
      for (const message of out.slice(1)) assert.ok(message.type === 'done' && spans(message.result) === editedSpans);
    });

    it('keeps at most ENGINE_SESSIONS sessions, forgetting the least recently used', () => {
      const job = (id: number, session: string): ToEngine => ({ type: 'job', id, task: { kind: 'summarize', text: DEMO, options: OPTIONS, session } });
      const names = Array.from({ length: ENGINE_SESSIONS + 1 }, (_, k) => `doc${k}`);
      // doc0 is used again before the others fill the cache, so doc1 is the one forgotten.
      const order = ['doc0', 'doc1', 'doc0', ...names.slice(2), 'doc0', 'doc1'];
      const out = run(order.map((name, id) => job(id, name))).filter((m) => m.type === 'done');
      const read = out.map((m) => (m.type === 'done' && m.result.kind === 'summarize' ? m.result.reading?.read : undefined));
      assert.equal(read.at(-2), 'unchanged', 'the most recently used is kept');
      assert.equal(read.at(-1), 'whole', 'the least recently used was forgotten');
    });

    it('keeps the texts of its sessions under ENGINE_SESSION_CHARS together, always keeping the one in use', function () {
      this.timeout(120_000);
      const big = DEMO.repeat(Math.ceil((0.4 * ENGINE_SESSION_CHARS) / DEMO.length));
      const options = { ...OPTIONS, maxChars: 3_000_000 };
      const job = (id: number, text: string, session: string): ToEngine => ({ type: 'job', id, task: { kind: 'summarize', text, options, session } });
      // Two big texts fit under the bound (0.8 of it); a third pushes the oldest out.
      const out = run([job(1, big, 'a'), job(2, big, 'b'), job(3, big, 'c'), job(4, big, 'b'), job(5, big, 'a')]).filter((m) => m.type === 'done');
      const read = out.map((m) => (m.type === 'done' && m.result.kind === 'summarize' ? m.result.reading?.read : undefined));
      assert.deepEqual(read, ['whole', 'whole', 'whole', 'unchanged', 'whole']);
    });

    it('keeps the model it was sent and uses it for every job that names its key', () => {
      const bayes = { ...OPTIONS, method: 'bayes' as const };
      const job = (id: number): ToEngine => ({ type: 'job', id, task: { kind: 'summarize', text: DEMO, options: bayes }, modelKey: 'default@1' });
      const out = run([{ type: 'model', key: 'default@1', model: MODEL_JSON }, job(1), job(2)]).filter((m) => m.type === 'done');
      const loaded = loadModel(MODEL_JSON);
      assert.ok(loaded.ok);
      const reference = JSON.stringify(summarize(DEMO, { ...bayes, model: loaded.model }).sentences.map((p) => p.span));
      assert.equal(out.length, 2);
      for (const message of out) {
        assert.ok(message.type === 'done');
        assert.equal(spans(message.result), reference);
        assert.equal(message.result.kind === 'summarize' && message.result.modelProblem, undefined);
      }
    });

    it('says why a model was refused and summarizes with the built-in one', () => {
      const out = run([
        { type: 'model', key: 'bad@1', model: { format: 'something else' } },
        { type: 'job', id: 1, task: { kind: 'summarize', text: DEMO, options: OPTIONS }, modelKey: 'bad@1' },
      ]);
      const done = out.at(-1)!;
      assert.ok(done.type === 'done' && done.result.kind === 'summarize');
      assert.match(done.result.modelProblem ?? '', /invalid sentence model/);
      assert.equal(spans(done.result), expected);
    });

    it('fails a job that names a model the host was never sent, instead of using another', () => {
      const out = run([{ type: 'job', id: 9, task: { kind: 'summarize', text: DEMO, options: OPTIONS }, modelKey: 'never-sent' }]);
      assert.deepEqual(out, [{ type: 'failed', id: 9, error: 'the engine host was not sent model never-sent' }]);
    });

    it('runs an abstract check', () => {
      const text = readFileSync(new URL('../../media/demo/abstract-check.md', import.meta.url), 'utf8');
      const out = run([{ type: 'job', id: 2, task: { kind: 'checkAbstract', text, options: { format: 'markdown', language: 'auto' } } }]);
      assert.equal(out.length, 1);
      assert.ok(out[0]!.type === 'done' && out[0]!.result.kind === 'checkAbstract' && out[0]!.result.report.ok);
    });

    it('lists the headings for the abstract picker in document order, with their depth', () => {
      // CommonMark: ATX level = number of #, setext '=' = level 1 (spec 0.31.2, sections 4.2 and 4.3).
      const text = '# Title\n\nIntro text here.\n\n## Findings\n\nSome text.\n\nNotes\n=====\n\nMore text.\n';
      const out = run([{ type: 'job', id: 3, task: { kind: 'headings', text, format: 'markdown' } }]);
      assert.equal(out.length, 1);
      assert.ok(out[0]!.type === 'done' && out[0]!.result.kind === 'headings');
      assert.deepEqual(out[0]!.result.headings, [
        { heading: 'Title', depth: 1 },
        { heading: 'Findings', depth: 2 },
        { heading: 'Notes', depth: 1 },
      ]);
    });
  });

  describe('Node worker thread host', () => {
    it('summarizes in a thread: the same sentences as in this process, with the stages on the way', async () => {
      const client = track(new EngineClient(nodeWorkerHost(() => new Worker(nodeScript, { eval: true }))));
      try {
        const stages: EngineStage[] = [];
        const result = await client.run({ kind: 'summarize', text: DEMO, options: OPTIONS }, { onStage: (stage) => stages.push(stage) });
        assert.equal(spans(result), expected);
        assert.deepEqual(stages, ['reading', 'ranking', 'checking']);
      } finally {
        client.dispose();
      }
    });

    it('stops a thread that is stuck in a job, and a crashed thread, then carries on in a fresh one', async () => {
      // Stand-in engine: 'hang' never returns (a busy loop), 'crash' ends the thread, anything else echoes.
      const standIn = `const { parentPort } = require('node:worker_threads');
parentPort.on('message', (m) => {
  if (m.type !== 'job') return;
  if (m.task.text === 'hang') for (;;) {}
  if (m.task.text === 'crash') process.exit(3);
  parentPort.postMessage({ type: 'done', id: m.id, result: { kind: 'checkAbstract', report: { ok: false, error: m.task.text }, elapsedMs: 0 } });
});`;
      const threads: Worker[] = [];
      const client = track(new EngineClient(nodeWorkerHost(() => threads[threads.push(new Worker(standIn, { eval: true })) - 1]!)));
      try {
        const stuck = client.run({ kind: 'summarize', text: 'hang', options: OPTIONS });
        await new Promise((resolve) => setTimeout(resolve, 100));
        const exited = new Promise<number>((resolve) => threads[0]!.once('exit', resolve));
        const next = client.run({ kind: 'summarize', text: 'after', options: OPTIONS });
        await assert.rejects(stuck, CancelledError);
        assert.equal(typeof (await exited), 'number', 'the stuck thread really ended');
        assert.deepEqual((await next).kind === 'checkAbstract' && (await next).kind, 'checkAbstract');
        await assert.rejects(client.run({ kind: 'summarize', text: 'crash', options: OPTIONS }), /exited \(code 3\)/);
        const recovered = await client.run({ kind: 'summarize', text: 'again', options: OPTIONS });
        assert.ok(recovered.kind === 'checkAbstract' && !recovered.report.ok && recovered.report.error === 'again');
        assert.equal(client.startedHosts, 3);
      } finally {
        client.dispose();
      }
    });
  });

  describe('Web Worker host (started from a Blob URL)', () => {
    it('reads the script once, starts every worker from its Blob URL and summarizes there', async () => {
      let reads = 0;
      const bytes = new TextEncoder().encode(webScript);
      const script = new BlobScript(async () => (reads++, bytes));
      const before = BlobUrlWorker.started.length;
      const client = track(new EngineClient(webWorkerHost(() => script.url(), (url) => new BlobUrlWorker(url))));
      try {
        const stages: EngineStage[] = [];
        let begun: () => void = () => undefined;
        const firstBegun = new Promise<void>((resolve) => (begun = resolve));
        const first = client.run({ kind: 'summarize', text: DEMO, options: OPTIONS }, { onStage: () => begun() });
        await firstBegun;
        // A newer job replaces the running one: its worker stops and a second starts, from the same URL.
        const second = client.run({ kind: 'summarize', text: DEMO, options: OPTIONS }, { onStage: (stage) => stages.push(stage) });
        await assert.rejects(first, CancelledError);
        assert.equal(spans(await second), expected);
        assert.deepEqual(stages, ['reading', 'ranking', 'checking']);
        const urls = BlobUrlWorker.started.slice(before);
        assert.equal(urls.length, 2);
        assert.match(urls[0]!, /^blob:/);
        assert.equal(urls[1], urls[0]);
        assert.equal(reads, 1, 'the script is read once');
        assert.equal(await resolveObjectURL(urls[0]!)!.text(), webScript, 'the Blob holds the bytes read');
        script.dispose();
        assert.equal(resolveObjectURL(urls[0]!), undefined, 'dispose revokes the URL');
      } finally {
        client.dispose();
      }
    });

    it('reports a failed read to the job and tries the read again for the next one', async () => {
      let reads = 0;
      const script = new BlobScript(async () => {
        reads++;
        if (reads === 1) throw new Error('file not found');
        return new TextEncoder().encode(webScript);
      });
      const client = track(new EngineClient(webWorkerHost(() => script.url(), (url) => new BlobUrlWorker(url))));
      try {
        await assert.rejects(client.run({ kind: 'summarize', text: DEMO, options: OPTIONS }), /could not read the engine script: file not found/);
        assert.equal(spans(await client.run({ kind: 'summarize', text: DEMO, options: OPTIONS })), expected);
        assert.equal(reads, 2);
      } finally {
        client.dispose();
        script.dispose();
      }
    });

    it('keeps messages in order until the worker exists, and never starts one for a host stopped before that', async () => {
      let release: (url: string) => void = () => undefined;
      const url = new Promise<string>((resolve) => (release = resolve));
      const started: { url: string; got: ToEngine[]; worker: DomWorker }[] = [];
      const create = (u: string): DomWorker => {
        const entry = { url: u, got: [] as ToEngine[], worker: undefined as unknown as DomWorker };
        entry.worker = { postMessage: (m) => entry.got.push(m), terminate: () => undefined, onmessage: null, onerror: null, onmessageerror: null };
        started.push(entry);
        return entry.worker;
      };
      const start = webWorkerHost(() => url, create);
      const events: string[] = [];
      const listener = { message: (m: FromEngine) => events.push(m.type), failed: (e: Error) => events.push(e.message) };
      const kept = start(listener);
      const stopped = start(listener);
      kept.post({ type: 'model', key: 'k', model: {} });
      kept.post({ type: 'job', id: 1, task: { kind: 'summarize', text: 'x', options: OPTIONS } });
      stopped.post({ type: 'job', id: 2, task: { kind: 'summarize', text: 'y', options: OPTIONS } });
      stopped.terminate();
      release('blob:nodedata:stand-in');
      await url;
      await new Promise((resolve) => setImmediate(resolve));
      assert.equal(started.length, 1, 'only the host still running gets a worker');
      assert.deepEqual(
        started[0]!.got.map((m) => m.type),
        ['model', 'job'],
      );
      started[0]!.worker.onmessage!({ data: { type: 'stage', id: 1, stage: 'reading' } });
      started[0]!.worker.onerror!({ message: 'SyntaxError: bad script' });
      started[0]!.worker.onmessage!({ data: { type: 'stage', id: 1, stage: 'ranking' } });
      assert.deepEqual(events, ['stage', 'the engine worker failed: SyntaxError: bad script'], 'nothing is heard after a failure');
    });
  });
});
