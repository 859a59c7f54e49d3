/**
 * The reStructuredText benchmark corpus: OpenStack Nova specifications, whose authors write an
 * introduction between the title block and the first section.
 *
 * Procedure (the corpus README, ../shared/corpus/nova-specs/README.md, step by step):
 *  1. the reference is the introduction: the prose between the title block and the first section
 *     heading after it, without the blueprint URL line;
 *  2. the body is the rest of the document: everything from the first section heading on, with the
 *     title kept; it is summarized with a word budget = the reference's words;
 *  3. documents whose reference has fewer than 15 words, or whose body has fewer than 5
 *     sentences, are skipped.
 * Words and sentences are counted the way the engine counts them (its rst reader and tokenizer),
 * as for the Markdown corpus (bench/corpus.ts), whose shape this module mirrors.
 *
 * Split (by document, so no document is in both halves): the files have no numbers, so a hash of
 * the file name decides — FNV-1a (32 bit) even → train, odd → test. A hash, unlike the position in
 * the folder, does not move a document to the other half when files are added.
 */
import { readdir, readFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { parseDocument, splitIntroduction, wordTokens, type ParsedDocument } from '../src/core/index';

export { splitIntroduction } from '../src/core/index';
import { CorpusMissing, MIN_BODY_SENTENCES, MIN_REFERENCE_WORDS, type CorpusDocument, type CorpusLoad, type Half } from './corpus';

export const NOVA_CORPUS = '../shared/corpus/nova-specs/docs';

/** The engine's rst reader, with tables and footnotes skipped (its defaults). */
const readRst = (text: string): ParsedDocument => parseDocument(text, { format: 'restructuredtext' });

/** FNV-1a over the UTF-16 units of the name (offset basis 2166136261, prime 16777619). */
export function nameHash(name: string): number {
  let hash = 0x811c9dc5;
  for (let i = 0; i < name.length; i++) {
    hash ^= name.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash;
}

export function novaHalfOf(file: string): Half {
  return nameHash(file) % 2 === 0 ? 'train' : 'test';
}

/** Applies the README's procedure to one file; returns the document or the reason it is skipped. */
export function prepareNovaDocument(file: string, text: string): CorpusDocument | { readonly skipped: string } {
  const split = splitIntroduction(text);
  if (!split) return { skipped: 'no section heading after the introduction' };
  const referenceSentences = readRst(split.referenceText).sentences.map((s) => s.text);
  const referenceWords = referenceSentences.reduce((sum, sentence) => sum + wordTokens(sentence).length, 0);
  if (referenceWords < MIN_REFERENCE_WORDS) return { skipped: `reference under ${MIN_REFERENCE_WORDS} words` };
  const body = readRst(split.bodyText);
  if (body.sentences.length < MIN_BODY_SENTENCES) return { skipped: `body under ${MIN_BODY_SENTENCES} sentences` };
  return { file, number: nameHash(file), half: novaHalfOf(file), bodyText: split.bodyText, body, referenceSentences, referenceWords };
}

/** Where the corpus is: `--nova-corpus PATH`, else $TERSELY_NOVA_CORPUS, else the shared folder beside the project. */
export function novaCorpusDirectory(args: readonly string[], env: NodeJS.ProcessEnv = process.env): string {
  const flag = args.indexOf('--nova-corpus');
  if (flag >= 0 && args[flag + 1]) return resolve(args[flag + 1]!);
  if (env.TERSELY_NOVA_CORPUS) return resolve(env.TERSELY_NOVA_CORPUS);
  return resolve(NOVA_CORPUS);
}

/** Reads the .rst files of the folder (sorted by name) and prepares those of the wanted half (or all). */
export async function loadNovaCorpus(directory: string, half: Half | 'both', onProgress?: (done: number, total: number) => void): Promise<CorpusLoad> {
  let names: string[];
  try {
    names = (await readdir(directory)).filter((name) => name.toLowerCase().endsWith('.rst')).sort();
  } catch {
    throw new CorpusMissing(
      `corpus folder not found: ${directory}\n` +
        `The reStructuredText benchmark reads specifications from ${NOVA_CORPUS} (relative to the current folder).\n` +
        'Point it elsewhere with --nova-corpus PATH or the TERSELY_NOVA_CORPUS environment variable.',
    );
  }
  if (names.length === 0) throw new CorpusMissing(`no .rst files in ${directory}`);
  const documents: CorpusDocument[] = [];
  const skipped: Record<string, number> = {};
  for (const [index, name] of names.entries()) {
    if (half !== 'both' && novaHalfOf(name) !== half) continue;
    const prepared = prepareNovaDocument(name, await readFile(join(directory, name), 'utf8'));
    if ('skipped' in prepared) skipped[prepared.skipped] = (skipped[prepared.skipped] ?? 0) + 1;
    else documents.push(prepared);
    onProgress?.(index + 1, names.length);
  }
  return { directory, documents, skipped, files: names.length };
}
