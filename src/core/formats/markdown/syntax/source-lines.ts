/**
 * Lines of the parsed text, as markdown-it numbers them, with offsets into the original string.
 *
 * markdown-it reads CRLF and lone CR as LF before parsing, so its offsets drift from the original
 * by one for every CRLF before them; line numbers and columns stay the same. Offsets are 0-based
 * UTF-16 units; a line's end is where its line ending starts.
 */
import type { Point } from 'unist';

export class SourceLines {
  /** Offset where each line starts. */
  readonly starts: Int32Array;
  /** Offset where each line's content ends (its line ending starts there). */
  readonly ends: Int32Array;
  /** Lines as markdown-it counts them (a final line ending opens no line). */
  readonly count: number;
  /** CRLF pairs before each line; null when there are none and offsets agree. */
  private readonly crlfBefore: Int32Array | null;

  constructor(readonly text: string) {
    const starts: number[] = [];
    const ends: number[] = [];
    const crlfBefore: number[] = [];
    let crlf = 0;
    let lineStart = 0;
    for (let p = 0; p < text.length; p++) {
      const code = text.charCodeAt(p);
      if (code !== 0x0a && code !== 0x0d) continue;
      starts.push(lineStart);
      ends.push(p);
      crlfBefore.push(crlf);
      if (code === 0x0d && text.charCodeAt(p + 1) === 0x0a) {
        p++;
        crlf++;
      }
      lineStart = p + 1;
    }
    if (lineStart < text.length) {
      starts.push(lineStart);
      ends.push(text.length);
      crlfBefore.push(crlf);
    }
    this.count = starts.length;
    this.starts = Int32Array.from(starts);
    this.ends = Int32Array.from(ends);
    this.crlfBefore = crlf === 0 ? null : Int32Array.from(crlfBefore);
  }

  /** The original offset of a normalized offset on `line`. */
  fromNormalized(offset: number, line: number): number {
    return this.crlfBefore === null ? offset : offset + this.crlfBefore[line]!;
  }

  /** The line holding `offset` (a line ending belongs to the line it ends). */
  lineOf(offset: number): number {
    return this.search(offset, (line) => this.starts[line]!);
  }

  /** The line holding a normalized offset. */
  lineOfNormalized(offset: number): number {
    const crlf = this.crlfBefore;
    return crlf === null ? this.lineOf(offset) : this.search(offset, (line) => this.starts[line]! - crlf[line]!);
  }

  private search(offset: number, startOf: (line: number) => number): number {
    let low = 0;
    let high = this.count - 1;
    while (low < high) {
      const mid = (low + high + 1) >> 1;
      if (startOf(mid) <= offset) low = mid;
      else high = mid - 1;
    }
    return Math.max(0, low);
  }

  /** An mdast point (line and column 1-based, offset 0-based). */
  point(offset: number, line = this.lineOf(offset)): Point {
    return { line: line + 1, column: offset - (this.starts[line] ?? 0) + 1, offset };
  }
}
