/**
 * Speed and footprint benchmark: prints one table, asserts nothing.
 *
 *   node --expose-gc dist/bench.cjs speed [--corpus PATH] [--quick] [--full]
 *
 * Inputs are corpus documents (../shared/corpus/rust-rfcs/docs) concatenated and cut to size
 * (1 KB = 1,024 characters). Every size runs in its own child process, so its peak resident
 * memory (maxRSS from process.resourceUsage) belongs to that size alone. Times are medians of
 * several runs after warm-up runs (the 2 MB and 10 MB rows: one cold run); the stage columns
 * time the same pipeline as summarize() (parse → analyze → rank → select+check) piece by piece,
 * so the bottleneck is visible.
 * --quick: fewer runs and no 2 MB / 10 MB rows; --full: also 10 MB of plain text with the cap raised.
 *
 * Beside the engine, the same child process times a bare markdown-it parse of the same text
 * (default options, `md.parse`, the package's published browser build), so the engine's time can
 * be read as a multiple of the parser's on a machine whose speed varies; and a live row: a summary
 * session (createSummarySession) on a 200 KB document, re-summarized after one paragraph is
 * edited, edit after edit.
 */
import os from 'node:os';
import { RESULTS_FILE, writeResultsBlock } from './results-file';
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join, resolve } from 'node:path';
// The yardstick is markdown-it as its authors publish it: the engine's bundled copy sets its class
// fields by plain assignment (scripts/markdown-it-fields.mjs), the package's browser build does not.
import markdownIt from 'markdown-it/browser';
import { createSummarySession, parseDocument, resolveOptions, summarize, type SummaryStage } from '../src/core/index';
import type { DocumentFormat, Summary } from '../src/core/index';
import { corpusDirectory } from './corpus';

const KB = 1024;
const MB = 1024 * KB;

/** Targets from the project's issues (issue 12: engine speed); printed beside the figures. */
const TARGETS = {
  smallMs: 10,
  megabyteMs: 400,
  tenMegabyteMs: 5000,
  /** Time per KB from 20 KB to 10 MB may grow by this factor at most. */
  growth: 1.3,
  shortLinesMs: 3000,
  megabyteRssMb: 150,
  /** Engine 1 MB time ÷ bare markdown-it parse of the same text, same process. */
  parserRatio: 5,
  liveMs: 15,
};

/** Sentences in the "short sentences" row ("Line N is ok."). */
const SHORT_LINES = 100_000;

interface Job {
  readonly label: string;
  readonly format: DocumentFormat;
  readonly chars: number;
  readonly warmups: number;
  readonly runs: number;
  /** Passed as maxChars; above the default cap for the 10 MB rows. */
  readonly maxChars?: number;
  /** Time the stages separately as well (skipped for the slowest rows). */
  readonly stages: boolean;
  /** 'short-lines': SHORT_LINES lines "Line N is ok." instead of corpus text. */
  readonly input?: 'corpus' | 'short-lines';
  /** Also time a bare markdown-it parse of the same text. */
  readonly bare?: boolean;
  /** Also time this many live re-summaries after one-paragraph edits (a summary session). */
  readonly edits?: number;
  /**
   * Also summarize this many different texts of the same size once each: what a user's new
   * document costs, where the timed runs repeat one text (and find its patterns compiled).
   */
  readonly distinct?: number;
}

interface JobResult {
  readonly label: string;
  readonly format: DocumentFormat;
  readonly chars: number;
  readonly sentences: number;
  readonly picked: number;
  readonly refused?: string;
  readonly medianMs: number;
  readonly runs: readonly number[];
  readonly stages?: { parse: number; analyze: number; rank: number; select: number };
  readonly baselineRssMb: number;
  /** maxRSS over all the runs of this size (warm-up, timed and staged). */
  readonly peakRssMb: number;
  /** maxRSS of a fresh process that summarizes once: the memory one summary needs. */
  readonly singleRunPeakRssMb?: number;
  readonly peakHeapMb: number;
  /** Median of bare markdown-it parses of the same text (same process, after the engine runs). */
  readonly bareParseMs?: number;
  /** Live row: median re-summary after a one-paragraph edit, pieces read per edit, edits timed. */
  readonly live?: { readonly medianMs: number; readonly piecesRead: number; readonly pieces: number; readonly edits: number };
  /** Median over `distinct` different texts, each summarized once after the timed runs. */
  readonly distinct?: { readonly medianMs: number; readonly texts: number };
}

const median = (values: readonly number[]): number => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length === 0 ? NaN : sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
};

