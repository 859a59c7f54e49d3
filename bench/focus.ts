/**
 * Focus benchmark: does a focus steer the summary to what the reader asked about?
 *
 *   node dist/bench.cjs focus [--split test|train] [--limit N] [--write]
 *
 * Procedure, for every document of the half, in both corpora (rust-rfcs: the `Summary` section is
 * the author's summary, bench/corpus.ts; nova-specs: the introduction, bench/nova-corpus.ts):
 *  1. the author's summary is withheld (the body is what gets summarized);
 *  2. one of its sentences is the target: the first with at least MIN_FOCUS_WORDS content words;
 *  3. the focus is that sentence's distinct content words (stop words out, ROUGE's tokenizer);
 *  4. a 2-sentence summary with the focus and one without are scored against the target sentence
 *     with ROUGE-1/2 (Porter stemming, stop words kept).
 * Documents whose summary has no sentence with enough content words are skipped (counted).
 * The test half goes to bench/RESULTS.md (with --write); the train half is for choosing weights.
 */
import {
  finishSummary,
  prepareDocument,
  rankPrepared,
  rougeN,
  tokenizeText,
  type DocumentFormat,
  type RougeOptions,
  type Summary,
} from '../src/core/index';
import { corpusDirectory, loadCorpus, type CorpusDocument, type Half } from './corpus';
import { loadNovaCorpus, novaCorpusDirectory } from './nova-corpus';
import { RESULTS_FILE, writeResultsBlock } from './results-file';

const ROUGE_OPTIONS: RougeOptions = { stem: true };
export const MIN_FOCUS_WORDS = 4;
const SENTENCES = 2;

/** The target sentence and the focus made of its content words; null when no sentence qualifies. */
export function focusFromReference(referenceSentences: readonly string[]): { target: string; focus: string } | null {
  for (const sentence of referenceSentences) {
    const words = [...new Set(tokenizeText(sentence, { removeStopWords: true }).flat())].filter((w) => /\p{L}/u.test(w));
    if (words.length >= MIN_FOCUS_WORDS) return { target: sentence, focus: words.join(' ') };
  }
  return null;
}

interface Totals {
  documents: number;
  skipped: number;
  r1: [number, number];
  r2: [number, number];
  r1f: [number, number];
  r2f: [number, number];
  better: number;
  worse: number;
  shortFocused: number;
}

const text = (summary: Summary) => summary.sentences.map((s) => s.text);

function scoreCorpus(documents: readonly CorpusDocument[], format: DocumentFormat): Totals {
  const totals: Totals = { documents: 0, skipped: 0, r1: [0, 0], r2: [0, 0], r1f: [0, 0], r2f: [0, 0], better: 0, worse: 0, shortFocused: 0 };
  for (const doc of documents) {
    const chosen = focusFromReference(doc.referenceSentences);
    if (!chosen) {
      totals.skipped++;
      continue;
    }
    const preparation = prepareDocument(doc.bodyText, { format, budget: { unit: 'sentences', value: SENTENCES } });
    if (!preparation.ok) {
      totals.skipped++;
      continue;
    }
    const { prepared } = preparation;
    const ranked = rankPrepared(prepared);
    const plain = finishSummary(prepared, ranked);
    const focused = finishSummary(prepared, ranked, { ...prepared.options, focus: chosen.focus });
    if (focused.sentences.length < SENTENCES) totals.shortFocused++;
    const [p1, f1] = [rougeN(text(plain), chosen.target, 1, ROUGE_OPTIONS), rougeN(text(focused), chosen.target, 1, ROUGE_OPTIONS)];
    const [p2, f2] = [rougeN(text(plain), chosen.target, 2, ROUGE_OPTIONS), rougeN(text(focused), chosen.target, 2, ROUGE_OPTIONS)];
    totals.documents++;
    totals.r1[0] += p1.recall;
    totals.r1[1] += f1.recall;
    totals.r2[0] += p2.recall;
    totals.r2[1] += f2.recall;
    totals.r1f[0] += p1.f1;
    totals.r1f[1] += f1.f1;
    totals.r2f[0] += p2.f1;
    totals.r2f[1] += f2.f1;
    if (f1.f1 > p1.f1) totals.better++;
    else if (f1.f1 < p1.f1) totals.worse++;
  }
  return totals;
}

const fixed = (x: number, n: number) => (n > 0 ? (x / n).toFixed(3) : '–');

function table(rows: readonly (readonly [string, Totals])[]): string {
  const lines = [
    '| corpus | documents (skipped) | ROUGE-1 R unfocused → focused | ROUGE-2 R | ROUGE-1 F1 | ROUGE-2 F1 | focused better / worse (R-1 F1) | focused summaries shorter than 2 |',
    '|---|---|---|---|---|---|---|---|',
  ];
  for (const [name, t] of rows) {
    const n = t.documents;
    lines.push(
      `| ${name} | ${n} (${t.skipped}) | ${fixed(t.r1[0], n)} → **${fixed(t.r1[1], n)}** | ${fixed(t.r2[0], n)} → **${fixed(t.r2[1], n)}** | ` +
        `${fixed(t.r1f[0], n)} → **${fixed(t.r1f[1], n)}** | ${fixed(t.r2f[0], n)} → **${fixed(t.r2f[1], n)}** | ${t.better} / ${t.worse} | ${t.shortFocused} |`,
    );
  }
  return lines.join('\n');
}

export async function run(args: string[]): Promise<number> {
  const split = (args.includes('--split') ? args[args.indexOf('--split') + 1] : 'test') as Half;
  const limit = args.includes('--limit') ? Number(args[args.indexOf('--limit') + 1]) : Infinity;
  const started = Date.now();
  const rust = (await loadCorpus(corpusDirectory(args), split)).documents.slice(0, limit);
  const nova = (await loadNovaCorpus(novaCorpusDirectory(args), split)).documents.slice(0, limit);
  const rows: [string, Totals][] = [
    ['rust-rfcs (Markdown)', scoreCorpus(rust, 'markdown')],
    ['nova-specs (reStructuredText)', scoreCorpus(nova, 'restructuredtext')],
  ];
  const output = table(rows);
  console.log(`focus benchmark, ${split} half, ${((Date.now() - started) / 1000).toFixed(1)} s\n${output}`);
  if (args.includes('--write') && split === 'test') {
    writeResultsBlock(
      RESULTS_FILE,
      'focus',
      [
        `## Focused summaries (${split} half)`,
        '',
        'bench/focus.ts: one sentence of the author\'s summary (the first with at least 4 content words) is the target; its ' +
          'content words are the focus; the summary is withheld and the body summarized in 2 sentences with and without the ' +
          'focus (default method). ROUGE against the target sentence, Porter stemming, stop words kept. Recall and F1 are means over documents.',
        '',
        output,
      ].join('\n'),
    );
  }
  return 0;
}
