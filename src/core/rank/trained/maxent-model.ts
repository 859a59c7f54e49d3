/**
 * The maximum-entropy sentence model (Osborne 2002): its JSON file format, validation on load,
 * the shipped default, and the 'maxent' ranker that uses it.
 *
 * File format (JSON, ours; same "format" and "version" as the naive Bayes file, another "kind"):
 *   {
 *     "format": "tersely-sentence-model", "version": 1, "kind": "maximum-entropy",
 *     "regularization": 1,                          // λ of the L2 penalty it was trained with
 *     "bias": -4.1,                                 // b
 *     "weights": { "length": [..one per value..], ... },
 *     "trainedOn": { ... }                          // provenance: command, data, counts
 *   }
 * A sentence's score is its log-odds b + Σ_f weights[f][value of f] (for a continuous feature,
 * weights[f][0] × its scaled value); features the model leaves out add nothing.
 */
import { relativeToAverage } from './explain';
import defaultMaxentJson from '../../../../media/models/maxent-model.json';
import type { AnalyzedDocument, RankResult } from '../../types';
import { CONTINUOUS_NAMES, MAXENT_FEATURES, maxentFeatures, type MaxentFeatureMatrix } from './maxent-features';
import { checkModelHeader, describeValue, isRecord, ModelError, onlyKeys, own } from './model-checks';
import { MODEL_FORMAT, MODEL_LIMITS, MODEL_VERSION, templateTextOf } from './model';

export const MAXENT_KIND = 'maximum-entropy';

export interface MaxentModel {
  readonly format: typeof MODEL_FORMAT;
  readonly version: typeof MODEL_VERSION;
  readonly kind: typeof MAXENT_KIND;
  readonly regularization: number;
  readonly bias: number;
  readonly weights: Readonly<Record<string, readonly number[]>>;
  readonly trainedOn?: Readonly<Record<string, unknown>>;
  /** Sentences `tersely train` found recurring across the training documents (select/template-text.ts); never picked. */
  readonly templateText?: readonly string[];
}

const ARITY: ReadonlyMap<string, number> = new Map(MAXENT_FEATURES.map((f) => [f.name, f.arity]));
const TOP_LEVEL_KEYS = new Set(['format', 'version', 'kind', 'regularization', 'bias', 'weights', 'trainedOn', 'templateText']);

function weight(value: unknown, where: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || Math.abs(value) > MODEL_LIMITS.maxWeight) {
    throw new ModelError(`${where} must be a number from −${MODEL_LIMITS.maxWeight} to ${MODEL_LIMITS.maxWeight}, got ${describeValue(value)}`);
  }
  return value;
}

/** Checks a parsed maximum-entropy model file; throws ModelError saying what is wrong. */
export function validateMaxentModel(json: unknown): MaxentModel {
  checkModelHeader(json, MODEL_FORMAT, MODEL_VERSION);
  if (own(json, 'kind') !== MAXENT_KIND) throw new ModelError(`model kind ${describeValue(own(json, 'kind'))} is not "${MAXENT_KIND}"`);
  onlyKeys(json, TOP_LEVEL_KEYS, 'the model');
  const regularization = own(json, 'regularization');
  if (typeof regularization !== 'number' || !Number.isFinite(regularization) || regularization < 0 || regularization > MODEL_LIMITS.maxSmoothing) {
    throw new ModelError(`"regularization" must be a number from 0 to ${MODEL_LIMITS.maxSmoothing.toLocaleString('en-US')}, got ${describeValue(regularization)}`);
  }
  const bias = weight(own(json, 'bias'), '"bias"');
  const weightJson = own(json, 'weights');
  if (!isRecord(weightJson)) throw new ModelError('"weights" must be an object of per-feature weight lists');
  const weights: Record<string, number[]> = {};
  for (const name of Object.keys(weightJson)) {
    const arity = ARITY.get(name);
    if (arity === undefined) throw new ModelError(`unknown feature ${JSON.stringify(name)}; known features: ${[...ARITY.keys()].join(', ')}`);
    const list = own(weightJson, name);
    if (!Array.isArray(list)) throw new ModelError(`weights.${name} must be a list of ${arity} numbers`);
    if (list.length !== arity) throw new ModelError(`weights.${name} has ${list.length} weights; this version of the feature has ${arity}`);
    weights[name] = list.map((value: unknown, v) => weight(value, `weights.${name}[${v}]`));
  }
  if (Object.keys(weights).length === 0) throw new ModelError('the model has no features');
  const trainedOn = own(json, 'trainedOn');
  if (trainedOn !== undefined && !isRecord(trainedOn)) throw new ModelError('"trainedOn" must be an object (free-form provenance)');
  const templateText = templateTextOf(own(json, 'templateText'));
  return {
    format: MODEL_FORMAT,
    version: MODEL_VERSION,
    kind: MAXENT_KIND,
    regularization,
    bias,
    weights,
    ...(trainedOn !== undefined ? { trainedOn } : {}),
    ...(templateText !== undefined ? { templateText } : {}),
  };
}

let cachedDefault: MaxentModel | undefined;

/** The maximum-entropy model shipped with Tersely (its `trainedOn` holds the command that made it). */
export function defaultMaxentModel(): MaxentModel {
  cachedDefault ??= validateMaxentModel(defaultMaxentJson);
  return cachedDefault;
}

const MAXENT_VALUE_LABELS: Readonly<Record<string, readonly string[]>> = Object.fromEntries(MAXENT_FEATURES.map((f) => [f.name, f.values]));

/**
 * Ranks by the model's log-odds; `features` holds each feature's contribution (its weight for the
 * sentence's value), relative to the document's average sentence (explain.ts).
 */
export function rankMaxent(a: AnalyzedDocument, model: MaxentModel = defaultMaxentModel(), matrix?: MaxentFeatureMatrix): RankResult {
  const n = a.doc.sentences.length;
  const values = matrix ?? maxentFeatures(a);
  const scores = new Float64Array(n).fill(model.bias);
  const features: Record<string, Float64Array> = {};
  const bins: Record<string, ArrayLike<number>> = {};
  for (const [name, table] of Object.entries(model.weights)) {
    const column = values[name];
    if (!column) continue;
    const contribution = new Float64Array(n);
    const continuous = CONTINUOUS_NAMES.has(name);
    for (let i = 0; i < n; i++) {
      contribution[i] = continuous ? table[0]! * column[i]! : (table[column[i]!] ?? 0);
      scores[i]! += contribution[i]!;
    }
    features[name] = contribution;
    if (!continuous) bins[name] = column;
  }
  return { scores, features: relativeToAverage(features), featureValues: { bins, labels: MAXENT_VALUE_LABELS } };
}

/** Every feature value of a model with its weight, for people reading what was learned. */
export function maxentFeatureReport(model: MaxentModel): { readonly label: string; readonly odds: number }[] {
  const rows: { label: string; odds: number }[] = [];
  for (const feature of MAXENT_FEATURES) {
    model.weights[feature.name]?.forEach((w, v) => rows.push({ label: `${feature.name} = ${feature.values[v]}`, odds: w }));
  }
  return rows;
}
