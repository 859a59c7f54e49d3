/**
 * Pick audit (issue 11): what the default summaries pick, sentence by sentence, on both test halves
 * (rust-rfcs, Markdown; nova-specs, reStructuredText). Counted by rule on every pick:
 *  - fragments: six words or fewer, a lead-in ending in a colon, link-only, a bare reference
 *    (the engine's own rules, `fragmentKind`);
 *  - placeholders / boilerplate / bylines / metadata (`barredKind`), template text (sentences
 *    `learnTemplateText` finds recurring in the corpus's train half, as `tersely train` stores
 *    them in a model), and repeated sentences (same normalized text twice in one summary);
 *  - runs of more than two consecutive sentences of one paragraph.
 * Two lengths: the quality benchmark's (a word budget = the reference's words) and the default.
 *
 *   node dist/bench.cjs audit [--limit N] [--sample FILE]
 *
 * Writes the table to bench/RESULTS.md (full run) and 50 summaries to read to bench/out/audit-sample.md.
 */
import { mkdir, writeFile } from 'node:fs/promises';
import {
  barredKind,
  candidateSentences,
  defaultMaxentModel,
  finishSummary,
  fragmentKind,
  learnTemplateText,
  normalizeSentence,
  prepareDocument,
  rankPrepared,
  type DocumentFormat,
  type Summary,
} from '../src/core/index';
import { corpusDirectory, loadCorpus, type CorpusDocument, type CorpusLoad } from './corpus';
import { loadNovaCorpus, novaCorpusDirectory } from './nova-corpus';
import { RESULTS_FILE, writeResultsBlock } from './results-file';

interface Tally {
  summaries: number;
  picks: number;
  fragments: number;
  barred: number;
  template: number;
  repeated: number;
  longRuns: number;
  /** Runs in summaries whose length takes in every candidate sentence, where the rule lifts (selection-input.ts). */
  liftedRuns: number;
  words: number;
}

const newTally = (): Tally => ({ summaries: 0, picks: 0, fragments: 0, barred: 0, template: 0, repeated: 0, longRuns: 0, liftedRuns: 0, words: 0 });

/** Counts one summary's picks into the tally. */
export function auditSummary(summary: Summary, templateKeys: ReadonlySet<string>, tally: Tally, takesAll = false): void {
  const doc = summary.document;
  tally.summaries++;
  const seen = new Set<string>();
  let run = 0;
  let previous = -2;
  for (const pick of summary.sentences) {
    const sentence = doc.sentences[pick.sentence]!;
    const words = sentence.text.split(/\s+/).filter(Boolean).length;
    const source = doc.text.slice(sentence.span.start - doc.baseOffset, sentence.span.end - doc.baseOffset);
    const key = normalizeSentence(sentence.text);
    tally.picks++;
    tally.words += words;
    if (fragmentKind(sentence.text, words, source, { answeredInParagraph: sentence.positionInParagraph < sentence.paragraphLength - 1 }) !== null) tally.fragments++;
    if (barredKind(sentence.text, words) !== null) tally.barred++;
    if (templateKeys.has(key)) tally.template++;
    if (seen.has(key)) tally.repeated++;
    seen.add(key);
    const samePara = pick.sentence === previous + 1 && doc.sentences[previous]?.paragraph === sentence.paragraph;
    run = samePara ? run + 1 : 1;
    if (run === 3) {
      if (takesAll) tally.liftedRuns++;
      else tally.longRuns++;
    }
    previous = pick.sentence;
  }
}

interface HalfAudit {
  readonly name: string;
  readonly format: DocumentFormat;
  readonly load: CorpusLoad;
  readonly train: CorpusLoad;
}

/** The summary, and whether a word budget takes in every candidate sentence (the run limit then lifts). */
function summarizeAt(doc: CorpusDocument, format: DocumentFormat, budget: { unit: 'words'; value: number } | undefined, templateText: readonly string[]): { summary: Summary; takesAll: boolean } {
  const model = { ...defaultMaxentModel(), templateText };
  const preparation = prepareDocument(doc.bodyText, { format, budget, model });
  if (!preparation.ok) throw new Error(`${doc.file}: ${preparation.refused.refused}`);
  const { prepared } = preparation;
  const candidateWords = candidateSentences(prepared).reduce((sum, i) => sum + prepared.analyzed.words[i]!.length, 0);
  return { summary: finishSummary(prepared, rankPrepared(prepared)), takesAll: budget !== undefined && budget.value >= candidateWords };
}

/** Summaries per corpus written to the reading sample (50 in all). */
const SAMPLE_PER_CORPUS = 25;

const percent = (part: number, whole: number) => (whole > 0 ? `${((100 * part) / whole).toFixed(1)}%` : '—');

