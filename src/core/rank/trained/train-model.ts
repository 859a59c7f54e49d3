/**
 * Training the sentence model from documents that carry their own summaries. Pure: the command
 * line reads the files and hands over their text.
 */
import { analyze, resolveLanguage } from '../../analyze';
import { splitIntroduction, splitReference } from '../../evaluate/reference-split';
import { parseDocument } from '../../formats/registry';
import type { AnalyzedDocument, DocumentFormat } from '../../types';
import { FEATURES, sentenceFeatures } from './features';
import { labelSentences } from './labels';
import { MODEL_FORMAT, MODEL_VERSION, type BayesModel } from './model';
import { countFeatureValues, type LabelledDocument } from './naive-bayes';
import { labelMaxentDocument, maxentModelFromLabelled, type MaxentTrainOptions } from './train-maxent';
import type { MaxentModel } from './maxent-model';

/** The kinds `tersely train --kind` makes, the default first (naive Bayes, so earlier recorded commands still make what they made). */
export const MODEL_KINDS = ['naive-bayes', 'maximum-entropy'] as const;

export interface TrainingExample {
  /** The document without its reference section. */
  readonly analyzed: AnalyzedDocument;
  /** The reference summary's sentences. */
  readonly reference: readonly string[];
}

export interface TrainOptions {
  /** Add-α smoothing stored in the model (default 1, Laplace). */
  readonly smoothing?: number;
  /** Free-form provenance stored in the model (command, corpus, date...). */
  readonly trainedOn?: Readonly<Record<string, unknown>>;
}

const ARITIES: Readonly<Record<string, number>> = Object.fromEntries(FEATURES.map((f) => [f.name, f.arity]));

/** Labels the examples, counts feature values per class, and returns the model. */
export function trainModel(examples: readonly TrainingExample[], options: TrainOptions = {}): BayesModel {
  const documents: LabelledDocument[] = examples.map((example) => ({
    features: sentenceFeatures(example.analyzed),
    labels: labelSentences(example.analyzed, example.reference),
  }));
  return modelFromLabelled(documents, options);
}

/** Labels the examples and fits the maximum-entropy model (train-maxent.ts). */
export function trainMaxentModel(examples: readonly TrainingExample[], options: MaxentTrainOptions = {}): MaxentModel {
  return maxentModelFromLabelled(examples.map((example) => labelMaxentDocument(example.analyzed, example.reference, options.labels)), options);
}

/** The counting half of training, for callers that already have features and labels. */
export function modelFromLabelled(documents: readonly LabelledDocument[], options: TrainOptions = {}): BayesModel {
  const counts = countFeatureValues(documents, ARITIES);
  if (counts.positive === 0 || counts.negative === 0) {
    throw new RangeError(
      counts.positive === 0
        ? 'no sentence matched any reference sentence, so there is nothing to learn from'
        : 'every sentence matched a reference sentence, so there is nothing to contrast them with',
    );
  }
  return {
    format: MODEL_FORMAT,
    version: MODEL_VERSION,
    kind: 'naive-bayes',
    smoothing: options.smoothing ?? 1,
    classes: { positive: counts.positive, negative: counts.negative },
    features: counts.features,
    ...(options.trainedOn ? { trainedOn: { ...options.trainedOn, documents: documents.length } } : {}),
  };
}

export interface DocumentExampleOptions {
  /** The heading of the section that holds the document's own summary; null: always the introduction. */
  readonly referenceHeading: string | null;
  /** A document without that section gives its introduction (the prose before its first section) instead. */
  readonly introductionFallback?: boolean;
  readonly format?: DocumentFormat;
  /** 'auto' or an ISO 639-1 code. */
  readonly language?: string;
}

/** Turns one document into a training example, or says why it cannot be one. */
export function exampleFromDocument(text: string, options: DocumentExampleOptions): TrainingExample | { readonly skipped: string } {
  const format = options.format ?? 'markdown';
  const parsed = parseDocument(text, { format });
  const heading = options.referenceHeading;
  const split =
    (heading !== null ? splitReference(text, heading, format, parsed) : null) ??
    (heading === null || options.introductionFallback ? splitIntroduction(text, format, parsed) : null);
  if (!split) return { skipped: heading !== null && !options.introductionFallback ? `no "${heading}" section` : 'no summary section and no introduction before a section' };
  const reference = parseDocument(split.referenceText, { format }).sentences.map((s) => s.text);
  if (reference.length === 0) return { skipped: `the "${options.referenceHeading}" section has no prose sentences` };
  const body = parseDocument(split.bodyText, { format });
  if (body.sentences.length === 0) return { skipped: 'nothing but the reference section has prose sentences' };
  const language = resolveLanguage(body, options.language ?? 'auto');
  return { analyzed: analyze(body, language), reference };
}
