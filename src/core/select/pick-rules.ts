/**
 * The selector's rules beyond MMR, each optional so the selector without them is plain
 * balanced MMR:
 *  - fragments (see filler.ts) are never fillers: they never take a section's seat, and outside
 *    the quotas they are picked only when their relevance clears `fragmentFloor`;
 *  - a section gets a seat only when its best non-fragment sentence clears `qualityFloor`; a
 *    section left out that way gives no sentence at all;
 *  - at most `maxRun` consecutive sentences of one paragraph;
 *  - no text twice (`textKey`: sentences with the same key say the same thing).
 * Every block only ever turns on as picks are added, which the lazy selector relies on.
 */

import type { LeftOutReason } from '../types';

export type { LeftOutReason };

export interface PickRuleInput {
  readonly relevance: Float64Array;
  readonly unitOf: Int32Array;
  /** 1 for a fragment (too short, a lead-in, link-only, a bare reference). */
  readonly fragment?: Uint8Array;
  /** Least relevance of a section's best sentence for the section to get a seat. */
  readonly qualityFloor?: number;
  /** …or the most distinct sentences ranked above it (issue 11: seats given past the 30th were filler). */
  readonly qualityRank?: number;
  /** Least relevance of a fragment picked outside the quotas. */
  readonly fragmentFloor?: number;
  /** Paragraph of each sentence, for the run limit. */
  readonly paragraphOf?: Int32Array;
  /** Most consecutive sentences of one paragraph (Infinity = no limit). */
  readonly maxRun?: number;
  /** Sentences with equal keys have the same text; only one of them may be picked. */
  readonly textKey?: Int32Array;
}

export class PickRules {
  private readonly picked: Uint8Array;
  private readonly keysTaken = new Set<number>();

  constructor(private readonly input: PickRuleInput) {
    this.picked = new Uint8Array(input.relevance.length);
  }

  addPick(i: number): void {
    this.picked[i] = 1;
    const key = this.input.textKey?.[i];
    if (key !== undefined) this.keysTaken.add(key);
  }

  /** May fill a section's seat. */
  filler(i: number): boolean {
    return this.input.fragment?.[i] !== 1;
  }

  private leftOut: ReadonlySet<number> = new Set();

  /** Units left out of the balance: their sentences are not picked at all (never forced in as filler). */
  leaveOut(units: Iterable<number>): void {
    this.leftOut = new Set(units);
  }

  /** May be picked outside the quotas. */
  free(i: number): boolean {
    if (this.leftOut.has(this.input.unitOf[i]!)) return false;
    return this.filler(i) || this.input.relevance[i]! >= (this.input.fragmentFloor ?? 0);
  }

  /** True once taking `i` would break the run limit or repeat a text (stays true). */
  blocked(i: number): boolean {
    const key = this.input.textKey?.[i];
    if (key !== undefined && this.keysTaken.has(key)) return true;
    const { paragraphOf, maxRun } = this.input;
    if (!paragraphOf || maxRun === undefined || !Number.isFinite(maxRun)) return false;
    const paragraph = paragraphOf[i];
    const inRun = (j: number) => j >= 0 && j < this.picked.length && this.picked[j] === 1 && paragraphOf[j] === paragraph;
    let before = 0;
    while (inRun(i - before - 1)) before++;
    let after = 0;
    while (inRun(i + after + 1)) after++;
    return before + after + 1 > maxRun;
  }

  /**
   * Units whose best sentence may not hold a seat, and why. The best sentence qualifies when its
   * relevance clears `qualityFloor` or it ranks among the document's `qualityRank` best distinct
   * non-fragment sentences (relevance is scaled per document, so one dominant sentence must not
   * push every other section under the floor).
   */
  unitsLeftOut(candidates: readonly number[]): Map<number, LeftOutReason> {
    const best = new Map<number, number>();
    const ranked: number[] = [];
    for (const i of candidates) {
      const unit = this.input.unitOf[i]!;
      if (!best.has(unit)) best.set(unit, -1);
      if (this.filler(i)) {
        ranked.push(i);
        if (best.get(unit)! < 0 || this.input.relevance[i]! > this.input.relevance[best.get(unit)!]!) best.set(unit, i);
      }
    }
    const floor = this.input.qualityFloor ?? -Infinity;
    const rankOf = this.distinctRanks(ranked);
    const out = new Map<number, LeftOutReason>();
    for (const [unit, sentence] of best) {
      if (sentence < 0) out.set(unit, 'onlyFragments');
      else if (this.input.relevance[sentence]! < floor && rankOf.get(sentence)! > (this.input.qualityRank ?? Infinity)) out.set(unit, 'belowQualityFloor');
    }
    // A document whose every section falls short still gets a summary of what it has.
    return out.size === best.size ? new Map() : out;
  }

  /** 1-based rank by relevance (ties to document order), copies of a text sharing their first copy's rank. */
  private distinctRanks(sentences: readonly number[]): Map<number, number> {
    const { relevance, textKey } = this.input;
    const order = [...sentences].sort((a, b) => relevance[b]! - relevance[a]! || a - b);
    const rankOfKey = new Map<number, number>();
    const ranks = new Map<number, number>();
    for (const i of order) {
      const key = textKey?.[i] ?? -1 - i;
      if (!rankOfKey.has(key)) rankOfKey.set(key, rankOfKey.size + 1);
      ranks.set(i, rankOfKey.get(key)!);
    }
    return ranks;
  }
}
