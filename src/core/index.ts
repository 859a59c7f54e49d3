/**
 * The engine's public face. The command line, the extension, its engine hosts, the benchmarks and
 * a web build import from here and nowhere deeper; `test/unit/core-api.test.ts` pins the names.
 */

// The pipeline and its stages.
export { summarize, prepareDocument, rankPrepared, finishSummary, rankOptionsOf, candidateSentences } from './summarize';
export type { SummarizeRequest, SummaryStage, PreparedDocument, Preparation } from './summarize';
// Sessions: repeated summaries of one document, reading again only what an edit changed.
export { createSummarySession } from './session';
export type { SummarySession, SessionUpdate } from './session';

// Options: the schema every surface reads, and their resolution.
export {
  SUMMARY_OPTIONS,
  HOST_OPTIONS,
  ALL_OPTIONS,
  DEFAULT_OPTIONS,
  OptionsError,
  checkOptions,
  resolveOptions,
  LENGTH_BOUNDS,
  LENGTH_EXPECTS,
  parseLength,
  formatLength,
} from './options/index';
export type {
  OptionDefinition,
  SettingSurface,
  CliSurface,
  CliCommand,
  SummaryOptionKey,
  HostOptionKey,
  HostOptionValues,
  SummaryOptions,
  SummaryRequestOptions,
  OptionProblem,
  CheckedOptions,
  ValueKind,
  JsonShape,
  Checked,
  Choice,
} from './options/index';

// Input formats.
export { FORMATS, FORMAT_IDS, GENERIC_FORMAT, formatInfo, formatForFileName, formatForLanguageId, formatForEditorDocument } from './formats/catalog';
export type { FormatInfo } from './formats/catalog';
export { parseDocument } from './formats/registry';
export type { ParseOptions, ReadOptions, Reader } from './formats/registry';

// Ranking methods and the trained model.
export { METHOD_INFO, METHOD_NAMES } from './rank/methods';
export type { MethodInfo } from './rank/methods';
export { METHODS } from './rank/registry';
export type { MethodEntry, Ranker } from './rank/registry';
export { BLEND_WEIGHTS } from './rank/blend';
export type { RankOptions, BlendComponent, BlendWeights } from './rank/blend';
export { validateModel, defaultModel, modelFeatureReport, ModelError, MODEL_FORMAT, MODEL_VERSION, MODEL_LIMITS } from './rank/trained/model';
export type { BayesModel } from './rank/trained/model';
export { validateMaxentModel, defaultMaxentModel, maxentFeatureReport, MAXENT_KIND } from './rank/trained/maxent-model';
export type { MaxentModel } from './rank/trained/maxent-model';
export { loadModel, validateSentenceModel, modelMismatch } from './rank/trained/sentence-model';
export type { SentenceModel, ModelKind, ModelLoad } from './rank/trained/sentence-model';
export { trainModel, trainMaxentModel, exampleFromDocument, MODEL_KINDS } from './rank/trained/train-model';
export { LABEL_RULES } from './rank/trained/labels';
export type { LabelRule } from './rank/trained/labels';
export type { TrainingExample, TrainOptions, DocumentExampleOptions } from './rank/trained/train-model';

// Sentence kinds, template text and hysteresis (what is never picked, and what is kept).
export { barredKind, fragmentKind, normalizeSentence, SENTENCE_KIND_DEFAULTS } from './select/sentence-kinds';
export type { FragmentKind } from './select/sentence-kinds';
export { learnTemplateText, TEMPLATE_LEARNING_DEFAULTS, TEMPLATE_LIMITS } from './select/template-text';
export type { TemplateInput } from './select/template-text';
export { HYSTERESIS_DEFAULTS } from './select/hysteresis';
export { SELECTION_DEFAULTS } from './select/selection-input';
// Key phrases (TextRank keyword extraction).
export { extractKeyPhrases, KEYPHRASE_DEFAULTS } from './keyphrases/textrank-keywords';
export type { KeyPhraseSettings } from './keyphrases/textrank-keywords';

// Digests of several documents.
export { startDigest, digestDocuments, digestReader, DIGEST_DEFAULTS } from './digest/digest';
export type { ReadForDigest, DigestReader } from './digest/digest';
export type { Digest, DigestBuilder, DigestDocument, DigestOccurrence, DigestRequest, DigestSentence, DocumentProgress } from './digest/digest';
export { CROSS_DOCUMENT_DEFAULTS, DIGEST_WEIGHTS } from './digest/cross-document';

// After a summary: repairs, section paths, Markdown, the abstract check.
export { applyRepair } from './summary/apply-repair';
export type { RepairOutcome } from './summary/apply-repair';
export { sectionPath, unitOfSection } from './summary/sections';
export { WORDS_PER_MINUTE, minutesToRead } from './summary/report';
export { summaryToMarkdown, escapeMarkdown } from './render/markdown';
export { abstractChecker, checkAbstract, ABSTRACT_CHECK_DEFAULTS } from './check/abstract';
export type { CheckAbstractRequest } from './check/abstract';
export type * from './check/abstract-report';

// Text utilities callers need to agree with the engine.
export { LineIndex } from './text/lines';
export type { LinePosition } from './text/lines';
export { countWords, wordTokens, SUPPORTED_LANGUAGES } from './text/tokens';
export { inputProblem } from './input-guard';
export { DEFAULT_EXCLUDED_HEADINGS, HEADING_CLASSES, normalizeHeading, sameHeading } from './text/headings';

// Evaluation (benchmarks).
export { rougeN, rougeL, rougeS, rougeNTokens, rougeLTokens, tokenizeText } from './evaluate/rouge';
export type { RougeOptions, RougeScore, TokenizedText } from './evaluate/rouge';
export { greedyOracle } from './evaluate/oracle';
export { splitReference, splitIntroduction } from './evaluate/reference-split';
export type { IntroductionSplit } from './evaluate/reference-split';

export type * from './types';

// Development tools only (bench/tune*.ts): the blend's components and the repair strategy's knobs.
export * as tuning from './tuning';
