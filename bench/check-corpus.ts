/**
 * Documents with their authors' own abstracts, for the abstract-check benchmark: each document is
 * split into the abstract (checked as separate text) and the body it is checked against.
 *
 *   - Rust RFCs (Markdown): the section headed "Summary" is cut out, as in bench/corpus.ts.
 *   - Nova specs (reStructuredText, read with the plain-text reader until a reStructuredText
 *     reader lands): the abstract is the introduction, the prose between the title block and the
 *     first section heading, without the blueprint URL line (the corpus README); the body is the
 *     rest with the title kept.
 * Both: abstracts under 15 words and bodies under 5 sentences are skipped (the same bounds as the
 * quality benchmark). Split by document: RFC number even → train; for Nova, an FNV-1a hash of the
 * file name, even → train.
 */
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { parseDocument, splitReference, wordTokens, type DocumentFormat } from '../src/core/index';
import { CorpusMissing, documentNumber, halfOf, MIN_BODY_SENTENCES, MIN_REFERENCE_WORDS, REFERENCE_HEADING, type Half } from './corpus';

/** The two folders read, as the other benchmarks find them (--corpus / $TERSELY_CORPUS, --nova-corpus / $TERSELY_NOVA_CORPUS). */
export interface CheckCorpusFolders {
  readonly rfcs: string;
  readonly nova: string;
}

export type CorpusName = 'rust-rfcs' | 'nova-specs';

export interface AbstractDocument {
  readonly corpus: CorpusName;
  readonly file: string;
  readonly half: Half;
  readonly format: DocumentFormat;
  /** The abstract as written (markup kept, so code spans stay visible to the identifier rules). */
  readonly abstractText: string;
  readonly bodyText: string;
}

/** 32-bit FNV-1a (common practice, no source): a stable split for files without a number. */
export function fnv1a(text: string): number {
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash >>> 0;
}

function enoughWords(abstractText: string, format: DocumentFormat): boolean {
  const sentences = parseDocument(abstractText, { format }).sentences;
  return sentences.reduce((sum, s) => sum + wordTokens(s.text).length, 0) >= MIN_REFERENCE_WORDS;
}

export function splitRfc(file: string, text: string): AbstractDocument | null {
  const number = documentNumber(file);
  if (number === null) return null;
  const split = splitReference(text, REFERENCE_HEADING, 'markdown');
  if (!split || !enoughWords(split.referenceText, 'markdown')) return null;
  if (parseDocument(split.bodyText, { format: 'markdown' }).sentences.length < MIN_BODY_SENTENCES) return null;
  return { corpus: 'rust-rfcs', file, half: halfOf(number), format: 'markdown', abstractText: split.referenceText.trim(), bodyText: split.bodyText };
}

const URL_LINE = /^\s*<?https?:\/\/\S+>?\s*$/u;

export function splitNova(file: string, text: string): AbstractDocument | null {
  const doc = parseDocument(text, { format: 'plaintext' });
  // The title section is the first heading; the introduction is its own text before its first child.
  const title = doc.sections.find((s) => s.headingSpan !== null);
  if (!title?.headingSpan) return null;
  const firstChild = doc.sections.find((s) => s.parent === title.index && s.headingSpan !== null);
  const introEnd = firstChild?.headingSpan?.start ?? title.span.end;
  const intro = text.slice(title.headingSpan.end, introEnd);
  const abstractText = intro
    .split('\n')
    .filter((line) => !URL_LINE.test(line))
    .join('\n')
    .trim();
  if (abstractText === '' || !enoughWords(abstractText, 'plaintext')) return null;
  const bodyText = text.slice(0, title.headingSpan.end) + '\n\n' + text.slice(introEnd);
  if (parseDocument(bodyText, { format: 'plaintext' }).sentences.length < MIN_BODY_SENTENCES) return null;
  return { corpus: 'nova-specs', file, half: fnv1a(file) % 2 === 0 ? 'train' : 'test', format: 'plaintext', abstractText, bodyText };
}

export interface CheckCorpusLoad {
  readonly documents: readonly AbstractDocument[];
  readonly files: Readonly<Record<CorpusName, number>>;
  readonly skipped: Readonly<Record<CorpusName, number>>;
}

/**
 * Both corpora, the wanted half, sorted by file name; `limit` documents per corpus at most (the
 * first ones), or with `sample`, that many spread evenly over the half (for quick iteration: old
 * and new documents alike, the same ones on every run).
 */
export async function loadCheckCorpus(half: Half, limit: number, folders: CheckCorpusFolders, sample = Infinity): Promise<CheckCorpusLoad> {
  const documents: AbstractDocument[] = [];
  const files: Record<CorpusName, number> = { 'rust-rfcs': 0, 'nova-specs': 0 };
  const skipped: Record<CorpusName, number> = { 'rust-rfcs': 0, 'nova-specs': 0 };
  const sources: readonly [CorpusName, string, string, (file: string, text: string) => AbstractDocument | null][] = [
    ['rust-rfcs', folders.rfcs, '.md', splitRfc],
    ['nova-specs', folders.nova, '.rst', splitNova],
  ];
  for (const [name, directory, extension, split] of sources) {
    let names: string[];
    try {
      names = (await readdir(directory)).filter((f) => f.endsWith(extension)).sort();
    } catch {
      throw new CorpusMissing(`corpus folder not found: ${directory}\nPoint the check benchmark elsewhere with --corpus PATH / TERSELY_CORPUS (Rust RFCs) and --nova-corpus PATH / TERSELY_NOVA_CORPUS (Nova specs).`);
    }
    let taken = 0;
    const usable: AbstractDocument[] = [];
    for (const file of names) {
      if (taken >= limit) break;
      const number = documentNumber(file);
      const fileHalf = name === 'rust-rfcs' ? (number === null ? null : halfOf(number)) : fnv1a(file) % 2 === 0 ? 'train' : 'test';
      if (fileHalf !== half) continue;
      files[name]++;
      const document = split(file, await readFile(join(directory, file), 'utf8'));
      if (document === null) skipped[name]++;
      else {
        usable.push(document);
        taken++;
      }
    }
    if (usable.length <= sample) documents.push(...usable);
    else for (let k = 0; k < sample; k++) documents.push(usable[Math.floor((k * usable.length) / sample)]!);
  }
  return { documents, files, skipped };
}
