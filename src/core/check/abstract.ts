/**
 * Abstract check: does a hand-written abstract (a "Summary", "Abstract" or "TL;DR" section, or
 * text supplied separately) cover the document's sections, and does the body back each of its
 * sentences? And how close is it to Tersely's own summary of the same length?
 *
 * Pipeline: parse → analyze → locate the abstract (abstract-locator.ts) → match it against the
 * body (abstract-match.ts: alignment, consistency findings, copies, coverage) → compare with a
 * summary (abstract-rouge.ts).
 *
 * Paraphrase tolerance comes from the document alone (stems, numbers written either way, terms the
 * document uses together): a paraphrase in words the document never uses can still be flagged,
 * and a detector can miss a change it has no rule for. The report shows its evidence with lines so
 * a person can judge.
 */
import { OptionsError, checkOptions, type SummaryOptions, type SummaryRequestOptions } from '../options/resolve';
import { finishSummary, prepareDocument, rankPrepared, type PreparedDocument } from '../summarize';
import type { DocumentFormat } from '../types';
import { locateAbstract, type LocatedAbstract } from './abstract-locator';
import { ABSTRACT_CHECK_DEFAULTS, bodyModel, matchAbstract, type BodyModel } from './abstract-match';
import type { AbstractCheck, AbstractReport, AbstractRougeComparison, AbstractSentenceCheck, AbstractSource, AbstractThresholds } from './abstract-report';
import type { RankResult } from '../types';
import { compareWithSummary } from './abstract-rouge';

export type { AbstractReport, AbstractSource } from './abstract-report';
export { ABSTRACT_CHECK_DEFAULTS } from './abstract-match';

/** The same options as a summary (size cap, excluded headings, tables, language), plus where the abstract is. */
export interface CheckAbstractRequest extends SummaryRequestOptions {
  readonly format?: DocumentFormat;
  /** Default: the first section headed Summary, Abstract, TL;DR (or, failing those, Overview). */
  readonly abstract?: AbstractSource;
  readonly thresholds?: Partial<AbstractThresholds>;
}

/** Throws OptionsError when an option is invalid, as `summarize` does. */
export function checkAbstract(documentText: string, request: CheckAbstractRequest = {}): AbstractReport {
  const { abstract, ...rest } = request;
  return abstractChecker(documentText, rest)(abstract);
}

/**
 * Reads a document once and checks any number of abstracts against it (the editor re-checking
 * after an edit of a separate abstract, the benchmark's perturbed copies): the parse, the body's
 * weights, its term space and the ranking behind the comparison summary are made once.
 * Throws OptionsError when an option is invalid.
 */
export function abstractChecker(documentText: string, request: Omit<CheckAbstractRequest, 'abstract'> = {}): (abstract?: AbstractSource) => AbstractReport {
  const thresholds = { ...ABSTRACT_CHECK_DEFAULTS, ...validThresholds(request.thresholds) };
  const { thresholds: _thresholds, ...summaryRequest } = request;
  const preparation = prepareDocument(documentText, summaryRequest);
  if (!preparation.ok) {
    const refused: AbstractReport = { ok: false, reason: 'refused', error: preparation.refused.refused ?? 'The document was not read.' };
    return () => refused;
  }
  const { prepared } = preparation;
  const models = new Map<number, BodyModel | null>();
  let ranked: RankResult | null = null;
  const ranking = () => (ranked ??= rankPrepared(prepared));
  const whole: Comparison = { prepared, ranking };
  // An opening-text abstract has no heading to leave out of the comparison summary: the summary is
  // made from the document with the opening's sentences blanked (same length, so every offset
  // stays right). Made once; null when that text cannot be read (the report then says so).
  let opening: Comparison | null | undefined;
  const withoutOpening = (located: LocatedAbstract): Comparison | null => {
    if (opening !== undefined) return opening;
    const { doc } = prepared.analyzed;
    const parts: string[] = [];
    let at = 0;
    for (const sentence of located.sentences) {
      const from = sentence.span!.start - doc.baseOffset;
      const to = sentence.span!.end - doc.baseOffset;
      parts.push(doc.text.slice(at, from), doc.text.slice(from, to).replace(/[^\r\n]/g, ' '));
      at = to;
    }
    parts.push(doc.text.slice(at));
    const blanked = prepareDocument(parts.join(''), summaryRequest);
    let blankedRanking: RankResult | null = null;
    return (opening = blanked.ok ? { prepared: blanked.prepared, ranking: () => (blankedRanking ??= rankPrepared(blanked.prepared)) } : null);
  };
  return (abstract) => {
    const located = locateAbstract(prepared.analyzed, abstract, prepared.analyzed.language);
    if ('error' in located) return { ok: false, reason: located.reason, error: located.error };
    // One body per abstract place: a section, the opening text, or none (separate text).
    const key = located.section ?? (located.origin === 'opening' ? -2 : -1);
    if (!models.has(key)) models.set(key, bodyModel(prepared.analyzed, located, prepared.options.excludeHeadings));
    const model = models.get(key)!;
    if (model === null) return { ok: false, reason: 'noBody', error: 'The document has no prose outside the abstract to check it against.' };
    return report(prepared, located, matchAbstract(prepared.analyzed, located, thresholds, model), thresholds, located.origin === 'opening' ? withoutOpening(located) : whole);
  };
}

