/**
 * The trained sentence model: its JSON file format, validation on load, the shipped default, and
 * the 'bayes' ranker that uses it.
 *
 * File format (JSON, ours):
 *   {
 *     "format": "tersely-sentence-model", "version": 1, "kind": "naive-bayes",
 *     "smoothing": 1,                                  // α of the smoothing (naive-bayes.ts)
 *     "classes": { "positive": 812, "negative": 40210 }, // training sentences per class
 *     "features": { "length": { "positive": [..arity..], "negative": [..arity..] }, ... },
 *     "trainedOn": { ... }                              // optional provenance, free-form
 *   }
 * Counts rather than probabilities are stored, so a file can be checked by hand and smoothing
 * changed without retraining.
 */
import defaultModelJson from '../../../../media/models/default-model.json';
import type { AnalyzedDocument, RankResult } from '../../types';
import { FEATURES, sentenceFeatures, type FeatureMatrix } from './features';
import { scoreNaiveBayes, valueLogOdds, type ClassCounts, type NaiveBayesCounts } from './naive-bayes';

export const MODEL_FORMAT = 'tersely-sentence-model';
export const MODEL_VERSION = 1;

export interface BayesModel {
  readonly format: typeof MODEL_FORMAT;
  readonly version: typeof MODEL_VERSION;
  readonly kind: 'naive-bayes';
  readonly smoothing: number;
  readonly classes: { readonly positive: number; readonly negative: number };
  readonly features: Readonly<Record<string, ClassCounts>>;
  readonly trainedOn?: Readonly<Record<string, unknown>>;
}

export class ModelError extends Error {
  override readonly name = 'ModelError';
}

const ARITY: Readonly<Record<string, number>> = Object.fromEntries(FEATURES.map((f) => [f.name, f.arity]));

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function countList(value: unknown, where: string, arity: number): number[] {
  if (!Array.isArray(value)) throw new ModelError(`${where} must be a list of ${arity} counts`);
  if (value.length !== arity) throw new ModelError(`${where} has ${value.length} counts; this version of the feature has ${arity}`);
  return value.map((count, v) => {
    if (typeof count !== 'number' || !Number.isFinite(count) || count < 0) throw new ModelError(`${where}[${v}] must be a count of at least 0`);
    return count;
  });
}

/**
 * Checks a parsed model file and returns it typed; throws ModelError saying what is wrong.
 * Features the model leaves out are simply not used; features this version does not know are refused.
 */
export function validateModel(json: unknown): BayesModel {
  if (!isRecord(json)) throw new ModelError('a model file must hold a JSON object');
  if (json.format !== MODEL_FORMAT) throw new ModelError(`not a sentence model: "format" must be "${MODEL_FORMAT}"`);
  if (json.version !== MODEL_VERSION) throw new ModelError(`model version ${String(json.version)} is not supported (expected ${MODEL_VERSION})`);
  if (json.kind !== 'naive-bayes') throw new ModelError(`model kind ${String(json.kind)} is not supported (expected "naive-bayes")`);
  const smoothing = json.smoothing;
  if (typeof smoothing !== 'number' || !Number.isFinite(smoothing) || smoothing <= 0) throw new ModelError('"smoothing" must be a number above 0');
  const classes = json.classes;
  if (!isRecord(classes)) throw new ModelError('"classes" must give the positive and negative sentence counts');
  const positive = classes.positive;
  const negative = classes.negative;
  for (const [label, count] of [['positive', positive], ['negative', negative]] as const) {
    if (typeof count !== 'number' || !Number.isFinite(count) || count <= 0) throw new ModelError(`"classes.${label}" must be a count above 0 (the model needs examples of both classes)`);
  }
  if (!isRecord(json.features)) throw new ModelError('"features" must be an object of per-feature counts');
  const features: Record<string, ClassCounts> = {};
  for (const [name, entry] of Object.entries(json.features)) {
    const arity = ARITY[name];
    if (arity === undefined) throw new ModelError(`unknown feature "${name}"; known features: ${Object.keys(ARITY).join(', ')}`);
    if (!isRecord(entry)) throw new ModelError(`features.${name} must hold "positive" and "negative" counts`);
    const counts = {
      positive: countList(entry.positive, `features.${name}.positive`, arity),
      negative: countList(entry.negative, `features.${name}.negative`, arity),
    };
    // Every training sentence has exactly one value per feature, so each list sums to its class size.
    for (const label of ['positive', 'negative'] as const) {
      const sum = counts[label].reduce((a, b) => a + b, 0);
      const expected = label === 'positive' ? (positive as number) : (negative as number);
      if (Math.abs(sum - expected) > 1e-6 * Math.max(1, expected)) {
        throw new ModelError(`features.${name}.${label} sums to ${sum}, but classes.${label} is ${expected}`);
      }
    }
    features[name] = counts;
  }
  if (Object.keys(features).length === 0) throw new ModelError('the model has no features');
  return {
    format: MODEL_FORMAT,
    version: MODEL_VERSION,
    kind: 'naive-bayes',
    smoothing,
    classes: { positive: positive as number, negative: negative as number },
    features,
    ...(isRecord(json.trainedOn) ? { trainedOn: json.trainedOn } : {}),
  };
}

export type ModelLoad = { readonly ok: true; readonly model: BayesModel } | { readonly ok: false; readonly error: string };

/** Validation without throwing, for callers that fall back to the default model. */
export function loadModel(json: unknown): ModelLoad {
  try {
    return { ok: true, model: validateModel(json) };
  } catch (error) {
    if (error instanceof ModelError) return { ok: false, error: `invalid sentence model: ${error.message}` };
    throw error;
  }
}

let cachedDefault: BayesModel | undefined;

/** The model shipped with Tersely (trained by `tersely train`; the command is in its `trainedOn`). */
export function defaultModel(): BayesModel {
  cachedDefault ??= validateModel(defaultModelJson);
  return cachedDefault;
}

function modelCounts(model: BayesModel): NaiveBayesCounts {
  return { positive: model.classes.positive, negative: model.classes.negative, features: model.features };
}

/** Ranks by the model's log-odds; `features` holds each feature's contribution. */
export function rankBayes(a: AnalyzedDocument, model: BayesModel = defaultModel(), matrix?: FeatureMatrix): RankResult {
  const n = a.doc.sentences.length;
  const { scores, contributions } = scoreNaiveBayes(modelCounts(model), model.smoothing, matrix ?? sentenceFeatures(a), n);
  return { scores, features: contributions };
}

/** Every feature value of a model with its log-odds contribution, for people reading what was learned. */
export function modelFeatureReport(model: BayesModel): { readonly label: string; readonly odds: number }[] {
  const rows: { label: string; odds: number }[] = [];
  for (const feature of FEATURES) {
    const counts = model.features[feature.name];
    if (!counts) continue;
    valueLogOdds(counts, model.classes.positive, model.classes.negative, model.smoothing).forEach((odds, v) => {
      rows.push({ label: `${feature.name} = ${feature.values[v]}`, odds });
    });
  }
  return rows;
}
