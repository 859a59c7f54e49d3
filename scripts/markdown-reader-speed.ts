/**
 * Speed of the Markdown readers, measured in one run on the same text: the mdast reader
 * (src/core/formats/markdown/markdown.ts), the markdown-it reader (src/core/formats/markdown-it, a full
 * ParsedDocument) and its stages, and a bare markdown-it parse (default options, tokens only).
 * Prints figures and ratios (the machine is shared, so ratios from one run mean more than
 * milliseconds); asserts nothing.
 *
 *   node --expose-gc --import tsx scripts/markdown-reader-speed.ts [--corpus PATH] [--runs N]
 *
 * Inputs: corpus documents in name order joined by blank lines, cut to 20 KB and 1 MB
 * (1 KB = 1,024 characters). The variants run in turn within each round, so load on the machine
 * falls on all of them alike; each figure is the median over the rounds after one warm-up round,
 * with the fastest round beside it (on a loaded machine the least disturbed run).
 *
 * Here and not in bench/: it times readers inside the engine, and bench/ reaches the engine only
 * through src/core/index.ts (test/unit/engine-boundary.test.ts).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import markdownIt from 'markdown-it';
import { markdownItTree, parseMarkdownFast } from '../src/core/formats/markdown-it/index';
import { parseTokens } from '../src/core/formats/markdown-it/parser';
import { parseMarkdown } from '../src/core/formats/markdown/markdown';
import { corpusDirectory } from '../bench/corpus';

const KB = 1024;
const SIZES = [{ label: '20 KB', chars: 20 * KB, rounds: 41 }, { label: '1 MB', chars: 1024 * KB, rounds: 7 }];
/** Targets from issue 12: the engine end to end; the reader must leave most of it to the later stages. */
const ENGINE_TARGETS_MS: Readonly<Record<string, number>> = { '20 KB': 10, '1 MB': 400 };

function markdownFiles(dir: string): string[] {
  return readdirSync(dir)
    .sort()
    .flatMap((name) => {
      const path = join(dir, name);
      return statSync(path).isDirectory() ? markdownFiles(path) : name.endsWith('.md') ? [path] : [];
    });
}

function corpusText(files: readonly string[], chars: number): string {
  const parts: string[] = [];
  let length = 0;
  for (let i = 0; length < chars; i = (i + 1) % files.length) {
    const text = readFileSync(files[i]!, 'utf8');
    parts.push(text);
    length += text.length + 2;
  }
  const text = parts.join('\n\n').slice(0, chars);
  return /[\uD800-\uDBFF]$/.test(text) ? text.slice(0, -1) : text;
}

const median = (values: readonly number[]): number => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
};

function run(args: readonly string[]): number {
  const files = markdownFiles(corpusDirectory(args));
  if (files.length === 0) {
    console.error('no corpus documents found (give the folder with --corpus PATH)');
    return 1;
  }
  const runsFlag = args.indexOf('--runs');
  const bare = markdownIt();
  const options = { baseOffset: 0, includeTables: false };
  console.log('Markdown readers (one warm-up round, then the rounds shown)');
  for (const size of SIZES) {
    const text = corpusText(files, size.chars);
    const rounds = runsFlag >= 0 ? Number(args[runsFlag + 1]) : size.rounds;
    const variants: [string, () => unknown][] = [
      ['bare markdown-it parse (tokens)', () => bare.parse(text, {})],
      ['reader: markdown-it tokens', () => parseTokens(text)],
      ['reader: tokens + mdast tree', () => markdownItTree(text)],
      ['reader: full ParsedDocument', () => parseMarkdownFast(text, options)],
      ["today's reader (mdast, full)", () => parseMarkdown(text, options)],
    ];
    const times = variants.map(() => [] as number[]);
    for (let round = 0; round <= rounds; round++) {
      variants.forEach(([, fn], v) => {
        const started = performance.now();
        fn();
        if (round > 0) times[v]!.push(performance.now() - started);
      });
    }
    const medians = times.map(median);
    const fastest = times.map((runs) => Math.min(...runs));
    const bareMs = medians[0]!;
    const readerMs = medians[3]!;
    const todayMs = medians[4]!;
    console.log(`\n${size.label} (${text.length} characters, ${rounds} rounds)`);
    console.log(`  ${''.padEnd(32)} ${'median'.padStart(8)}    × bare ${'fastest'.padStart(9)}    × bare`);
    variants.forEach(([name], v) => {
      const ratio = (medians[v]! / bareMs).toFixed(2).padStart(6);
      const fastestRatio = (fastest[v]! / fastest[0]!).toFixed(2).padStart(6);
      console.log(`  ${name.padEnd(32)} ${medians[v]!.toFixed(1).padStart(8)} ms ${ratio} ${fastest[v]!.toFixed(1).padStart(8)} ms ${fastestRatio}`);
    });
    console.log(`  today's reader / markdown-it reader: ${(todayMs / readerMs).toFixed(1)}×`);
    console.log(`  reader ${readerMs.toFixed(1)} ms against the engine's end-to-end target for ${size.label}: ${ENGINE_TARGETS_MS[size.label]} ms`);
  }
  return 0;
}

process.exitCode = run(process.argv.slice(2));
