/**
 * Timing helpers for live summaries: a per-key debouncer and a generation counter that tells
 * whether an asynchronous result is still the newest one asked for. Pure (timers are injected).
 */

export interface Timers {
  setTimeout(callback: () => void, ms: number): unknown;
  clearTimeout(handle: unknown): void;
}

const realTimers: Timers = {
  setTimeout: (callback, ms) => setTimeout(callback, ms),
  clearTimeout: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
};

export class Debouncer {
  private readonly pending = new Map<string, unknown>();

  constructor(private readonly timers: Timers = realTimers) {}

  /** Runs `action` after `ms` of quiet for this key; a newer call for the key replaces the older one. */
  schedule(key: string, ms: number, action: () => void): void {
    this.cancel(key);
    const handle = this.timers.setTimeout(() => {
      this.pending.delete(key);
      action();
    }, ms);
    this.pending.set(key, handle);
  }

  cancel(key: string): void {
    const handle = this.pending.get(key);
    if (handle !== undefined) {
      this.timers.clearTimeout(handle);
      this.pending.delete(key);
    }
  }

  isPending(key: string): boolean {
    return this.pending.has(key);
  }

  dispose(): void {
    for (const handle of this.pending.values()) this.timers.clearTimeout(handle);
    this.pending.clear();
  }
}

/** A ticket for one request: the generation it was issued in and the document version it read. */
export interface RequestTicket {
  readonly generation: number;
  readonly documentKey: string;
  readonly version: number;
}

/**
 * Issues tickets; only the newest ticket is current. A result is shown only when its ticket is
 * current AND the document is still at the version the request read.
 */
export class RequestSequencer {
  private generation = 0;

  issue(documentKey: string, version: number): RequestTicket {
    this.generation += 1;
    return { generation: this.generation, documentKey, version };
  }

  /** Makes every ticket issued so far stale (e.g. on Clear or when the document closes). */
  invalidate(): void {
    this.generation += 1;
  }

  isFresh(ticket: RequestTicket, currentVersion: number | undefined): boolean {
    return ticket.generation === this.generation && currentVersion === ticket.version;
  }
}
