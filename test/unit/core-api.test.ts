/**
 * Pins the engine's public face (src/core/index.ts): an export added or removed by accident fails
 * here; one added on purpose is added to this list in the same change.
 */
import assert from 'node:assert/strict';
import * as core from '../../src/core/index';

const PUBLIC_VALUES = [
  'ABSTRACT_CHECK_DEFAULTS',
  'ALL_OPTIONS',
  'BLEND_WEIGHTS',
  'CROSS_DOCUMENT_DEFAULTS',
  'DEFAULT_EXCLUDED_HEADINGS',
  'DIGEST_DEFAULTS',
  'DIGEST_WEIGHTS',
  'DEFAULT_OPTIONS',
  'FORMATS',
  'FORMAT_IDS',
  'GENERIC_FORMAT',
  'HEADING_CLASSES',
  'HOST_OPTIONS',
  'KEYPHRASE_DEFAULTS',
  'LABEL_RULES',
  'LENGTH_BOUNDS',
  'LENGTH_EXPECTS',
  'LineIndex',
  'MAXENT_KIND',
  'METHODS',
  'METHOD_INFO',
  'METHOD_NAMES',
  'MODEL_FORMAT',
  'MODEL_KINDS',
  'MODEL_LIMITS',
  'MODEL_VERSION',
  'ModelError',
  'OptionsError',
  'SUMMARY_OPTIONS',
  'SENTENCE_KIND_DEFAULTS',
  'TEMPLATE_LEARNING_DEFAULTS',
  'TEMPLATE_LIMITS',
  'HYSTERESIS_DEFAULTS',
  'SELECTION_DEFAULTS',
  'barredKind',
  'fragmentKind',
  'normalizeSentence',
  'learnTemplateText',
  'SUPPORTED_LANGUAGES',
  'WORDS_PER_MINUTE',
  'abstractChecker',
  'applyRepair',
  'candidateSentences',
  'checkAbstract',
  'checkOptions',
  'countWords',
  'createSummarySession',
  'defaultMaxentModel',
  'defaultModel',
  'digestDocuments',
  'digestReader',
  'escapeMarkdown',
  'exampleFromDocument',
  'extractKeyPhrases',
  'finishSummary',
  'formatForEditorDocument',
  'formatForFileName',
  'formatForLanguageId',
  'formatInfo',
  'formatLength',
  'greedyOracle',
  'inputProblem',
  'loadModel',
  'maxentFeatureReport',
  'minutesToRead',
  'modelFeatureReport',
  'modelMismatch',
  'normalizeHeading',
  'parseDocument',
  'parseLength',
  'prepareDocument',
  'rankOptionsOf',
  'rankPrepared',
  'resolveOptions',
  'rougeL',
  'rougeLTokens',
  'rougeN',
  'rougeNTokens',
  'rougeS',
  'sameHeading',
  'sectionPath',
  'splitIntroduction',
  'splitReference',
  'startDigest',
  'summarize',
  'summaryToMarkdown',
  'tokenizeText',
  'trainMaxentModel',
  'trainModel',
  'tuning',
  'unitOfSection',
  'validateMaxentModel',
  'validateModel',
  'validateSentenceModel',
  'wordTokens',
];

describe('core: the public API', () => {
  it('exports exactly the pinned names', () => {
    assert.deepEqual(Object.keys(core).sort(), [...PUBLIC_VALUES].sort());
  });

  it('summarizes through the face alone', () => {
    const summary = core.summarize('# Ferry plan\n\nThe night ferry leaves at nine. It returns at midnight.\n', { budget: '1s' });
    assert.equal(summary.sentences.length, 1);
    assert.ok(summary.ranking !== undefined);
  });

  it('refuses a request key it does not know, naming it', () => {
    assert.throws(
      () => core.summarize('Text here.', { cueWords: { bonus: [] } } as never),
      (error: unknown) => error instanceof core.OptionsError && error.problems.some((p) => p.key === 'cueWords' && /not an option/.test(p.reason)),
    );
  });
});
