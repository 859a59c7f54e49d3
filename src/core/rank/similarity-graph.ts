/**
 * The sentence similarity graph of LexRank and TextRank, sparse and of bounded size: pairs are
 * found through the inverted index (only sentences that share a term are ever compared), every
 * sentence keeps its strongest neighbours only, and the result is stored as compressed rows in
 * typed arrays. No n×n matrix is allocated.
 *
 * Two limits make the work and the graph grow linearly with the document:
 *  - `maxProposingFrequency`: walking the postings of a term held by sf sentences visits
 *    sf·(sf−1)/2 pairs, so a term held by more sentences than this proposes no pairs (the total of
 *    visits is then at most limit × postings). Pairs proposed through other terms still get their
 *    exact similarity, these terms included; only pairs linked by such common terms alone are
 *    lost. Such terms carry little weight where it matters (LexRank's idf of a term in 200 of 200+
 *    sentences is at most log(n/200)), and a document of up to this many sentences is never pruned.
 *  - `maxNeighbours` (k): each sentence keeps its k most similar partners (ties: the earlier
 *    sentence); a link stays when either end keeps it, so the graph has at most n·k links and the
 *    power iteration costs O(n·k) per step. Below k + 1 sentences nothing is cut.
 * Both values were chosen on the benchmark's train half (even RFC numbers, `scripts/graph-limits`
 * figures in bench/RESULTS.md): with k = 32, 97% of those documents keep their whole LexRank
 * graph and the scores of the rest move by a few percent at most; raising either limit moved no
 * ROUGE figure. These are ours, not the papers' (Erkan & Radev 2004 and Mihalcea & Tarau 2004 use
 * the full graph).
 */
import { dot, invertedIndex, makeVector, type SparseVector } from '../vectors';

export const SPARSE_GRAPH_DEFAULTS = {
  maxNeighbours: 32,
  maxProposingFrequency: 200,
} as const;

export interface GraphLimits {
  readonly maxNeighbours: number;
  readonly maxProposingFrequency: number;
}

/** An undirected weighted graph stored as compressed rows: the edges of node i are slots `offsets[i] .. offsets[i+1]`. */
export interface CsrGraph {
  readonly size: number;
  readonly offsets: Int32Array;
  readonly targets: Int32Array;
  readonly weights: Float64Array;
}

/**
 * Links pairs of sentences whose similarity exceeds `minSimilarity`, in both directions, weighted
 * by that similarity, within the limits above. For each sentence i the dot products with all
 * later sentences are accumulated through the postings; `similarityOf(i, j, dot)` turns a dot
 * product into the similarity. No self-loops; rows list their neighbours in ascending order.
 */
