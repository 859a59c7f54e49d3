import assert from 'node:assert/strict';
import { Debouncer, RequestSequencer, type Timers } from '../../src/extension/scheduling';

/** Manual clock: timers fire only when the test advances time. */
class FakeTimers implements Timers {
  now = 0;
  private next = 1;
  private readonly pending = new Map<number, { at: number; callback: () => void }>();
  setTimeout(callback: () => void, ms: number): unknown {
    const handle = this.next++;
    this.pending.set(handle, { at: this.now + ms, callback });
    return handle;
  }
  clearTimeout(handle: unknown): void {
    this.pending.delete(handle as number);
  }
  advance(ms: number): void {
    this.now += ms;
    for (const [handle, timer] of [...this.pending].sort((a, b) => a[1].at - b[1].at)) {
      if (timer.at <= this.now) {
        this.pending.delete(handle);
        timer.callback();
      }
    }
  }
  get count(): number {
    return this.pending.size;
  }
}

describe('extension scheduling: debouncer', () => {
  it('runs once, after the quiet period following the last call', () => {
    const timers = new FakeTimers();
    const debouncer = new Debouncer(timers);
    const runs: number[] = [];
    for (let i = 0; i < 5; i++) {
      debouncer.schedule('doc', 300, () => runs.push(timers.now));
      timers.advance(100);
    }
    assert.deepEqual(runs, []);
    timers.advance(199);
    assert.deepEqual(runs, []);
    timers.advance(1);
    assert.deepEqual(runs, [700]);
  });

  it('keeps keys apart and cancels on request and on dispose', () => {
    const timers = new FakeTimers();
    const debouncer = new Debouncer(timers);
    const runs: string[] = [];
    debouncer.schedule('a', 10, () => runs.push('a'));
    debouncer.schedule('b', 10, () => runs.push('b'));
    debouncer.cancel('a');
    assert.equal(debouncer.isPending('a'), false);
    timers.advance(10);
    assert.deepEqual(runs, ['b']);
    debouncer.schedule('c', 10, () => runs.push('c'));
    debouncer.dispose();
    assert.equal(timers.count, 0);
    timers.advance(10);
    assert.deepEqual(runs, ['b']);
  });
});

describe('extension scheduling: stale results', () => {
  it('shows only the newest request, and only for the document version it read', () => {
    const sequencer = new RequestSequencer();
    const first = sequencer.issue('doc', 1);
    const second = sequencer.issue('doc', 2);
    assert.equal(sequencer.isFresh(first, 2), false, 'superseded by a newer request');
    assert.equal(sequencer.isFresh(second, 2), true);
    assert.equal(sequencer.isFresh(second, 3), false, 'the document changed while the engine ran');
    assert.equal(sequencer.isFresh(second, undefined), false, 'the document was closed');
    sequencer.invalidate();
    assert.equal(sequencer.isFresh(second, 2), false, 'cleared');
  });

  it('drops every out-of-order completion of interleaved requests (simulation)', () => {
    // Requests complete in a shuffled order; exactly the last one issued may be shown.
    const sequencer = new RequestSequencer();
    const tickets = Array.from({ length: 20 }, (_, version) => sequencer.issue('doc', version));
    const order = tickets.map((t, i) => ({ t, key: (i * 7919) % 20 })).sort((a, b) => a.key - b.key);
    const shown = order.filter(({ t }) => sequencer.isFresh(t, 19)).map(({ t }) => t.version);
    assert.deepEqual(shown, [19]);
  });
});
