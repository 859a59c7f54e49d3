/**
 * Fidelity of the markdown-it reader (src/core/formats/markdown-it) against the mdast reader
 * (src/core/formats/markdown/markdown.ts) on every Markdown document of the corpus. Prints figures, asserts
 * nothing; test/unit/parse-markdown-it.test.ts pins each class of difference with a small input.
 *
 *   npx tsx scripts/compare-markdown-readers.ts [--corpus PATH] [--include-tables] [--show N]
 *
 * A sentence matches when a sentence with the same text and the same span exists in the other
 * reading. Differences are grouped into regions (runs of top-level blocks the two trees disagree
 * on) and each region is named by the first rule in CLASSES that recognizes it.
 *
 * Here and not in bench/: it compares two readers inside the engine, and bench/ reaches the engine
 * only through src/core/index.ts (test/unit/engine-boundary.test.ts).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import type { List, Nodes, Paragraph, Root, RootContent } from 'mdast';
import { toString } from 'mdast-util-to-string';
import { markdownItTree, parseMarkdownFast } from '../src/core/formats/markdown-it/index';
import { parseMarkdown } from '../src/core/formats/markdown/markdown';
import { parseMarkdownTree } from '../src/core/formats/markdown/markdown-tree';
import type { Sentence, Skipped } from '../src/core/types';
import { corpusDirectory } from '../bench/corpus';

interface Region {
  readonly start: number;
  readonly end: number;
  readonly old: readonly RootContent[];
  readonly next: readonly RootContent[];
}

/** Named classes of difference, tried in order; the fallback names the block types. */
const CLASSES: readonly { readonly name: string; readonly matches: (region: Region) => boolean }[] = [
  {
    // CommonMark 0.31.2, List items: only a list that interrupts a paragraph must start at 1.
    name: 'ordered list starting above 1 after indented code: markdown-it (and commonmark.js) read a list, the mdast reader a paragraph',
    matches: (region) =>
      region.next.some((node) => node.type === 'list' && node.ordered === true && (node.start ?? 1) !== 1) &&
      region.old.some((node) => node.type === 'paragraph' && /^\d{1,9}[.)]\s/.test(toString(node as Paragraph))),
  },
  {
    // GFM spec 0.29, Tables (extension): cells beyond the header row's count are ignored.
    name: 'table read differently (a row with more cells than the header: markdown-it drops the excess as GFM says, the mdast reader keeps it)',
    matches: (region) => region.old.some((node) => node.type === 'table') && region.next.some((node) => node.type === 'table'),
  },
];

interface Tally {
  documents: Set<string>;
  onlyOld: number;
  onlyNew: number;
  skippedOld: number;
  skippedNew: number;
  example: string;
}

interface Difference {
  readonly file: string;
  readonly side: 'mdast only' | 'markdown-it only';
  readonly what: string;
  readonly start: number;
  readonly excerpt: string;
}

