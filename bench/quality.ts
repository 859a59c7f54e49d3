/**
 * Quality benchmark: every ranker, the default, the trained models and three anchors (lead, random,
 * greedy oracle) against the authors' own summaries, scored with ROUGE-1/2/L.
 *
 *   node dist/bench.cjs quality [--collection rust-rfcs|nova-specs] [--corpus PATH | --nova-corpus PATH]
 *                               [--split test|train] [--limit N] [--methods a,b] [--out FILE]
 *
 * The test half is the default and the only half whose table goes to bench/RESULTS.md (one block
 * per collection); the train half is for tuning (its table goes to bench/out/).
 */
import { seededRandom } from './seeded-random';
import { RESULTS_FILE, writeResultsBlock } from './results-file';
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { dirname } from 'node:path';
import {
  candidateSentences,
  DEFAULT_OPTIONS,
  finishSummary,
  greedyOracle,
  METHOD_NAMES,
  modelMismatch,
  prepareDocument,
  rankPrepared,
  resolveOptions,
  rougeL,
  rougeN,
  tokenizeText,
  validateSentenceModel,
  type DocumentFormat,
  type PreparedDocument,
  type RankerName,
  type RougeOptions,
  type SentenceModel,
  type Summary,
  type SummaryOptions,
} from '../src/core/index';
import { CorpusMissing, type CorpusDocument, type CorpusLoad, type Half } from './corpus';
import { collectionOf, type Collection } from './collections';
import { fixed, mean, METRICS, report, type RowTotals, type Totals } from './quality-report';

/** Porter stemming on, stop words kept: the usual way ROUGE is reported (common practice, no source). */
const ROUGE_OPTIONS: RougeOptions = { stem: true };
const DEFAULT_METHOD: RankerName = DEFAULT_OPTIONS.method;
const RANDOM_SEED = 20240601;

interface Scores {
  readonly f1: Record<'r1' | 'r2' | 'rl', number>;
  readonly recall: Record<'r1' | 'r2' | 'rl', number>;
}

export interface QualityArgs {
  readonly collection: Collection;
  readonly corpus: string;
  readonly split: Half;
  readonly limit: number;
  readonly out: string;
  readonly methods: readonly RankerName[];
  /** A model file for the trained methods of its kind instead of the shipped one (tuning on the train half). */
  readonly model: string | undefined;
}

function parseArgs(args: readonly string[]): QualityArgs {
  const value = (flag: string) => {
    const at = args.indexOf(flag);
    return at >= 0 ? args[at + 1] : undefined;
  };
  const collection = collectionOf(args);
  const split: Half = value('--split') === 'train' ? 'train' : 'test';
  const limit = Number(value('--limit') ?? Infinity);
  const methods = (value('--methods')?.split(',') ?? [...METHOD_NAMES]).filter((m): m is RankerName => (METHOD_NAMES as readonly string[]).includes(m));
  const fullTest = split === 'test' && !Number.isFinite(limit) && methods.length === METHOD_NAMES.length && value('--model') === undefined;
  return {
    collection,
    corpus: collection.directory(args),
    split,
    limit: Number.isFinite(limit) && limit > 0 ? Math.floor(limit) : Infinity,
    out: value('--out') ?? (fullTest ? RESULTS_FILE : `bench/out/quality-${collection.id}-${split}.md`),
    methods,
    model: value('--model'),
  };
}

/** Takes sentences in the given order while they fit the word limit (the selector's rule for word budgets). */
function fillInOrder(order: readonly number[], wordCounts: readonly number[], limit: number): number[] {
  const picked: number[] = [];
  let words = 0;
  for (const i of order) {
    if (words + wordCounts[i]! > limit) continue;
    picked.push(i);
    words += wordCounts[i]!;
  }
  // Like the selector: a budget smaller than every sentence still gets the shortest one.
  if (picked.length === 0 && order.length > 0) picked.push(order.reduce((a, b) => (wordCounts[b]! < wordCounts[a]! ? b : a)));
  return picked.sort((a, b) => a - b);
}

