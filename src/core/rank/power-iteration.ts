/**
 * PageRank by power iteration on a weighted graph in compressed rows.
 *
 * Page, Brin, Motwani & Winograd (1998), "The PageRank citation ranking: bringing order to the
 * web"; used for sentences by Erkan & Radev (2004, LexRank) and Mihalcea & Tarau (2004, TextRank).
 *
 *   x'[j] = d · Σ_i x[i] · w(i,j) / out(i)  +  (d · Σ_{dangling k} x[k] + 1 − d) / n
 *
 * A node without outgoing weight (a "dangling" sentence that resembles no other) spreads its score
 * evenly over all nodes, so the vector keeps summing to 1. The iteration stops when the L1 change
 * between two steps drops below `tolerance`; hitting the cap is reported, not hidden.
 */
import type { RankResult } from '../types';
import type { CsrGraph } from './similarity-graph';

export const PAGERANK_DEFAULTS = {
  /** Damping factor d; 0.85 in Erkan & Radev (2004) and Mihalcea & Tarau (2004). */
  damping: 0.85,
  /** L1 change that counts as converged. */
  tolerance: 1e-6,
  /** The error shrinks by ≥ d per step, so from ≤ 2 it needs ≈ 90 steps to reach 1e-6; 200 leaves room. */
  maxIterations: 200,
} as const;

export interface PageRankSettings {
  readonly damping: number;
  readonly tolerance: number;
  readonly maxIterations: number;
}

export interface PageRankResult {
  /** Stationary distribution: non-negative, sums to 1 (empty for an empty graph). */
  readonly scores: Float64Array;
  readonly converged: boolean;
  /** Update steps performed. */
  readonly iterations: number;
}

export function pageRank(graph: CsrGraph, settings: PageRankSettings = PAGERANK_DEFAULTS): PageRankResult {
  const n = graph.size;
  if (n === 0) return { scores: new Float64Array(0), converged: true, iterations: 0 };

  const { offsets, targets, weights } = graph;
  const { damping, tolerance, maxIterations } = settings;
  const outWeight = new Float64Array(n);
  const dangling: number[] = [];
  for (let i = 0; i < n; i++) {
    let sum = 0;
    for (let e = offsets[i]!; e < offsets[i + 1]!; e++) sum += weights[e]!;
    outWeight[i] = sum;
    if (sum === 0) dangling.push(i);
  }

  let current = new Float64Array(n).fill(1 / n);
  let next = new Float64Array(n);
  const share = new Float64Array(n);
  const unitWeights = weights.every((w) => w === 1);
  let iterations = 0;
  let converged = false;
  while (iterations < maxIterations) {
    let danglingMass = 0;
    for (const k of dangling) danglingMass += current[k]!;
    const base = (damping * danglingMass + 1 - damping) / n;
    for (let i = 0; i < n; i++) share[i] = outWeight[i] === 0 ? 0 : (damping * current[i]!) / outWeight[i]!;
    // Each node gathers from its own row: the graph is undirected (w(i,j) = w(j,i)) and rows
    // ascend, so the terms are added in the same order as pushing from every i in turn would add
    // them, and the sums are the same to the last bit, without scattered writes.
    let change = 0;
    for (let j = 0; j < n; j++) {
      let sum = base;
      // x · 1 is x: links of weight 1 (LexRank's threshold graph, key phrases) skip the product.
      if (unitWeights) for (let e = offsets[j]!; e < offsets[j + 1]!; e++) sum += share[targets[e]!]!;
      else for (let e = offsets[j]!; e < offsets[j + 1]!; e++) sum += share[targets[e]!]! * weights[e]!;
      next[j] = sum;
      change += Math.abs(sum - current[j]!);
    }
    iterations++;
    [current, next] = [next, current];
    if (change < tolerance) {
      converged = true;
      break;
    }
  }
  return { scores: current, converged, iterations };
}

/** No sentence, or a single sentence that holds the whole distribution: nothing to iterate. */
export function trivialRanking(n: number, feature: string): RankResult {
  const scores = new Float64Array(n).fill(1);
  return { scores, features: { [feature]: scores }, converged: true, iterations: 0 };
}
