/**
 * The quality benchmark's report: the table of methods and anchors, the targets of the collection,
 * the stand-alone check table and the hand-written notes (bench/quality-notes.ts).
 */
import { defaultModel, type RankerName } from '../src/core/index';
import type { Collection } from './collections';
import type { CorpusLoad, Half } from './corpus';
import { NOTES } from './quality-notes';

export type Metric = 'r1' | 'r2' | 'rl';
export const METRICS: readonly Metric[] = ['r1', 'r2', 'rl'];

export interface RowTotals {
  readonly name: string;
  readonly anchor: boolean;
  f1: Record<Metric, number>;
  recall: Record<Metric, number>;
  milliseconds: number;
  documents: number;
  /** ROUGE-1 F1 per document, in document order (for the beats-lead count). */
  readonly perDocument: number[];
  words: number;
  sentences: number;
  flagged: number;
}

export interface Totals {
  readonly rows: Map<string, RowTotals>;
  analyzeMilliseconds: number;
  repaired: RowTotals;
}

export interface ReportContext {
  readonly collection: Collection;
  readonly directory: string;
  readonly split: Half;
  readonly defaultMethod: RankerName;
  readonly corpus: CorpusLoad;
  readonly documents: number;
  readonly seconds: number;
}

export const fixed = (value: number, digits = 3) => value.toFixed(digits);
export const mean = (row: RowTotals, value: number) => (row.documents > 0 ? value / row.documents : 0);

export function beatsShare(row: RowTotals, lead: RowTotals): number {
  let wins = 0;
  row.perDocument.forEach((value, i) => {
    if (value > lead.perDocument[i]!) wins++;
  });
  return row.perDocument.length > 0 ? wins / row.perDocument.length : 0;
}

export function gapClosed(row: RowTotals, lead: RowTotals, oracle: RowTotals, metric: Metric): number {
  const gap = mean(oracle, oracle.f1[metric]) - mean(lead, lead.f1[metric]);
  return gap > 0 ? (mean(row, row.f1[metric]) - mean(lead, lead.f1[metric])) / gap : 0;
}

function table(rows: readonly RowTotals[], lead: RowTotals, defaultMethod: string): string {
  const lines = [
    '| Method | R-1 F1 | R-2 F1 | R-L F1 | R-1 recall | R-2 recall | R-L recall | beats lead (R-1 F1) | words / summary | ms / doc |',
    '| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |',
  ];
  const sorted = [...rows].sort((a, b) => mean(b, b.f1.r1) - mean(a, a.f1.r1));
  for (const row of sorted) {
    const name = row.name === defaultMethod ? `**${row.name} (default)**` : row.anchor ? `_${row.name}_ (anchor)` : row.name;
    lines.push(
      `| ${name} | ${METRICS.map((m) => fixed(mean(row, row.f1[m]))).join(' | ')} | ${METRICS.map((m) => fixed(mean(row, row.recall[m]))).join(' | ')} | ` +
        `${row === lead ? '—' : `${(100 * beatsShare(row, lead)).toFixed(0)}%`} | ${fixed(mean(row, row.words), 1)} | ${fixed(mean(row, row.milliseconds), 2)} |`,
    );
  }
  return lines.join('\n');
}

function command(context: ReportContext): string {
  const flags = [context.collection.id === 'rust-rfcs' ? '' : ` --collection ${context.collection.id}`, context.split === 'test' ? '' : ` --split ${context.split}`].join('');
  return `node dist/bench.cjs quality${flags}`;
}

