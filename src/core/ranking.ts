/** Maps a method name and the summary options to one ranker call. */
import { loadModel, rankBayes } from './learn/model';
import type { SummaryOptions } from './options';
import { RANKERS, rankBlend, type RankOptions } from './rank/index';
import type { AnalyzedDocument, RankerName, RankResult } from './types';

export function rankOptionsFrom(options: SummaryOptions): RankOptions {
  // A model that does not validate falls back to the shipped one; callers report the problem.
  const loaded = options.model === undefined ? null : loadModel(options.model);
  return { cueWords: options.cueWords, ...(loaded?.ok ? { model: loaded.model } : {}) };
}

export function rankWith(method: RankerName, analyzed: AnalyzedDocument, options: SummaryOptions): RankResult {
  const rankOptions = rankOptionsFrom(options);
  if (method === 'blend') return rankBlend(analyzed, rankOptions);
  if (method === 'bayes') return rankBayes(analyzed, rankOptions.model);
  return RANKERS[method](analyzed, rankOptions);
}
