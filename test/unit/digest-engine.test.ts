/** A digest job through the engine protocol: the host's runner (engine-runner.ts) and the client (worker-client.ts). */
import assert from 'node:assert/strict';
import { digestDocuments, type DigestRequest } from '../../src/core/index';
import type { EngineDigestDocument, EngineResult, EngineTask, FromEngine, ToEngine } from '../../src/extension/engine-protocol';
import { engineRunner } from '../../src/extension/engine-runner';
import { CancelledError, EngineClient, type HostListener } from '../../src/extension/worker-client';

// Three invented notes from one allotment society.
const DOCUMENTS: EngineDigestDocument[] = [
  { file: 'plots.md', format: 'markdown', text: '# Plots\n\nEach member rents one plot by the year. The rent is paid at the spring meeting.\n' },
  { file: 'water.rst', format: 'restructuredtext', text: 'Water\n=====\n\nThe water taps are opened in April and closed in October. Hoses are not allowed in July.\n' },
  { file: 'tools.txt', format: 'plaintext', text: 'TOOLS\n\nThe tool shed is locked at dusk. Borrowed tools go back clean and dry.\n' },
];
const OPTIONS: DigestRequest = { budget: { unit: 'sentences', value: 4 } };
const digestTask = (options: DigestRequest = OPTIONS): EngineTask => ({ kind: 'digest', documents: DOCUMENTS, options });

describe('engine runner: a digest job', () => {
  function run(message: ToEngine): FromEngine[] {
    const out: FromEngine[] = [];
    engineRunner((m) => out.push(m))(message);
    return out;
  }

  it('reports each document as it is read (1..n of n), then the digest the engine makes of them', () => {
    const out = run({ type: 'job', id: 9, task: digestTask() });
    assert.ok(out.every((m) => m.id === 9));
    assert.deepEqual(
      out.slice(0, -1).map((m) => (m.type === 'progress' ? [m.done, m.total] : m.type)),
      [
        [1, 3],
        [2, 3],
        [3, 3],
      ],
    );
    const done = out.at(-1)!;
    assert.ok(done.type === 'done' && done.result.kind === 'digest', JSON.stringify(done));
    const reference = digestDocuments(DOCUMENTS, OPTIONS);
    assert.deepEqual(done.result.digest, reference);
    assert.deepEqual(done.result.digest.documents.map((d) => d.file), ['plots.md', 'water.rst', 'tools.txt']);
    assert.equal(done.result.digest.stats.sentencesOut, 4);
  });

  it('digests with the model it was sent, and says why a model was refused', () => {
    const out: FromEngine[] = [];
    const runner = engineRunner((m) => out.push(m));
    runner({ type: 'model', key: 'bad@1', model: { format: 'something else' } });
    runner({ type: 'job', id: 3, task: digestTask(), modelKey: 'bad@1' });
    const done = out.at(-1)!;
    assert.ok(done.type === 'done' && done.result.kind === 'digest', JSON.stringify(done));
    assert.match(done.result.modelProblem ?? '', /invalid sentence model/);
    runner({ type: 'job', id: 4, task: digestTask(), modelKey: 'never-sent' });
    assert.deepEqual(out.at(-1), { type: 'failed', id: 4, error: 'the engine host was not sent model never-sent' });
  });

  it('never picks a sentence of the team templates it is given', () => {
    const template = { text: 'TOOLS\n\nThe tool shed is locked at dusk.\n', format: 'plaintext' as const };
    const plain = digestDocuments(DOCUMENTS, { budget: { unit: 'sentences', value: 6 } });
    assert.ok(plain.sentences.some((s) => s.text === 'The tool shed is locked at dusk.'), 'picked without the template');
    const out = run({ type: 'job', id: 5, task: digestTask({ budget: { unit: 'sentences', value: 6 }, templates: [template] }) });
    const done = out.at(-1)!;
    assert.ok(done.type === 'done' && done.result.kind === 'digest');
    const texts = done.result.digest.sentences.map((s) => s.text);
    assert.ok(!texts.includes('The tool shed is locked at dusk.'), texts.join(' | '));
    assert.ok(texts.includes('Borrowed tools go back clean and dry.'), texts.join(' | '));
  });

  it('fails the job, before reading any document, on options the engine refuses', () => {
    const out = run({ type: 'job', id: 2, task: digestTask({ focus: 'water' }) });
    assert.equal(out.length, 1);
    const [failed] = out;
    assert.ok(failed!.type === 'failed');
    assert.match(failed.error, /focus/);
  });
});

describe('engine client: progress of a digest job', () => {
  let listener: HostListener;
  let sent: ToEngine[];
  let client: EngineClient;
  beforeEach(() => {
    sent = [];
    client = new EngineClient((l) => {
      listener = l;
      return { post: (m) => sent.push(m), terminate: () => undefined };
    });
  });
  afterEach(() => client.dispose());

  const jobId = (): number => {
    const job = sent.find((m) => m.type === 'job');
    assert.ok(job && job.type === 'job');
    return job.id;
  };
  const result = (): EngineResult => ({ kind: 'digest', digest: digestDocuments(DOCUMENTS, OPTIONS), elapsedMs: 1 });

  it('hands each progress message to onProgress and settles only on the result', async () => {
    const seen: [number, number][] = [];
    let settled = false;
    const job = client.run(digestTask(), { onProgress: (done, total) => seen.push([done, total]) });
    void job.then(() => (settled = true));
    const id = jobId();
    for (let k = 1; k <= 3; k++) listener.message({ type: 'progress', id, done: k, total: 3 });
    listener.message({ type: 'progress', id: id + 1, done: 1, total: 1 });
    await new Promise((resolve) => setImmediate(resolve));
    assert.equal(settled, false, 'progress does not settle the job');
    assert.deepEqual(seen, [
      [1, 3],
      [2, 3],
      [3, 3],
    ], 'a message about another job is not delivered');
    listener.message({ type: 'done', id, result: result() });
    const reply = await job;
    assert.equal(reply.kind, 'digest');
    assert.equal(settled, true);
    // A late progress message after the result reaches nobody.
    listener.message({ type: 'progress', id, done: 3, total: 3 });
    assert.equal(seen.length, 3);
  });

  it('takes progress without onProgress, and a digest can still be cancelled after some progress', async () => {
    const controller = new AbortController();
    const job = client.run(digestTask(), { signal: controller.signal });
    listener.message({ type: 'progress', id: jobId(), done: 1, total: 3 });
    controller.abort();
    await assert.rejects(job, CancelledError);
  });

  it('names the model in a digest job once one is in use, as for summaries', async () => {
    client.useModel({ key: 'team.json@1', model: { counts: 1 } });
    const job = client.run(digestTask());
    const sentJob = sent.filter((m) => m.type === 'job').at(-1);
    assert.ok(sentJob && sentJob.type === 'job');
    assert.equal(sentJob.modelKey, 'team.json@1');
    listener.message({ type: 'done', id: sentJob.id, result: result() });
    await job;
  });

  it('sends the documents and options as given, with no model key', async () => {
    const job = client.run(digestTask());
    const sentJob = sent.find((m) => m.type === 'job');
    assert.ok(sentJob && sentJob.type === 'job');
    assert.deepEqual(sentJob.task, digestTask());
    assert.equal(sentJob.modelKey, undefined);
    listener.message({ type: 'done', id: sentJob.id, result: result() });
    await job;
  });
});
