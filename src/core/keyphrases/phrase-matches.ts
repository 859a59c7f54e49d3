/**
 * Where a key phrase occurs in a sentence's source: its words in order, any case, separated by one
 * to twelve characters that are not letters or digits (markup, line breaks), never inside a word.
 *
 * This is what the regular expression
 *   (?<![\p{L}\p{N}]) w1 [^\p{L}\p{N}]{1,12} w2 … wn (?![\p{L}\p{N}])   (flags g, i, u)
 * finds, found without compiling one per phrase: each such pattern took about a millisecond to
 * compile, and a summary of a new document compiled ten (the compiled-pattern cache only helped
 * when the same document was summarized again). The search below follows the pattern step by step:
 * the same start positions, the same greedy-then-shorter choice of every gap, the same case-
 * insensitive comparison of code points. Non-ASCII characters are tested with small expressions
 * compiled once, with the same classes and flags, so their case folding is the engine's own.
 */
import type { Span } from '../types';

/** The pattern's classes and literals under the same flags; sticky, so each tests one position. */
const LETTER_OR_DIGIT = /[\p{L}\p{N}]/iuy;
const SEPARATOR = /[^\p{L}\p{N}]/iuy;
const MAX_GAP = 12;

/** Sticky case-insensitive matchers of single code points of phrases (a few dozen in practice). */
const codePointMatchers = new Map<number, RegExp>();
const MAX_MATCHERS = 10_000;

function codePointMatcher(codePoint: number): RegExp {
  let matcher = codePointMatchers.get(codePoint);
  if (matcher === undefined) {
    const literal = String.fromCodePoint(codePoint).replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
    matcher = new RegExp(literal, 'iuy');
    if (codePointMatchers.size >= MAX_MATCHERS) codePointMatchers.clear();
    codePointMatchers.set(codePoint, matcher);
  }
  return matcher;
}

const isAsciiLetterOrDigit = (unit: number): boolean => (unit >= 0x30 && unit <= 0x39) || ((unit | 0x20) >= 0x61 && (unit | 0x20) <= 0x7a);
/** ASCII case folding: A-Z onto a-z. */
const foldAscii = (unit: number): number => (unit >= 0x41 && unit <= 0x5a ? unit | 0x20 : unit);

/** Whether the code point starting at `at` is a letter or digit as the pattern's class reads it. */
function letterOrDigitAt(text: string, at: number): boolean {
  const unit = text.charCodeAt(at);
  if (unit < 0x80) return isAsciiLetterOrDigit(unit);
  LETTER_OR_DIGIT.lastIndex = at;
  return LETTER_OR_DIGIT.test(text);
}

/** End of the separator code point starting at `at`, or -1 when that code point is a letter or digit. */
function separatorEnd(text: string, at: number): number {
  const unit = text.charCodeAt(at);
  if (unit < 0x80) return isAsciiLetterOrDigit(unit) ? -1 : at + 1;
  SEPARATOR.lastIndex = at;
  return SEPARATOR.test(text) ? SEPARATOR.lastIndex : -1;
}

/** Start of the code point that ends at `at` (a surrogate pair counts as one). */
function previousCodePoint(text: string, at: number): number {
  const unit = text.charCodeAt(at - 1);
  if (unit >= 0xdc00 && unit <= 0xdfff && at >= 2) {
    const lead = text.charCodeAt(at - 2);
    if (lead >= 0xd800 && lead <= 0xdbff) return at - 2;
  }
  return at - 1;
}

/** Code points of a phrase word. */
function codePointsOf(word: string): number[] {
  const points: number[] = [];
  for (const character of word) points.push(character.codePointAt(0)!);
  return points;
}

/** End of `word` matched at `at`, case-insensitively, or -1. */
function wordEnd(text: string, at: number, word: readonly number[]): number {
  let p = at;
  for (const codePoint of word) {
    if (p >= text.length) return -1;
    const unit = text.charCodeAt(p);
    if (codePoint < 0x80 && unit < 0x80) {
      if (foldAscii(codePoint) !== foldAscii(unit)) return -1;
      p++;
      continue;
    }
    const matcher = codePointMatcher(codePoint);
    matcher.lastIndex = p;
    if (!matcher.test(text)) return -1;
    p = matcher.lastIndex;
  }
  return p;
}

/** End of words[w..] matched from `at` (gaps before each later word), or -1; longest gaps tried first. */
function wordsEnd(text: string, at: number, words: readonly (readonly number[])[], w: number): number {
  const end = wordEnd(text, at, words[w]!);
  if (end < 0) return -1;
  if (w === words.length - 1) return end < text.length && letterOrDigitAt(text, end) ? -1 : end;
  const gapEnds: number[] = [];
  for (let p = end; gapEnds.length < MAX_GAP && p < text.length; ) {
    const next = separatorEnd(text, p);
    if (next < 0) break;
    gapEnds.push(next);
    p = next;
  }
  for (let g = gapEnds.length - 1; g >= 0; g--) {
    const found = wordsEnd(text, gapEnds[g]!, words, w + 1);
    if (found >= 0) return found;
  }
  return -1;
}

/** Non-overlapping matches of `phrase` (non-empty words separated by single spaces) in `text`, left to right. */
export function phraseMatches(text: string, phrase: string): Span[] {
  const words = phrase.split(' ').map(codePointsOf);
  const spans: Span[] = [];
  let at = 0;
  while (at < text.length) {
    const end = at > 0 && letterOrDigitAt(text, previousCodePoint(text, at)) ? -1 : wordsEnd(text, at, words, 0);
    if (end >= 0) {
      spans.push({ start: at, end });
      at = end;
    } else {
      // Like the expression's search, move on by one code point.
      const unit = text.charCodeAt(at);
      const trail = text.charCodeAt(at + 1);
      at += unit >= 0xd800 && unit <= 0xdbff && trail >= 0xdc00 && trail <= 0xdfff ? 2 : 1;
    }
  }
  return spans;
}
