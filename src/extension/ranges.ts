/**
 * Engine spans (0-based UTF-16 offsets, half-open `[start, end)`) checked against the text they
 * are shown in, and the editor's line/character rules for code that only has a string. Free of
 * the editor API; the one span → editor range conversion is `rangeOf` in editor-ranges.ts.
 */
import type { Span } from '../core/index';

export interface LinePosition {
  /** 0-based line. */
  readonly line: number;
  /** 0-based UTF-16 column within the line. */
  readonly character: number;
}

/**
 * Line starts of a text, with the editor's rules: `\r\n`, `\n` and a lone `\r` each end a line,
 * and an offset inside a `\r\n` pair or past the end is clamped as the editor does.
 */
export class LineIndex {
  private readonly starts: number[] = [0];

  constructor(private readonly text: string) {
    for (let i = 0; i < text.length; i++) {
      const code = text.charCodeAt(i);
      if (code === 13 /* \r */) {
        if (text.charCodeAt(i + 1) === 10) i++;
        this.starts.push(i + 1);
      } else if (code === 10 /* \n */) {
        this.starts.push(i + 1);
      }
    }
  }

  get lineCount(): number {
    return this.starts.length;
  }

  positionAt(offset: number): LinePosition {
    const clamped = Math.max(0, Math.min(this.text.length, Math.floor(offset)));
    let low = 0;
    let high = this.starts.length - 1;
    while (low < high) {
      const mid = (low + high + 1) >> 1;
      if (this.starts[mid]! <= clamped) low = mid;
      else high = mid - 1;
    }
    const lineStart = this.starts[low]!;
    // The character may not sit between \r and \n: that offset belongs to the end of the line.
    const lineEnd = this.lineContentEnd(low);
    return { line: low, character: Math.min(clamped, lineEnd) - lineStart };
  }

  offsetAt(position: LinePosition): number {
    if (position.line < 0) return 0;
    if (position.line >= this.starts.length) return this.text.length;
    const start = this.starts[position.line]!;
    return Math.min(start + Math.max(0, position.character), this.lineContentEnd(position.line));
  }

  private lineContentEnd(line: number): number {
    const next = line + 1 < this.starts.length ? this.starts[line + 1]! : this.text.length;
    let end = next;
    if (end > this.starts[line]! && line + 1 < this.starts.length) {
      end--; // the \n or lone \r
      if (this.text.charCodeAt(end) === 10 && end > this.starts[line]! && this.text.charCodeAt(end - 1) === 13) end--;
    }
    return end;
  }
}

function isHighSurrogate(code: number): boolean {
  return code >= 0xd800 && code <= 0xdbff;
}

function isLowSurrogate(code: number): boolean {
  return code >= 0xdc00 && code <= 0xdfff;
}

/**
 * Checks a span from the engine against the document it is about to be shown in. Returns a span
 * that lies inside `[0, length)`, does not split a surrogate pair (widened outwards) and is not
 * empty — or null when the span cannot belong to this text (then it must not be shown at all).
 */
export function checkedSpan(span: Span, text: string): Span | null {
  const { start, end } = span;
  if (!Number.isInteger(start) || !Number.isInteger(end) || start < 0 || end > text.length || end <= start) return null;
  let safeStart = start;
  let safeEnd = end;
  if (safeStart > 0 && isLowSurrogate(text.charCodeAt(safeStart)) && isHighSurrogate(text.charCodeAt(safeStart - 1))) safeStart--;
  if (safeEnd < text.length && isLowSurrogate(text.charCodeAt(safeEnd)) && isHighSurrogate(text.charCodeAt(safeEnd - 1))) safeEnd++;
  return { start: safeStart, end: safeEnd };
}

/** Index of the span that contains `offset` (start inclusive, end exclusive), or -1. Spans must be sorted and disjoint. */
export function spanAt(spans: readonly Span[], offset: number): number {
  let low = 0;
  let high = spans.length - 1;
  while (low <= high) {
    const mid = (low + high) >> 1;
    const span = spans[mid]!;
    if (offset < span.start) high = mid - 1;
    else if (offset >= span.end) low = mid + 1;
    else return mid;
  }
  return -1;
}
