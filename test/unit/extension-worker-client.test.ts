import assert from 'node:assert/strict';
import { Worker } from 'node:worker_threads';
import { CancelledError, EngineClient } from '../../src/extension/worker-client';
import type { EngineTask } from '../../src/extension/engine-protocol';

/**
 * A stand-in engine thread: replies to a summarize job after `text` milliseconds (so tests can
 * make a job slow), fails when text is 'fail', and exits the process when text is 'crash'.
 */
const STAND_IN = `
const { parentPort } = require('node:worker_threads');
parentPort.on('message', (job) => {
  if (job.text === 'crash') process.exit(3);
  if (job.text === 'fail') return parentPort.postMessage({ id: job.id, ok: false, error: 'engine said no' });
  setTimeout(() => parentPort.postMessage({ id: job.id, ok: true, kind: 'summarize', summary: { echo: job.text }, elapsedMs: 0 }), Number(job.text) || 0);
});`;

function task(text: string): EngineTask {
  return { kind: 'summarize', text, options: {} as never };
}

describe('extension worker client', () => {
  let client: EngineClient;
  let log: string[];
  beforeEach(() => {
    log = [];
    client = new EngineClient(() => new Worker(STAND_IN, { eval: true }), (line) => log.push(line));
  });
  afterEach(() => client.dispose());

  it('runs a job on a thread and returns its reply', async () => {
    const result = await client.run(task('5'));
    assert.equal(result.kind, 'summarize');
    assert.deepEqual((result as { summary: unknown }).summary, { echo: '5' });
    assert.equal(client.busy, false);
  });

  it('reuses the thread for jobs that do not overlap', async () => {
    await client.run(task('1'));
    await client.run(task('1'));
    assert.equal(client.startedWorkers, 1);
  });

  it('cancels a running job when a newer one arrives: the old one rejects, only the new result comes back', async () => {
    const slow = client.run(task('2000'));
    const fast = client.run(task('5'));
    await assert.rejects(slow, CancelledError);
    assert.deepEqual(((await fast) as { summary: unknown }).summary, { echo: '5' });
    assert.equal(client.startedWorkers, 2, 'the old thread was stopped and a fresh one started');
    assert.ok(log.some((line) => line.includes('cancelled')));
  });

  it('cancels through an AbortSignal', async () => {
    const controller = new AbortController();
    const job = client.run(task('2000'), controller.signal);
    controller.abort();
    await assert.rejects(job, CancelledError);
    await assert.rejects(client.run(task('1'), controller.signal), CancelledError, 'an aborted signal never starts a job');
  });

  it('passes engine errors through and survives a crashed thread', async () => {
    await assert.rejects(client.run(task('fail')), /engine said no/);
    await assert.rejects(client.run(task('crash')), /exited/);
    const after = await client.run(task('1'));
    assert.deepEqual((after as { summary: unknown }).summary, { echo: '1' });
  });

  it('refuses work after dispose', async () => {
    client.dispose();
    await assert.rejects(client.run(task('1')), /shut down/);
  });
});
