/**
 * Development tool: compares automatic-repair strategies on the TRAIN half only, so the repair
 * defaults are chosen without looking at the test half.
 *
 *   node dist/bench.cjs tune-repair [--corpus PATH] [--limit N] [--show N]
 *
 * Each document is ranked and selected once (default method, word budget = the reference's words,
 * exactly as the quality benchmark does); every strategy then repairs the same picks. Printed per
 * strategy: ROUGE-1/2 F1 after repair, the drop from the unrepaired summary, the share of summary
 * sentences still flagged, words per summary and how often each repair step was taken.
 * `--show N` prints the first N repair log lines of the shipped strategy, for reading by hand.
 */
import {
  candidateSentences,
  finishSummary,
  prepareDocument,
  rankPrepared,
  rougeNTokens,
  tokenizeText,
  tuning,
  type ParsedDocument,
  type TokenizedText,
} from '../src/core/index';
import { corpusDirectory, loadCorpus, type CorpusDocument } from './corpus';

const { findStandAloneProblems, repairAutomatically, REPAIR_STRATEGY, sentenceFitness, summaryRelevance } = tuning;
type RepairStrategy = typeof REPAIR_STRATEGY;

const ROUGE_OPTIONS = { stem: true } as const;

interface Prepared {
  readonly doc: ParsedDocument;
  readonly picked: readonly number[];
  readonly wordCounts: readonly number[];
  readonly wordBudget: number;
  readonly isCandidate: (i: number) => boolean;
  readonly rankScores: Float64Array;
  readonly fitScores: Float64Array;
  readonly sentenceTokens: TokenizedText;
  readonly reference: TokenizedText;
}

interface Variant {
  readonly label: string;
  readonly strategy: Partial<RepairStrategy>;
  /** Repair ranks candidates by the selector's fitness-adjusted scores instead of the raw ranking. */
  readonly fitScores?: boolean;
}

/** The shipped strategy first; then one change at a time from it (each merged onto REPAIR_STRATEGY). */
const VARIANTS: readonly Variant[] = [
  { label: 'shipped (REPAIR_STRATEGY)', strategy: {} },
  { label: 'first version exactly', strategy: { trimFirst: false, sameSectionFirst: true, refill: false } },
  { label: 'context before trim', strategy: { trimFirst: false } },
  { label: 'no refill', strategy: { refill: false } },
  { label: 'replacement from the same section first', strategy: { sameSectionFirst: true } },
  { label: 'no swap', strategy: { swap: false } },
  { label: 'swap ratio 2', strategy: { swapScoreRatio: 2 } },
  { label: 'swap ratio 0.5', strategy: { swapScoreRatio: 0.5 } },
  { label: 'fitness-adjusted scores', strategy: {}, fitScores: true },
  { label: 'leave demonstratives flagged', strategy: { keepTriggers: ['demonstrative'] } },
  { label: 'leave additives flagged', strategy: { keepTriggers: ['additive'] } },
];

function prepare(corpusDoc: CorpusDocument): Prepared {
  const preparation = prepareDocument(corpusDoc.bodyText, { format: 'markdown', budget: { unit: 'words', value: corpusDoc.referenceWords }, method: 'blend' });
  if (!preparation.ok) throw new Error(`${corpusDoc.file}: ${preparation.refused.refused}`);
  const { prepared } = preparation;
  const { analyzed } = prepared;
  const doc = analyzed.doc;
  const ranked = rankPrepared(prepared);
  const picked = finishSummary(prepared, ranked).sentences.map((s) => s.sentence);
  const wordCounts = analyzed.words.map((w) => w.length);
  const candidates = candidateSentences(prepared);
  const candidateSet = new Set(candidates);
  const pickedWords = picked.reduce((sum, i) => sum + wordCounts[i]!, 0);
  return {
    doc,
    picked,
    wordCounts,
    // As finishSummary does for a word budget.
    wordBudget: Math.max(corpusDoc.referenceWords, pickedWords),
    isCandidate: (i) => candidateSet.has(i),
    rankScores: ranked.scores,
    fitScores: summaryRelevance(ranked.scores, sentenceFitness(analyzed), candidates),
    sentenceTokens: doc.sentences.map((s) => tokenizeText([s.text], ROUGE_OPTIONS).flat()),
    reference: tokenizeText(corpusDoc.referenceSentences, ROUGE_OPTIONS),
  };
}