/**
 * Collects garbage once, before the baseline memory reading. Not before each timed run: a forced
 * collection shrinks the young generation and made the next 20 KB run about twice as slow.
 */
const gc = (): void => (globalThis as { gc?: () => void }).gc?.();
const mb = (bytes: number): number => bytes / MB;

// ------------------------------------------------------------------ input

function markdownFiles(dir: string): string[] {
  return readdirSync(dir)
    .sort()
    .flatMap((name) => {
      const path = join(dir, name);
      return statSync(path).isDirectory() ? markdownFiles(path) : name.endsWith('.md') ? [path] : [];
    });
}

/** Corpus documents joined by blank lines (repeated if the corpus is smaller), cut to `chars`; from the `first`-th file on. */
function corpusText(dir: string, chars: number, first = 0): string {
  const files = markdownFiles(dir);
  if (files.length === 0) throw new Error(`no .md files in ${dir}`);
  const parts: string[] = [];
  let length = 0;
  for (let i = first % files.length; length < chars; i = (i + 1) % files.length) {
    const text = readFileSync(files[i]!, 'utf8');
    parts.push(text);
    length += text.length + 2;
  }
  let text = parts.join('\n\n').slice(0, chars);
  // Never end on half of a surrogate pair.
  if (/[\uD800-\uDBFF]$/.test(text)) text = text.slice(0, -1);
  return text;
}

// ------------------------------------------------------------------ one size, in a child process

function shortLines(count: number): string {
  return Array.from({ length: count }, (_, i) => `Line ${i + 1} is ok.`).join('\n') + '\n';
}

/**
 * Re-summaries in one session after one-paragraph edits: each edit inserts a word into a
 * paragraph further along the document (and the next edit starts from the edited text).
 */
function liveEdits(text: string, request: { format: DocumentFormat }, edits: number): NonNullable<JobResult['live']> {
  const session = createSummarySession();
  session.summarize(text, request);
  const times: number[] = [];
  let pieces = 0;
  let piecesRead = 0;
  let current = text;
  for (let e = 0; e < edits; e++) {
    // A sentence end in the e-th slice of the document: the edit lands inside a paragraph.
    const at = current.indexOf('. ', Math.floor(((e + 0.5) / edits) * current.length));
    if (at < 0) continue;
    current = current.slice(0, at) + ' today' + current.slice(at);
    const started = performance.now();
    session.summarize(current, request);
    times.push(performance.now() - started);
    pieces = session.lastUpdate?.pieces ?? 0;
    piecesRead += session.lastUpdate?.piecesRead ?? 0;
  }
  return { medianMs: median(times), piecesRead: piecesRead / Math.max(1, times.length), pieces, edits: times.length };
}

