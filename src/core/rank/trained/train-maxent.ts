/**
 * Training the maximum-entropy model: every sentence of every training document becomes one
 * sparse row of one-hot feature indicators (maxent-features.ts), labelled as for naive Bayes
 * (labels.ts), and an L2-regularised logistic regression is fitted (logistic-regression.ts).
 */
import type { AnalyzedDocument } from '../../types';
import { fitLogistic, type SparseRow } from './logistic-regression';
import { labelsBy, type LabelRule } from './labels';
import { CONTINUOUS_NAMES, MAXENT_FEATURES, maxentFeatures, type MaxentFeatureMatrix } from './maxent-features';
import { MAXENT_KIND, type MaxentModel } from './maxent-model';
import { MODEL_FORMAT, MODEL_VERSION } from './model';

/**
 * λ of the L2 penalty, in units of one training sentence's log-likelihood. Chosen on the train
 * halves only (bench/RESULTS.md notes); a Gaussian prior of variance 1/λ on each weight.
 */
export const DEFAULT_REGULARIZATION = 1;

export interface MaxentTrainOptions {
  readonly regularization?: number;
  /** Which sentences count as summary sentences (labels.ts); default DEFAULT_LABELS. */
  readonly labels?: LabelRule;
  readonly trainedOn?: Readonly<Record<string, unknown>>;
}

export interface MaxentLabelledDocument {
  readonly features: MaxentFeatureMatrix;
  readonly labels: Uint8Array;
}

/** Column of each feature's first value; the last entry is the number of columns. */
const OFFSETS: readonly number[] = MAXENT_FEATURES.reduce<number[]>((list, f) => [...list, list[list.length - 1]! + f.arity], [0]);

/** Chosen on the train halves (bench/RESULTS.md notes). */
export const DEFAULT_LABELS: LabelRule = 'best-match';

export function labelMaxentDocument(analyzed: AnalyzedDocument, reference: readonly string[], rule: LabelRule = DEFAULT_LABELS): MaxentLabelledDocument {
  return { features: maxentFeatures(analyzed), labels: labelsBy(rule, analyzed, reference) };
}

export function maxentModelFromLabelled(documents: readonly MaxentLabelledDocument[], options: MaxentTrainOptions = {}): MaxentModel {
  const rows: SparseRow[] = [];
  const labels: number[] = [];
  let positive = 0;
  for (const { features, labels: docLabels } of documents) {
    docLabels.forEach((label, i) => {
      const indices = new Int32Array(MAXENT_FEATURES.length);
      const values = new Float64Array(MAXENT_FEATURES.length).fill(1);
      MAXENT_FEATURES.forEach((feature, f) => {
        const value = features[feature.name]![i]!;
        if (CONTINUOUS_NAMES.has(feature.name)) {
          indices[f] = OFFSETS[f]!;
          values[f] = value;
          return;
        }
        if (value >= feature.arity) throw new RangeError(`feature ${feature.name} has value ${value}, beyond its ${feature.arity} values`);
        indices[f] = OFFSETS[f]! + value;
      });
      rows.push({ indices, values });
      labels.push(label);
      positive += label;
    });
  }
  if (positive === 0) throw new RangeError('no sentence matched any reference sentence, so there is nothing to learn from');
  if (positive === rows.length) throw new RangeError('every sentence matched a reference sentence, so there is nothing to contrast them with');
  const regularization = options.regularization ?? DEFAULT_REGULARIZATION;
  const fit = fitLogistic({ rows, labels, dimension: OFFSETS[OFFSETS.length - 1]!, lambda: regularization });
  const weights: Record<string, number[]> = {};
  // Six significant digits: a model file stays readable, and the scores move by far less than any tie-break.
  const round = (value: number) => Number(value.toPrecision(6));
  MAXENT_FEATURES.forEach((feature, f) => {
    weights[feature.name] = Array.from(fit.weights.subarray(OFFSETS[f]!, OFFSETS[f + 1]!), round);
  });
  return {
    format: MODEL_FORMAT,
    version: MODEL_VERSION,
    kind: MAXENT_KIND,
    regularization,
    bias: round(fit.bias),
    weights,
    ...(options.trainedOn
      ? { trainedOn: { ...options.trainedOn, labels: options.labels ?? DEFAULT_LABELS, documents: documents.length, sentences: { positive, negative: rows.length - positive }, newtonSteps: fit.iterations, converged: fit.converged } }
      : {}),
  };
}