interface Tally {
  r1: number;
  r2: number;
  sentences: number;
  flagged: number;
  words: number;
  readonly steps: Map<string, number>;
}

const newTally = (): Tally => ({ r1: 0, r2: 0, sentences: 0, flagged: 0, words: 0, steps: new Map() });

function score(p: Prepared, picked: readonly number[], edited: ReadonlyMap<number, string>, tally: Tally): void {
  const candidate = picked.map((i) => (edited.has(i) ? tokenizeText([edited.get(i)!], ROUGE_OPTIONS).flat() : p.sentenceTokens[i]!));
  tally.r1 += rougeNTokens(candidate, p.reference, 1).f1;
  tally.r2 += rougeNTokens(candidate, p.reference, 2).f1;
  tally.sentences += picked.length;
  tally.words += picked.reduce((sum, i) => sum + p.wordCounts[i]!, 0);
  tally.flagged += new Set(findStandAloneProblems(p.doc, picked, { edited }).map((w) => w.sentence)).size;
}

/** The repair step a log line reports (see repair.ts). */
function stepOf(line: string): string {
  if (line.includes('in place of')) return 'swap';
  if (line.includes('added context')) return 'context';
  if (line.includes('leading connective')) return 'trim';
  if (line.includes('replaced by')) return 'replace';
  if (line.includes('dropped')) return 'drop';
  if (line.includes('refill')) return 'refill';
  return 'other';
}

export async function run(argv: readonly string[] = process.argv.slice(3)): Promise<number> {
  const value = (flag: string) => (argv.includes(flag) ? argv[argv.indexOf(flag) + 1] : undefined);
  const limit = Number(value('--limit') ?? Infinity);
  let show = Number(value('--show') ?? 0);
  const corpus = await loadCorpus(corpusDirectory(argv), 'train');
  const documents = corpus.documents.filter((d) => d.half === 'train').slice(0, limit);
  const started = performance.now();
  const prepared = documents.map(prepare);
  process.stderr.write(`prepared ${prepared.length} train documents in ${((performance.now() - started) / 1000).toFixed(0)} s\n`);

  const before = newTally();
  for (const p of prepared) score(p, p.picked, new Map(), before);
  const n = prepared.length;
  const share = (t: Tally) => `${((100 * t.flagged) / Math.max(1, t.sentences)).toFixed(1)}%`;
  console.log(`train half, ${n} documents; repair strategy shipped: ${JSON.stringify(REPAIR_STRATEGY)}`);
  console.log('R-1 F1  R-2 F1  R-1 drop  flagged  words  steps  variant');
  console.log(`${(before.r1 / n).toFixed(4)}  ${(before.r2 / n).toFixed(4)}  ${'—'.padStart(8)}  ${share(before).padStart(7)}  ${(before.words / n).toFixed(1)}  —  no repair`);
  for (const variant of VARIANTS) {
    const tally = newTally();
    for (const p of prepared) {
      const outcome = repairAutomatically({
        doc: p.doc,
        picked: p.picked,
        scores: variant.fitScores ? p.fitScores : p.rankScores,
        wordBudget: p.wordBudget,
        wordsOf: (i) => p.wordCounts[i] ?? 0,
        isCandidate: p.isCandidate,
        strategy: variant.strategy,
      });
      for (const line of outcome.log) tally.steps.set(stepOf(line), (tally.steps.get(stepOf(line)) ?? 0) + 1);
      if (variant === VARIANTS[0] && show > 0) {
        for (const line of outcome.log.slice(0, show)) console.log(`    ${documentsFile(p, documents, prepared)}: ${line}`);
        show -= outcome.log.length;
      }
      score(p, outcome.picked, outcome.edited, tally);
    }
    const steps = [...tally.steps].map(([k, v]) => `${k} ${v}`).join(', ');
    console.log(
      `${(tally.r1 / n).toFixed(4)}  ${(tally.r2 / n).toFixed(4)}  ${((before.r1 - tally.r1) / n).toFixed(4).padStart(8)}  ${share(tally).padStart(7)}  ${(tally.words / n).toFixed(1)}  ${variant.label} [${steps}]`,
    );
  }
  return 0;
}

function documentsFile(p: Prepared, documents: readonly CorpusDocument[], prepared: readonly Prepared[]): string {
  return documents[prepared.indexOf(p)]!.file;
}