export function similarityGraph(
  vectors: readonly SparseVector[],
  vocabularySize: number,
  similarityOf: (i: number, j: number, dot: number) => number,
  minSimilarity: number,
  limits: GraphLimits = SPARSE_GRAPH_DEFAULTS,
): CsrGraph {
  const n = vectors.length;
  const postings = invertedIndex(vectors, vocabularySize);
  const common = commonTerms(postings.offsets, limits.maxProposingFrequency);
  const commonParts = common.count === 0 ? null : vectors.map((vector) => restrict(vector, common.flags));
  const accumulated = new Float64Array(n);
  const seenBy = new Int32Array(n).fill(-1);
  const candidates = new Int32Array(n);
  // A node has at most n − 1 partners, so k above that keeps everything.
  const kept = new Neighbours(n, Math.max(0, Math.min(n - 1, Math.floor(limits.maxNeighbours))));

  for (let i = 0; i < n; i++) {
    const { ids, values } = vectors[i]!;
    let count = 0;
    for (let k = 0; k < ids.length; k++) {
      const id = ids[k]!;
      if (common.flags[id]) continue;
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
    const mine = commonParts?.[i];
    for (let c = 0; c < count; c++) {
      const j = candidates[c]!;
      const extra = mine !== undefined && mine.ids.length > 0 ? dot(mine, commonParts![j]!) : 0;
      const similarity = similarityOf(i, j, accumulated[j]! + extra);
      if (similarity > minSimilarity) {
        kept.offer(i, j, similarity);
        kept.offer(j, i, similarity);
      }
    }
  }
  return kept.toCsr();
}

/** Flags the terms held by more than `maxFrequency` sentences (they propose no pairs). */
export function commonTerms(offsets: Int32Array, maxFrequency: number): { readonly flags: Uint8Array; readonly count: number } {
  const vocabularySize = offsets.length - 1;
  const flags = new Uint8Array(vocabularySize);
  let count = 0;
  for (let t = 0; t < vocabularySize; t++) {
    if (offsets[t + 1]! - offsets[t]! > maxFrequency) {
      flags[t] = 1;
      count++;
    }
  }
  return { flags, count };
}

/** The entries of `vector` whose id is flagged in `keep`. */
function restrict(vector: SparseVector, keep: Uint8Array): SparseVector {
  const slots: number[] = [];
  for (let k = 0; k < vector.ids.length; k++) if (keep[vector.ids[k]!]) slots.push(k);
  if (slots.length === 0) return EMPTY_VECTOR;
  return makeVector(Int32Array.from(slots, (k) => vector.ids[k]!), Float64Array.from(slots, (k) => vector.values[k]!));
}

const EMPTY_VECTOR: SparseVector = { ids: new Int32Array(0), values: new Float64Array(0), norm: 0 };

/** Number of neighbours of each node (a sentence's degree in the similarity graph). */
export function linkCounts(graph: CsrGraph): Float64Array {
  const counts = new Float64Array(graph.size);
  for (let i = 0; i < graph.size; i++) counts[i] = graph.offsets[i + 1]! - graph.offsets[i]!;
  return counts;
}

/**
 * The k strongest partners of every node, each node's in a binary min-heap (weakest at the root;
 * among equal weights the later partner counts as weaker, so ties keep the earlier sentence).
 * Memory: n·k slots, allocated once.
 */
class Neighbours {
  private readonly targets: Int32Array;
  private readonly weights: Float64Array;
  private readonly sizes: Int32Array;

  constructor(
    private readonly n: number,
    private readonly k: number,
  ) {
    this.targets = new Int32Array(n * k);
    this.weights = new Float64Array(n * k);
    this.sizes = new Int32Array(n);
  }

  offer(node: number, partner: number, weight: number): void {
    const k = this.k;
    if (k === 0) return;
    const base = node * k;
    const size = this.sizes[node]!;
    if (size < k) {
      // Sift up from the new leaf.
      let at = size;
      while (at > 0) {
        const parent = (at - 1) >> 1;
        if (!this.weaker(partner, weight, this.targets[base + parent]!, this.weights[base + parent]!)) break;
        this.targets[base + at] = this.targets[base + parent]!;
        this.weights[base + at] = this.weights[base + parent]!;
        at = parent;
      }
      this.targets[base + at] = partner;
      this.weights[base + at] = weight;
      this.sizes[node] = size + 1;
      return;
    }
    // Full: replace the root if the newcomer is stronger, then sift down.
    if (!this.weaker(this.targets[base]!, this.weights[base]!, partner, weight)) return;
    let at = 0;
    for (;;) {
      const left = 2 * at + 1;
      if (left >= k) break;
      const right = left + 1;
      let child = left;
      if (right < k && this.weaker(this.targets[base + right]!, this.weights[base + right]!, this.targets[base + left]!, this.weights[base + left]!)) child = right;
      if (!this.weaker(this.targets[base + child]!, this.weights[base + child]!, partner, weight)) break;
      this.targets[base + at] = this.targets[base + child]!;
      this.weights[base + at] = this.weights[base + child]!;
      at = child;
    }
    this.targets[base + at] = partner;
    this.weights[base + at] = weight;
  }

  /** True when (a, wa) ranks below (b, wb): lower weight, or equal weight and the later partner. */
  private weaker(a: number, wa: number, b: number, wb: number): boolean {
    return wa < wb || (wa === wb && a > b);
  }

  /** Symmetric CSR of every kept link (kept by either end), rows ascending, each link once per row. */
  toCsr(): CsrGraph {
    const { n, k, sizes, targets, weights } = this;
    // Each kept entry (i → j) lands in row i and in row j; a link both ends kept lands twice and is
    // merged below.
    const counts = new Int32Array(n + 1);
    for (let i = 0; i < n; i++) {
      counts[i + 1]! += sizes[i]!;
      for (let s = 0; s < sizes[i]!; s++) counts[targets[i * k + s]! + 1]! += 1;
    }
    for (let i = 0; i < n; i++) counts[i + 1]! += counts[i]!;
    const fill = counts.slice(0, n);
    const rawTargets = new Int32Array(counts[n]!);
    const rawWeights = new Float64Array(counts[n]!);
    for (let i = 0; i < n; i++) {
      for (let s = 0; s < sizes[i]!; s++) {
        const j = targets[i * k + s]!;
        const w = weights[i * k + s]!;
        rawTargets[fill[i]!] = j;
        rawWeights[fill[i]!++] = w;
        rawTargets[fill[j]!] = i;
        rawWeights[fill[j]!++] = w;
      }
    }
    // Sort each row by target and drop the duplicates (a row holds at most k + its in-links).
    const offsets = new Int32Array(n + 1);
    const outTargets = new Int32Array(counts[n]!);
    const outWeights = new Float64Array(counts[n]!);
    const order: number[] = [];
    let out = 0;
    for (let i = 0; i < n; i++) {
      order.length = 0;
      for (let e = counts[i]!; e < counts[i + 1]!; e++) order.push(e);
      order.sort((x, y) => rawTargets[x]! - rawTargets[y]!);
      const start = out;
      for (const e of order) {
        if (out > start && outTargets[out - 1] === rawTargets[e]) continue;
        outTargets[out] = rawTargets[e]!;
        outWeights[out++] = rawWeights[e]!;
      }
      offsets[i + 1] = out;
    }
    return { size: n, offsets, targets: outTargets.slice(0, out), weights: outWeights.slice(0, out) };
  }
}