function runJob(job: Job, corpus: string): JobResult {
  const text = job.input === 'short-lines' ? shortLines(SHORT_LINES) : corpusText(corpus, job.chars);
  const request = { format: job.format, ...(job.maxChars ? { maxChars: job.maxChars } : {}) };
  gc();
  const baselineRss = process.memoryUsage().rss;
  let peakHeap = process.memoryUsage().heapUsed;
  const sampleHeap = () => {
    peakHeap = Math.max(peakHeap, process.memoryUsage().heapUsed);
  };

  for (let i = 0; i < job.warmups; i++) {
    summarize(text, request);
    sampleHeap();
  }
  const runs: number[] = [];
  let last: Summary | undefined;
  for (let i = 0; i < Math.max(1, job.runs); i++) {
    const started = performance.now();
    last = summarize(text, request);
    runs.push(performance.now() - started);
    sampleHeap();
  }
  if (last === undefined) throw new Error('no run');

  let stages: JobResult['stages'];
  if (job.stages && last.refused === undefined) {
    const options = resolveOptions(request);
    const times = { parse: [] as number[], analyze: [] as number[], rank: [] as number[], select: [] as number[] };
    for (let i = 0; i < job.runs; i++) {
      // The parse alone, then the whole pipeline timed at its own stage boundaries.
      const p0 = performance.now();
      parseDocument(text, { format: job.format, includeTables: options.includeTables });
      const parseTime = performance.now() - p0;
      const at: Partial<Record<SummaryStage | 'end', number>> = {};
      const start = performance.now();
      summarize(text, { ...request, onStage: (stage) => (at[stage] = performance.now()) });
      at.end = performance.now();
      sampleHeap();
      const read = (at.ranking ?? at.end) - (at.reading ?? start);
      times.parse.push(parseTime);
      times.analyze.push(Math.max(0, read - parseTime));
      times.rank.push((at.checking ?? at.end) - (at.ranking ?? at.end));
      times.select.push(at.end - (at.checking ?? at.end));
    }
    stages = { parse: median(times.parse), analyze: median(times.analyze), rank: median(times.rank), select: median(times.select) };
  }

  let bareParseMs: number | undefined;
  if (job.bare) {
    const md = markdownIt();
    const times: number[] = [];
    for (let i = 0; i < Math.max(3, job.runs); i++) {
      const started = performance.now();
      md.parse(text, {});
      times.push(performance.now() - started);
    }
    bareParseMs = median(times);
  }
  const live = job.edits ? liveEdits(text, request, job.edits) : undefined;
  let distinct: JobResult['distinct'];
  if (job.distinct) {
    const times: number[] = [];
    // Texts starting 11 files apart: no two share their opening documents.
    for (let k = 1; k <= job.distinct; k++) {
      const other = corpusText(corpus, job.chars, 11 * k);
      const started = performance.now();
      summarize(other, request);
      times.push(performance.now() - started);
    }
    distinct = { medianMs: median(times), texts: times.length };
  }

  return {
    label: job.label,
    format: job.format,
    chars: text.length,
    ...(bareParseMs !== undefined ? { bareParseMs } : {}),
    ...(live ? { live } : {}),
    ...(distinct ? { distinct } : {}),
    sentences: last.document.sentences.length,
    picked: last.sentences.length,
    ...(last.refused !== undefined ? { refused: last.refused } : {}),
    medianMs: median(runs),
    runs,
    ...(stages ? { stages } : {}),
    baselineRssMb: mb(baselineRss),
    // maxRSS is in kilobytes.
    peakRssMb: process.resourceUsage().maxRSS / KB,
    peakHeapMb: mb(peakHeap),
  };
}

/** Runs one job in a fresh Node process (same script, `--child`), so memory peaks do not mix. */
function runInChild(job: Job, corpus: string): JobResult | { error: string } {
  const script = process.argv[1]!;
  const child = spawnSync(process.execPath, [...process.execArgv, script, 'speed', '--child', JSON.stringify({ job, corpus })], {
    encoding: 'utf8',
    maxBuffer: 16 * MB,
  });
  const line = child.stdout.trim().split('\n').pop() ?? '';
  try {
    return JSON.parse(line) as JobResult;
  } catch {
    return { error: (child.stderr || child.stdout || `exit ${child.status} ${child.signal ?? ''}`).trim().split('\n').slice(-3).join(' | ') };
  }
}

// ------------------------------------------------------------------ extension footprint

function fileSize(path: string): string {
  return existsSync(path) ? `${(statSync(path).size / KB).toFixed(1)} KB` : 'not built';
}

/**
 * Activation outside the editor: require dist/extension.cjs with a stand-in `vscode` module (every
 * property a callable that returns another stand-in) and call activate with a stand-in context.
 * It shows the cost of loading the bundle and building the context, not the editor's own work.
 */
function activationInChild(): { requireMs: number; activateMs: number } | { error: string } {
  const path = resolve('dist/extension.cjs');
  if (!existsSync(path)) return { error: 'dist/extension.cjs not built' };
  const require = createRequire(resolve('package.json'));
  const Module = require('node:module') as { _resolveFilename: (request: string, ...rest: unknown[]) => string };
  const stubId = resolve('.vscode-stand-in.cjs');
  const original = Module._resolveFilename;
  Module._resolveFilename = function (this: unknown, request: string, ...rest: unknown[]) {
    return request === 'vscode' ? stubId : original.call(this, request, ...rest);
  };
  // The bundle copies the module's own properties (esbuild's ESM interop), so the stand-in lists
  // every name the bundle reads from it.
  const names = new Set([...readFileSync(path, 'utf8').matchAll(/\bvscode\d*\.([A-Za-z_$][\w$]*)/g)].map((m) => m[1]!));
  const api = Object.fromEntries([...names].map((name) => [name, standIn(`vscode.${name}`)]));
  require.cache[stubId] = { id: stubId, filename: stubId, loaded: true, exports: api } as unknown as NodeJS.Module;
  const t0 = performance.now();
  const extension = require(path) as { activate: (context: unknown) => unknown; deactivate?: () => void };
  const t1 = performance.now();
  const context = {
    subscriptions: [] as { dispose?: () => void }[],
    extensionUri: standIn('extensionUri'),
    extensionPath: resolve('.'),
    globalState: standIn('globalState'),
    workspaceState: standIn('workspaceState'),
    extensionMode: 1,
  };
  try {
    extension.activate(context);
  } catch (error) {
    return { error: `activate threw with the stand-in API: ${String(error).split('\n')[0]}` };
  }
  const t2 = performance.now();
  try {
    extension.deactivate?.();
    for (const d of context.subscriptions) d.dispose?.();
  } catch {
    // Tearing down stand-ins is not measured.
  }
  return { requireMs: t1 - t0, activateMs: t2 - t1 };
}

