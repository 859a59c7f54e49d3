/**
 * Turns a selection into the `Summary` callers see: picked sentences with their section path,
 * rank and the features behind the score; figures; each balance unit's share of document and summary.
 */
import type { SummaryOptions } from '../options/resolve';
import type { SentenceKinds } from '../select/sentence-kinds';
import { balanceUnits, excludedSections, type Candidates } from '../select/units';
import { extractKeyPhrases } from '../keyphrases/textrank-keywords';
import { sectionPath } from './sections';
import type {
  AnalyzedDocument,
  BarredKind,
  LeftOutReason,
  SectionLeftOut,
  PickedSentence,
  FeatureValues,
  RankResult,
  SectionShare,
  StandAloneWarning,
  Summary,
} from '../types';

import { minutesToRead } from '../reading';

/** Barred kinds whose words key phrases leave out. */
const NO_TOPIC: ReadonlySet<string> = new Set<BarredKind>(['boilerplate', 'byline', 'metadata', 'template']);

export { WORDS_PER_MINUTE, minutesToRead } from '../reading';

export interface ReportInput {
  readonly analyzed: AnalyzedDocument;
  readonly ranked: RankResult;
  readonly options: SummaryOptions;
  /** Picked sentence indices in document order. */
  readonly picked: readonly number[];
  /** Word count of each sentence, as the selector counted them. */
  readonly wordCounts: readonly number[];
  /** Balance unit of each sentence (-1 = not a candidate) and each unit's content words. */
  readonly candidates: Candidates;
  readonly quotas: ReadonlyMap<number, number>;
  /** Units the selector gave no seat, and why. */
  readonly leftOut?: ReadonlyMap<number, LeftOutReason>;
  /** Sentence classes (barred sentences are reported). */
  readonly kinds?: SentenceKinds;
  /** Display text for sentences edited by a repair. */
  readonly edited?: ReadonlyMap<number, string>;
  readonly warnings?: readonly StandAloneWarning[];
  readonly notices?: readonly string[];
}

export function describeSummary(input: ReportInput): Summary {
  const { analyzed, ranked, options, picked, wordCounts } = input;
  const { unitOf, unitWeights: unitWords } = input.candidates;
  const { doc } = analyzed;
  const ranks = rankOrder(ranked.scores, unitOf);

  const sentences: PickedSentence[] = picked.map((i) => {
    const sentence = doc.sentences[i]!;
    const editedText = input.edited?.get(i);
    return {
      sentence: i,
      text: editedText ?? sentence.text,
      span: sentence.span,
      sectionPath: sectionPath(doc, sentence.section),
      section: sentence.section,
      score: ranked.scores[i] ?? 0,
      rank: ranks[i] ?? 0,
      features: featuresOf(ranked, i),
      ...(ranked.featureValues ? { featureValues: valuesOf(ranked.featureValues, i) } : {}),
      ...(editedText !== undefined ? { edited: { reason: 'leading connective removed' } } : {}),
    };
  });

  const unitPickedWords = new Map<number, number>();
  const unitPicked = new Map<number, number>();
  let candidateWords = 0;
  for (const words of unitWords.values()) candidateWords += words;
  let wordsOut = 0;
  for (const i of picked) {
    const unit = unitOf[i]!;
    wordsOut += wordCounts[i]!;
    unitPicked.set(unit, (unitPicked.get(unit) ?? 0) + 1);
    unitPickedWords.set(unit, (unitPickedWords.get(unit) ?? 0) + wordCounts[i]!);
  }
  const wordsIn = wordCounts.reduce((a, b) => a + b, 0);

  const shares: SectionShare[] = [...unitWords.keys()]
    .sort((a, b) => a - b)
    .map((unit) => ({
      section: unit,
      heading: unit === 0 ? doc.title ?? '' : doc.sections[unit]!.heading,
      documentShare: candidateWords > 0 ? unitWords.get(unit)! / candidateWords : 0,
      summaryShare: wordsOut > 0 ? (unitPickedWords.get(unit) ?? 0) / wordsOut : 0,
      picked: unitPicked.get(unit) ?? 0,
      quota: input.quotas.get(unit) ?? 0,
    }));

  const { leftOut, barred } = leftOutSections(input, shares);
  const notices = [...(input.notices ?? [])];
  if (doc.sentences.length === 0) notices.push('No prose sentences were found (headings, code, tables and lists of links are not summarized).');

  return {
    document: doc,
    method: options.method,
    language: analyzed.language,
    sentences,
    shares,
    // Sign-offs, bylines, metadata lines and template text name no topic of the document (an API line does).
    keyPhrases: extractKeyPhrases(analyzed, {}, input.kinds ? (i) => NO_TOPIC.has(input.kinds!.barred[i] ?? '') : undefined),
    stats: {
      wordsIn,
      wordsOut,
      compression: wordsIn > 0 ? wordsOut / wordsIn : 0,
      sentencesIn: doc.sentences.length,
      sentencesOut: picked.length,
      sectionsCovered: shares.filter((s) => s.picked > 0).length,
      sectionsWithContent: shares.length,
      minutesToRead: minutesToRead(wordsOut),
      documentMinutesToRead: minutesToRead(wordsIn),
    },
    ranking: {
      ...(ranked.converged !== undefined ? { converged: ranked.converged } : {}),
      ...(ranked.iterations !== undefined ? { iterations: ranked.iterations } : {}),
    },
    warnings: input.warnings ?? [],
    notices,
    leftOut,
    barred,
  };
}

