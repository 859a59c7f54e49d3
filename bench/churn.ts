/**
 * Churn under a small edit (issue 11, item 5): how many picks survive when one paragraph is
 * inserted into a corpus document, with and without the previous picks passed back (hysteresis).
 *
 * Procedure, per document of the half (default options, default length):
 *  1. summarize the body;
 *  2. insert one paragraph — the first prose paragraph of 15-40 words of the next document in
 *     the corpus (by name), so its words are real but foreign — after a paragraph chosen by a
 *     seeded random draw;
 *  3. summarize the edited text twice: without and with `previous` = the first summary's texts;
 *  4. of the first summary's picks outside the edited section (the inserted paragraph's own
 *     section; any other section, parent or child, counts as outside), count those still picked.
 * Figures are pooled over all such picks. Target: ≥ 80% unchanged.
 *
 *   node dist/bench.cjs churn [--corpus PATH] [--split test|train] [--limit N]
 */
import { prepareDocument, rankPrepared, finishSummary, type DocumentFormat, type Summary } from '../src/core/index';
import { corpusDirectory, loadCorpus, type CorpusDocument, type Half } from './corpus';
import { loadNovaCorpus, novaCorpusDirectory } from './nova-corpus';
import { RESULTS_FILE, writeResultsBlock } from './results-file';
import { seededRandom } from './seeded-random';

const SEED = 20261202;

function summarizeText(text: string, format: DocumentFormat, budget: string, previous?: readonly string[]): Summary {
  const preparation = prepareDocument(text, { format, budget, ...(previous ? { previous } : {}) });
  if (!preparation.ok) throw new Error(preparation.refused.refused);
  return finishSummary(preparation.prepared, rankPrepared(preparation.prepared));
}

/** The raw source of the first prose paragraph of 15-40 words, or null. */
function donorParagraph(doc: CorpusDocument): string | null {
  const body = doc.body;
  for (const paragraph of body.paragraphs) {
    if (paragraph.kind !== 'paragraph') continue;
    const text = paragraph.sentences.map((i) => body.sentences[i]!.text).join(' ');
    const words = text.split(/\s+/).filter(Boolean).length;
    if (words >= 15 && words <= 40) return text;
  }
  return null;
}

interface ChurnTally {
  documents: number;
  outside: number;
  keptPlain: number;
  keptHysteresis: number;
  picks: number;
}

function measure(documents: readonly CorpusDocument[], format: DocumentFormat, budget: string, label: string): ChurnTally {
  const tally: ChurnTally = { documents: 0, outside: 0, keptPlain: 0, keptHysteresis: 0, picks: 0 };
  documents.forEach((doc, k) => {
    const donor = donorParagraph(documents[(k + 1) % documents.length]!);
    const paragraphs = doc.body.paragraphs.filter((p) => p.kind === 'paragraph' && p.sentences.length > 0);
    if (!donor || paragraphs.length === 0) return;
    const next = seededRandom(SEED + k);
    const after = paragraphs[Math.floor(next() * paragraphs.length)]!;
    const at = after.span.end - doc.body.baseOffset;
    const edited = `${doc.bodyText.slice(0, at)}\n\n${donor}\n\n${doc.bodyText.slice(at).replace(/^[ \t]*\n?/, '')}`;
    const before = summarizeText(doc.bodyText, format, budget);
    const plain = summarizeText(edited, format, budget);
    const kept = summarizeText(edited, format, budget, before.sentences.map((s) => s.text));
    const outside = before.sentences.filter((s) => s.section !== after.section).map((s) => s.text);
    const plainTexts = new Set(plain.sentences.map((s) => s.text));
    const keptTexts = new Set(kept.sentences.map((s) => s.text));
    tally.documents++;
    tally.picks += before.sentences.length;
    tally.outside += outside.length;
    tally.keptPlain += outside.filter((t) => plainTexts.has(t)).length;
    tally.keptHysteresis += outside.filter((t) => keptTexts.has(t)).length;
    process.stderr.write(`\r${label}: ${k + 1}/${documents.length}`);
  });
  process.stderr.write('\n');
  return tally;
}

const share = (part: number, whole: number) => (whole > 0 ? `${((100 * part) / whole).toFixed(1)}%` : '—');

export async function run(argv: readonly string[]): Promise<number> {
  const value = (flag: string) => {
    const at = argv.indexOf(flag);
    return at >= 0 ? argv[at + 1] : undefined;
  };
  const split: Half = value('--split') === 'train' ? 'train' : 'test';
  const limit = Number(value('--limit') ?? Infinity);
  const rust = (await loadCorpus(corpusDirectory(argv), split)).documents.filter((d) => d.half === split).slice(0, limit);
  const nova = (await loadNovaCorpus(novaCorpusDirectory(argv), split)).documents.filter((d) => d.half === split).slice(0, limit);
  const rows = ['auto', 'tldr'].flatMap((budget) => [
    [`rust-rfcs, ${budget}`, measure(rust, 'markdown', budget, `rust-rfcs ${budget}`)],
    [`nova-specs, ${budget}`, measure(nova, 'restructuredtext', budget, `nova-specs ${budget}`)],
  ] as const);
  const text = [
    '# Churn under a one-paragraph edit',
    '',
    `Generated ${new Date().toISOString().slice(0, 10)} by \`node dist/bench.cjs churn${split === 'train' ? ' --split train' : ''}\` (${split} halves); do not edit by hand.`,
    '',
    'One paragraph of 15-40 words (the first such paragraph of the next document in the corpus) is inserted after a seeded-random paragraph; ' +
      'the edited text is summarized at the default length (auto) and at the tldr preset, without and with the first summary\'s texts passed back as `previous` ' +
      '(hysteresis margin `HYSTERESIS_DEFAULTS.margin`). "Kept" = share of the first summary\'s picks outside the inserted paragraph\'s own section that are still picked. Target ≥ 80%.',
    '',
    '| Corpus, length | documents | picks | picks outside the edited section | kept, no previous | kept, with previous (hysteresis) |',
    '| --- | ---: | ---: | ---: | ---: | ---: |',
    ...rows.map(([name, t]) => `| ${name} | ${t.documents} | ${t.picks} | ${t.outside} | ${share(t.keptPlain, t.outside)} | ${share(t.keptHysteresis, t.outside)} |`),
    '',
  ].join('\n');
  console.log(text);
  if (split === 'test' && !Number.isFinite(limit)) writeResultsBlock(RESULTS_FILE, 'churn', text);
  return 0;
}
