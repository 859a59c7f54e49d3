/**
 * Sentence boundaries inside one block of prose (a paragraph, list item, quote or table cell).
 *
 * The input is prose already normalized by the parser: soft line breaks are spaces (the parser may
 * say where they were) and a hard line break is '\n', which always ends a sentence (list items and
 * lines without final punctuation stay separate). Two stages:
 * - the punctuation scanner (boundary-scanner.ts) decides every '.', '?', '!', ideographic full
 *   stop, line break and inline list marker;
 * - fallback boundaries (fallback-boundaries.ts) split what punctuation left whole: other
 *   scripts' full stops by the platform's sentence rules, Thai and Lao phrases, HTML block ends,
 *   lines broken on purpose, and runs longer than any real sentence (long-runs.ts).
 * Both are linear in the text length.
 */

import type { Span } from '../types';
import { BoundaryScanner } from './boundary-scanner';
import { refineSpans } from './fallback-boundaries';
import { spansBetween } from './spans';

export { MAX_SENTENCE_CHARS, FALLBACK_PIECE_CHARS } from './long-runs';

export interface LineBreaks {
  /** Ascending offsets of the spaces in the text that stand for a soft line break of the source. */
  readonly softBreaks: readonly number[];
  /**
   * A line that ends before the next word would have run out of room may end a sentence (plain
   * text). Not in Markdown, where a soft break is a space by definition (CommonMark 0.30, §6.7);
   * there the breaks are only used to cut runs longer than any sentence.
   */
  readonly deliberate: boolean;
  /**
   * Ascending, disjoint spans of the text that punctuation never ends a sentence inside: inline
   * code, where "." and "?" are syntax (`${ .. }`, `a?.b`). Runs longer than any sentence are
   * still cut there.
   */
  readonly unbreakable?: readonly Span[];
}

/**
 * Splits `text` into sentences. Offsets are local to `text`, half-open, trimmed of surrounding
 * whitespace, in order and non-overlapping; together they cover every non-whitespace character.
 */
export function splitSentences(text: string, lines: LineBreaks = { softBreaks: [], deliberate: false }): Span[] {
  const cuts = new BoundaryScanner(text).cuts();
  const spans = spansBetween(text, lines.unbreakable ? cutsOutside(cuts, lines.unbreakable) : cuts);
  return refineSpans(text, spans, lines);
}

/** The ascending `cuts` that fall strictly inside none of the ascending, disjoint `spans`. */
function cutsOutside(cuts: readonly number[], spans: readonly Span[]): number[] {
  const kept: number[] = [];
  let k = 0;
  for (const cut of cuts) {
    while (k < spans.length && spans[k]!.end <= cut) k++;
    const span = spans[k];
    if (span === undefined || cut <= span.start) kept.push(cut);
  }
  return kept;
}
