/**
 * The two benchmark collections, described as data so one quality benchmark serves both: how to
 * find and read each, what format its documents are in, how its README defines the reference and
 * the split, the block of bench/RESULTS.md its table goes to, and its targets (issue 11).
 */
import { corpusDirectory, loadCorpus, type CorpusLoad, type Half } from './corpus';
import { loadNovaCorpus, novaCorpusDirectory } from './nova-corpus';
import type { DocumentFormat } from '../src/core/index';

export type CollectionId = 'rust-rfcs' | 'nova-specs';

/** Mean ROUGE figures of one method or anchor over the documents of a run. */
export interface TargetFigures {
  readonly r1: number;
  readonly r2: number;
  readonly leadR1: number;
  /** Share of documents where the method's ROUGE-1 F1 beats lead's. */
  readonly beatsLead: number;
  /** Share of the lead→oracle ROUGE-1 F1 gap closed. */
  readonly gapClosed: number;
}

export interface Target {
  readonly label: (f: TargetFigures) => string;
  readonly met: (f: TargetFigures) => boolean;
  readonly value: (f: TargetFigures) => string;
}

export interface Collection {
  readonly id: CollectionId;
  readonly format: DocumentFormat;
  readonly resultsBlock: 'quality' | 'quality-nova';
  directory(args: readonly string[]): string;
  load(directory: string, half: Half, onProgress?: (done: number, total: number) => void): Promise<CorpusLoad>;
  /** The corpus line of the report, from the number of files and the folder as shown. */
  describeCorpus(files: number, shownDirectory: string): string;
  /** How the reference is cut out. */
  readonly procedure: string;
  /** How documents are split into halves. */
  readonly split: string;
  readonly shippedFolder: string;
  readonly targets: readonly Target[];
}

const fixed = (value: number) => value.toFixed(3);
const percent = (value: number) => `${(100 * value).toFixed(1)}%`;

export const COLLECTIONS: Readonly<Record<CollectionId, Collection>> = {
  'rust-rfcs': {
    id: 'rust-rfcs',
    format: 'markdown',
    resultsBlock: 'quality',
    directory: (args) => corpusDirectory(args),
    load: (directory, half, onProgress) => loadCorpus(directory, half, onProgress),
    describeCorpus: (files, shown) => `${files} Markdown design documents (Rust RFCs, see the corpus README), read from \`${shown}\``,
    procedure: 'the `Summary` section is cut out as the reference; the rest is summarized',
    split: 'RFC number even → train half (tuning, model training), odd → test half',
    shippedFolder: '../shared/corpus/rust-rfcs/docs',
    targets: [
      { label: (f) => `ROUGE-1 F1 ≥ lead + 0.05 (${fixed(f.leadR1 + 0.05)})`, met: (f) => f.r1 >= f.leadR1 + 0.05, value: (f) => fixed(f.r1) },
      { label: () => 'ROUGE-1 F1 ≥ 0.37 (issue 11)', met: (f) => f.r1 >= 0.37, value: (f) => fixed(f.r1) },
      { label: () => 'ROUGE-2 F1 ≥ 0.105 (issue 11)', met: (f) => f.r2 >= 0.105, value: (f) => fixed(f.r2) },
      { label: () => 'beats lead on ≥ 72% of documents (issue 11)', met: (f) => f.beatsLead >= 0.72, value: (f) => percent(f.beatsLead) },
      { label: () => 'closes ≥ 40% of the lead→oracle gap (ROUGE-1 F1; issue 11)', met: (f) => f.gapClosed >= 0.4, value: (f) => percent(f.gapClosed) },
    ],
  },
  'nova-specs': {
    id: 'nova-specs',
    format: 'restructuredtext',
    resultsBlock: 'quality-nova',
    directory: (args) => novaCorpusDirectory(args),
    load: (directory, half, onProgress) => loadNovaCorpus(directory, half, onProgress),
    describeCorpus: (files, shown) =>
      `${files} reStructuredText design specifications (OpenStack Nova specs, see the corpus README), read from \`${shown}\` with the engine's rst reader`,
    procedure:
      'the introduction (the prose between the title block and the first section heading, without the blueprint URL line) is the reference; ' +
      'the rest (the title and everything from the first section heading on) is summarized',
    split: 'FNV-1a hash of the file name even → train half (tuning, model training), odd → test half (`bench/nova-corpus.ts`)',
    shippedFolder: '../shared/corpus/nova-specs/docs',
    targets: [
      { label: (f) => `ROUGE-1 F1 ≥ lead + 0.04 (${fixed(f.leadR1 + 0.04)}; issue 11)`, met: (f) => f.r1 >= f.leadR1 + 0.04, value: (f) => fixed(f.r1) },
      { label: () => 'beats lead on ≥ 50% of documents (ours)', met: (f) => f.beatsLead >= 0.5, value: (f) => percent(f.beatsLead) },
    ],
  },
};

export function collectionOf(args: readonly string[]): Collection {
  const at = args.indexOf('--collection');
  const id = at >= 0 ? args[at + 1] : 'rust-rfcs';
  if (id !== 'rust-rfcs' && id !== 'nova-specs') throw new Error(`--collection takes rust-rfcs or nova-specs, not ${String(id)}`);
  return COLLECTIONS[id];
}
