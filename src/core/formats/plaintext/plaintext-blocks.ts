/**
 * Plain text (and reStructuredText-like text) → a flat list of blocks: headings, prose paragraphs,
 * list items and skipped stretches. Paragraphs are separated by blank lines; a line that looks
 * like a list item starts a new item even without a blank line.
 */

import type { SkipReason } from '../../types';
import {
  isCapitalsHeading,
  isSeparatorLine,
  listItemContentStart,
  numberedHeadingLevels,
  numberedWithPeriod,
  ruleChar,
  ruleLength,
  type Line,
} from './plaintext-lines';

/** One line's contribution to a paragraph: local `[start, end)` of its text. */
export interface TextRange {
  readonly start: number;
  readonly end: number;
}

export type PlainBlock =
  | {
      readonly type: 'heading';
      readonly text: string;
      /** How the heading was written: `under=`, `over-`, `caps`, or `numbered`. */
      readonly style: string;
      /** Levels of the leading number (`2.1 …` → 2), 0 when unnumbered. */
      readonly numberLevels: number;
      readonly start: number;
      readonly end: number;
    }
  | {
      readonly type: 'paragraph';
      readonly kind: 'paragraph' | 'listItem';
      /** Indentation of the list marker (list items only). */
      readonly indent: number;
      readonly ranges: readonly TextRange[];
    }
  | { readonly type: 'skip'; readonly reason: SkipReason; readonly start: number; readonly end: number };

/** Lines indented this much (or by a tab) at the start of a block are code (common practice, no source). */
const CODE_INDENT = 4;

export function plainBlocks(lines: readonly Line[]): PlainBlock[] {
  return new BlockReader(lines).read();
}

interface OpenParagraph {
  kind: 'paragraph' | 'listItem';
  indent: number;
  ranges: TextRange[];
  lastLine: Line;
}

/** The list item most recently opened while a list is running (blank lines do not end a list). */
interface RunningItem {
  /** Indentation of its marker. */
  readonly indent: number;
  /** Column where its text starts; later paragraphs indented this far continue the item. */
  readonly column: number;
}

class BlockReader {
  private readonly blocks: PlainBlock[] = [];
  private open: OpenParagraph | null = null;
  private runningItem: RunningItem | null = null;
  /** Indentation of a paragraph that ended with `::`; the indented block after it is literal. */
  private literalAfter: number | null = null;
  private i = 0;

  constructor(private readonly lines: readonly Line[]) {}

  read(): PlainBlock[] {
    while (this.i < this.lines.length) this.step();
    this.flush();
    return this.blocks;
  }

  private step(): void {
    const line = this.lines[this.i]!;
    if (line.blank) {
      this.flush();
      this.i++;
      return;
    }
    if (this.open === null && this.readBlockStart(line)) return;
    if (this.open !== null && isSeparatorLine(line)) {
      this.flush();
      this.skipLines('thematicBreak', this.i, this.i + 1);
      return;
    }
    const itemStart = listItemContentStart(line);
    if (itemStart !== null && !isSeparatorLine(line)) {
      this.flush();
      this.literalAfter = null; // a literal block must follow its `::` paragraph directly
      const column = line.indent + (itemStart - line.contentStart);
      this.open = { kind: 'listItem', indent: line.indent, ranges: [], lastLine: line };
      this.runningItem = { indent: line.indent, column };
      this.addRange(itemStart, line);
      this.i++;
      return;
    }
    if (this.open === null) {
      // After a blank line: text indented to an item's text column continues that item.
      const item = this.runningItem;
      if (item !== null && line.indent >= item.column) {
        this.open = { kind: 'listItem', indent: item.indent, ranges: [], lastLine: line };
      } else {
        this.runningItem = null;
        this.open = { kind: 'paragraph', indent: line.indent, ranges: [], lastLine: line };
      }
    }
    this.addRange(line.contentStart, line);
    this.i++;
  }