function scoreSentences(sentences: readonly string[], reference: readonly string[]): Scores {
  const r1 = rougeN(sentences, [reference], 1, ROUGE_OPTIONS);
  const r2 = rougeN(sentences, [reference], 2, ROUGE_OPTIONS);
  const rl = rougeL(sentences, [reference], ROUGE_OPTIONS);
  return { f1: { r1: r1.f1, r2: r2.f1, rl: rl.f1 }, recall: { r1: r1.recall, r2: r2.recall, rl: rl.recall } };
}

function newRow(name: string, anchor: boolean): RowTotals {
  return { name, anchor, f1: { r1: 0, r2: 0, rl: 0 }, recall: { r1: 0, r2: 0, rl: 0 }, milliseconds: 0, documents: 0, perDocument: [], words: 0, sentences: 0, flagged: 0 };
}

function addScores(row: RowTotals, scores: Scores, milliseconds: number, words: number, sentences: number, flagged: number): void {
  for (const metric of METRICS) {
    row.f1[metric] += scores.f1[metric];
    row.recall[metric] += scores.recall[metric];
  }
  row.perDocument.push(scores.f1.r1);
  row.milliseconds += milliseconds;
  row.documents++;
  row.words += words;
  row.sentences += sentences;
  row.flagged += flagged;
}

/** Summary sentences the stand-alone checker flags (distinct sentences). */
function flaggedCount(summary: Summary): number {
  const picked = new Set(summary.sentences.map((s) => s.sentence));
  return new Set(summary.warnings.map((w) => w.sentence).filter((i) => picked.has(i))).size;
}

interface DocumentContext {
  readonly prepared: PreparedDocument;
  readonly wordCounts: readonly number[];
  readonly candidates: readonly number[];
  readonly options: (method: RankerName, extra?: Partial<SummaryOptions>) => SummaryOptions;
}

/** The engine's own first stages (the same parse and analysis `summarize` makes), at the reference's length. */
function prepare(doc: CorpusDocument, format: DocumentFormat): DocumentContext {
  const preparation = prepareDocument(doc.bodyText, { format, budget: { unit: 'words', value: doc.referenceWords } });
  if (!preparation.ok) throw new Error(`${doc.file}: ${preparation.refused.refused}`);
  const { prepared } = preparation;
  const wordCounts = prepared.analyzed.words.map((w) => w.length);
  return {
    prepared,
    wordCounts,
    candidates: candidateSentences(prepared),
    options: (method, extra = {}) => resolveOptions({ ...prepared.options, method, ...extra }),
  };
}

