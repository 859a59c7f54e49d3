/**
 * The source as reStructuredText reads it: lines with tabs expanded to 8-column stops, vertical
 * tabs and form feeds as spaces, trailing blanks removed (the specification's reading of input).
 * Every column of an expanded line still maps back to a UTF-16 offset of the original string.
 *
 * A `Region` is a view of some lines from a left column on (the body of a list item, a directive,
 * a block quote): the indentation-based structure of the format is parsed region by region, the
 * way the reference implementation strips indentation and parses the remaining lines again.
 */

const TAB_WIDTH = 8;
/** Line terminators (those Python's `splitlines` knows, minus \v and \f, which are spaces here). */
const LINE_END = /\r\n|[\n\r\x1c-\x1e\x85\u2028\u2029]/g;
/** Python's `str.isspace` set: what `rstrip()` removes. */
const BLANK = /[\t\n\v\f\r\x1c-\x20\x85\xa0\u1680\u2000-\u200a\u2028\u2029\u202f\u205f\u3000]/;

/** `text` without trailing blanks (a loop: a `[…]+$` pattern retries at every blank of a long line). */
function trimBlanksEnd(text: string): string {
  let end = text.length;
  while (end > 0 && BLANK.test(text[end - 1]!)) end--;
  return end === text.length ? text : text.slice(0, end);
}

export interface SourceLine {
  /** Offset of the line's first unit. */
  readonly start: number;
  /** Offset just after the line's last non-blank unit. */
  readonly end: number;
  /** Tabs expanded, \v and \f as spaces, trailing blanks removed. */
  readonly text: string;
  /** For a line with a tab: the source offset of each unit of `text`; null when offset = start + column. */
  readonly offsets: Int32Array | null;
}

export class SourceLines {
  readonly lines: readonly SourceLine[];

  /** `from` skips a byte order mark at offset 0 (it is not text). */
  constructor(readonly source: string, from: number) {
    const lines: SourceLine[] = [];
    let start = from;
    LINE_END.lastIndex = from;
    for (let m = LINE_END.exec(source); m !== null; m = LINE_END.exec(source)) {
      lines.push(makeLine(source, start, m.index));
      start = m.index + m[0].length;
    }
    if (start < source.length) lines.push(makeLine(source, start, source.length));
    this.lines = lines;
  }

  /** Source offset of `column` in line `line` (a column at or past the end maps to the line's end). */
  offsetAt(line: number, column: number): number {
    const l = this.lines[line]!;
    if (column >= l.text.length) return l.end;
    return l.offsets === null ? l.start + column : l.offsets[column]!;
  }
}

function makeLine(source: string, start: number, end: number): SourceLine {
  const raw = source.slice(start, end).replace(/[\v\f]/g, ' ');
  if (!raw.includes('\t')) {
    const text = trimBlanksEnd(raw);
    return { start, end: start + text.length, text, offsets: null };
  }
  let text = '';
  const offsets: number[] = [];
  for (let i = 0; i < raw.length; i++) {
    if (raw[i] === '\t') {
      const width = TAB_WIDTH - (text.length % TAB_WIDTH);
      text += ' '.repeat(width);
      for (let k = 0; k < width; k++) offsets.push(start + i);
    } else {
      text += raw[i];
      offsets.push(start + i);
    }
  }
  const trimmed = trimBlanksEnd(text);
  const lastEnd = trimmed.length === 0 ? start : offsets[trimmed.length - 1]! + 1;
  return { start, end: lastEnd, text: trimmed, offsets: Int32Array.from(offsets.slice(0, trimmed.length)) };
}

/** One line of a region: source line `line` read from column `col` (up to `endCol`, for table cells). */
export interface RegionLine {
  readonly line: number;
  readonly col: number;
  readonly endCol?: number;
}

/** Lines of an indented block with the block's indentation removed. */
export interface IndentedBlock {
  readonly region: Region;
  /** Index (in the parent region) of the first line after the block. */
  readonly next: number;
  readonly indent: number;
}

export class Region {
  private readonly texts: string[];

