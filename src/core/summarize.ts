/**
 * The pipeline, in one visible place: read → analyze → rank → select → check.
 *
 * `summarize` runs it whole. The stages are exported too (`prepareDocument`, `rankPrepared`,
 * `finishSummary`) so the benchmarks time and tune exactly what ships, and reuse one ranking for
 * several lengths, instead of composing a pipeline of their own.
 */
import { analyze, resolveLanguage, sentenceWords } from './analyze';
import { findStandAloneProblems, repairAutomatically } from './coherence/index';
import { FORMAT_IDS } from './formats/catalog';
import { parseDocument } from './formats/registry';
import { inputProblem, withWellFormedTexts } from './input-guard';
import { OptionsError, checkOptions, type SummaryOptions, type SummaryRequestOptions } from './options/resolve';
import { SUMMARY_OPTIONS } from './options/schema';
import type { RankOptions } from './rank/blend';
import { rankWith } from './rank/registry';
import { selectSentences } from './select/select';
import { prepareSelection, summaryCandidates } from './select/selection-input';
import { focusNotice, focusSelection } from './focus/focus';
import { honourBudget } from './summary/budget';
import { describeSummary } from './summary/report';
import type { AnalyzedDocument, DocumentFormat, ParsedDocument, RankerName, RankResult, Summary } from './types';

/** What the engine is doing, for progress shown to people. */
export type SummaryStage = 'reading' | 'ranking' | 'checking';

export interface SummarizeRequest extends SummaryRequestOptions {
  /** The text's format (see formats/registry.ts); Markdown when absent. */
  readonly format?: DocumentFormat;
  /** Offset of `text` in the whole document when summarizing a selection. */
  readonly baseOffset?: number;
  /** Called as each stage starts. */
  readonly onStage?: (stage: SummaryStage) => void;
}

/** Request fields besides the schema's options. */
const REQUEST_KEYS: ReadonlySet<string> = new Set(['model', 'templates', 'previous', 'format', 'baseOffset', 'onStage']);

/** A document read and analysed, with the options it is summarized under. */
export interface PreparedDocument {
  readonly analyzed: AnalyzedDocument;
  readonly options: SummaryOptions;
  /** What reading the text noticed (lone surrogates), for the summary's notices. */
  readonly notices?: readonly string[];
}

export type Preparation = { readonly ok: true; readonly prepared: PreparedDocument } | { readonly ok: false; readonly refused: Summary };

/** A request whose options and input passed the checks, or the summary that refuses the input. */
export type CheckedRequest =
  | { readonly ok: true; readonly options: SummaryOptions; readonly format: DocumentFormat; readonly baseOffset: number }
  | { readonly ok: false; readonly refused: Summary };

/** Checks the request's options and the input. Throws OptionsError on invalid options. */
export function checkRequest(text: string, request: SummarizeRequest = {}): CheckedRequest {
  const { options, problems } = checkOptions(request);
  const format = request.format ?? 'markdown';
  const allProblems = [...problems];
  // A key the engine does not know is a caller's mistake (a renamed option, a typo); say so.
  for (const key of Object.keys(request)) {
    if (!(key in SUMMARY_OPTIONS) && !REQUEST_KEYS.has(key)) allProblems.push({ key, reason: 'is not an option of a summary' });
  }
  if (!FORMAT_IDS.includes(format)) allProblems.push({ key: 'format', reason: `expected one of ${FORMAT_IDS.join(', ')}` });
  const baseOffset = request.baseOffset ?? 0;
  if (!(Number.isInteger(baseOffset) && baseOffset >= 0)) allProblems.push({ key: 'baseOffset', reason: 'expected a whole number of at least 0' });
  if (allProblems.length > 0) throw new OptionsError(allProblems);

  const problem = inputProblem(text, options.maxChars);
  if (problem) return { ok: false, refused: refusedSummary(text, format, baseOffset, options, problem) };
  return { ok: true, options, format, baseOffset };
}

/** Checks the request and the input, then reads and analyses the text. Throws OptionsError on invalid options. */
export function prepareDocument(text: string, request: SummarizeRequest = {}): Preparation {
  const checked = checkRequest(text, request);
  if (!checked.ok) return checked;
  const { options, format, baseOffset } = checked;
  request.onStage?.('reading');
  const { doc, notices } = withWellFormedTexts(parseDocument(text, { format, baseOffset, includeTables: options.includeTables, includeFootnotes: options.includeFootnotes }));
  const words = sentenceWords(doc);
  const analyzed = analyze(doc, resolveLanguage(doc, options.language, words), words);
  return { ok: true, prepared: { analyzed, options, ...(notices.length > 0 ? { notices } : {}) } };
}

/** Ranks, selects and checks a prepared document: the rest of summarize(). */
export function summarizePrepared(prepared: PreparedDocument, request: SummarizeRequest = {}): Summary {
  request.onStage?.('ranking');
  const ranked = rankPrepared(prepared);
  request.onStage?.('checking');
  return finishSummary(prepared, ranked);
}

