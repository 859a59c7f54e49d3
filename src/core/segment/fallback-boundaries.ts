/**
 * Boundaries for text the punctuation scanner cannot split: scripts whose full stops it does not
 * know, Thai and Lao (a space ends the phrase or sentence; words are not spaced), HTML pasted as
 * text, lines that were broken on purpose, and runs with no sentence punctuation at all.
 *
 * Applied after the scanner, to its spans only, so every decision the scanner made (and the
 * golden rules test pins) stands; these only add cuts inside a span.
 */
import type { Span } from '../types';
import { isCloser, isSpaceCode } from './characters';
import { breakLongRun, MAX_SENTENCE_CHARS } from './long-runs';
import { platformSentenceBreaks } from './platform-segmenter';
import type { LineBreaks } from './sentences';
import { sortedCuts, spansBetween } from './spans';

/** Sentence punctuation of scripts the scanner does not read (danda, Arabic question mark, Armenian, Ethiopic, Khmer, Myanmar full stops, '‼', …). */
const FOREIGN_TERMINATOR = /(?![.?!\u203d\u3002\uff01\uff1f\uff61])\p{Sentence_Terminal}/u;
/** Thai and Lao: a space between two of their characters separates phrases or sentences (common practice, no source). */
const SPACE_IN_THAI_OR_LAO = /[\u0e00-\u0eff][ \t\u00a0]+(?=[\u0e00-\u0eff])/g;
/**
 * The end of an HTML block element or a line break tag, in text that is not read as HTML, with
 * the closing tags that follow it ("</li></ul></div>"), so no piece is made of tags alone.
 */
const BLOCK_TAG_END = /(?:<\/(?:p|div|li|dd|dt|h[1-6]|tr|td|th|blockquote|section|article|header|footer|ul|ol|table|title|pre)\s*>|<br\s*\/?>)(?:\s*<\/[a-z][a-z0-9]*\s*>)*/gi;
/** Anything that could call for a fallback cut; text without any of it keeps the scanner's spans as they are. */
const MAY_NEED_CUTS = new RegExp(`${FOREIGN_TERMINATOR.source}|[\\u0e00-\\u0eff]|<`, 'u');
/**
 * A paragraph shaped like a list, whose short lines may end units (see LineShape). On nova-specs
 * read as plain text, the line test alone changed 321 of the 795 documents, often inside
 * hand-wrapped sentences; with these two conditions 46 of the 398 in the alphabetically even half
 * change (53 of 397 in the other), mostly name lists and "key: value" lines. A median share of
 * 0.5 would keep a six-line shopping list whole.
 */
const LIST_MIN_LINES = 3;
const LIST_MEDIAN_SHARE = 0.6;
/** Punctuation that ends a sentence, for "this span ends like a sentence". */
const ENDS_LIKE_SENTENCE = /[\p{Sentence_Terminal}\u2026]$/u;

/** Adds fallback cuts inside the scanner's `spans`. */
export function refineSpans(text: string, spans: readonly Span[], lineBreaks: LineBreaks): Span[] {
  const { softBreaks } = lineBreaks;
  const special = MAY_NEED_CUTS.test(text);
  const deliberate = lineBreaks.deliberate && softBreaks.length > 0;
  if (!special && !deliberate && spans.every((s) => s.end - s.start <= MAX_SENTENCE_CHARS)) return [...spans];
  const lines = deliberate ? new LineShape(text, softBreaks) : null;
  const out: Span[] = [];
  for (const span of spans) {
    const cuts = special ? [...foreignTerminatorCuts(text, span), ...matchCuts(text, span, SPACE_IN_THAI_OR_LAO, 1), ...matchCuts(text, span, BLOCK_TAG_END)] : [];
    if (lines !== null && !endsLikeSentence(text, span)) cuts.push(...lines.deliberateBreaks(span));
    const pieces = cuts.length > 0 ? spansBetween(text, sortedCuts(cuts), span.start, span.end) : [span];
    for (const piece of pieces) out.push(...breakLongRun(text, piece, softBreaks));
  }
  return out;
}

/** The span's last character, past closing quotes and brackets, is sentence punctuation. */
function endsLikeSentence(text: string, span: Span): boolean {
  let end = span.end;
  while (end > span.start && isCloser(text.charAt(end - 1))) end--;
  return end > span.start && ENDS_LIKE_SENTENCE.test(text.slice(Math.max(span.start, end - 2), end));
}

