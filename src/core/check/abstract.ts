/**
 * Abstract check: does a hand-written abstract (a "Summary", "Abstract" or "TL;DR" section, or
 * text supplied separately) cover the document's sections, and does the body back each of its
 * sentences? And how close is it to Tersely's own summary of the same length?
 *
 * Pipeline: parse → analyze → locate the abstract (abstract-locator.ts) → match it against the
 * body (abstract-match.ts) → compare with a summary (abstract-rouge.ts).
 *
 * Similarity only sees shared vocabulary: a faithful paraphrase in entirely new words can be
 * flagged, and a claim that reuses the body's words with a changed number passes. The report says
 * "may", and shows the evidence so a person can judge.
 */
import { analyze, resolveLanguage } from '../analyze';
import { inputProblem } from '../input-guard';
import { DEFAULT_OPTIONS, resolveOptions } from '../options';
import { parseDocument } from '../parse/index';
import { rankWith } from '../ranking';
import { summarizeRanked } from '../summarize';
import type { AnalyzedDocument, DocumentFormat } from '../types';
import { locateAbstract, type LocatedAbstract } from './abstract-locator';
import { ABSTRACT_CHECK_DEFAULTS, matchAbstract } from './abstract-match';
import type { AbstractCheck, AbstractReport, AbstractRougeComparison, AbstractSource, AbstractThresholds } from './abstract-report';
import { compareWithSummary } from './abstract-rouge';

export type { AbstractReport, AbstractSource } from './abstract-report';
export { ABSTRACT_CHECK_DEFAULTS } from './abstract-match';

export interface CheckAbstractOptions {
  readonly format: DocumentFormat;
  /** Default: the first section headed Summary, Abstract, TL;DR (or, failing those, Overview). */
  readonly abstract?: AbstractSource;
  /** 'auto' (default) or an ISO 639-1 code. */
  readonly language?: string;
  readonly thresholds?: Partial<AbstractThresholds>;
}

export function checkAbstract(documentText: string, options: CheckAbstractOptions): AbstractReport {
  const thresholds = { ...ABSTRACT_CHECK_DEFAULTS, ...validThresholds(options.thresholds) };
  const problem = inputProblem(documentText, DEFAULT_OPTIONS.maxChars);
  if (problem !== null) return { ok: false, error: problem };
  const doc = parseDocument(documentText, { format: options.format });
  const language = resolveLanguage(doc, options.language ?? 'auto');
  const analyzed = analyze(doc, language);

  const located = locateAbstract(analyzed, options.abstract, language);
  if (typeof located === 'string') return { ok: false, error: located };

  const match = matchAbstract(analyzed, located, thresholds);
  if (match === null) return { ok: false, error: 'The document has no prose outside the abstract to check it against.' };
  const { sentences, sections, unjudged } = match;

  const notices: string[] = [];
  const rouge = rougeComparison(analyzed, located, notices);

  const result: AbstractCheck = {
    ok: true,
    language: analyzed.language,
    abstract: {
      origin: located.origin,
      heading: located.heading,
      section: located.section,
      span: located.span,
      words: located.sentences.reduce((sum, s) => sum + s.words, 0),
      sentences,
    },
    sections,
    unjudgedSections: unjudged,
    uncoveredSections: sections.filter((s) => !s.covered).map((s) => s.section),
    unsupportedSentences: sentences.filter((s) => !s.supported).map((s) => s.index),
    thresholds,
    rouge,
    notices,
  };
  return result;
}

function validThresholds(partial: Partial<AbstractThresholds> | undefined): Partial<AbstractThresholds> {
  const valid: { -readonly [K in keyof AbstractThresholds]?: number } = {};
  for (const key of ['covered', 'supported'] as const) {
    const value = partial?.[key];
    if (typeof value === 'number' && Number.isFinite(value)) valid[key] = Math.min(1, Math.max(0, value));
  }
  const minTerms = partial?.minSectionTerms;
  if (typeof minTerms === 'number' && Number.isFinite(minTerms)) valid.minSectionTerms = Math.max(0, Math.round(minTerms));
  return valid;
}

/** Tersely's own summary at the abstract's length, compared with the abstract both ways. */
function rougeComparison(analyzed: AnalyzedDocument, located: LocatedAbstract, notices: string[]): AbstractRougeComparison | null {
  const words = located.sentences.reduce((sum, s) => sum + s.words, 0);
  // The summary must not simply copy the abstract back, so the abstract section is left out.
  const excludeHeadings = located.heading === null ? DEFAULT_OPTIONS.excludeHeadings : [...DEFAULT_OPTIONS.excludeHeadings, located.heading];
  const options = resolveOptions({
    language: analyzed.language,
    budget: { unit: 'words', value: Math.max(1, words) },
    minSentences: 1,
    excludeHeadings,
  });
  // Reuses the parse already made: summarize() would parse the whole document a second time.
  const summary = summarizeRanked(analyzed, rankWith(options.method, analyzed, options), options);
  if (summary.sentences.length === 0) {
    notices.push('No comparison summary: the document has no sentences outside the abstract to pick.');
    return null;
  }
  return compareWithSummary({
    abstractSentences: located.sentences.map((s) => s.text),
    summary: summary.sentences,
    words,
    summaryWords: summary.stats.wordsOut,
    language: analyzed.language,
  });
}