export function run(args: readonly string[]): number {
  const directory = corpusDirectory(args);
  const includeTables = args.includes('--include-tables');
  const showIndex = args.indexOf('--show');
  const show = showIndex >= 0 ? Number(args[showIndex + 1] ?? 20) : 20;
  const files = markdownFiles(directory);
  if (files.length === 0) {
    console.error(`no .md files in ${directory} (give the corpus with --corpus PATH)`);
    return 1;
  }

  let oldSentences = 0;
  let newSentences = 0;
  let matched = 0;
  let oldMs = 0;
  let newMs = 0;
  const same = { sections: 0, paragraphs: 0, skipped: 0, title: 0 };
  const reasons = new Map<string, [number, number]>();
  const classes = new Map<string, Tally>();
  const differences: Difference[] = [];

  for (const file of files) {
    const text = readFileSync(file, 'utf8');
    let started = performance.now();
    const old = parseMarkdown(text, { baseOffset: 0, includeTables });
    oldMs += performance.now() - started;
    started = performance.now();
    const next = parseMarkdownFast(text, { baseOffset: 0, includeTables });
    newMs += performance.now() - started;

    oldSentences += old.sentences.length;
    newSentences += next.sentences.length;
    const onlyOld = unmatched(old.sentences, next.sentences, sentenceKey);
    const onlyNew = unmatched(next.sentences, old.sentences, sentenceKey);
    matched += old.sentences.length - onlyOld.length;
    const skippedOld = unmatched(old.skipped, next.skipped, skippedKey);
    const skippedNew = unmatched(next.skipped, old.skipped, skippedKey);
    if (JSON.stringify(old.sections) === JSON.stringify(next.sections)) same.sections++;
    if (JSON.stringify(old.paragraphs) === JSON.stringify(next.paragraphs)) same.paragraphs++;
    if (skippedOld.length + skippedNew.length === 0) same.skipped++;
    if (old.title === next.title) same.title++;
    for (const [doc, side] of [[old, 0], [next, 1]] as const) {
      for (const skipped of doc.skipped) {
        const counts = reasons.get(skipped.reason) ?? [0, 0];
        counts[side]++;
        reasons.set(skipped.reason, counts);
      }
    }
    if (onlyOld.length + onlyNew.length + skippedOld.length + skippedNew.length === 0) continue;

    const name = file.slice(directory.length + 1);
    const regions = differingRegions(parseTree(text, 'mdast'), parseTree(text, 'markdown-it'));
    const classify = (start: number): Tally => {
      const region = regions.find((r) => r.start <= start && start < r.end);
      const label = region === undefined ? 'inside one block: inline reading differs' : className(region);
      let tally = classes.get(label);
      if (tally === undefined) {
        tally = { documents: new Set(), onlyOld: 0, onlyNew: 0, skippedOld: 0, skippedNew: 0, example: `${name} @${start}` };
        classes.set(label, tally);
      }
      tally.documents.add(name);
      return tally;
    };
    for (const s of onlyOld) classify(s.span.start).onlyOld++;
    for (const s of onlyNew) classify(s.span.start).onlyNew++;
    for (const s of skippedOld) classify(s.span.start).skippedOld++;
    for (const s of skippedNew) classify(s.span.start).skippedNew++;
    const excerpt = (start: number, end: number) => JSON.stringify(text.slice(start, Math.min(end, start + 90)));
    for (const s of onlyOld) differences.push({ file: name, side: 'mdast only', what: 'sentence', start: s.span.start, excerpt: excerpt(s.span.start, s.span.end) });
    for (const s of onlyNew) differences.push({ file: name, side: 'markdown-it only', what: 'sentence', start: s.span.start, excerpt: excerpt(s.span.start, s.span.end) });
    for (const s of skippedOld) differences.push({ file: name, side: 'mdast only', what: `skipped ${s.reason}`, start: s.span.start, excerpt: excerpt(s.span.start, s.span.end) });
    for (const s of skippedNew) differences.push({ file: name, side: 'markdown-it only', what: `skipped ${s.reason}`, start: s.span.start, excerpt: excerpt(s.span.start, s.span.end) });
  }

  const percent = (n: number, of: number) => `${((100 * n) / Math.max(1, of)).toFixed(3)}%`;
  console.log(`Markdown readers compared on ${files.length} documents of ${directory}${includeTables ? ', table cells read' : ', tables skipped'}`);
  console.log(`  mdast reader:       ${oldSentences} sentences, ${(oldMs / 1000).toFixed(1)} s in all`);
  console.log(`  markdown-it reader: ${newSentences} sentences, ${(newMs / 1000).toFixed(1)} s in all (times include the first, cold runs)`);
  console.log(`  sentences identical (text and span): ${matched} of ${oldSentences} (${percent(matched, oldSentences)}); only in mdast: ${oldSentences - matched}, only in markdown-it: ${newSentences - matched}`);
  console.log(`  documents with identical section trees: ${same.sections}/${files.length}; titles: ${same.title}/${files.length}; paragraphs: ${same.paragraphs}/${files.length}; skipped blocks: ${same.skipped}/${files.length}`);
  console.log('  skipped blocks by reason (mdast / markdown-it):');
  for (const [reason, [a, b]] of [...reasons].sort((x, y) => x[0].localeCompare(y[0]))) console.log(`    ${reason.padEnd(16)} ${String(a).padStart(6)} / ${b}`);
  console.log(`  classes of difference: ${classes.size}`);
  for (const [label, t] of classes) {
    console.log(`    ${label}`);
    console.log(`      ${t.documents.size} document(s), e.g. ${t.example}; sentences only in mdast ${t.onlyOld}, only in markdown-it ${t.onlyNew}; skipped blocks only in mdast ${t.skippedOld}, only in markdown-it ${t.skippedNew}`);
  }
  if (differences.length > 0) console.log(`  differences (${Math.min(show, differences.length)} of ${differences.length}):`);
  for (const d of differences.slice(0, show)) console.log(`    ${d.file} @${d.start} ${d.side} ${d.what}: ${d.excerpt}`);
  return 0;
}

