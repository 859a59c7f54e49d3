/**
 * A trained sentence model of either kind, read from its file: the "kind" field says which
 * validator applies. Which methods need which kind lives here too, so a mismatch is refused with a
 * message instead of falling back to a built-in model.
 */
import type { RankerName } from '../../types';
import { MAXENT_KIND, validateMaxentModel, type MaxentModel } from './maxent-model';
import { isRecord, ModelError, own } from './model-checks';
import { validateModel, type BayesModel } from './model';

export type SentenceModel = BayesModel | MaxentModel;
export type ModelKind = SentenceModel['kind'];

/** Checks a parsed model file of either kind; throws ModelError saying what is wrong. */
export function validateSentenceModel(json: unknown): SentenceModel {
  if (!isRecord(json)) throw new ModelError('a model file must hold a JSON object');
  // The naive Bayes validator checks format and version first, then says which kinds exist.
  return own(json, 'kind') === MAXENT_KIND ? validateMaxentModel(json) : validateModel(json);
}

export type ModelLoad = { readonly ok: true; readonly model: SentenceModel } | { readonly ok: false; readonly error: string };

/** Validation without throwing. */
export function loadModel(json: unknown): ModelLoad {
  try {
    return { ok: true, model: validateSentenceModel(json) };
  } catch (error) {
    if (error instanceof ModelError) return { ok: false, error: `invalid sentence model: ${error.message}` };
    throw error;
  }
}

/** The kind of model each trained method reads (the balanced blend holds the naive Bayes model). */
export const MODEL_KIND_OF: Readonly<Partial<Record<RankerName, ModelKind>>> = { bayes: 'naive-bayes', blend: 'naive-bayes', maxent: MAXENT_KIND };

const KIND_WORDS: Readonly<Record<ModelKind, string>> = { 'naive-bayes': 'a naive Bayes model', [MAXENT_KIND]: 'a maximum-entropy model' };

/** Why a model cannot serve a method, or null when it can (methods that use no model ignore it). */
export function modelMismatch(method: RankerName, model: SentenceModel): string | null {
  const needed = MODEL_KIND_OF[method];
  if (needed === undefined || needed === model.kind) return null;
  return `the "${method}" method needs ${KIND_WORDS[needed]} (\`tersely train --kind ${needed}\`); this file holds ${KIND_WORDS[model.kind]}`;
}

/** The user's model when it is of the kind wanted, else undefined; a model of another kind is an error here. */
export function modelOfKind<K extends ModelKind>(model: SentenceModel | undefined, kind: K): Extract<SentenceModel, { kind: K }> | undefined {
  if (model === undefined) return undefined;
  if (model.kind !== kind) throw new ModelError(`a ${kind} model is needed here, not a ${model.kind} model`);
  return model as Extract<SentenceModel, { kind: K }>;
}