  constructor(readonly src: SourceLines, readonly lines: readonly RegionLine[]) {
    this.texts = lines.map((l) => {
      const full = src.lines[l.line]!.text;
      const text = l.endCol === undefined ? full.slice(l.col) : full.slice(l.col, l.endCol);
      return l.endCol === undefined ? text : trimBlanksEnd(text);
    });
  }

  get length(): number {
    return this.lines.length;
  }

  text(i: number): string {
    return this.texts[i] ?? '';
  }

  blank(i: number): boolean {
    return this.text(i).length === 0;
  }

  /** Leading spaces of line i (the only indentation the format counts, tabs being expanded). */
  indentOf(i: number): number {
    const text = this.text(i);
    let n = 0;
    while (n < text.length && text.charCodeAt(n) === 32) n++;
    return n;
  }

  /** Source offset of column `k` of line i. */
  offset(i: number, k: number): number {
    const l = this.lines[i]!;
    return this.src.offsetAt(l.line, l.col + k);
  }

  /** Source offset of the first non-blank unit of line i. */
  startOffset(i: number): number {
    return this.offset(i, this.indentOf(i));
  }

  /** Source offset just after the last non-blank unit of line i. */
  endOffset(i: number): number {
    return this.offset(i, this.text(i).length - 1) + 1;
  }

  slice(from: number, to = this.length): Region {
    return new Region(this.src, this.lines.slice(from, to));
  }

  /** Lines [from, to) with `strip` columns removed (the first line by `first` instead, when given). */
  shifted(from: number, to: number, strip: number, first?: number): Region {
    return new Region(
      this.src,
      this.lines.slice(from, to).map((l, k) => ({ ...l, col: l.col + (k === 0 && first !== undefined ? first : strip) })),
    );
  }

  /** Span of lines [from, to): first non-blank unit to last non-blank unit (blank lines ignored). */
  span(from: number, to: number): { start: number; end: number } | null {
    let first = from;
    while (first < to && this.blank(first)) first++;
    let last = to - 1;
    while (last >= first && this.blank(last)) last--;
    if (first > last) return null;
    return { start: this.startOffset(first), end: this.endOffset(last) };
  }

  /**
   * The indented block starting at line `start` (the reference implementation's `get_indented`):
   * lines up to the first non-blank line that is not indented (or, with `blockIndent`, indented
   * less). The common indentation of the lines after a first line of known indent is removed;
   * leading blank lines are dropped when `stripTop`.
   */
  indented(
    start: number,
    options: { untilBlank?: boolean; blockIndent?: number; firstIndent?: number; stripIndent?: boolean; stripTop?: boolean } = {},
  ): IndentedBlock {
    const { untilBlank = false, blockIndent, stripIndent = true, stripTop = true } = options;
    const firstIndent = options.firstIndent ?? blockIndent;
    let indent = blockIndent;
    let end = start + (firstIndent !== undefined ? 1 : 0);
    while (end < this.length) {
      const text = this.text(end);
      if (text.length > 0) {
        const lineIndent = this.indentOf(end);
        if (lineIndent === 0 || (blockIndent !== undefined && lineIndent < blockIndent)) break;
        if (blockIndent === undefined) indent = indent === undefined ? lineIndent : Math.min(indent, lineIndent);
      } else if (untilBlank) {
        break;
      }
      end++;
    }
    const strip = stripIndent ? (indent ?? 0) : 0;
    let region = this.shifted(start, end, strip, firstIndent);
    if (stripTop) {
      let top = 0;
      while (top < region.length && region.blank(top)) top++;
      region = region.slice(top);
    }
    return { region, next: end, indent: indent ?? 0 };
  }

  /** Non-blank lines from `start` up to a blank line; with `flushLeft`, also up to an indented line. */
  textBlockEnd(start: number, flushLeft: boolean): number {
    let end = start;
    while (end < this.length && !this.blank(end)) {
      if (flushLeft && this.indentOf(end) > 0) break;
      end++;
    }
    return end;
  }
}