  /** Constructs recognized only at the start of a block; returns true when one was consumed. */
  private readBlockStart(line: Line): boolean {
    if (this.literalAfter !== null) {
      const base = this.literalAfter;
      this.literalAfter = null;
      if (line.indent > base) {
        this.skipIndented('code', (l) => l.indent > base);
        return true;
      }
    }
    const item = this.runningItem;
    const inItem = item !== null && line.indent >= item.column && line.indent < item.column + CODE_INDENT;
    if (!inItem && line.indent >= CODE_INDENT) {
      this.skipIndented('code', (l) => l.indent >= CODE_INDENT);
      return true;
    }
    if (this.readHeading(line)) return true;
    if (isSeparatorLine(line)) {
      this.skipLines('thematicBreak', this.i, this.i + 1);
      return true;
    }
    if (/^[ \t]*\.\.(?:[ \t]|$)/.test(line.text)) {
      // reStructuredText comment or directive, with its indented body.
      this.i++;
      this.skipIndentedFrom('comment', this.i - 1, (l) => l.indent > line.indent);
      return true;
    }
    if (/^[ \t]*\+[-=+]+\+[ \t]*$/.test(line.text) || /^[ \t]*=+(?:[ \t]+=+)+[ \t]*$/.test(line.text)) {
      // Grid or simple table: runs to the next blank line.
      let j = this.i;
      while (j < this.lines.length && !this.lines[j]!.blank) j++;
      this.skipLines('table', this.i, j);
      return true;
    }
    return false;
  }

  private readHeading(line: Line): boolean {
    const next = this.lines[this.i + 1];
    const afterNext = this.lines[this.i + 2];
    const over = ruleChar(line);
    // Overline, title, underline of the same character.
    if (over !== null && next !== undefined && !next.blank && ruleChar(next) === null && afterNext !== undefined) {
      if (ruleChar(afterNext) === over) {
        this.pushHeading(next.text, `over${over}`, line.start, afterNext.end);
        this.runningItem = null;
        this.i += 3;
        return true;
      }
    }
    if (over !== null) return false;
    const title = line.text.trim();
    const under = next === undefined ? null : ruleChar(next);
    if (under !== null && line.indent < CODE_INDENT && ruleLength(next!) >= Math.max(3, Math.floor(title.length / 2))) {
      this.pushHeading(title, `under${under}`, line.start, next!.end);
      this.runningItem = null;
      this.i += 2;
      return true;
    }
    const standalone = next === undefined || next.blank;
    const levels = numberedHeadingLevels(title);
    // `3. Results` also reads as a list item, so it counts as a heading only on a line of its own.
    const numbered = levels > 1 || (levels === 1 && (standalone || !numberedWithPeriod(title)));
    if (numbered || (listItemContentStart(line) === null && isCapitalsHeading(title))) {
      this.pushHeading(title, numbered ? 'numbered' : 'caps', line.contentStart, line.end);
      this.runningItem = null;
      this.i += 1;
      return true;
    }
    return false;
  }

  private pushHeading(text: string, style: string, start: number, end: number): void {
    const clean = text.trim().replace(/\s+/g, ' ');
    this.blocks.push({ type: 'heading', text: clean, style, numberLevels: numberedHeadingLevels(clean), start, end });
  }

  /** Skips the current line and the following lines that satisfy `inside` (blank lines included). */
  private skipIndented(reason: SkipReason, inside: (line: Line) => boolean): void {
    this.skipIndentedFrom(reason, this.i, inside);
  }

  private skipIndentedFrom(reason: SkipReason, first: number, inside: (line: Line) => boolean): void {
    let last = first;
    let j = Math.max(this.i, first + 1);
    while (j < this.lines.length) {
      const line = this.lines[j]!;
      if (!line.blank && !inside(line)) break;
      if (!line.blank) last = j;
      j++;
    }
    this.skipLines(reason, first, last + 1);
  }

  private skipLines(reason: SkipReason, from: number, to: number): void {
    const first = this.lines[from]!;
    const last = this.lines[to - 1]!;
    this.blocks.push({ type: 'skip', reason, start: first.contentStart, end: last.end });
    this.i = to;
  }

  private addRange(start: number, line: Line): void {
    this.open!.ranges.push({ start, end: line.end });
    this.open!.lastLine = line;
  }

  private flush(): void {
    const open = this.open;
    if (open === null) return;
    this.open = null;
    if (/::[ \t]*$/.test(open.lastLine.text)) this.literalAfter = open.lastLine.indent;
    this.blocks.push({ type: 'paragraph', kind: open.kind, indent: open.indent, ranges: open.ranges });
  }
}
