/**
 * The token view the consistency detectors read: each word of a sentence's text with its offsets
 * in that text, lower-cased form and stem, plus helpers that find where a phrase sits in the source.
 *
 * Offsets here are into `Sentence.text` (markup stripped); `locate` maps a phrase back to the
 * document by searching the sentence's source slice, and falls back to the whole sentence when
 * markup splits the phrase.
 */
import { contentTerms, stem } from '../../text/tokens';
import type { Span } from '../../types';

export interface ClaimToken {
  /** As written. */
  readonly raw: string;
  /** Lower case, curly apostrophe straightened. */
  readonly lower: string;
  /** The content term (stemmed) or null for a stop word or a short token. */
  readonly term: string | null;
  readonly start: number;
  readonly end: number;
}

/** A sentence as the detectors see it. */
export interface CheckedText {
  readonly text: string;
  readonly tokens: readonly ClaimToken[];
  /** Distinct content terms, for "shares enough context" tests. */
  readonly terms: ReadonlySet<string>;
}

/** Words, numbers with their decimal point or thousands commas, a trailing "%" kept on the number. */
const TOKEN = /[\p{L}\p{M}\p{N}]+(?:(?:['\u2019.-]|(?<=\p{N}),(?=\p{N}{3}))[\p{L}\p{M}\p{N}]+)*%?/gu;

export function checkedText(text: string, language: string): CheckedText {
  const tokens: ClaimToken[] = [];
  const terms = new Set<string>();
  for (const match of text.matchAll(TOKEN)) {
    const raw = match[0];
    const lower = raw.toLowerCase().replaceAll('\u2019', "'");
    const term = contentTerms([lower.replace(/%$/u, '')], language)[0] ?? null;
    if (term !== null) terms.add(term);
    tokens.push({ raw, lower, term, start: match.index, end: match.index + raw.length });
  }
  return { text, tokens, terms };
}

/** The stem of a word, for comparing cue-governed words across sentences. */
export function stemOf(word: string, language: string): string {
  return stem(word.toLowerCase(), language);
}

/**
 * Where a phrase of `text` sits in the document: searched in the sentence's source slice (the
 * first occurrence, ignoring case), else the whole sentence.
 */
export function locate(source: string, sourceSpan: Span | null, phrase: string): Span | null {
  if (sourceSpan === null) return null;
  const words = phrase.trim().split(/\s+/u).filter((w) => w !== '');
  if (words.length === 0) return sourceSpan;
  // Line breaks and runs of spaces in the source stand for the single spaces of the sentence text.
  const pattern = new RegExp(words.map((w) => w.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&')).join('\\s+'), 'iu');
  const match = pattern.exec(source);
  if (!match) return sourceSpan;
  return { start: sourceSpan.start + match.index, end: sourceSpan.start + match.index + match[0].length };
}

/** Content terms shared by two sentences, leaving out the given ones. */
export function sharedTerms(a: CheckedText, b: CheckedText, leaveOut: ReadonlySet<string> = new Set()): string[] {
  const shared: string[] = [];
  for (const term of a.terms) if (b.terms.has(term) && !leaveOut.has(term)) shared.push(term);
  return shared;
}
