/**
 * Digest benchmark: quality on groups of related documents, and speed on a whole folder.
 *
 *   node dist/bench.cjs digest [--split test|train] [--limit N] [--speed-only | --quality-only] [--write]
 *
 * Groups of related documents, from both corpora, each member with its author's summary withheld:
 *  - nova-specs: a spec re-proposed in several release folders (same file name after the last
 *    `--`); the group's half is its name's (bench/nova-corpus.ts hash).
 *  - rust-rfcs: an RFC and the RFCs it names by number ("RFC 1234", "RFC #1234") that are in the
 *    corpus, at most MAX_CITED of them; the group's half is the citing RFC's.
 * Per group: the digest, and two anchors at the same word budget (the words of the group's
 * summaries together): lead-per-document (first sentences of each document in turn) and random
 * (seeded). Figures: ROUGE-1/2 of each against the concatenation of the group's own summaries
 * (Porter stemming, stop words kept); coverage (share of the group's documents with a sentence in
 * the output); near-duplicate pairs in the output (two sentences of different documents whose
 * word-token cosine, stop words kept and nothing stemmed, is at least 0.8 — a different measure
 * from the engine's own stemmed tf·idf test; target 0).
 *
 * Speed: every file of each corpus folder through the streaming builder, one at a time, in one
 * process; time, throughput and heap after the digest (with --expose-gc).
 */
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import {
  candidateSentences,
  digestDocuments,
  formatForFileName,
  prepareDocument,
  rougeN,
  startDigest,
  wordTokens,
  type DocumentFormat,
  type RougeOptions,
} from '../src/core/index';
import { corpusDirectory, documentNumber, halfOf, loadCorpus, type CorpusDocument, type Half } from './corpus';
import { loadNovaCorpus, nameHash, novaCorpusDirectory } from './nova-corpus';
import { RESULTS_FILE, writeResultsBlock } from './results-file';
import { seededRandom } from './seeded-random';

const ROUGE_OPTIONS: RougeOptions = { stem: true };
const MAX_CITED = 3;
const DUPLICATE_COSINE = 0.8;
const RANDOM_SEED = 20261202;

interface Member {
  readonly file: string;
  readonly body: string;
  readonly reference: readonly string[];
}

interface Group {
  readonly key: string;
  readonly format: DocumentFormat;
  readonly members: readonly Member[];
}

const memberOf = (d: CorpusDocument): Member => ({ file: d.file, body: d.bodyText, reference: d.referenceSentences });

export function novaGroups(documents: readonly CorpusDocument[]): Group[] {
  const byName = new Map<string, CorpusDocument[]>();
  for (const d of documents) {
    const name = d.file.slice(d.file.lastIndexOf('--') + 2);
    byName.set(name, [...(byName.get(name) ?? []), d]);
  }
  return [...byName.entries()].filter(([, list]) => list.length >= 2).map(([key, list]) => ({ key, format: 'restructuredtext', members: list.map(memberOf) }));
}

const CITATION = /\bRFC\s?#?(\d{1,4})\b/gi;

export function rfcGroups(documents: readonly CorpusDocument[]): Group[] {
  const byNumber = new Map(documents.map((d) => [d.number, d]));
  const groups: Group[] = [];
  for (const d of documents) {
    const cited: CorpusDocument[] = [];
    for (const match of d.bodyText.matchAll(CITATION)) {
      const other = byNumber.get(Number(match[1]));
      if (other && other !== d && !cited.includes(other)) cited.push(other);
      if (cited.length === MAX_CITED) break;
    }
    if (cited.length > 0) groups.push({ key: d.file, format: 'markdown', members: [d, ...cited].map(memberOf) });
  }
  return groups;
}

interface Output {
  readonly sentences: readonly { readonly file: string; readonly text: string }[];
}

function leadPerDocument(group: Group, budget: number): Output {
  const lists = group.members.map((m) => candidateTexts(m, group.format));
  const out: { file: string; text: string }[] = [];
  let words = 0;
  for (let round = 0; ; round++) {
    let any = false;
    for (const [k, list] of lists.entries()) {
      const text = list[round];
      if (text === undefined) continue;
      any = true;
      const w = wordTokens(text).length;
      if (words + w <= budget) {
        out.push({ file: group.members[k]!.file, text });
        words += w;
      }
    }
    if (!any) return { sentences: out };
  }
}