export async function run(argv: readonly string[]): Promise<number> {
  const at = argv.indexOf('--limit');
  const limit = at >= 0 ? Number(argv[at + 1]) : Infinity;
  const halves: HalfAudit[] = [
    { name: 'rust-rfcs', format: 'markdown', load: await loadCorpus(corpusDirectory(argv), 'test'), train: await loadCorpus(corpusDirectory(argv), 'train') },
    { name: 'nova-specs', format: 'restructuredtext', load: await loadNovaCorpus(novaCorpusDirectory(argv), 'test'), train: await loadNovaCorpus(novaCorpusDirectory(argv), 'train') },
  ];
  const rows: string[] = [];
  const sample: string[] = ['# 50 default summaries to read (pick audit)', ''];
  for (const half of halves) {
    const templateText = learnTemplateText(half.train.documents.filter((d) => d.half === 'train').map((d) => d.body));
    const templateKeys = new Set(templateText.map(normalizeSentence));
    const documents = half.load.documents.filter((d) => d.half === 'test').slice(0, limit);
    const tallies = { benchmark: newTally(), default: newTally() };
    let sampled = 0;
    documents.forEach((doc, k) => {
      const reference = summarizeAt(doc, half.format, { unit: 'words', value: doc.referenceWords }, templateText);
      auditSummary(reference.summary, templateKeys, tallies.benchmark, reference.takesAll);
      const atDefault = summarizeAt(doc, half.format, undefined, templateText).summary;
      auditSummary(atDefault, templateKeys, tallies.default);
      // 25 summaries per corpus, spread evenly over its test half.
      if (k % Math.max(1, Math.floor(documents.length / SAMPLE_PER_CORPUS)) === 0 && sampled < SAMPLE_PER_CORPUS) {
        sampled++;
        sample.push(`## ${half.name}: ${doc.file} (default length, ${atDefault.stats.wordsOut} words)`, '');
        for (const pick of atDefault.sentences) sample.push(`- ${pick.text}`);
        if (atDefault.leftOut && atDefault.leftOut.length > 0) sample.push('', `Left out: ${atDefault.leftOut.map((l) => `${l.heading || '(top)'} (${l.reason})`).join('; ')}`);
        sample.push('');
      }
      process.stderr.write(`\r${half.name}: ${k + 1}/${documents.length}`);
    });
    process.stderr.write('\n');
    for (const [length, t] of Object.entries(tallies)) {
      rows.push(
        `| ${half.name} | ${length === 'benchmark' ? 'reference length (benchmark)' : 'default length'} | ${t.summaries} | ${t.picks} | ${(t.words / Math.max(1, t.picks)).toFixed(1)} | ` +
          `${percent(t.fragments, t.picks)} | ${t.barred} | ${t.template} | ${t.repeated} | ${t.longRuns}${t.liftedRuns > 0 ? ` (and ${t.liftedRuns} where the length takes in every candidate sentence)` : ''} |`,
      );
    }
    rows.push(`| ${half.name} | template sentences learned from the train half | ${templateText.length} | | | | | | | |`);
  }
  const text = [
    '# Pick audit',
    '',
    `Generated ${new Date().toISOString().slice(0, 10)} by \`node dist/bench.cjs audit\` on the test halves; do not edit by hand.`,
    '',
    'Every pick of the default method, counted by rule: fragments = six words or fewer, a lead-in ending in a colon, a question its paragraph goes on to answer, link-only, a bare reference, a pointer elsewhere (\'For more information, see …\') or an unfinished clause (ending in a comma, a semicolon, \'and\', \'or\', \'nor\' or \'but\'); ' +
      'barred = placeholder answers, pull-request boilerplate, bylines, metadata lines; template = a sentence `learnTemplateText` finds recurring ' +
      'in independent documents of the same corpus\'s train half (what `tersely train` stores in a model), passed to the engine in the model; ' +
      'repeated = the same normalized text twice in one summary; runs = three or more consecutive sentences of one paragraph (the rule lifts when the length takes in every candidate sentence; such runs are counted apart).',
    '',
    '| Corpus | Length | summaries | picks | words / pick | fragments (target ≤ 12%) | barred picks (target 0) | template picks (target 0) | repeated (target 0) | runs > 2 (target 0) |',
    '| --- | --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |',
    ...rows,
    '',
  ].join('\n');
  console.log(text);
  if (!Number.isFinite(limit)) writeResultsBlock(RESULTS_FILE, 'audit', text);
  await mkdir('bench/out', { recursive: true });
  await writeFile('bench/out/audit-sample.md', sample.join('\n') + '\n');
  console.log('50 summaries to read: bench/out/audit-sample.md');
  return 0;
}
