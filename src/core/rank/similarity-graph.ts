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
 *    lost. The limit is a count, not a share, so the cost stays linear in long documents; a
 *    document of up to this many sentences is never pruned this way.
 *  - `maxNeighbours` (k): each sentence keeps its k most similar partners (ties: the earlier
 *    sentence); a link stays when either end keeps it, so the graph has at most n·k links and the
 *    power iteration costs O(n·k) per step. Below k + 1 sentences nothing is cut.
 * Both values were chosen on the benchmark's train half (even RFC numbers; `node dist/bench.cjs
 * quality --split train`): the default blend's ROUGE-1 F1 was 0.343 with the unpruned graph, with
 * k = 32 and with k = 64; with k = 32, 89% of those documents keep their LexRank scores exactly.
 * rank-graph-limits.test.ts states how far the scores of larger documents move. The values are
 * ours; Erkan & Radev (2004) and Mihalcea & Tarau (2004) use the full graph.
 */
import { invertedIndex, type SparseVector } from '../vectors';

export const SPARSE_GRAPH_DEFAULTS = {
  maxNeighbours: 32,
  maxProposingFrequency: 200,
} as const;

export interface GraphLimits {
  readonly maxNeighbours: number;
  readonly maxProposingFrequency: number;
}

/**
 * An undirected weighted graph stored as compressed rows: the edges of node i are slots
 * `offsets[i] .. offsets[i+1]`, every link in both rows with the same weight, each row ascending
 * (pageRank relies on both).
 */
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
  const commonPart = common.count === 0 ? null : commonEntries(vectors, common.flags);
  // Row i's weights of common terms, dense, so a candidate's share costs one lookup per term.
  const rowCommon = commonPart === null ? null : new Float64Array(vocabularySize);
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
    const mineFrom = commonPart === null ? 0 : commonPart.offsets[i]!;
    const mineTo = commonPart === null ? 0 : commonPart.offsets[i + 1]!;
    for (let e = mineFrom; e < mineTo; e++) rowCommon![commonPart!.ids[e]!] = commonPart!.values[e]!;
    for (let c = 0; c < count; c++) {
      const j = candidates[c]!;
      let extra = 0;
      if (mineTo > mineFrom) {
        for (let e = commonPart!.offsets[j]!; e < commonPart!.offsets[j + 1]!; e++) extra += rowCommon![commonPart!.ids[e]!]! * commonPart!.values[e]!;
      }
      const similarity = similarityOf(i, j, accumulated[j]! + extra);
      if (similarity > minSimilarity) {
        kept.offer(i, j, similarity);
        kept.offer(j, i, similarity);
      }
    }
    for (let e = mineFrom; e < mineTo; e++) rowCommon![commonPart!.ids[e]!] = 0;
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

/** Each sentence's entries for flagged terms, as compressed rows (sentence i: `offsets[i] .. offsets[i+1]`). */
function commonEntries(vectors: readonly SparseVector[], flags: Uint8Array): { offsets: Int32Array; ids: Int32Array; values: Float64Array } {
  const offsets = new Int32Array(vectors.length + 1);
  vectors.forEach((vector, i) => {
    let count = 0;
    for (const id of vector.ids) if (flags[id]) count++;
    offsets[i + 1] = offsets[i]! + count;
  });
  const ids = new Int32Array(offsets[vectors.length]!);
  const values = new Float64Array(offsets[vectors.length]!);
  vectors.forEach((vector, i) => {
    let slot = offsets[i]!;
    for (let k = 0; k < vector.ids.length; k++) {
      if (!flags[vector.ids[k]!]) continue;
      ids[slot] = vector.ids[k]!;
      values[slot++] = vector.values[k]!;
    }
  });
  return { offsets, ids, values };
}

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
    // In-links: for each node j, the nodes i that kept j, ascending (filled in order of i).
    const inOffsets = new Int32Array(n + 1);
    for (let i = 0; i < n; i++) for (let s = 0; s < sizes[i]!; s++) inOffsets[targets[i * k + s]! + 1]! += 1;
    for (let i = 0; i < n; i++) inOffsets[i + 1]! += inOffsets[i]!;
    const fill = inOffsets.slice(0, n);
    const inSources = new Int32Array(inOffsets[n]!);
    const inWeights = new Float64Array(inOffsets[n]!);
    for (let i = 0; i < n; i++) {
      for (let s = 0; s < sizes[i]!; s++) {
        const j = targets[i * k + s]!;
        inSources[fill[j]!] = i;
        inWeights[fill[j]!++] = weights[i * k + s]!;
      }
    }
    // Row i: its own kept partners (sorted here; at most k) merged with its in-links, duplicates once.
    const offsets = new Int32Array(n + 1);
    const outTargets = new Int32Array(n * k + inOffsets[n]!);
    const outWeights = new Float64Array(n * k + inOffsets[n]!);
    const ownTargets = new Int32Array(k);
    const ownWeights = new Float64Array(k);
    let out = 0;
    for (let i = 0; i < n; i++) {
      const size = sizes[i]!;
      for (let s = 0; s < size; s++) {
        // Insertion sort by partner.
        const t = targets[i * k + s]!;
        const w = weights[i * k + s]!;
        let at = s;
        while (at > 0 && ownTargets[at - 1]! > t) {
          ownTargets[at] = ownTargets[at - 1]!;
          ownWeights[at] = ownWeights[at - 1]!;
          at--;
        }
        ownTargets[at] = t;
        ownWeights[at] = w;
      }
      let a = 0;
      let b = inOffsets[i]!;
      const bEnd = inOffsets[i + 1]!;
      while (a < size || b < bEnd) {
        const ta = a < size ? ownTargets[a]! : n;
        const tb = b < bEnd ? inSources[b]! : n;
        if (ta <= tb) {
          outTargets[out] = ta;
          outWeights[out++] = ownWeights[a++]!;
          if (ta === tb) b++; // both ends kept it: same pair, same weight
        } else {
          outTargets[out] = tb;
          outWeights[out++] = inWeights[b++]!;
        }
      }
      offsets[i + 1] = out;
    }
    return { size: n, offsets, targets: outTargets.slice(0, out), weights: outWeights.slice(0, out) };
  }
}