function randomPick(group: Group, budget: number, random: () => number): Output {
  const all = group.members.flatMap((m) => candidateTexts(m, group.format).map((text) => ({ file: m.file, text })));
  for (let i = all.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [all[i], all[j]] = [all[j]!, all[i]!];
  }
  const out: { file: string; text: string }[] = [];
  let words = 0;
  for (const s of all) {
    const w = wordTokens(s.text).length;
    if (words + w <= budget) {
      out.push(s);
      words += w;
    }
  }
  return { sentences: out };
}

function candidateTexts(member: Member, format: DocumentFormat): string[] {
  const p = prepareDocument(member.body, { format });
  if (!p.ok) return [];
  return candidateSentences(p.prepared).map((i) => p.prepared.analyzed.doc.sentences[i]!.text);
}

function wordCosine(a: string, b: string): number {
  const count = (text: string) => {
    const m = new Map<string, number>();
    for (const w of wordTokens(text)) m.set(w, (m.get(w) ?? 0) + 1);
    return m;
  };
  const x = count(a);
  const y = count(b);
  let dot = 0;
  for (const [w, c] of x) dot += c * (y.get(w) ?? 0);
  const norm = (m: Map<string, number>) => Math.sqrt([...m.values()].reduce((s, c) => s + c * c, 0));
  return dot === 0 ? 0 : dot / (norm(x) * norm(y));
}

function nearDuplicatePairs(output: Output): number {
  let pairs = 0;
  const s = output.sentences;
  for (let i = 0; i < s.length; i++) for (let j = i + 1; j < s.length; j++) if (s[i]!.file !== s[j]!.file && wordCosine(s[i]!.text, s[j]!.text) >= DUPLICATE_COSINE) pairs++;
  return pairs;
}

interface Row {
  groups: number;
  r1: number;
  r2: number;
  r1r: number;
  coverage: number;
  duplicates: number;
  groupsWithDuplicates: number;
}

const emptyRow = (): Row => ({ groups: 0, r1: 0, r2: 0, r1r: 0, coverage: 0, duplicates: 0, groupsWithDuplicates: 0 });

function score(row: Row, output: Output, group: Group, reference: readonly (readonly string[])[]): void {
  const texts = output.sentences.map((s) => s.text);
  const r1 = rougeN(texts, reference, 1, ROUGE_OPTIONS);
  row.groups++;
  row.r1 += r1.f1;
  row.r1r += r1.recall;
  row.r2 += rougeN(texts, reference, 2, ROUGE_OPTIONS).f1;
  row.coverage += new Set(output.sentences.map((s) => s.file)).size / group.members.length;
  const duplicates = nearDuplicatePairs(output);
  row.duplicates += duplicates;
  if (duplicates > 0) row.groupsWithDuplicates++;
}

function evaluate(groups: readonly Group[]): Record<'digest' | 'lead' | 'random', Row> {
  const rows = { digest: emptyRow(), lead: emptyRow(), random: emptyRow() };
  const random = seededRandom(RANDOM_SEED);
  for (const group of groups) {
    // One reference: the group's own summaries, concatenated (one list of sentences).
    const reference = group.members.flatMap((m) => m.reference);
    const budget = reference.reduce((sum, s) => sum + wordTokens(s).length, 0);
    const digest = digestDocuments(
      group.members.map((m) => ({ file: m.file, text: m.body, format: group.format })),
      { budget: { unit: 'words', value: budget } },
    );
    score(rows.digest, digest, group, [reference]);
    score(rows.lead, leadPerDocument(group, budget), group, [reference]);
    score(rows.random, randomPick(group, budget, random), group, [reference]);
  }
  return rows;
}

function qualityTable(name: string, rows: Record<string, Row>): string[] {
  const f = (x: number, n: number) => (n > 0 ? (x / n).toFixed(3) : '–');
  return Object.entries(rows).map(
    ([method, r]) =>
      `| ${name} | ${method} | ${r.groups} | ${f(r.r1, r.groups)} | ${f(r.r2, r.groups)} | ${f(r.r1r, r.groups)} | ${f(r.coverage, r.groups)} | ${r.duplicates} (${r.groupsWithDuplicates} groups) |`,
  );
}

