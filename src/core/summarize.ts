/**
 * The pipeline, in one visible place: parse → analyze → rank → select → check.
 */
import { analyze, resolveLanguage } from './analyze';
import { resolveOptions, type SummaryOptions } from './options';
import { parseDocument } from './parse/index';
import { rankWith } from './ranking';
import { candidateUnits } from './select/units';
import { selectSentences } from './select/select';
import { applyFitness, sentenceFitness } from './select/fitness';
import { describeSummary } from './summary-report';
import { inputProblem } from './input-guard';
import { findStandAloneProblems, repairAutomatically } from './coherence/index';
import type { AnalyzedDocument, DocumentFormat, ParsedDocument, RankResult, Summary } from './types';

/** The pipeline's stages as a caller may show them while it waits. */
export type SummarizeStage = 'reading' | 'ranking' | 'checking';

export interface SummarizeRequest extends Partial<Record<keyof SummaryOptions, unknown>> {
  readonly format?: DocumentFormat;
  /** Offset of `text` in the whole document when summarizing a selection. */
  readonly baseOffset?: number;
  /** Called as each stage begins (the editor's engine host forwards them as progress). */
  readonly onStage?: (stage: SummarizeStage) => void;
}

export function summarize(text: string, request: SummarizeRequest = {}): Summary {
  const options = resolveOptions(request);
  const format: DocumentFormat = request.format === 'plaintext' ? 'plaintext' : 'markdown';
  const baseOffset = typeof request.baseOffset === 'number' && request.baseOffset >= 0 ? Math.floor(request.baseOffset) : 0;

  const problem = inputProblem(text, options.maxChars);
  if (problem) return refusedSummary(text, format, baseOffset, options, problem);

  request.onStage?.('reading');
  const doc = parseDocument(text, { format, baseOffset, includeTables: options.includeTables });
  const language = resolveLanguage(doc, options.language);
  const analyzed = analyze(doc, language);
  request.onStage?.('ranking');
  const ranked = rankWith(options.method, analyzed, options);
  request.onStage?.('checking');
  return summarizeRanked(analyzed, ranked, options);
}

/** Selection and checks for already-ranked sentences (the benchmark reuses one ranking for several budgets). */
export function summarizeRanked(analyzed: AnalyzedDocument, ranked: RankResult, options: SummaryOptions): Summary {
  const { doc } = analyzed;
  const wordCounts = analyzed.words.map((w) => w.length);
  const candidates = candidateUnits(doc, wordCounts, options);
  const { unitOf, unitWeights } = candidates;

  const selection = selectSentences({
    scores: applyFitness(ranked.scores, sentenceFitness(analyzed)),
    wordCounts,
    terms: analyzed.terms,
    unitOf,
    unitWeights,
    budget: options.budget,
    minSentences: options.minSentences,
    minPerSection: options.minPerSection,
    balance: options.balance,
    mmrLambda: options.mmrLambda,
  });

  let picked = selection.picked;
  let edited: ReadonlyMap<number, string> | undefined;
  if (options.repair === 'auto') {
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
  }
  const warnings = findStandAloneProblems(doc, picked, { scores: ranked.scores, ...(edited ? { edited } : {}) });
  return describeSummary({ analyzed, ranked, options, picked, wordCounts, candidates, quotas: selection.quotas, edited, warnings });
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
    stats: { wordsIn: 0, wordsOut: 0, compression: 0, sentencesIn: 0, sentencesOut: 0, sectionsCovered: 0, sectionsWithContent: 0, minutesSaved: 0 },
    warnings: [],
    notices: [reason],
    refused: reason,
  };
}
