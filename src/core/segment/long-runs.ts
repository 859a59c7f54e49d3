/**
 * A cap on a unit's length. A "sentence" far longer than any real one is a run the punctuation
 * did not split (unpunctuated text, a long list written one item per line, pasted markup); left
 * whole it would be the entire summary whatever the length asked for.
 */
import type { Span } from '../types';
import { isSpaceCode } from './characters';
import { characterBoundaryBefore, platformSentenceBreaks } from './platform-segmenter';
import { spansBetween } from './spans';

/**
 * Longest unit kept whole, in UTF-16 code units. The longest sentences the splitter finds in the
 * shared corpora are 607 characters (rust-rfcs, 59,663 sentences) and 654 (nova-specs read as
 * plain text, 56,109 sentences); a run half as long again is not a sentence.
 */
export const MAX_SENTENCE_CHARS = 1_000;

/**
 * Longest piece cut from such a run when the platform's sentence rules do not split it: the 99th
 * percentile of sentence length in both corpora (293 and 292 characters), so a piece reads like
 * a long sentence, not like a page.
 */
export const FALLBACK_PIECE_CHARS = 300;

/** A clause mark or space is only used as a cut this far into a piece, so pieces are not crumbs. */
const MIN_PIECE_CHARS = 100;

/** Commas, semicolons, colons and dashes of several scripts, where a clause may end. */
const CLAUSE_MARKS = new Set([...',;:\u2013\u2014\u060c\u061b\u3001\uff0c\uff1b\uff1a']);
/** Clause marks of scripts without spaces, which need no space after them. */
const IDEOGRAPHIC_CLAUSE_MARKS = new Set([...'\u3001\uff0c\uff1b\uff1a']);

/**
 * Scripts written without spaces between words, where a long run may be cut between two
 * characters. In other scripts a token thousands of characters long without a space is data (a
 * key, an encoded image), not prose; it stays one unit rather than becoming pseudo-sentences.
 */
const SPACELESS_SCRIPT = /[\p{Script=Han}\p{Script=Hiragana}\p{Script=Katakana}\p{Script=Thai}\p{Script=Lao}\p{Script=Khmer}\p{Script=Myanmar}\p{Script=Tibetan}]/u;

/**
 * `span` as it is when it is at most MAX_SENTENCE_CHARS long; otherwise cut at the platform's
 * sentence boundaries, and any piece still too long cut into pieces of at most
 * FALLBACK_PIECE_CHARS at the last line break of the source, else clause mark, else space, else
 * between two characters. Lines are packed rather than each made a unit: a run this long without
 * punctuation may hold tens of thousands of one-word lines.
 */
export function breakLongRun(text: string, span: Span, softBreaks: readonly number[]): Span[] {
  if (proseLength(text, span) <= MAX_SENTENCE_CHARS) return [span];
  return spansBetween(text, platformSentenceBreaks(text, span.start, span.end), span.start, span.end).flatMap((piece) =>
    piece.end - piece.start <= MAX_SENTENCE_CHARS ? [piece] : packPieces(text, piece, softBreaks),
  );
}

/**
 * The span's length without its data tokens (a word longer than a fallback piece, in a script
 * written with spaces): a sentence that quotes a 2,000-character key is still one sentence.
 */
function proseLength(text: string, span: Span): number {
  const length = span.end - span.start;
  if (length <= MAX_SENTENCE_CHARS) return length;
  let data = 0;
  let start = span.start;
  for (let k = span.start; k <= span.end; k++) {
    if (k < span.end && !isSpaceCode(text.charCodeAt(k))) continue;
    if (k - start > FALLBACK_PIECE_CHARS && !SPACELESS_SCRIPT.test(text.slice(start, k))) data += k - start;
    start = k + 1;
  }
  return length - data;
}

/** Consecutive pieces of at most FALLBACK_PIECE_CHARS covering `span`. */
function packPieces(text: string, span: Span, softBreaks: readonly number[]): Span[] {
  const pieces: Span[] = [];
  let start = span.start;
  while (span.end - start > FALLBACK_PIECE_CHARS) {
    const limit = start + FALLBACK_PIECE_CHARS;
    let cut = lastBreakIn(softBreaks, start + MIN_PIECE_CHARS, limit);
    if (cut < 0) cut = lastClauseEnd(text, start + MIN_PIECE_CHARS, limit);
    if (cut < 0) cut = lastSpace(text, start + MIN_PIECE_CHARS, limit);
    if (cut < 0) cut = SPACELESS_SCRIPT.test(text.slice(start, limit)) ? characterBoundaryBefore(text, start, limit) : tokenEnd(text, limit, span.end);
    // One character longer than the piece (thousands of combining marks) stays whole.
    if (cut <= start) cut = tokenEnd(text, limit, span.end);
    pieces.push(...spansBetween(text, [], start, cut));
    start = cut;
    while (start < span.end && isSpaceCode(text.charCodeAt(start))) start++;
  }
  if (start < span.end) pieces.push(...spansBetween(text, [], start, span.end));
  return pieces;
}

/** The last of the ascending `breaks` in [from, limit], or -1 (binary search). */
function lastBreakIn(breaks: readonly number[], from: number, limit: number): number {
  let lo = 0;
  let hi = breaks.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (breaks[mid]! <= limit) lo = mid + 1;
    else hi = mid;
  }
  const candidate = breaks[lo - 1];
  return candidate !== undefined && candidate >= from ? candidate : -1;
}

/** The offset just after the last clause mark in [from, limit) that ends a clause, or -1. */
function lastClauseEnd(text: string, from: number, limit: number): number {
  for (let k = limit - 1; k >= from; k--) {
    const ch = text.charAt(k);
    if (!CLAUSE_MARKS.has(ch)) continue;
    if (IDEOGRAPHIC_CLAUSE_MARKS.has(ch) || isSpaceCode(text.charCodeAt(k + 1))) return k + 1;
  }
  return -1;
}

/** Where the whitespace-free token running through `from` ends (at most `to`). */
function tokenEnd(text: string, from: number, to: number): number {
  let k = from;
  while (k < to && !isSpaceCode(text.charCodeAt(k))) k++;
  return k;
}

/** The offset of the last space in [from, limit], or -1. */
function lastSpace(text: string, from: number, limit: number): number {
  for (let k = limit; k >= from; k--) if (isSpaceCode(text.charCodeAt(k))) return k;
  return -1;
}