/** The options a ranker sees. */
export function rankOptionsOf(options: SummaryOptions): RankOptions {
  return {
    cueWords: { bonus: options.preferPhrases, stigma: options.avoidPhrases },
    ...(options.model ? { model: options.model } : {}),
  };
}

/** Scores every sentence with the options' method (or another one, for the benchmark). */
export function rankPrepared(prepared: PreparedDocument, method: RankerName = prepared.options.method, extra: RankOptions = {}): RankResult {
  return rankWith(method, prepared.analyzed, { ...rankOptionsOf(prepared.options), ...extra });
}

export function summarize(text: string, request: SummarizeRequest = {}): Summary {
  const preparation = prepareDocument(text, request);
  return preparation.ok ? summarizePrepared(preparation.prepared, request) : preparation.refused;
}

/** The sentences a summary may pick (prose with words, outside excluded sections, not barred), in document order. */
export function candidateSentences(prepared: PreparedDocument, options: SummaryOptions = prepared.options): number[] {
  const { unitOf } = summaryCandidates(prepared.analyzed, options);
  const list: number[] = [];
  for (let i = 0; i < unitOf.length; i++) if (unitOf[i]! >= 0) list.push(i);
  return list;
}

/** Selection and checks for ranked sentences: fitness, balance, MMR, the stand-alone check and repairs. */
export function finishSummary(prepared: PreparedDocument, generic: RankResult, options: SummaryOptions = prepared.options): Summary {
  const { analyzed } = prepared;
  const { doc } = analyzed;
  const general = prepareSelection(analyzed, generic, options);
  // A focus re-ranks and narrows the candidates to the sentences that speak to it (focus/focus.ts).
  const focused = options.focus !== '' ? focusSelection(analyzed, options.focus, generic, general) : null;
  const { input, candidates, candidateList, kinds } = focused ?? general;
  const ranked = focused?.ranked ?? generic;
  const { wordCounts } = input;
  const { unitOf } = candidates;
  const selection = selectSentences(input);

  // With a focus, too few matching sentences is the focus notice's to say, not the budget's.
  const honoured = honourBudget({ budget: options.budget, minSentences: options.minSentences, picked: selection.picked, wordCounts, candidates: general.candidateList, wordLimit: selection.wordLimit });
  let picked = [...honoured.picked];
  let edited: ReadonlyMap<number, string> | undefined;
  if (options.repair === 'auto' && picked.length > 0) {
    // A sentence budget has no word limit; repairs then may only swap, never grow the summary.
    const pickedWords = picked.reduce((sum, i) => sum + wordCounts[i]!, 0);
    const repaired = repairAutomatically({
      doc,
      picked,
      scores: ranked.scores,
      wordBudget: Number.isFinite(selection.wordLimit) ? Math.max(selection.wordLimit, pickedWords) : pickedWords,
      ...(options.budget.unit === 'sentences' ? { maxPicks: Math.max(options.budget.value, picked.length) } : {}),
      wordsOf: (i) => wordCounts[i] ?? 0,
      isCandidate: (i) => unitOf[i]! >= 0,
    });
    picked = repaired.picked;
    edited = repaired.edited;
    // A repair may bring in a sentence whose text is already in the summary; no text twice.
    const seen = new Set<number>();
    picked = picked.filter((i) => !seen.has(kinds.textKey[i]!) && seen.add(kinds.textKey[i]!) !== undefined);
  }
  const warnings = findStandAloneProblems(doc, picked, { scores: ranked.scores, ...(edited ? { edited } : {}) });
  const notices = [...(prepared.notices ?? []), ...honoured.notices];
  if (focused) {
    const words = picked.reduce((sum, i) => sum + wordCounts[i]!, 0);
    const short = options.budget.unit === 'sentences' ? picked.length < options.budget.value : picked.length === candidateList.length && words < selection.wordLimit;
    const notice = focusNotice(focused.report, short);
    if (notice) notices.push(notice);
  }
  const summary = describeSummary({ analyzed, ranked, options, picked, wordCounts, candidates, quotas: selection.quotas, leftOut: selection.leftOut, kinds, edited, warnings, notices });
  return focused ? { ...summary, focus: focused.report } : summary;
}

function refusedSummary(text: string, format: DocumentFormat, baseOffset: number, options: SummaryOptions, reason: string): Summary {
  const empty: ParsedDocument = {
    text,
    baseOffset,
    format,
    title: null,
    sections: [{ index: 0, heading: '', depth: 0, headingSpan: null, span: { start: baseOffset, end: baseOffset + text.length }, parent: null }],
    paragraphs: [],
    sentences: [],
    skipped: [],
  };
  return {
    document: empty,
    method: options.method,
    language: options.language === 'auto' ? 'en' : options.language,
    sentences: [],
    shares: [],
    keyPhrases: [],
    stats: { wordsIn: 0, wordsOut: 0, compression: 0, sentencesIn: 0, sentencesOut: 0, sectionsCovered: 0, sectionsWithContent: 0, minutesToRead: 0, documentMinutesToRead: 0 },
    warnings: [],
    ranking: {},
    notices: [reason],
    refused: reason,
  };
}
