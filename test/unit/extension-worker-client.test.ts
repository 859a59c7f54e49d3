import assert from 'node:assert/strict';
import type { EngineResult, EngineTask, FromEngine, ToEngine } from '../../src/extension/engine-protocol';
import { CancelledError, EngineClient, type HostListener, type StartHost } from '../../src/extension/worker-client';

/** A host that does nothing by itself: the test reads what it was sent and answers for it. */
class FakeHost {
  readonly received: ToEngine[] = [];
  terminated = false;
  constructor(readonly listener: HostListener) {}

  jobs(): Extract<ToEngine, { type: 'job' }>[] {
    return this.received.filter((m): m is Extract<ToEngine, { type: 'job' }> => m.type === 'job');
  }

  models(): string[] {
    return this.received.flatMap((m) => (m.type === 'model' ? [m.key] : []));
  }

  lastJobId(): number {
    const jobs = this.jobs();
    assert.ok(jobs.length > 0, 'a job was sent');
    return jobs.at(-1)!.id;
  }

  say(message: FromEngine): void {
    this.listener.message(message);
  }

  finish(id = this.lastJobId(), echo = 'done'): void {
    this.say({ type: 'done', id, result: result(echo) });
  }
}

function result(echo: string): EngineResult {
  return { kind: 'checkAbstract', report: { ok: false, reason: 'noAbstract', error: echo }, elapsedMs: 1 };
}

function task(text = 'some text'): EngineTask {
  return { kind: 'summarize', text, options: {} as never };
}

function fakeHosts(): { start: StartHost; hosts: FakeHost[] } {
  const hosts: FakeHost[] = [];
  const start: StartHost = (listener) => {
    const host = new FakeHost(listener);
    hosts.push(host);
    return { post: (message) => host.received.push(message), terminate: () => (host.terminated = true) };
  };
  return { start, hosts };
}

const echoOf = (r: EngineResult): string => (r.kind === 'checkAbstract' && !r.report.ok ? r.report.error : '?');

