/**
 * The default blend of several rankers. Scores are only compared within one document, so each
 * ranker keeps its natural scale and the blend rescales them (scale.ts) before adding them up.
 */
import type { AnalyzedDocument, RankerName, RankResult } from '../types';
import { centroidRank, type CentroidOptions } from './centroid';
import { edmundsonRank, titleComponent, type EdmundsonOptions } from './edmundson';
import { lexRank, type LexRankOptions } from './lexrank';
import { luhnRank, type LuhnOptions } from './luhn';
import { normalize, type Normalization } from '../scale';
import { positionRank, type PositionOptions } from './position';
import { textRank, type TextRankOptions } from './textrank';
import { withDefaultsOnce } from './memo';
import { rankBayes } from './trained/model';
import { modelOfKind, type SentenceModel } from './trained/sentence-model';

export type SingleRankerName = Exclude<RankerName, 'blend' | 'bayes' | 'maxent'>;

/** What the blend can mix: every single ranker plus the title-word overlap on its own. */
export type BlendComponent = SingleRankerName | 'title' | 'bayes';

export type BlendWeights = Readonly<Record<BlendComponent, number>>;

export interface RankOptions extends PositionOptions, LuhnOptions, EdmundsonOptions, LexRankOptions, TextRankOptions, CentroidOptions {
  /** Blend weights; missing components keep their default weight. */
  readonly blend?: Partial<BlendWeights>;
  /** How the blend puts component scores on one scale. */
  readonly normalization?: Normalization;
  /** The user's trained sentence model for the trained methods (the shipped model of each kind when absent). */
  readonly model?: SentenceModel;
}

export type RankerFn = (a: AnalyzedDocument, options?: RankOptions) => RankResult;

export const RANKERS: Record<SingleRankerName, RankerFn> = {
  position: positionRank,
  luhn: luhnRank,
  edmundson: edmundsonRank,
  lexrank: lexRank,
  textrank: textRank,
  centroid: centroidRank,
};

/**
 * Default blend (ours, untuned; meant to be re-fitted on a training corpus): content centrality
 * from two angles — closeness to the document's centroid and LexRank's graph centrality — carries
 * most weight, position breaks ties the way Baxendale's lead bias suggests, and title overlap
 * rewards sentences that speak to what the document says it is about. Each component is scaled
 * to [0, 1] first (min-max by default).
 */
export const BLEND_WEIGHTS: BlendWeights = {
  // Chosen on the benchmark's TRAIN half only (RFC numbers even; objective ROUGE-1 + ROUGE-2 F1 at
  // the reference's length): the trained naive Bayes model carries the decision, LexRank and the
  // centroid add document-specific centrality the model only sees in coarse bins. The test half
  // was not looked at while choosing; bench/RESULTS.md reports it.
  bayes: 1,
  lexrank: 0.3,
  centroid: 0.1,
  textrank: 0,
  position: 0,
  title: 0,
  luhn: 0,
  edmundson: 0,
};

export const BLEND_NORMALIZATION: Normalization = 'minmax';

function componentScores(component: BlendComponent, a: AnalyzedDocument, options: RankOptions): RankResult {
  if (component === 'title') {
    const settings = options.edmundson;
    return { scores: titleComponent(a, settings?.titleWordWeight, settings?.headingWordWeight) };
  }
  if (component === 'bayes') return rankBayes(a, modelOfKind(options.model, 'naive-bayes'));
  if (component === 'lexrank' && !options.lexrank) return withDefaultsOnce(a, 'lexrank', () => lexRank(a));
  if (component === 'centroid' && !options.centroid) return withDefaultsOnce(a, 'centroid', () => centroidRank(a));
  return RANKERS[component](a, options);
}

/** Weighted sum of normalised component scores; `features` holds each used component's normalised values. */
export function rankBlend(a: AnalyzedDocument, options: RankOptions = {}): RankResult {
  const weights: BlendWeights = { ...BLEND_WEIGHTS, ...options.blend };
  const method = options.normalization ?? BLEND_NORMALIZATION;
  const n = a.doc.sentences.length;
  const scores = new Float64Array(n);
  const features: Record<string, Float64Array> = {};
  let converged: boolean | undefined;
  let iterations: number | undefined;
  for (const component of Object.keys(weights) as BlendComponent[]) {
    const weight = weights[component];
    if (!(weight !== 0 && Number.isFinite(weight))) continue;
    const result = componentScores(component, a, options);
    const scaled = normalize(result.scores, method);
    features[component] = scaled;
    scaled.forEach((value, i) => {
      scores[i]! += weight * value;
    });
    if (result.converged !== undefined) converged = (converged ?? true) && result.converged;
    if (result.iterations !== undefined) iterations = Math.max(iterations ?? 0, result.iterations);
  }
  return {
    scores,
    features,
    ...(converged !== undefined ? { converged } : {}),
    ...(iterations !== undefined ? { iterations } : {}),
  };
}
