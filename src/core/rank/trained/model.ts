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
import { relativeToAverage } from './explain';
import defaultModelJson from '../../../../media/models/default-model.json';
import { checkLearnedTemplateText } from '../../select/template-text';
import type { AnalyzedDocument, RankResult } from '../../types';
import { FEATURES, sentenceFeatures, type FeatureMatrix } from './features';
import { checkModelHeader, describeValue, isRecord, ModelError, onlyKeys, own } from './model-checks';
import { scoreNaiveBayes, valueLogOdds, type ClassCounts, type NaiveBayesCounts } from './naive-bayes';

export const MODEL_FORMAT = 'tersely-sentence-model';
export const MODEL_VERSION = 1;

export { ModelError } from './model-checks';

export interface BayesModel {
  readonly format: typeof MODEL_FORMAT;
  readonly version: typeof MODEL_VERSION;
  readonly kind: 'naive-bayes';
  readonly smoothing: number;
  readonly classes: { readonly positive: number; readonly negative: number };
  readonly features: Readonly<Record<string, ClassCounts>>;
  readonly trainedOn?: Readonly<Record<string, unknown>>;
  /** Sentences `tersely train` found recurring across the training documents (select/template-text.ts); never picked. */
  readonly templateText?: readonly string[];
}

/**
 * Bounds a model must keep, in one place. A model file is about 2 KB (media/models/default-model.json
 * is 1,979 bytes); 256 KiB leaves room for any provenance while keeping a file that is read, parsed
 * and sent with requests cheap. Counts are whole numbers of training sentences; up to
 * Number.MAX_SAFE_INTEGER they add up exactly and their logarithms stay finite (1e308 would not:
 * the two class counts together overflow to Infinity). Smoothing above a million would drown any
 * count a real corpus gives (Laplace smoothing is 1).
 */
export const MODEL_LIMITS = {
  maxFileBytes: 256 * 1024,
  maxCount: Number.MAX_SAFE_INTEGER,
  maxSmoothing: 1_000_000,
  /**
   * Largest weight (or bias) of a maximum-entropy model. A fitted L2-regularised weight is a log
   * odds ratio of a few units; one of a thousand would put σ at 0 or 1 in double precision (e^−745
   * underflows), so it cannot come from a real fit and would make scores tie.
   */
  maxWeight: 1_000,
} as const;

/** Arity of each feature this version knows; a Map, so "__proto__" or "constructor" is just an unknown name. */
const ARITY: ReadonlyMap<string, number> = new Map(FEATURES.map((f) => [f.name, f.arity]));
const TOP_LEVEL_KEYS = new Set(['format', 'version', 'kind', 'smoothing', 'classes', 'features', 'trainedOn', 'templateText']);
const CLASS_KEYS = new Set(['positive', 'negative']);

function isCount(value: unknown, min: number): value is number {
  return typeof value === 'number' && Number.isSafeInteger(value) && value >= min && value <= MODEL_LIMITS.maxCount;
}

function countList(value: unknown, where: string, arity: number): number[] {
  if (!Array.isArray(value)) throw new ModelError(`${where} must be a list of ${arity} counts`);
  if (value.length !== arity) throw new ModelError(`${where} has ${value.length} counts; this version of the feature has ${arity}`);
  return value.map((count: unknown, v) => {
    if (!isCount(count, 0)) throw new ModelError(`${where}[${v}] must be a whole number from 0 to ${MODEL_LIMITS.maxCount}, got ${describeValue(count)}`);
    return count;
  });
}

/**
 * Checks a parsed model file and returns it typed; throws ModelError saying what is wrong. Only
 * own properties are read; unknown fields and features this version does not know are refused;
 * every number is a finite count within MODEL_LIMITS. Features the model leaves out are not used.
 */