function standIn(name: string): unknown {
  const members = new Map<PropertyKey, unknown>();
  const target = function () {};
  return new Proxy(target, {
    get(_target, property) {
      if (property === 'then') return undefined; // not a promise
      if (property === Symbol.toPrimitive) return () => 0;
      if (property === Symbol.iterator) return function* () {};
      if (property === 'dispose') return () => {};
      if (!members.has(property)) members.set(property, standIn(`${name}.${String(property)}`));
      return members.get(property);
    },
    set(_target, property, value) {
      members.set(property, value);
      return true;
    },
    apply: () => standIn(`${name}()`),
    construct: () => standIn(`new ${name}`) as object,
  });
}

// ------------------------------------------------------------------ the table

function jobsFor(quick: boolean, full: boolean): Job[] {
  const jobs: Job[] = [
    { label: '20 KB', format: 'markdown', chars: 20 * KB, warmups: quick ? 3 : 10, runs: quick ? 9 : 31, stages: true, distinct: quick ? 9 : 31 },
    { label: '200 KB', format: 'markdown', chars: 200 * KB, warmups: quick ? 1 : 2, runs: quick ? 3 : 7, stages: true, edits: quick ? 9 : 25 },
    { label: '1 MB', format: 'markdown', chars: MB, warmups: 1, runs: quick ? 3 : 5, stages: true, bare: true },
    { label: '1 MB', format: 'plaintext', chars: MB, warmups: 1, runs: quick ? 1 : 3, stages: true },
    { label: `${SHORT_LINES / 1000}k short lines`, format: 'plaintext', chars: 0, warmups: 0, runs: 1, stages: true, input: 'short-lines' },
  ];
  if (!quick) {
    // One cold run each from here: the point is that they finish, and how time grows.
    jobs.push({ label: '2 MB', format: 'markdown', chars: 2 * MB, warmups: 0, runs: 1, stages: true });
    jobs.push({ label: '10 MB (cap raised)', format: 'markdown', chars: 10 * MB, warmups: 0, runs: 1, maxChars: 12 * MB, stages: false });
  }
  if (full) jobs.push({ label: '10 MB (cap raised)', format: 'plaintext', chars: 10 * MB, warmups: 0, runs: 1, maxChars: 12 * MB, stages: false });
  return jobs;
}

const pad = (text: string, width: number) => text.padStart(width);
const ms = (value: number | undefined) => (value === undefined || Number.isNaN(value) ? '-' : value >= 100 ? value.toFixed(0) : value.toFixed(1));

function printTable(results: readonly (JobResult | { error: string; label: string; format: string })[]): void {
  const header = ['size', 'format', 'sentences', 'median ms', 'ms/KB', 'parse', 'analyze', 'rank', 'select+check', 'RSS 1 run', 'RSS all runs', 'heap MB'];
  const widths = [18, 9, 9, 9, 6, 7, 7, 7, 12, 9, 12, 7];
  console.log(header.map((h, i) => pad(h, widths[i]!)).join(' '));
  for (const r of results) {
    if ('error' in r) {
      console.log(`${pad(r.label, widths[0]!)} ${pad(r.format, widths[1]!)}  failed: ${r.error}`);
      continue;
    }
    const row = [
      r.label,
      r.format,
      String(r.sentences),
      ms(r.medianMs),
      (r.medianMs / (r.chars / KB)).toFixed(2),
      ms(r.stages?.parse),
      ms(r.stages?.analyze),
      ms(r.stages?.rank),
      ms(r.stages?.select),
      r.singleRunPeakRssMb === undefined ? '-' : r.singleRunPeakRssMb.toFixed(0),
      `${r.peakRssMb.toFixed(0)} (${r.baselineRssMb.toFixed(0)})`,
      r.peakHeapMb.toFixed(0),
    ];
    console.log(row.map((c, i) => pad(c, widths[i]!)).join(' '));
  }
  console.log('  median ms: summarize() end to end, median of the runs after warm-up; stage columns: medians of separate staged runs.');
  console.log('  RSS 1 run: peak resident memory (MB) of a fresh process that loads the input and summarizes it once;');
  console.log('  RSS all runs: the same over all warm-up, timed and staged runs (in brackets: with the input loaded, before any run);');
  console.log('  heap MB: largest heapUsed seen between runs (read after each run, so a lower bound of the true peak).');
}