async function speed(folder: string): Promise<string> {
  const names = (await readdir(folder)).filter((n) => formatForFileName(n)).sort();
  const gc = (globalThis as { gc?: () => void }).gc;
  gc?.();
  const heapBefore = process.memoryUsage().heapUsed;
  const started = performance.now();
  const builder = startDigest({ budget: { unit: 'sentences', value: 40 } });
  let bytes = 0;
  let peakHeap = 0;
  for (const name of names) {
    const text = await readFile(join(folder, name), 'utf8');
    bytes += Buffer.byteLength(text);
    builder.add(name, text, formatForFileName(name)!.id);
    peakHeap = Math.max(peakHeap, process.memoryUsage().heapUsed);
  }
  const read = performance.now();
  const digest = builder.finish();
  const done = performance.now();
  gc?.();
  const heapAfter = process.memoryUsage().heapUsed;
  const mb = (x: number) => (x / 1024 / 1024).toFixed(1);
  return (
    `| ${folder.split('/').slice(-2).join('/')} | ${names.length} | ${mb(bytes)} MB | ${((done - started) / 1000).toFixed(1)} s | ${((read - started) / 1000).toFixed(1)} s | ` +
    `${((done - read) / 1000).toFixed(2)} s | ${(names.length / ((done - started) / 1000)).toFixed(0)} | ${mb(peakHeap)} MB | ${gc ? mb(heapAfter - heapBefore) + ' MB' : 'run with --expose-gc'} | ${digest.stats.documentsRepresented} / ${digest.sentences.length} |`
  );
}

export async function run(args: string[]): Promise<number> {
  const split = (args.includes('--split') ? args[args.indexOf('--split') + 1] : 'test') as Half;
  const limit = args.includes('--limit') ? Number(args[args.indexOf('--limit') + 1]) : Infinity;
  const lines: string[] = [];
  if (!args.includes('--speed-only')) {
    const started = Date.now();
    const nova = (await loadNovaCorpus(novaCorpusDirectory(args), 'both')).documents;
    const rust = (await loadCorpus(corpusDirectory(args), 'both')).documents;
    const novaSet = novaGroups(nova).filter((g) => (nameHash(g.key) % 2 === 0 ? 'train' : 'test') === split).slice(0, limit);
    const rustSet = rfcGroups(rust).filter((g) => halfOf(documentNumber(g.key)!) === split).slice(0, limit);
    lines.push(
      `### Quality (${split} half; ${novaSet.length} nova-specs groups of re-proposed specs, ${rustSet.length} rust-rfcs groups of citing and cited RFCs)`,
      '',
      '| corpus | output | groups | ROUGE-1 F1 | ROUGE-2 F1 | ROUGE-1 R | coverage | near-duplicate pairs |',
      '|---|---|---|---|---|---|---|---|',
      ...qualityTable('nova-specs', evaluate(novaSet)),
      ...qualityTable('rust-rfcs', evaluate(rustSet)),
      '',
      `(${((Date.now() - started) / 1000).toFixed(0)} s)`,
    );
    console.log(lines.join('\n'));
  }
  if (args.includes('--quality-only')) return 0;
  const speedLines = [
    '### Speed (every file of the folder, streamed one at a time; machine shared, 2 cores)',
    '',
    '| folder | files | size | total | reading + ranking | across the set | files/s | peak heap | heap kept after | represented / sentences |',
    '|---|---|---|---|---|---|---|---|---|---|',
    await speed(novaCorpusDirectory(args)),
    await speed(corpusDirectory(args)),
  ];
  console.log(speedLines.join('\n'));
  lines.push('', ...speedLines);
  if (args.includes('--write') && split === 'test' && !args.includes('--speed-only')) {
    writeResultsBlock(RESULTS_FILE, 'digest', ['## Digests of several documents', '', 'bench/digest.ts (procedure in its header).', '', ...lines].join('\n'));
  } else if (args.includes('--write') && args.includes('--speed-only')) {
    writeResultsBlock(RESULTS_FILE, 'digest-speed', ['### Digest speed, measured alone (bench/digest.ts --speed-only)', '', ...speedLines.slice(2)].join('\n'));
  }
  return 0;
}
