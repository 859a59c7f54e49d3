/**
 * The sentence similarity graph of LexRank and TextRank, built sparsely: pairs are found through
 * the inverted index (only sentences that share a term are ever compared), and the result is
 * stored as compressed rows in typed arrays. No n×n matrix is allocated, so a 1 MB document
 * (~9,000 sentences, ~40 M possible pairs) stays within tens of megabytes.
 *
 * Two budgets bound the work on large or repetitive documents; ordinary documents never reach
 * them, and then the graph is exact:
 *  - `maxPairVisits`: walking a term's postings visits sf·(sf−1)/2 pairs. When the total over all
 *    terms exceeds the budget, the terms held by the most sentences are skipped for *proposing*
 *    pairs, most common first, until it fits. Pairs proposed through other terms still get their
 *    exact similarity (skipped terms included); only pairs linked by skipped terms alone are lost.
 *  - `maxLinks`: when more pairs pass `minSimilarity` than this, only the strongest are kept. The
 *    cut is made on a logarithmic histogram of similarities (bins ~2% apart) and never splits a
 *    bin, so slightly fewer may be kept and tied links are dropped together, never chosen by
 *    position. 2 M links take 48 MB as rows.
 * Measured once on ~1 MB of technical Markdown (7,700 sentences through the project's parser and
 * analyzer): 4.8 M pair visits; 0.8 M links at LexRank's 0.1 threshold (exact), 4.1 M links with
 * any overlap (continuous LexRank and TextRank keep the strongest 2 M). Budget values: ours.
 */
import { dot, invertedIndex, makeVector, type SparseVector } from '../vectors';

export const GRAPH_BUDGET_DEFAULTS = {
  maxPairVisits: 10_000_000,
  maxLinks: 2_000_000,
} as const;

export interface GraphBudget {
  readonly maxPairVisits: number;
  readonly maxLinks: number;
}

/** An undirected weighted graph stored as compressed rows: the edges of node i are slots `offsets[i] .. offsets[i+1]`. */
export interface CsrGraph {
  readonly size: number;
  readonly offsets: Int32Array;
  readonly targets: Int32Array;
  readonly weights: Float64Array;
}

/**
 * Links every pair of sentences whose similarity exceeds `minSimilarity`, in both directions,
 * weighted by that similarity. For each sentence i the dot products with all later sentences are
 * accumulated through the postings; `similarityOf(i, j, dot)` turns a dot product into the
 * similarity. No self-loops.
 */
export function similarityGraph(
  vectors: readonly SparseVector[],
  vocabularySize: number,
  similarityOf: (i: number, j: number, dot: number) => number,
  minSimilarity: number,
  budget: GraphBudget = GRAPH_BUDGET_DEFAULTS,
): CsrGraph {
  const n = vectors.length;
  const postings = invertedIndex(vectors, vocabularySize);
  const skipped = termsOverBudget(postings.offsets, budget.maxPairVisits);
  const skippedParts = vectors.map((vector) => restrict(vector, skipped));
  const accumulated = new Float64Array(n);
  const seenBy = new Int32Array(n);
  const candidates = new Int32Array(n);

  /** Calls `visit` for every linked pair (i < j), rows in order, each row's partners ascending. */
  const forEachPair = (visit: (i: number, j: number, similarity: number) => void) => {
    seenBy.fill(-1);
    for (let i = 0; i < n; i++) {
      const { ids, values } = vectors[i]!;
      let count = 0;
      for (let k = 0; k < ids.length; k++) {
        const id = ids[k]!;
        if (skipped[id]) continue;
        const weight = values[k]!;
        const start = postings.offsets[id]!;
        for (let p = postings.offsets[id + 1]! - 1; p >= start; p--) {
          const j = postings.sentences[p]!;
          if (j <= i) break; // postings ascend; only pairs i < j
          if (seenBy[j] !== i) {
            seenBy[j] = i;
            accumulated[j] = 0;
            candidates[count++] = j;
          }
          accumulated[j]! += weight * postings.values[p]!;
        }
      }
      const mine = skippedParts[i]!;
      for (const j of candidates.subarray(0, count).sort()) {
        const extra = mine.ids.length > 0 ? dot(mine, skippedParts[j]!) : 0;
        const similarity = similarityOf(i, j, accumulated[j]! + extra);
        if (similarity > minSimilarity) visit(i, j, similarity);
      }
    }
  };

  // First pass: keep links until the budget is exceeded, counting all of them in the histogram.
  const histogram = new Float64Array(HISTOGRAM_BINS);
  let edges = new EdgeList();
  forEachPair((i, j, similarity) => {
    histogram[binOf(similarity)]! += 1;
    if (edges.length <= budget.maxLinks) edges.push(i, j, similarity);
  });
  if (edges.length > budget.maxLinks) {
    // Second pass: only links in the strongest bins that fit the budget together.
    let kept = 0;
    let lowestBin = HISTOGRAM_BINS;
    while (lowestBin > 0 && kept + histogram[lowestBin - 1]! <= budget.maxLinks) kept += histogram[--lowestBin]!;
    edges = new EdgeList();
    forEachPair((i, j, similarity) => {
      if (binOf(similarity) >= lowestBin) edges.push(i, j, similarity);
    });
  }
  return edges.toCsr(n);
}