export async function run(args: readonly string[] = []): Promise<number> {
  const childAt = args.indexOf('--child');
  if (childAt >= 0) {
    const { job, corpus } = JSON.parse(args[childAt + 1]!) as { job: Job; corpus: string };
    console.log(JSON.stringify(runJob(job, corpus)));
    return 0;
  }
  if (args.includes('--activation-child')) {
    console.log(JSON.stringify(activationInChild()));
    return 0;
  }

  // Everything printed from here on is also kept for bench/RESULTS.md (full default runs only).
  const printed: string[] = [];
  const print = console.log;
  console.log = (...parts: unknown[]) => {
    printed.push(parts.map(String).join(' '));
    print(...parts);
  };
  try {
    return await report(args, printed);
  } finally {
    console.log = print;
  }
}

async function report(args: readonly string[], printed: string[]): Promise<number> {
  const corpus = corpusDirectory(args);
  if (!existsSync(corpus)) {
    console.log(`speed: corpus folder not found at ${corpus}; skipping the engine figures (pass --corpus PATH or set TERSELY_CORPUS).`);
  }
  const quick = args.includes('--quick');
  const full = args.includes('--full');
  if (typeof (globalThis as { gc?: unknown }).gc !== 'function') console.log('(run with node --expose-gc for steadier figures)');

  const results: (JobResult | { error: string; label: string; format: string })[] = [];
  if (existsSync(corpus)) {
    console.log(`Engine: method ${resolveOptions().method} (default options), corpus ${corpus}`);
    for (const job of jobsFor(quick, full)) {
      const result = runInChild(job, corpus);
      if ('error' in result) {
        results.push({ ...result, label: job.label, format: job.format });
        continue;
      }
      // Repeated runs leave garbage V8 collects lazily; one run in a fresh process shows the real need.
      const single = job.warmups === 0 && job.runs === 1 && !job.stages ? result : runInChild({ ...job, warmups: 0, runs: 1, stages: false }, corpus);
      results.push('error' in single ? result : { ...result, singleRunPeakRssMb: single.peakRssMb });
    }
    printTable(results);

    const markdown = (label: string) => results.find((r): r is JobResult => !('error' in r) && r.label === label && r.format === 'markdown');
    const small = markdown('20 KB');
    const big = markdown('1 MB');
    console.log('');
    for (const [from, to] of [['20 KB', '1 MB'], ['200 KB', '1 MB'], ['1 MB', '2 MB']] as const) {
      const a = markdown(from);
      const b = markdown(to);
      if (!a || !b) continue;
      const growth = b.medianMs / b.chars / (a.medianMs / a.chars);
      console.log(`Growth ${from} → ${to} (Markdown): time per KB × ${growth.toFixed(2)} (1.00 = linear; size × ${(b.chars / a.chars).toFixed(0)}, time × ${(b.medianMs / a.medianMs).toFixed(1)})`);
    }
    if (small && big) {
      console.log(`Targets: 20 KB ≤ ${TARGETS.smallMs} ms → ${ms(small.medianMs)} ms ${small.medianMs <= TARGETS.smallMs ? 'met' : 'NOT met'}; ` +
        `1 MB ≤ ${TARGETS.megabyteMs} ms → ${ms(big.medianMs)} ms ${big.medianMs <= TARGETS.megabyteMs ? 'met' : 'NOT met'}; ` +
        `1 MB peak RSS (one run) ≤ ${TARGETS.megabyteRssMb} MB → ${(big.singleRunPeakRssMb ?? big.peakRssMb).toFixed(0)} MB ${(big.singleRunPeakRssMb ?? big.peakRssMb) <= TARGETS.megabyteRssMb ? 'met' : 'NOT met'}`);
    }
    if (small?.distinct) {
      console.log(`20 KB, a new document each time: median ${ms(small.distinct.medianMs)} ms over ${small.distinct.texts} different texts (the same text repeated: ${ms(small.medianMs)} ms; ratio ${(small.distinct.medianMs / small.medianMs).toFixed(2)})`);
    }
    const mid = markdown('200 KB');
    const huge = markdown('10 MB (cap raised)');
    const lines = results.find((r): r is JobResult => !('error' in r) && r.label.endsWith('short lines'));
    const verdict = (value: number, target: number) => (value <= target ? 'met' : 'NOT met');
    const targetLines: string[] = [];
    if (small && huge) {
      const growth = huge.medianMs / huge.chars / (small.medianMs / small.chars);
      targetLines.push(`time per KB 20 KB → 10 MB grows ≤ ×${TARGETS.growth} → ×${growth.toFixed(2)} ${verdict(growth, TARGETS.growth)}`);
    }
    if (huge) targetLines.push(`10 MB Markdown (cap raised) ≤ ${TARGETS.tenMegabyteMs} ms → ${ms(huge.medianMs)} ms ${verdict(huge.medianMs, TARGETS.tenMegabyteMs)}`);
    if (lines) targetLines.push(`${SHORT_LINES.toLocaleString('en-US')} short sentences ≤ ${TARGETS.shortLinesMs} ms → ${ms(lines.medianMs)} ms ${verdict(lines.medianMs, TARGETS.shortLinesMs)}`);
    if (big?.bareParseMs !== undefined) {
      const ratio = big.medianMs / big.bareParseMs;
      targetLines.push(`1 MB engine ÷ bare markdown-it parse (same process) ≤ ${TARGETS.parserRatio}× → ${ms(big.medianMs)} ms ÷ ${ms(big.bareParseMs)} ms = ${ratio.toFixed(1)}× ${verdict(ratio, TARGETS.parserRatio)}`);
    }
    if (mid?.live) {
      targetLines.push(
        `live re-summary after a one-paragraph edit, 200 KB ≤ ${TARGETS.liveMs} ms → median ${ms(mid.live.medianMs)} ms over ${mid.live.edits} edits ` +
          `(${mid.live.piecesRead.toFixed(1)} of ${mid.live.pieces} pieces read per edit; whole summary ${ms(mid.medianMs)} ms) ${verdict(mid.live.medianMs, TARGETS.liveMs)}`,
      );
    }
    for (const line of targetLines) console.log(`Target: ${line}`);
    const bigDoc = corpusText(corpus, 10 * MB);
    const started = performance.now();
    const refused = summarize(bigDoc, { format: 'markdown' });
    console.log(`10 MB Markdown at the default cap: ${refused.refused ? `refused in ${ms(performance.now() - started)} ms: "${refused.refused}"` : 'NOT refused'}`);
  }

  console.log('\nExtension footprint (as built in dist/; npm run build does not minify, the packaged build may):');
  for (const file of ['dist/extension.cjs', 'dist/engine-worker.cjs', 'dist/webview/panel.js', 'dist/cli.cjs']) console.log(`  ${file.padEnd(25)} ${fileSize(file)}`);
  const packages = readdirSync('.').filter((name) => name.endsWith('.vsix'));
  if (packages.length === 0) console.log('  .vsix                    none in the repository root');
  for (const name of packages) console.log(`  ${name.padEnd(24)} ${fileSize(name)}`);

  const activations: number[] = [];
  let activationError: string | null = null;
  for (let i = 0; i < 5 && activationError === null; i++) {
    const child = spawnSync(process.execPath, [process.argv[1]!, 'speed', '--activation-child'], { encoding: 'utf8' });
    const result = JSON.parse(child.stdout.trim().split('\n').pop() || '{"error":"no output"}') as { requireMs: number; activateMs: number } | { error: string };
    if ('error' in result) activationError = result.error;
    else activations.push(result.requireMs + result.activateMs);
  }
  if (activationError !== null) console.log(`  activation: not measurable in Node (${activationError}); see the editor tests`);
  else console.log(`  activation in Node with a stand-in vscode API (require + activate, fresh process): median ${ms(median(activations))} ms of ${activations.length}`);
  if (!args.includes('--quick') && existsSync(corpus)) {
    const date = new Date().toISOString().slice(0, 10);
    writeResultsBlock(
      RESULTS_FILE,
      'speed',
      `# Speed and footprint\n\nGenerated ${date} by \`npm run bench:speed\` on this project's 2-core machine (load average at the start: ${loadAverage()}); do not edit by hand.\n\n\`\`\`\n${printed.join('\n')}\n\`\`\`\n`,
    );
    console.log(`\nwritten to ${RESULTS_FILE}`);
  }
  return 0;
}

function loadAverage(): string {
  return os.loadavg().map((x) => x.toFixed(2)).join(', ');
}