describe('engine client (shared by both hosts)', () => {
  let client: EngineClient;
  let hosts: FakeHost[];
  let log: string[];
  beforeEach(() => {
    const fake = fakeHosts();
    hosts = fake.hosts;
    log = [];
    client = new EngineClient(fake.start, (line) => log.push(line));
  });
  afterEach(() => client.dispose());

  it('sends a job with its text and settings and resolves with the reply', async () => {
    const job = client.run(task('the document'));
    assert.equal(hosts.length, 1);
    const sent = hosts[0]!.jobs()[0]!;
    assert.deepEqual(sent.task, task('the document'));
    assert.equal(sent.modelKey, undefined, 'no model: the built-in one');
    hosts[0]!.finish(sent.id, 'ok');
    assert.equal(echoOf(await job), 'ok');
  });

  it('forwards the stages the host reports, in order, to the job that is running', async () => {
    const stages: string[] = [];
    const job = client.run(task(), { onStage: (stage) => stages.push(stage) });
    const host = hosts[0]!;
    const id = host.lastJobId();
    for (const stage of ['reading', 'ranking', 'checking'] as const) host.say({ type: 'stage', id, stage });
    host.say({ type: 'stage', id: id + 99, stage: 'reading' });
    host.finish(id);
    await job;
    assert.deepEqual(stages, ['reading', 'ranking', 'checking']);
    assert.ok(log.some((line) => line.includes(`job ${id + 99}`)), 'a message about another job is ignored and noted');
  });

  it('keeps one host for jobs that do not overlap', async () => {
    for (let i = 0; i < 3; i++) {
      const job = client.run(task());
      hosts[0]!.finish();
      await job;
    }
    assert.equal(hosts.length, 1);
    assert.equal(client.startedHosts, 1);
  });

  it('cancels a running job when a newer one arrives: the old host is stopped, its late reply is ignored', async () => {
    const first = client.run(task('old'));
    const second = client.run(task('new'));
    await assert.rejects(first, CancelledError);
    assert.equal(hosts.length, 2);
    assert.equal(hosts[0]!.terminated, true);
    // A reply from the stopped host (sent before it died) must not settle the new job.
    hosts[0]!.finish(hosts[0]!.lastJobId(), 'old result');
    hosts[1]!.finish(hosts[1]!.lastJobId(), 'new result');
    assert.equal(echoOf(await second), 'new result');
  });

  it('ignores a reply whose id is not the running job', async () => {
    const job = client.run(task());
    const id = hosts[0]!.lastJobId();
    hosts[0]!.finish(id + 1, 'wrong');
    hosts[0]!.finish(id, 'right');
    assert.equal(echoOf(await job), 'right');
  });

  it('cancels through an AbortSignal, and never starts a job whose signal is already aborted', async () => {
    const controller = new AbortController();
    const job = client.run(task(), { signal: controller.signal });
    controller.abort();
    await assert.rejects(job, CancelledError);
    assert.equal(hosts[0]!.terminated, true);
    await assert.rejects(client.run(task(), { signal: controller.signal }), CancelledError);
    assert.equal(hosts.length, 1);
  });

  it('passes engine errors through; a failed host rejects its job and the next job gets a fresh host', async () => {
    const failing = client.run(task());
    hosts[0]!.say({ type: 'failed', id: hosts[0]!.lastJobId(), error: 'engine said no' });
    await assert.rejects(failing, /engine said no/);
    const crashing = client.run(task());
    hosts[0]!.listener.failed(new Error('the engine thread exited (code 3)'));
    await assert.rejects(crashing, /exited/);
    const after = client.run(task());
    assert.equal(hosts.length, 2, 'a fresh host after the crash');
    hosts[1]!.finish();
    await after;
  });

  it('rejects (does not throw) when a host cannot be started or fails at once', async () => {
    const throwing = new EngineClient(() => {
      throw new Error('no workers here');
    });
    await assert.rejects(throwing.run(task()), /no workers here/);
    const failingAtOnce = new EngineClient((listener) => {
      listener.failed(new Error('script missing'));
      return { post: () => undefined, terminate: () => undefined };
    });
    await assert.rejects(failingAtOnce.run(task()), /script missing/);
  });

  it('sends the model once per host, keyed, and names the key in each summarize job', async () => {
    client.useModel({ key: 'model.json@1', model: { counts: 1 } });
    for (let i = 0; i < 2; i++) {
      const job = client.run(task());
      hosts[0]!.finish();
      await job;
    }
    const host = hosts[0]!;
    assert.deepEqual(host.models(), ['model.json@1'], 'sent once, not with every job');
    assert.ok(host.jobs().every((job) => job.modelKey === 'model.json@1'));
    assert.ok(host.received.indexOf(host.received.find((m) => m.type === 'model')!) < host.received.indexOf(host.jobs()[0]!), 'model before the first job');
    client.useModel({ key: 'model.json@1', model: { counts: 1 } });
    assert.deepEqual(host.models(), ['model.json@1'], 'the same key is not sent again');
    client.useModel({ key: 'model.json@2', model: { counts: 2 } });
    assert.deepEqual(host.models(), ['model.json@1', 'model.json@2'], 'a changed file is sent when it changes');
  });

  it('sends the model again to the fresh host that replaces a cancelled one', async () => {
    client.useModel({ key: 'm@1', model: {} });
    const first = client.run(task());
    const second = client.run(task());
    await assert.rejects(first, CancelledError);
    assert.deepEqual(hosts[1]!.models(), ['m@1']);
    assert.equal(hosts[1]!.jobs()[0]!.modelKey, 'm@1');
    hosts[1]!.finish();
    await second;
  });

  it('names no model once the setting is cleared, and none for abstract checks', async () => {
    client.useModel({ key: 'm@1', model: {} });
    client.useModel(undefined);
    const job = client.run(task());
    assert.equal(hosts[0]!.jobs()[0]!.modelKey, undefined);
    hosts[0]!.finish();
    await job;
    client.useModel({ key: 'm@1', model: {} });
    const check = client.run({ kind: 'checkAbstract', text: 'x', options: { format: 'markdown', language: 'en' } });
    assert.equal(hosts[0]!.jobs()[1]!.modelKey, undefined);
    hosts[0]!.finish();
    await check;
  });

  it('warms a host ahead of the first job, with the model, without a job', () => {
    client.useModel({ key: 'm@1', model: {} });
    assert.equal(hosts.length, 0, 'nothing starts until asked');
    client.warm();
    assert.equal(hosts.length, 1);
    assert.deepEqual(hosts[0]!.models(), ['m@1']);
    assert.equal(hosts[0]!.jobs().length, 0);
    client.warm();
    assert.equal(hosts.length, 1);
  });

  it('refuses work after dispose and stops its host', async () => {
    client.warm();
    client.dispose();
    assert.equal(hosts[0]!.terminated, true);
    await assert.rejects(client.run(task()), /shut down/);
  });
});