function markdownFiles(dir: string): string[] {
  let names: string[];
  try {
    names = readdirSync(dir).sort();
  } catch {
    return [];
  }
  return names.flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? markdownFiles(path) : name.endsWith('.md') ? [path] : [];
  });
}

const sentenceKey = (s: Sentence): string => `${s.span.start}:${s.span.end}:${s.text}`;
const skippedKey = (s: Skipped): string => `${s.span.start}:${s.span.end}:${s.reason}`;

/** Items of `mine` with no equal item (by key) left in `theirs`, each match used once. */
function unmatched<T>(mine: readonly T[], theirs: readonly T[], key: (item: T) => string): T[] {
  const left = new Map<string, number>();
  for (const item of theirs) left.set(key(item), (left.get(key(item)) ?? 0) + 1);
  return mine.filter((item) => {
    const n = left.get(key(item)) ?? 0;
    if (n === 0) return true;
    left.set(key(item), n - 1);
    return false;
  });
}

/** The tree a reader read `text` with (offsets without a byte order mark, as both readers parse). */
function parseTree(text: string, reader: 'mdast' | 'markdown-it'): Root {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  return reader === 'markdown-it' ? markdownItTree(body) : parseMarkdownTree(body);
}

const blockKey = (node: Nodes): string => `${node.type}@${node.position?.start.offset}-${node.position?.end.offset}:${JSON.stringify(shape(node))}`;

/** A block's structure without positions: types, list starts, cell counts. */
function shape(node: Nodes): unknown {
  const own = node.type === 'list' ? `${node.type}:${(node as List).start ?? ''}` : node.type;
  return 'children' in node ? [own, ...node.children.map((child) => shape(child as Nodes))] : own;
}

/** Runs of top-level blocks on which the two trees disagree (by type, span or structure). */
function differingRegions(old: Root, next: Root): Region[] {
  const regions: Region[] = [];
  let i = 0;
  let j = 0;
  let open: { start: number; end: number; old: RootContent[]; next: RootContent[] } | null = null;
  const startOf = (node: RootContent | undefined) => node?.position?.start.offset ?? Infinity;
  const endOf = (node: RootContent) => node.position?.end.offset ?? 0;
  while (i < old.children.length || j < next.children.length) {
    const a = old.children[i];
    const b = next.children[j];
    if (a !== undefined && b !== undefined && blockKey(a) === blockKey(b)) {
      if (open !== null) regions.push(open);
      open = null;
      i++;
      j++;
      continue;
    }
    open ??= { start: Math.min(startOf(a), startOf(b)), end: 0, old: [], next: [] };
    const takeOld = a !== undefined && startOf(a) <= startOf(b);
    const takeNew = b !== undefined && startOf(b) <= startOf(a);
    if (takeOld) {
      open.old.push(a);
      open.end = Math.max(open.end, endOf(a));
      i++;
    }
    if (takeNew) {
      open.next.push(b);
      open.end = Math.max(open.end, endOf(b));
      j++;
    }
  }
  if (open !== null) regions.push(open);
  return regions;
}

function className(region: Region): string {
  const named = CLASSES.find((c) => c.matches(region));
  if (named !== undefined) return named.name;
  const types = (nodes: readonly RootContent[]) => nodes.map((n) => n.type).join('+') || 'nothing';
  return `blocks read differently: mdast ${types(region.old)}, markdown-it ${types(region.next)}`;
}

process.exitCode = run(process.argv.slice(2));
