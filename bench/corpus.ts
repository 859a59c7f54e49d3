/**
 * The benchmark corpus: design documents that open with their author's own summary.
 *
 * Procedure (the corpus README, followed step by step):
 *  1. cut the section headed "Summary" (any level, case-insensitive) out: it is the reference;
 *  2. the rest of the document is the body, summarized with a word budget = the reference's words;
 *  3. documents whose reference has fewer than 15 words, or whose body has fewer than 5
 *     sentences, are skipped.
 * Words and sentences are counted the way the engine counts them (its parser and tokenizer), so the
 * budget is in the same unit the summarizer spends. Code blocks, URLs and other non-prose parts of
 * the reference are not words (the parser leaves them out).
 *
 * Split (by document, so no document is in both halves): RFC number even → train, odd → test.
 */
import { readdir, readFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { parseDocument, splitReference, wordTokens, type ParsedDocument } from '../src/core/index';

export const DEFAULT_CORPUS = '../shared/corpus/rust-rfcs/docs';
export const REFERENCE_HEADING = 'Summary';
export const MIN_REFERENCE_WORDS = 15;
export const MIN_BODY_SENTENCES = 5;

export type Half = 'train' | 'test';

export interface CorpusDocument {
  readonly file: string;
  /** The number the file name starts with (the RFC number). */
  readonly number: number;
  readonly half: Half;
  readonly bodyText: string;
  readonly body: ParsedDocument;
  readonly referenceSentences: readonly string[];
  readonly referenceWords: number;
}

export interface CorpusLoad {
  readonly directory: string;
  readonly documents: readonly CorpusDocument[];
  /** How many files of the loaded half (or both) were skipped, by reason. */
  readonly skipped: Readonly<Record<string, number>>;
  readonly files: number;
}

/** Even numbers train, odd numbers test; files without a leading number are not used. */
export function halfOf(number: number): Half {
  return number % 2 === 0 ? 'train' : 'test';
}

export function documentNumber(file: string): number | null {
  const match = /^(\d+)/.exec(file);
  return match ? Number(match[1]) : null;
}

/** Where the corpus is: `--corpus PATH`, else $TERSELY_CORPUS, else the shared folder beside the project. */
export function corpusDirectory(args: readonly string[], env: NodeJS.ProcessEnv = process.env): string {
  const flag = args.indexOf('--corpus');
  if (flag >= 0 && args[flag + 1]) return resolve(args[flag + 1]!);
  if (env.TERSELY_CORPUS) return resolve(env.TERSELY_CORPUS);
  return resolve(DEFAULT_CORPUS);
}

export class CorpusMissing extends Error {
  override readonly name = 'CorpusMissing';
}

/** Applies the README's procedure to one file; returns the document or the reason it is skipped. */
export function prepareDocument(file: string, text: string): CorpusDocument | { readonly skipped: string } {
  const number = documentNumber(file);
  if (number === null) return { skipped: 'no number in the file name' };
  const split = splitReference(text, REFERENCE_HEADING, 'markdown');
  if (!split) return { skipped: 'no Summary section' };
  const referenceSentences = parseDocument(split.referenceText, { format: 'markdown' }).sentences.map((s) => s.text);
  const referenceWords = referenceSentences.reduce((sum, sentence) => sum + wordTokens(sentence).length, 0);
  if (referenceWords < MIN_REFERENCE_WORDS) return { skipped: `reference under ${MIN_REFERENCE_WORDS} words` };
  const body = parseDocument(split.bodyText, { format: 'markdown' });
  if (body.sentences.length < MIN_BODY_SENTENCES) return { skipped: `body under ${MIN_BODY_SENTENCES} sentences` };
  return { file, number, half: halfOf(number), bodyText: split.bodyText, body, referenceSentences, referenceWords };
}

/** Reads the Markdown files of the folder (sorted by name) and prepares those of the wanted half (or all). */
export async function loadCorpus(directory: string, half: Half | 'both', onProgress?: (done: number, total: number) => void): Promise<CorpusLoad> {
  let names: string[];
  try {
    names = (await readdir(directory)).filter((name) => name.toLowerCase().endsWith('.md')).sort();
  } catch {
    throw new CorpusMissing(
      `corpus folder not found: ${directory}\n` +
        `The quality benchmark reads design documents from ${DEFAULT_CORPUS} (relative to the current folder).\n` +
        'Point it elsewhere with --corpus PATH or the TERSELY_CORPUS environment variable.',
    );
  }
  if (names.length === 0) throw new CorpusMissing(`no .md files in ${directory}`);
  const documents: CorpusDocument[] = [];
  const skipped: Record<string, number> = {};
  for (const [index, name] of names.entries()) {
    const number = documentNumber(name);
    if (half !== 'both' && number !== null && halfOf(number) !== half) continue;
    const prepared = prepareDocument(name, await readFile(join(directory, name), 'utf8'));
    if ('skipped' in prepared) skipped[prepared.skipped] = (skipped[prepared.skipped] ?? 0) + 1;
    else documents.push(prepared);
    onProgress?.(index + 1, names.length);
  }
  return { directory, documents, skipped, files: names.length };
}