const LEFT_OUT_MESSAGES: Readonly<Record<LeftOutReason, string>> = {
  belowQualityFloor: 'left out: no sentence here scores high enough to be worth a summary line',
  onlyFragments: 'left out: only short fragments, lead-ins or links',
  onlyBarred: 'left out: only placeholders, boilerplate or template text',
};

/** Sections with content that the summary leaves out on purpose, and the sentences barred outright. */
function leftOutSections(input: ReportInput, shares: readonly SectionShare[]): { leftOut: SectionLeftOut[]; barred: { sentence: number; kind: BarredKind }[] } {
  const { doc } = input.analyzed;
  const heading = (unit: number) => (unit === 0 ? doc.title ?? '' : doc.sections[unit]?.heading ?? '');
  const reasons = new Map<number, LeftOutReason>();
  const picked = new Map(shares.map((share) => [share.section, share.picked]));
  for (const [unit, reason] of input.leftOut ?? []) if ((picked.get(unit) ?? 0) === 0) reasons.set(unit, reason);
  const barred: { sentence: number; kind: BarredKind }[] = [];
  if (input.kinds) {
    const units = balanceUnits(doc, input.options.balanceDepth).unitOfSection;
    const excluded = excludedSections(doc, input.options.excludeHeadings);
    input.kinds.barred.forEach((kind, i) => {
      const sentence = doc.sentences[i]!;
      if (kind === null || excluded[sentence.section] === 1) return;
      barred.push({ sentence: i, kind });
      const unit = units[sentence.section]!;
      if (!picked.has(unit)) reasons.set(unit, 'onlyBarred');
    });
  }
  const leftOut = [...reasons.entries()]
    .sort((a, b) => a[0] - b[0])
    .map(([section, reason]) => ({ section, heading: heading(section), reason, message: LEFT_OUT_MESSAGES[reason] }));
  return { leftOut, barred };
}

/** 1-based rank of every candidate by score (ties broken by document order); 0 for non-candidates. */
function rankOrder(scores: Float64Array, unitOf: Int32Array): Int32Array {
  const order: number[] = [];
  for (let i = 0; i < scores.length; i++) if (unitOf[i]! >= 0) order.push(i);
  order.sort((a, b) => scores[b]! - scores[a]! || a - b);
  const ranks = new Int32Array(scores.length);
  order.forEach((sentence, k) => {
    ranks[sentence] = k + 1;
  });
  return ranks;
}

function valuesOf(values: FeatureValues, i: number): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [name, bins] of Object.entries(values.bins)) {
    const label = values.labels[name]?.[bins[i]!];
    if (label !== undefined) out[name] = label;
  }
  return out;
}

function featuresOf(ranked: RankResult, i: number): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [name, values] of Object.entries(ranked.features ?? {})) out[name] = values[i] ?? 0;
  return out;
}