/**
 * Where the platform's sentence rules cut after punctuation the scanner does not know. Cuts after
 * the scanner's own marks ('.', '?', '!') are not taken: the scanner already decided those
 * (abbreviations, initials) and decides them better.
 */
function foreignTerminatorCuts(text: string, span: Span): number[] {
  if (!FOREIGN_TERMINATOR.test(text.slice(span.start, span.end))) return [];
  return platformSentenceBreaks(text, span.start, span.end).filter((at) => {
    let k = at;
    while (k > span.start && (isSpaceCode(text.charCodeAt(k - 1)) || isCloser(text.charAt(k - 1)))) k--;
    return FOREIGN_TERMINATOR.test(text.slice(Math.max(span.start, k - 2), k));
  });
}

/** A cut at the end of every match of `pattern` inside the span (or `offset` units into it). */
function matchCuts(text: string, span: Span, pattern: RegExp, offset?: number): number[] {
  const cuts: number[] = [];
  const inside = text.slice(span.start, span.end);
  pattern.lastIndex = 0;
  for (let match = pattern.exec(inside); match !== null; match = pattern.exec(inside)) {
    cuts.push(span.start + match.index + (offset ?? match[0].length));
  }
  return cuts;
}

/**
 * The lines of a paragraph (between line breaks) and which soft breaks were made on purpose.
 *
 * Text wrapped to a width W breaks a line only when the next word would not fit, so
 * `line + 1 + next word > W`, and W is at least as long as any other line that could have been
 * wrapped (a line of one token cannot). A break where the next word would have fitted, measured
 * against the longest such other line, was not made by wrapping. People wrap by hand too, and
 * break early; so the test is only trusted in a paragraph shaped like a list: at least
 * LIST_MIN_LINES lines, most of them short (the median line, the last one aside, at most
 * LIST_MEDIAN_SHARE of the longest). Wrapped prose has most lines near the longest.
 */
class LineShape {
  private readonly softBreaks: readonly number[];
  /** Length of the line that each soft break ends. */
  private readonly lengthBefore: number[];
  private readonly longest: number;
  private readonly secondLongest: number;
  private readonly listShaped: boolean;

  constructor(
    private readonly text: string,
    softBreaks: readonly number[],
  ) {
    this.softBreaks = softBreaks;
    const hardBreaks: number[] = [];
    for (let at = text.indexOf('\n'); at >= 0; at = text.indexOf('\n', at + 1)) hardBreaks.push(at);
    const ends = sortedCuts([...softBreaks, ...hardBreaks, text.length]);
    const starts = ends.map((_, k) => (k === 0 ? 0 : ends[k - 1]! + 1));
    const lengths = ends.map((end, k) => end - starts[k]!);
    const lengthAt = new Map(ends.map((end, k) => [end, lengths[k]!]));
    this.lengthBefore = softBreaks.map((b) => lengthAt.get(b) ?? 0);
    const wrappable = lengths.filter((_, k) => text.slice(starts[k]!, ends[k]!).trim().includes(' ')).sort((a, b) => b - a);
    this.longest = wrappable[0] ?? 0;
    this.secondLongest = wrappable[1] ?? 0;
    const inner = lengths.slice(0, -1).sort((a, b) => a - b);
    const median = inner[Math.floor((inner.length - 1) / 2)] ?? 0;
    this.listShaped = lengths.length >= LIST_MIN_LINES && median <= LIST_MEDIAN_SHARE * this.longest;
  }

  /** Soft breaks inside `span` that were made on purpose. */
  deliberateBreaks(span: Span): number[] {
    const cuts: number[] = [];
    if (!this.listShaped) return cuts;
    const breaks = this.softBreaks;
    for (let k = firstAtOrAfter(breaks, span.start); k < breaks.length && breaks[k]! < span.end; k++) {
      const length = this.lengthBefore[k]!;
      const others = length === this.longest ? this.secondLongest : this.longest;
      if (length + 1 + this.wordLengthAt(breaks[k]! + 1) <= others) cuts.push(breaks[k]!);
    }
    return cuts;
  }

  private wordLengthAt(from: number): number {
    let end = from;
    while (end < this.text.length && !isSpaceCode(this.text.charCodeAt(end))) end++;
    return end - from;
  }
}

function firstAtOrAfter(sorted: readonly number[], value: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid]! < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