export function validateModel(json: unknown): BayesModel {
  checkModelHeader(json, MODEL_FORMAT, MODEL_VERSION);
  const kind = own(json, 'kind');
  if (kind !== 'naive-bayes') throw new ModelError(`model kind ${describeValue(kind)} is not supported (expected "naive-bayes", or "maximum-entropy" where either kind is read)`);
  onlyKeys(json, TOP_LEVEL_KEYS, 'the model');
  const smoothing = own(json, 'smoothing');
  if (typeof smoothing !== 'number' || !Number.isFinite(smoothing) || smoothing <= 0 || smoothing > MODEL_LIMITS.maxSmoothing) {
    throw new ModelError(`"smoothing" must be a number above 0 and at most ${MODEL_LIMITS.maxSmoothing.toLocaleString('en-US')}, got ${describeValue(smoothing)}`);
  }
  const classes = own(json, 'classes');
  if (!isRecord(classes)) throw new ModelError('"classes" must give the positive and negative sentence counts');
  onlyKeys(classes, CLASS_KEYS, '"classes"');
  const positive = own(classes, 'positive');
  const negative = own(classes, 'negative');
  for (const [label, count] of [['positive', positive], ['negative', negative]] as const) {
    if (!isCount(count, 1)) throw new ModelError(`"classes.${label}" must be a whole number from 1 to ${MODEL_LIMITS.maxCount} (the model needs examples of both classes), got ${describeValue(count)}`);
  }
  const totals = { positive: positive as number, negative: negative as number };
  if (totals.positive + totals.negative > MODEL_LIMITS.maxCount) throw new ModelError(`the class counts add up to more than ${MODEL_LIMITS.maxCount}`);
  const featureJson = own(json, 'features');
  if (!isRecord(featureJson)) throw new ModelError('"features" must be an object of per-feature counts');
  const features: Record<string, ClassCounts> = {};
  for (const name of Object.keys(featureJson)) {
    const arity = ARITY.get(name);
    if (arity === undefined) throw new ModelError(`unknown feature ${JSON.stringify(name)}; known features: ${[...ARITY.keys()].join(', ')}`);
    const entry = own(featureJson, name);
    if (!isRecord(entry)) throw new ModelError(`features.${name} must hold "positive" and "negative" counts`);
    onlyKeys(entry, CLASS_KEYS, `features.${name}`);
    const counts = {
      positive: countList(own(entry, 'positive'), `features.${name}.positive`, arity),
      negative: countList(own(entry, 'negative'), `features.${name}.negative`, arity),
    };
    // Every training sentence has exactly one value per feature, so each list sums to its class size.
    for (const label of ['positive', 'negative'] as const) {
      const sum = counts[label].reduce((a, b) => a + b, 0);
      if (sum !== totals[label]) throw new ModelError(`features.${name}.${label} sums to ${sum}, but classes.${label} is ${totals[label]}`);
    }
    features[name] = counts;
  }
  if (Object.keys(features).length === 0) throw new ModelError('the model has no features');
  const trainedOn = own(json, 'trainedOn');
  if (trainedOn !== undefined && !isRecord(trainedOn)) throw new ModelError('"trainedOn" must be an object (free-form provenance)');
  const templateText = templateTextOf(own(json, 'templateText'));
  return {
    format: MODEL_FORMAT,
    version: MODEL_VERSION,
    kind: 'naive-bayes',
    smoothing,
    classes: totals,
    features,
    ...(trainedOn !== undefined ? { trainedOn } : {}),
    ...(templateText !== undefined ? { templateText } : {}),
  };
}

/** The optional learned template text, checked (an optional field any model kind may carry). */
export function templateTextOf(value: unknown): readonly string[] | undefined {
  if (value === undefined) return undefined;
  try {
    return checkLearnedTemplateText(value);
  } catch (error) {
    throw new ModelError((error as Error).message);
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

const VALUE_LABELS: Readonly<Record<string, readonly string[]>> = Object.fromEntries(FEATURES.map((f) => [f.name, f.values]));

/** Ranks by the model's log-odds; `features` holds each feature's contribution relative to the document's average sentence (explain.ts). */
export function rankBayes(a: AnalyzedDocument, model: BayesModel = defaultModel(), matrix?: FeatureMatrix): RankResult {
  const n = a.doc.sentences.length;
  const values = matrix ?? sentenceFeatures(a);
  const { scores, contributions } = scoreNaiveBayes(modelCounts(model), model.smoothing, values, n);
  return { scores, features: relativeToAverage(contributions), featureValues: { bins: values, labels: VALUE_LABELS } };
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