export function report(context: ReportContext, totals: Totals): string {
  const { collection, corpus, split, defaultMethod } = context;
  const rows = [...totals.rows.values()];
  const get = (name: string) => totals.rows.get(name)!;
  const lead = get('lead');
  const oracle = get('oracle');
  const best = get(defaultMethod);
  const halfFiles = corpus.documents.length + Object.values(corpus.skipped).reduce((a, b) => a + b, 0);
  const skipped = Object.entries(corpus.skipped).map(([reason, count]) => `${count} × ${reason}`).join('; ') || 'none';
  const figures = {
    r1: mean(best, best.f1.r1),
    r2: mean(best, best.f1.r2),
    leadR1: mean(lead, lead.f1.r1),
    beatsLead: beatsShare(best, lead),
    gapClosed: gapClosed(best, lead, oracle, 'r1'),
  };
  const belowLead = rows.filter((r) => !r.anchor && mean(r, r.f1.r1) <= mean(lead, lead.f1.r1)).map((r) => r.name);
  const repaired = totals.repaired;
  const share = (row: RowTotals) => (row.sentences > 0 ? row.flagged / row.sentences : 0);
  const shown = context.directory.endsWith(collection.shippedFolder.slice(2)) ? collection.shippedFolder : context.directory;
  const model = (label: string, trainedOn: Readonly<Record<string, unknown>> | undefined, file: string) =>
    `- _${label}_ uses the shipped model \`${file}\`, trained on train halves only by \`${String(trainedOn?.command ?? '(command not recorded)')}\` (run from the project folder).`;
  const title = collection.id === 'rust-rfcs' ? '# Quality benchmark' : '# Quality benchmark: reStructuredText (nova-specs)';
  return [
    title,
    '',
    `Generated ${new Date().toISOString().slice(0, 10)} by ${split === 'test' ? `\`npm run bench\` (\`${command(context)}\`)` : `\`${command(context)}\``}; do not edit by hand.`,
    '',
    `- Corpus: ${collection.describeCorpus(corpus.files, shown)}.`,
    `- Procedure: ${collection.procedure} with a word budget equal to the reference's word count; documents with a reference under 15 words or a body under 5 sentences are skipped. Of the ${halfFiles} files in the ${split} half, ${corpus.documents.length} are usable; skipped: ${skipped}.`,
    `- Split by document: ${collection.split}. **This table: ${split} half, ${context.documents} documents.**`,
    '- ROUGE: Tersely\'s own implementation (`src/core/evaluate/rouge.ts`, checked against Lin 2004\'s examples and the `js-rouge` package), Porter stemming, stop words kept, one reference; ROUGE-L is summary-level union LCS. Figures are means over documents.',
    '- Anchors (computed by the bench, not by the engine): _lead_ = the first body sentences that fit the budget; _random_ = sentences in a seeded random order that fit; _oracle_ = greedy pick maximising ROUGE-1 F1 + ROUGE-2 F1 against the reference (a ceiling for extractive methods). All see the same candidate sentences as the methods (prose sentences outside the default excluded sections).',
    model('bayes', defaultModel().trainedOn, 'media/models/default-model.json'),
    `- ms / doc: ranking + selection per document (parsing and analysis, shared by all methods, took ${fixed(totals.analyzeMilliseconds / Math.max(1, context.documents), 2)} ms / doc). Whole run: ${context.seconds.toFixed(1)} s.`,
    '',
    table(rows, lead, defaultMethod),
    '',
    `## Targets (default method \`${defaultMethod}\`, F1)`,
    '',
    '| Target | Met | Value |',
    '| --- | --- | ---: |',
    ...collection.targets.map((t) => `| ${t.label(figures)} | ${t.met(figures) ? 'yes' : '**no**'} | ${t.value(figures)} |`),
    '',
    `Share of the lead→oracle gap the default closes: ROUGE-1 ${(100 * gapClosed(best, lead, oracle, 'r1')).toFixed(1)}%, ROUGE-2 ${(100 * gapClosed(best, lead, oracle, 'r2')).toFixed(1)}%, ROUGE-L ${(100 * gapClosed(best, lead, oracle, 'rl')).toFixed(1)}%.`,
    '',
    '## Stand-alone check and automatic repair (default method)',
    '',
    '| Run | flagged sentences / summary | flagged share | R-1 F1 | R-2 F1 | R-L F1 |',
    '| --- | ---: | ---: | ---: | ---: | ---: |',
    `| suggest (no repair) | ${fixed(mean(best, best.flagged), 2)} | ${(100 * share(best)).toFixed(1)}% | ${METRICS.map((m) => fixed(mean(best, best.f1[m]))).join(' | ')} |`,
    `| repair: auto | ${fixed(mean(repaired, repaired.flagged), 2)} | ${(100 * share(repaired)).toFixed(1)}% | ${METRICS.map((m) => fixed(mean(repaired, repaired.f1[m]))).join(' | ')} |`,
    '',
    '## Notes',
    '',
    belowLead.length > 0 ? `- Methods that do not beat the lead anchor on ROUGE-1 F1: ${belowLead.join(', ')}.` : '- Every method beats the lead anchor on ROUGE-1 F1.',
    `- The oracle is the extractive ceiling at this budget (${fixed(mean(oracle, oracle.f1.r1))} ROUGE-1 F1): authors' summaries paraphrase and often say things the body never states, so no sentence picker gets close to 1.`,
    ...NOTES[collection.id],
    '',
  ].join('\n');
}