function evaluateDocument(doc: CorpusDocument, format: DocumentFormat, methods: readonly RankerName[], totals: Totals, model: SentenceModel | undefined): void {
  const started = performance.now();
  const context = prepare(doc, format);
  totals.analyzeMilliseconds += performance.now() - started;
  const { prepared, wordCounts, candidates } = context;
  const body = prepared.analyzed.doc;
  const reference = doc.referenceSentences;
  const textOf = (picked: readonly number[]) => picked.map((i) => body.sentences[i]!.text);
  const wordsOf = (picked: readonly number[]) => picked.reduce((sum, i) => sum + wordCounts[i]!, 0);

  for (const method of methods) {
    const t0 = performance.now();
    const options = context.options(method);
    const ranked = rankPrepared(prepared, method, model !== undefined && modelMismatch(method, model) === null ? { model } : {});
    const summary = finishSummary(prepared, ranked, options);
    const elapsed = performance.now() - t0;
    const picked = summary.sentences.map((s) => s.sentence);
    addScores(totals.rows.get(method)!, scoreSentences(summary.sentences.map((s) => s.text), reference), elapsed, wordsOf(picked), picked.length, flaggedCount(summary));
    if (method === DEFAULT_METHOD) {
      const r0 = performance.now();
      const repaired = finishSummary(prepared, ranked, context.options(method, { repair: 'auto' }));
      const repairedPicked = repaired.sentences.map((s) => s.sentence);
      addScores(totals.repaired, scoreSentences(repaired.sentences.map((s) => s.text), reference), performance.now() - r0, wordsOf(repairedPicked), repairedPicked.length, flaggedCount(repaired));
    }
  }

  const limit = doc.referenceWords;
  const anchor = (name: string, pick: () => number[]) => {
    const t0 = performance.now();
    const picked = pick();
    addScores(totals.rows.get(name)!, scoreSentences(textOf(picked), reference), performance.now() - t0, wordsOf(picked), picked.length, 0);
  };
  anchor('lead', () => fillInOrder(candidates, wordCounts, limit));
  anchor('random', () => {
    const next = seededRandom(RANDOM_SEED + doc.number);
    const order = [...candidates];
    for (let i = order.length - 1; i > 0; i--) {
      const j = Math.floor(next() * (i + 1));
      [order[i], order[j]] = [order[j]!, order[i]!];
    }
    return fillInOrder(order, wordCounts, limit);
  });
  anchor('oracle', () => {
    const sentences = body.sentences.map((s) => tokenizeText([s.text], ROUGE_OPTIONS).flat());
    return greedyOracle({ sentences, wordCounts, candidates, reference: tokenizeText(reference, ROUGE_OPTIONS).flat(), wordLimit: limit });
  });
}

export async function run(argv: readonly string[] = process.argv.slice(3)): Promise<number> {
  const args = parseArgs(argv);
  const started = performance.now();
  let corpus: CorpusLoad;
  try {
    corpus = await args.collection.load(args.corpus, args.split, (done, total) => {
      if (done % 100 === 0 || done === total) process.stderr.write(`\rreading corpus ${done}/${total}`);
    });
    process.stderr.write('\n');
  } catch (error) {
    if (error instanceof CorpusMissing) {
      console.error(error.message);
      return 2;
    }
    throw error;
  }
  const model = args.model === undefined ? undefined : validateSentenceModel(JSON.parse(await readFile(args.model, 'utf8')));
  const documents = corpus.documents.filter((d) => d.half === args.split).slice(0, args.limit);
  const rows = new Map<string, RowTotals>();
  for (const method of args.methods) rows.set(method, newRow(method, false));
  for (const anchor of ['lead', 'random', 'oracle']) rows.set(anchor, newRow(anchor, true));
  const totals: Totals = { rows, analyzeMilliseconds: 0, repaired: newRow(`${DEFAULT_METHOD} + repair`, false) };
  documents.forEach((doc, index) => {
    evaluateDocument(doc, args.collection.format, args.methods, totals, model);
    if ((index + 1) % 20 === 0 || index + 1 === documents.length) {
      const seconds = (performance.now() - started) / 1000;
      process.stderr.write(`\rscoring ${args.collection.id} ${args.split} half: ${index + 1}/${documents.length} documents, ${seconds.toFixed(0)} s`);
    }
  });
  process.stderr.write('\n');
  if (!rows.has(DEFAULT_METHOD)) {
    console.log([...rows.values()].map((r) => `${r.name}\t${fixed(mean(r, r.f1.r1))}\t${fixed(mean(r, r.f1.r2))}\t${fixed(mean(r, r.f1.rl))}`).join('\n'));
    return 0;
  }
  const text = report(
    { collection: args.collection, directory: args.corpus, split: args.split, defaultMethod: DEFAULT_METHOD, corpus, documents: documents.length, seconds: (performance.now() - started) / 1000 },
    totals,
  );
  await mkdir(dirname(args.out), { recursive: true });
  if (args.out === RESULTS_FILE) writeResultsBlock(args.out, args.collection.resultsBlock, text);
  else await writeFile(args.out, text);
  console.log(text);
  console.log(`\nwritten to ${args.out}`);
  return 0;
}