/** The document Tersely's comparison summary is made from, and its ranking (made once, on demand). */
interface Comparison {
  readonly prepared: PreparedDocument;
  readonly ranking: () => RankResult;
}

function report(prepared: PreparedDocument, located: LocatedAbstract, match: ReturnType<typeof matchAbstract>, thresholds: AbstractThresholds, comparison: Comparison | null): AbstractCheck {
  const { analyzed } = prepared;
  const { sentences, sections, unjudged, content } = match;
  const notices: string[] = [];
  if (comparison === null) notices.push('No comparison summary: the document without its opening text could not be read.');
  const rouge = comparison === null ? null : rougeComparison(comparison, located, notices);

  return {
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
    contradictedSentences: sentences.filter((s) => s.verdict === 'contradicted').map((s) => s.index),
    findings: sentences.flatMap((s) => s.findings),
    content,
    copied: copiedShare(located, sentences),
    rule: COVERAGE_RULE,
    thresholds,
    rouge,
    notices,
  };
}

/** The one rule, said the same way by every surface. */
export const COVERAGE_RULE =
  'An abstract sentence is supported when one to three body sentences together hold enough of its content and nothing in the body contradicts it (contradicted when something does); a section is covered when it holds one of those body sentences for a supported or contradicted abstract sentence.';

function copiedShare(located: LocatedAbstract, sentences: readonly AbstractSentenceCheck[]): AbstractCheck['copied'] {
  const copied = sentences.filter((s) => s.copy !== null).map((s) => s.index);
  const words = located.sentences.reduce((sum, s) => sum + s.words, 0);
  const copiedWords = copied.reduce((sum, k) => sum + located.sentences[k]!.words, 0);
  return { sentences: copied, share: words === 0 ? 0 : copiedWords / words };
}

function validThresholds(partial: Partial<AbstractThresholds> | undefined): Partial<AbstractThresholds> {
  const valid: { -readonly [K in keyof AbstractThresholds]?: number } = {};
  const value = partial?.supported;
  if (typeof value === 'number' && Number.isFinite(value)) valid.supported = Math.min(1, Math.max(0, value));
  const minTerms = partial?.minSectionTerms;
  if (typeof minTerms === 'number' && Number.isFinite(minTerms)) valid.minSectionTerms = Math.max(0, Math.round(minTerms));
  return valid;
}

/** Tersely's own summary at the abstract's length, compared with the abstract both ways. */
function rougeComparison({ prepared, ranking }: Comparison, located: LocatedAbstract, notices: string[]): AbstractRougeComparison | null {
  const { analyzed } = prepared;
  const words = located.sentences.reduce((sum, s) => sum + s.words, 0);
  // The summary must not simply copy the abstract back, so the abstract section is left out.
  const excludeHeadings = located.heading === null ? prepared.options.excludeHeadings : [...prepared.options.excludeHeadings, located.heading];
  const checked = checkOptions({ budget: { unit: 'words', value: Math.max(1, words) }, minSentences: 1 });
  if (checked.problems.length > 0) throw new OptionsError(checked.problems);
  const options: SummaryOptions = { ...prepared.options, budget: checked.options.budget, minSentences: 1, excludeHeadings };
  // Reuses the parse already made: summarize() would parse the whole document a second time.
  const summary = finishSummary(prepared, ranking(), options);
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