/**
 * Flags the terms to skip when proposing pairs: none if all postings together visit at most
 * `maxPairVisits` pairs, otherwise the most widespread terms (ties: the later-seen term first)
 * until the rest fit.
 */
export function termsOverBudget(offsets: Int32Array, maxPairVisits: number): Uint8Array {
  const vocabularySize = offsets.length - 1;
  const skipped = new Uint8Array(vocabularySize);
  const visits = (t: number) => {
    const sf = offsets[t + 1]! - offsets[t]!;
    return (sf * (sf - 1)) / 2;
  };
  let total = 0;
  for (let t = 0; t < vocabularySize; t++) total += visits(t);
  if (total <= maxPairVisits) return skipped;
  const byVisits = Array.from({ length: vocabularySize }, (_, t) => t).sort((x, y) => visits(y) - visits(x) || y - x);
  for (const t of byVisits) {
    if (total <= maxPairVisits) break;
    skipped[t] = 1;
    total -= visits(t);
  }
  return skipped;
}

/** The entries of `vector` whose id is flagged in `keep`. */
function restrict(vector: SparseVector, keep: Uint8Array): SparseVector {
  const slots: number[] = [];
  vector.ids.forEach((id, k) => {
    if (keep[id]) slots.push(k);
  });
  if (slots.length === 0) return EMPTY_VECTOR;
  return makeVector(Int32Array.from(slots, (k) => vector.ids[k]!), Float64Array.from(slots, (k) => vector.values[k]!));
}

const EMPTY_VECTOR: SparseVector = { ids: new Int32Array(0), values: new Float64Array(0), norm: 0 };

/** Similarities from 2^-40 to 2^24 in bins 2^(1/32) apart (≈ 2%); anything outside lands in the end bins. */
const BINS_PER_OCTAVE = 32;
const LOWEST_OCTAVE = -40;
const HISTOGRAM_BINS = 64 * BINS_PER_OCTAVE;

function binOf(similarity: number): number {
  const bin = Math.floor((Math.log2(similarity) - LOWEST_OCTAVE) * BINS_PER_OCTAVE);
  return Math.min(HISTOGRAM_BINS - 1, Math.max(0, bin));
}

/** Number of neighbours of each node (a sentence's degree in the similarity graph). */
export function linkCounts(graph: CsrGraph): Float64Array {
  const counts = new Float64Array(graph.size);
  for (let i = 0; i < graph.size; i++) counts[i] = graph.offsets[i + 1]! - graph.offsets[i]!;
  return counts;
}

/** Growable edge list in typed arrays (a plain array of objects would triple the memory). */
class EdgeList {
  private from = new Int32Array(1024);
  private to = new Int32Array(1024);
  private weight = new Float64Array(1024);
  length = 0;

  push(i: number, j: number, w: number): void {
    if (this.length === this.from.length) {
      const capacity = this.length * 2;
      this.from = grow(this.from, new Int32Array(capacity));
      this.to = grow(this.to, new Int32Array(capacity));
      this.weight = grow(this.weight, new Float64Array(capacity));
    }
    this.from[this.length] = i;
    this.to[this.length] = j;
    this.weight[this.length] = w;
    this.length++;
  }

  /** Symmetric CSR; rows list their neighbours in ascending order because edges arrive sorted by (i, j). */
  toCsr(n: number): CsrGraph {
    const offsets = new Int32Array(n + 1);
    for (let e = 0; e < this.length; e++) {
      offsets[this.from[e]! + 1]! += 1;
      offsets[this.to[e]! + 1]! += 1;
    }
    for (let i = 0; i < n; i++) offsets[i + 1]! += offsets[i]!;
    const fill = offsets.slice(0, n);
    const targets = new Int32Array(2 * this.length);
    const weights = new Float64Array(2 * this.length);
    // Lower neighbours of j (edges i→j, i < j) come first in edge order, so fill them in one pass
    // and the upper ones in a second pass to keep every row sorted.
    for (let e = 0; e < this.length; e++) {
      const j = this.to[e]!;
      targets[fill[j]!] = this.from[e]!;
      weights[fill[j]!++] = this.weight[e]!;
    }
    for (let e = 0; e < this.length; e++) {
      const i = this.from[e]!;
      targets[fill[i]!] = this.to[e]!;
      weights[fill[i]!++] = this.weight[e]!;
    }
    return { size: n, offsets, targets, weights };
  }
}

function grow<T extends Int32Array | Float64Array>(old: T, larger: T): T {
  larger.set(old);
  return larger;
}
