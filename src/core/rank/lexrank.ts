/**
 * LexRank: Erkan & Radev (2004), "LexRank: Graph-based lexical centrality as salience in text
 * summarization", Journal of Artificial Intelligence Research 22.
 *
 * Sentences are nodes; two sentences are linked by their idf-modified cosine
 *
 *   cos(x, y) = Σ_w tf(w,x)·tf(w,y)·idf(w)² / (‖tf·idf(x)‖ · ‖tf·idf(y)‖)
 *
 * with idf over the document's sentences. The threshold variant keeps a link of weight 1 when the
 * cosine exceeds the threshold (each row is then divided by its degree inside the PageRank step);
 * the continuous variant keeps the cosine itself as the weight. A sentence's score is its share of
 * the stationary distribution with damping 0.85 (the paper's d = 0.15 is the jump probability).
 *
 * One deviation: the paper's matrix keeps the diagonal (every sentence resembles itself with
 * cosine 1). We drop it, so a sentence that resembles nothing else is a dangling node and spreads
 * its score instead of keeping it — only other sentences vouch for a sentence.
 * The graph is built sparsely, within the limits documented in similarity-graph.ts (each sentence keeps its strongest neighbours).
 */
import type { AnalyzedDocument, RankResult } from '../types';
import { pageRank, PAGERANK_DEFAULTS, trivialRanking, type PageRankSettings } from './power-iteration';
import { SPARSE_GRAPH_DEFAULTS, linkCounts, similarityGraph, type CsrGraph, type GraphLimits } from './similarity-graph';
import { sentenceVectorsOf, termIndexOf } from '../vectors';

export type LexRankVariant = 'threshold' | 'continuous';

export interface LexRankSettings extends PageRankSettings, GraphLimits {
  readonly variant: LexRankVariant;
  /** Cosine a link must exceed in the threshold variant; 0.1 is the paper's best setting for DUC 2004. */
  readonly threshold: number;
}

export const LEXRANK_DEFAULTS: LexRankSettings = {
  variant: 'threshold',
  threshold: 0.1,
  ...PAGERANK_DEFAULTS,
  ...SPARSE_GRAPH_DEFAULTS,
};

export interface LexRankOptions {
  readonly lexrank?: Partial<LexRankSettings>;
}

/** The sentence graph LexRank walks; exported so tests can hand the same graph to a reference PageRank. */
export function lexRankGraph(a: AnalyzedDocument, settings: LexRankSettings = LEXRANK_DEFAULTS): CsrGraph {
  const index = termIndexOf(a);
  // LexRank's idf-modified cosine: tf·idf with idf = log(N / sf), the 'sentence' variant.
  const vectors = sentenceVectorsOf(a);
  // Same value as cosine(vectors[i], vectors[j]), from the accumulated dot product.
  // The norms in one dense array: the graph asks for a pair's cosine over a million times at 1 MB.
  const norms = Float64Array.from(vectors, (vector) => vector.norm);
  const cosineOf = (i: number, j: number, dot: number) => Math.min(1, dot / (norms[i]! * norms[j]!));
  if (settings.variant === 'continuous') return similarityGraph(vectors, index.vocabulary.size, cosineOf, 0, settings);
  const graph = similarityGraph(vectors, index.vocabulary.size, cosineOf, settings.threshold, settings);
  return { ...graph, weights: graph.weights.fill(1) };
}

export function lexRank(a: AnalyzedDocument, options: LexRankOptions = {}): RankResult {
  const settings: LexRankSettings = { ...LEXRANK_DEFAULTS, ...options.lexrank };
  const n = a.terms.length;
  if (n <= 1) return trivialRanking(n, 'lexrank');
  const graph = lexRankGraph(a, settings);
  const { scores, converged, iterations } = pageRank(graph, settings);
  return { scores, features: { lexrank: scores, links: linkCounts(graph) }, converged, iterations };
}
