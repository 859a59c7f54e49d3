/**
 * Where each UTF-16 unit of an inline token's `content` comes from in the original text.
 *
 * markdown-it hands inline rules a string built from the block's lines: container markers and
 * indentation removed from each line, the whole trimmed, line endings read as LF, NUL as U+FFFD;
 * in table cells `\|` reads as `|`. Each piece is still the END of its source line (or cell), so
 * matching from the right recovers every unit's offset; only tab stops expanded into spaces have
 * no source unit of their own and take the offset of the line's start.
 */
import { alignValue } from '../source-align';
import type { SourceLines } from './source-lines';

export interface ContentOffsets {
  /** Original offset of each unit of the content. */
  readonly offsets: Int32Array;
  /** The original text (to measure a CRLF line ending). */
  readonly text: string;
}

/** Original offset just after content units `[0, end)` (an end of 0 gives the first unit's offset). */
export function endOffset(content: ContentOffsets, end: number): number {
  const { offsets, text } = content;
  if (end === 0) return offsets.length > 0 ? offsets[0]! : 0;
  const last = offsets[end - 1]!;
  return text.charCodeAt(last) === 0x0d && text.charCodeAt(last + 1) === 0x0a ? last + 2 : last + 1;
}

const sameUnit = (contentUnit: number, sourceUnit: number): boolean =>
  contentUnit === sourceUnit || (contentUnit === 0xfffd && sourceUnit === 0);

/** Content made of whole lines starting at `firstLine` (paragraphs, setext headings). */
export function linesContent(content: string, lines: SourceLines, firstLine: number): ContentOffsets {
  const offsets = new Int32Array(content.length);
  let from = 0;
  let line = firstLine;
  for (;;) {
    const newline = content.indexOf('\n', from);
    const to = newline < 0 ? content.length : newline;
    alignFromRight(content, from, to, lines.text, lines.starts[line]!, lines.ends[line]!, offsets);
    if (newline < 0) break;
    offsets[newline] = lines.ends[line]!;
    from = newline + 1;
    line++;
  }
  return { offsets, text: lines.text };
}

/** Content that is a slice of the source from `start` on (an ATX heading's text). */
export function sliceContent(content: string, text: string, start: number): ContentOffsets {
  const offsets = new Int32Array(content.length);
  for (let i = 0; i < content.length; i++) offsets[i] = start + i;
  return { offsets, text };
}

/** Content found in `source[start, end)` by the general alignment (a fallback that cannot fail). */
export function alignedContent(content: string, text: string, start: number, end: number): ContentOffsets {
  return { offsets: alignValue(content, text, start, end).starts, text };
}

/**
 * Matches `content[from, to)` against the end of `text[lineStart, lineEnd)`, skipping source
 * units the content lacks (trailing blanks trimmed away, the backslash of `\|`).
 */
function alignFromRight(content: string, from: number, to: number, text: string, lineStart: number, lineEnd: number, offsets: Int32Array): void {
  let j = lineEnd - 1;
  for (let i = to - 1; i >= from; i--) {
    const unit = content.charCodeAt(i);
    while (j >= lineStart && !sameUnit(unit, text.charCodeAt(j))) j--;
    if (j >= lineStart) offsets[i] = j--;
    else offsets[i] = lineStart;
  }
}

/** A table cell: its source range and where its content's units are. */
export interface CellSource {
  /** The cell's span as the mdast reader gives it: from its leading pipe (or the row start) to the next pipe. */
  readonly start: number;
  readonly end: number;
  readonly content: ContentOffsets;
}

const WHITESPACE = /\s/;

/**
 * Cells of a table row in `text[rowStart, rowEnd)`, split as markdown-it splits them (the row
 * trimmed, cut at pipes not preceded by a backslash, an empty first and last piece dropped,
 * each piece trimmed); `contents` are markdown-it's cell contents, in order.
 */
export function rowCells(text: string, rowStart: number, rowEnd: number, contents: readonly string[]): CellSource[] {
  let start = rowStart;
  let end = rowEnd;
  while (start < end && WHITESPACE.test(text[start]!)) start++;
  while (end > start && WHITESPACE.test(text[end - 1]!)) end--;
  const pieces: { from: number; to: number; pipeBefore: number }[] = [];
  let from = start;
  let pipeBefore = rowStart;
  for (let p = start; p < end; p++) {
    if (text.charCodeAt(p) === 0x7c && (p === start || text.charCodeAt(p - 1) !== 0x5c)) {
      pieces.push({ from, to: p, pipeBefore });
      pipeBefore = p;
      from = p + 1;
    }
  }
  pieces.push({ from, to: end, pipeBefore });
  if (pieces.length > 0 && pieces[0]!.from === pieces[0]!.to) pieces.shift();
  const last = pieces[pieces.length - 1];
  if (last !== undefined && last.from === last.to && pieces.length > 0) pieces.pop();

  // Cells markdown-it adds to a short row have no source; the mdast reader has no node for them.
  return contents.slice(0, pieces.length).map((content, k) => {
    const piece = pieces[k]!;
    const cellStart = k === 0 ? rowStart : piece.pipeBefore;
    const cellEnd = pieces[k + 1]?.pipeBefore ?? rowEnd;
    return { start: cellStart, end: cellEnd, content: pieceContent(content, text, piece.from, piece.to) };
  });
}

/** A cell's content in `text[from, to)`: trimmed, with `\|` read as `|`. */
function pieceContent(content: string, text: string, from: number, to: number): ContentOffsets {
  const offsets = new Int32Array(content.length);
  let p = from;
  while (p < to && WHITESPACE.test(text[p]!)) p++;
  for (let i = 0; i < content.length; i++, p++) {
    if (text.charCodeAt(p) === 0x5c && text.charCodeAt(p + 1) === 0x7c) p++;
    if (p >= to || text[p] !== content[i]) return alignedContent(content, text, from, to);
    offsets[i] = p;
  }
  return { offsets, text };
}
