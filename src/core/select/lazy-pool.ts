/**
 * A pool of candidates for lazy greedy selection ("lazy evaluation" of a greedy objective whose
 * values only fall as picks are added, as in Minoux 1978 and the CELF variant of Leskovec et al.
 * 2007). MMR values (Carbonell & Goldstein 1998) only fall: redundancy to the picks only grows,
 * and the section-repeat discount only grows. So a stored value is an upper bound, and the entry
 * on top of a binary max-heap whose stored value is current is the best candidate; only stale
 * entries that reach the top are re-evaluated.
 *
 * Order: higher value first, then lower sentence index, which is exactly the order of a full scan
 * in document order that keeps the first maximum; so the lazy pick equals the eager one.
 */

export interface PoolValuation {
  /** The candidate's value now. */
  value(sentence: number): number;
  /** A number that changes whenever the candidate's value may have changed. */
  version(sentence: number): number;
  /**
   * False once the candidate can no longer be taken from this pool. Must stay false once false
   * (picked, no longer fits, blocked), because the pool drops it for good.
   */
  usable(sentence: number): boolean;
}

export class LazyPool {
  private readonly sentence: Int32Array;
  private readonly value: Float64Array;
  private readonly version: Float64Array;
  private size = 0;
  /** Re-evaluations done so far (for the benchmark). */
  evaluations = 0;

  constructor(members: readonly number[], private readonly valuation: PoolValuation) {
    const n = members.length;
    this.sentence = new Int32Array(n);
    this.value = new Float64Array(n);
    this.version = new Float64Array(n);
    for (const i of members) {
      this.sentence[this.size] = i;
      this.value[this.size] = valuation.value(i);
      this.version[this.size] = valuation.version(i);
      this.size++;
    }
    this.evaluations += n;
    for (let k = (this.size >> 1) - 1; k >= 0; k--) this.siftDown(k);
  }

  get length(): number {
    return this.size;
  }

  /** Removes and returns the best usable candidate, or -1 when none is left. */
  takeBest(): number {
    const { valuation } = this;
    while (this.size > 0) {
      const top = this.sentence[0]!;
      if (!valuation.usable(top)) {
        this.removeTop();
        continue;
      }
      const current = valuation.version(top);
      if (current === this.version[0]) {
        this.removeTop();
        return top;
      }
      this.value[0] = valuation.value(top);
      this.version[0] = current;
      this.evaluations++;
      this.siftDown(0);
    }
    return -1;
  }

  private before(a: number, b: number): boolean {
    const va = this.value[a]!;
    const vb = this.value[b]!;
    return va > vb || (va === vb && this.sentence[a]! < this.sentence[b]!);
  }

  private swap(a: number, b: number): void {
    const s = this.sentence[a]!;
    this.sentence[a] = this.sentence[b]!;
    this.sentence[b] = s;
    const v = this.value[a]!;
    this.value[a] = this.value[b]!;
    this.value[b] = v;
    const r = this.version[a]!;
    this.version[a] = this.version[b]!;
    this.version[b] = r;
  }

  private removeTop(): void {
    this.size--;
    if (this.size === 0) return;
    this.sentence[0] = this.sentence[this.size]!;
    this.value[0] = this.value[this.size]!;
    this.version[0] = this.version[this.size]!;
    this.siftDown(0);
  }

  private siftDown(start: number): void {
    let k = start;
    for (;;) {
      const left = 2 * k + 1;
      if (left >= this.size) return;
      const right = left + 1;
      const child = right < this.size && this.before(right, left) ? right : left;
      if (!this.before(child, k)) return;
      this.swap(child, k);
      k = child;
    }
  }
}
