/**
 * Everything the selector is given, built in one place from a prepared document and its ranking:
 * which sentences may be picked (sentence-kinds.ts bars placeholders, boilerplate and template
 * text), relevance (scaled scores × fitness, plus hysteresis for previous picks), section
 * importance for the seats, and the rules (fragments, quality floor, run limit, no repeats).
 */
import type { SummaryOptions } from '../options/resolve';
import { defaultModel } from '../rank/trained/model';
import type { AnalyzedDocument, RankResult } from '../types';
import { sentenceVectorsOf, termIndexOf } from '../vectors';
import { sentenceFitness, summaryRelevance } from './fitness';
import { previousPicks, withHysteresis } from './hysteresis';
import type { SelectionInput } from './select';
import { sentenceKinds, type SentenceKinds } from './sentence-kinds';
import { templateKeys } from './template-text';
import { candidateUnits, type Candidates } from './units';

export const SELECTION_DEFAULTS = {
  /**
   * Least relevance (0-1) of a section's best non-fragment sentence for the section to get a seat.
   * Chosen on the benchmark's train half. At the benchmark's short budgets it rarely decides: with
   * the maxent default, floors 0 to 0.4 gave the same ROUGE-1 F1 within 0.001 on both train halves
   * (3 December 2026); it matters for longer summaries, where it keeps filler out.
   */
  qualityFloor: 0.2,
  /** …or a rank among the document's distinct sentences at least this good (issue 11 counted picks past the 30th as filler). */
  qualityRank: 30,
  /** Least relevance of a fragment picked outside the quotas (on its own merit). */
  fragmentFloor: 0.5,
  /** Most consecutive sentences of one paragraph (issue 11). */
  maxRun: 2,
} as const;

export interface PreparedSelection {
  readonly input: SelectionInput;
  readonly candidates: Candidates;
  /** Candidate sentences in document order. */
  readonly candidateList: readonly number[];
  readonly kinds: SentenceKinds;
}

/** The sentence classes of a document under the options' templates and the model's template text. */
export function kindsOf(analyzed: AnalyzedDocument, options: SummaryOptions): SentenceKinds {
  const wordCounts = analyzed.words.map((w) => w.length);
  const keys = templateKeys(options.templates ?? [], (options.model ?? defaultModel()).templateText ?? []);
  return sentenceKinds(analyzed.doc, wordCounts, keys);
}

/** Candidate units with barred sentences left out. */
export function summaryCandidates(analyzed: AnalyzedDocument, options: SummaryOptions, kinds = kindsOf(analyzed, options)): Candidates {
  return candidateUnits(analyzed.doc, analyzed.words.map((w) => w.length), options, kinds.barred);
}

export function prepareSelection(analyzed: AnalyzedDocument, ranked: RankResult, options: SummaryOptions, settings = SELECTION_DEFAULTS): PreparedSelection {
  const { doc } = analyzed;
  const wordCounts = analyzed.words.map((w) => w.length);
  const kinds = kindsOf(analyzed, options);
  const candidates = summaryCandidates(analyzed, options, kinds);
  const { unitOf } = candidates;
  const candidateList: number[] = [];
  let candidateWords = 0;
  for (let i = 0; i < unitOf.length; i++) {
    if (unitOf[i]! >= 0) {
      candidateList.push(i);
      candidateWords += wordCounts[i]!;
    }
  }
  let relevance = summaryRelevance(ranked.scores, sentenceFitness(analyzed), candidateList);
  if (options.previous && options.previous.length > 0) relevance = withHysteresis(relevance, previousPicks(doc, options.previous));

  // A section's claim to seats: the relevance of its content (non-fragment) words, not its length alone.
  const importance = new Map<number, number>();
  for (const i of candidateList) {
    const unit = unitOf[i]!;
    const weight = kinds.fragment[i] === 1 ? 0 : relevance[i]! * wordCounts[i]!;
    importance.set(unit, (importance.get(unit) ?? 0) + weight);
  }
  // The run limit lifts when the budget takes in the rest of the document anyway.
  const { budget } = options;
  const takesAll =
    (budget.unit === 'sentences' && budget.value >= candidateList.length) ||
    (budget.unit === 'words' && budget.value >= candidateWords) ||
    (budget.unit === 'ratio' && budget.value >= 1);
  const paragraphOf = Int32Array.from(doc.sentences, (s) => s.paragraph);

  const input: SelectionInput = {
    relevance,
    wordCounts,
    vectors: sentenceVectorsOf(analyzed),
    vocabularySize: termIndexOf(analyzed).vocabulary.size,
    unitOf,
    unitWeights: importance,
    budget,
    minSentences: options.minSentences,
    minPerSection: options.minPerSection,
    balance: options.balance,
    mmrLambda: options.mmrLambda,
    fragment: kinds.fragment,
    qualityFloor: settings.qualityFloor,
    qualityRank: settings.qualityRank,
    fragmentFloor: settings.fragmentFloor,
    paragraphOf,
    maxRun: takesAll ? Infinity : settings.maxRun,
    textKey: kinds.textKey,
  };
  return { input, candidates, candidateList, kinds };
}
