/**
 * Centroid ranking: Radev, Jing, Styś & Tam (2004), "Centroid-based summarization of multiple
 * documents", Information Processing and Management 40 (the MEAD system).
 *
 * The centroid is the document's average tf·idf vector, with the sentences standing in for
 * documents: c(t) = idf(t) · (occurrences of t) / n, idf(t) = log(n / sf(t)). Like MEAD we keep
 * only the strongest centroid terms — here the `maxTerms` largest (MEAD cut by a value threshold
 * instead; a count adapts to any document length). A sentence scores the cosine between its
 * tf·idf vector and the centroid; MEAD summed the centroid values of the sentence's words, which
 * favours long sentences — the cosine removes that length bias.
 */
import type { AnalyzedDocument, RankResult } from '../types';
import { cosine, inverseFrequency, makeVector, sentenceVectorsOf, termIndexOf, type SparseVector } from '../vectors';

export interface CentroidSettings {
  /** How many of the largest centroid terms to keep; Infinity keeps them all. */
  readonly maxTerms: number;
}

/** 100 terms: enough to cover a long document's topics, few enough to drop its noise (common practice, no source). */
export const CENTROID_DEFAULTS: CentroidSettings = {
  maxTerms: 100,
};

export interface CentroidOptions {
  readonly centroid?: Partial<CentroidSettings>;
}

/** The document centroid as a sparse vector, cut to the `maxTerms` largest values (ties: first-seen term wins). */
export function documentCentroid(a: AnalyzedDocument, settings: CentroidSettings = CENTROID_DEFAULTS): SparseVector {
  const index = termIndexOf(a);
  const n = index.counts.length;
  const idf = inverseFrequency(index, 'sentence');
  const entries: { id: number; value: number }[] = [];
  idf.forEach((weight, id) => {
    const value = (weight * index.totalCount[id]!) / n;
    if (value > 0) entries.push({ id, value });
  });
  entries.sort((x, y) => y.value - x.value || x.id - y.id);
  const kept = entries.slice(0, Math.max(0, settings.maxTerms)).sort((x, y) => x.id - y.id);
  return makeVector(Int32Array.from(kept, (e) => e.id), Float64Array.from(kept, (e) => e.value));
}

export function centroidRank(a: AnalyzedDocument, options: CentroidOptions = {}): RankResult {
  const settings: CentroidSettings = { ...CENTROID_DEFAULTS, ...options.centroid };
  const n = a.terms.length;
  if (n === 1) return { scores: Float64Array.of(1), features: { centroid: Float64Array.of(1) } };
  const vectors = sentenceVectorsOf(a);
  const centroid = documentCentroid(a, settings);
  // A zero centroid (empty document, or every term in every sentence) leaves all scores at 0.
  const scores = Float64Array.from(vectors, (vector) => cosine(vector, centroid));
  return { scores, features: { centroid: scores } };
}
