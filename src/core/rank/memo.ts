/**
 * One result per analysed document and ranker: the blend and the trained model both need the
 * centroid and LexRank scores, and LexRank is the costliest step on long documents.
 * Only calls with default settings are cached, so a result never depends on stale options.
 */
import type { AnalyzedDocument, RankResult } from '../types';

const cache = new WeakMap<AnalyzedDocument, Map<string, RankResult>>();

export function withDefaultsOnce(a: AnalyzedDocument, key: string, compute: () => RankResult): RankResult {
  let results = cache.get(a);
  if (!results) cache.set(a, (results = new Map()));
  let result = results.get(key);
  if (!result) results.set(key, (result = compute()));
  return result;
}
