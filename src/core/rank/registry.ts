/**
 * Binds every method of methods.ts to its ranker: one table, read by the pipeline and the benchmark.
 */
import type { AnalyzedDocument, RankerName, RankResult } from '../types';
import { RANKERS, rankBlend, type RankOptions } from './blend';
import { METHOD_INFO, type MethodInfo } from './methods';
import { rankMaxent } from './trained/maxent-model';
import { rankBayes } from './trained/model';
import { modelOfKind } from './trained/sentence-model';

export type Ranker = (a: AnalyzedDocument, options: RankOptions) => RankResult;

const RANKER_OF: Readonly<Record<RankerName, Ranker>> = {
  blend: rankBlend,
  position: RANKERS.position,
  luhn: RANKERS.luhn,
  edmundson: RANKERS.edmundson,
  lexrank: RANKERS.lexrank,
  textrank: RANKERS.textrank,
  centroid: RANKERS.centroid,
  bayes: (a, options) => rankBayes(a, modelOfKind(options.model, 'naive-bayes')),
  maxent: (a, options) => rankMaxent(a, modelOfKind(options.model, 'maximum-entropy')),
};

export interface MethodEntry extends MethodInfo {
  readonly rank: Ranker;
}

export const METHODS: readonly MethodEntry[] = METHOD_INFO.map((info) => ({ ...info, rank: RANKER_OF[info.name] }));

export function rankWith(method: RankerName, analyzed: AnalyzedDocument, options: RankOptions): RankResult {
  return RANKER_OF[method](analyzed, options);
}
