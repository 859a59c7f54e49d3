/**
 * TextRank for sentences: Mihalcea & Tarau (2004), "TextRank: Bringing order into texts", EMNLP.
 *
 * Two sentences are linked by their content overlap, normalised by length so long sentences are
 * not favoured:
 *
 *   sim(Si, Sj) = |{w : w ∈ Si and w ∈ Sj}| / (log|Si| + log|Sj|)
 *
 * where w ranges over distinct stemmed content terms and |S| counts the sentence's term tokens.
 * Scores come from weighted PageRank with damping 0.85 (the same power iteration as LexRank).
 *
 * Guard: two one-term sentences sharing their term would divide by log 1 + log 1 = 0. The
 * denominator is floored at ln 2 (its value for a one-term and a two-term sentence).
 * The graph is built sparsely, within the limits documented in similarity-graph.ts (each sentence keeps its strongest neighbours).
 */
import type { AnalyzedDocument, RankResult } from '../types';
import { pageRank, PAGERANK_DEFAULTS, trivialRanking, type PageRankSettings } from './power-iteration';
import { SPARSE_GRAPH_DEFAULTS, linkCounts, similarityGraph, type CsrGraph, type GraphLimits } from './similarity-graph';
import { presenceVectors, termIndexOf } from '../vectors';

export interface TextRankSettings extends PageRankSettings, GraphLimits {
  /** Smallest allowed denominator of the overlap similarity. */
  readonly minDenominator: number;
}

export const TEXTRANK_DEFAULTS: TextRankSettings = {
  minDenominator: Math.LN2,
  ...PAGERANK_DEFAULTS,
  ...SPARSE_GRAPH_DEFAULTS,
};

export interface TextRankOptions {
  readonly textrank?: Partial<TextRankSettings>;
}

/** Overlap similarity of two sentences given their shared distinct terms and their term counts. */
export function overlapSimilarity(shared: number, lengthA: number, lengthB: number, minDenominator = TEXTRANK_DEFAULTS.minDenominator): number {
  return overlapFromLogs(shared, Math.log(lengthA), Math.log(lengthB), minDenominator);
}

/** overlapSimilarity given the logarithms of the two term counts (the graph takes each once per sentence). */
function overlapFromLogs(shared: number, logA: number, logB: number, minDenominator: number): number {
  if (shared === 0) return 0;
  return shared / Math.max(logA + logB, minDenominator);
}

export function textRankGraph(a: AnalyzedDocument, settings: TextRankSettings = TEXTRANK_DEFAULTS): CsrGraph {
  const index = termIndexOf(a);
  const logLengths = Float64Array.from(a.terms, (terms) => Math.log(terms.length));
  // The dot product of 0/1 vectors is the number of distinct shared terms.
  return similarityGraph(
    presenceVectors(index),
    index.vocabulary.size,
    (i, j, shared) => overlapFromLogs(shared, logLengths[i]!, logLengths[j]!, settings.minDenominator),
    0,
    settings,
  );
}

export function textRank(a: AnalyzedDocument, options: TextRankOptions = {}): RankResult {
  const settings: TextRankSettings = { ...TEXTRANK_DEFAULTS, ...options.textrank };
  const n = a.terms.length;
  if (n <= 1) return trivialRanking(n, 'textrank');
  const graph = textRankGraph(a, settings);
  const { scores, converged, iterations } = pageRank(graph, settings);
  return { scores, features: { textrank: scores, links: linkCounts(graph) }, converged, iterations };
}
