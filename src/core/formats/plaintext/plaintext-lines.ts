/**
 * Line-level reading of plain text: line ranges (any line ending), indentation, and the shapes a
 * single line can have (rule, list item, numbered or capitalized heading).
 */

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const LOWER = /\p{Ll}/u;
const UPPER = /\p{Lu}/u;
const LETTERS = /\p{L}/gu;

export interface Line {
  /** Local offset of the first character of the line. */
  readonly start: number;
  /** Local offset just before the line ending. */
  readonly end: number;
  /** The line without its ending. */
  readonly text: string;
  /** Leading whitespace width in columns (a tab advances to the next multiple of 4). */
  readonly indent: number;
  /** Offset of the first non-blank character (`end` for a blank line). */
  readonly contentStart: number;
  readonly blank: boolean;
}

export function splitLines(text: string, from: number): Line[] {
  const lines: Line[] = [];
  let start = from;
  while (start <= text.length) {
    let end = start;
    while (end < text.length && text[end] !== '\n' && text[end] !== '\r') end++;
    lines.push(makeLine(text, start, end));
    if (end >= text.length) break;
    start = end + (text[end] === '\r' && text[end + 1] === '\n' ? 2 : 1);
    if (start === text.length) break; // a final line ending does not open an empty line
  }
  return lines;
}

function makeLine(text: string, start: number, end: number): Line {
  let indent = 0;
  let p = start;
  for (; p < end; p++) {
    const c = text[p];
    if (c === ' ') indent++;
    else if (c === '\t') indent += 4 - (indent % 4);
    else if (c !== '\f' && c !== '\v' && c !== '\u00a0') break;
  }
  const lineText = text.slice(start, end);
  return { start, end, text: lineText, indent, contentStart: p, blank: p === end };
}

/** A line made of one punctuation character repeated (at least 3 times): `=====`, `-----`, `~~~`. */
const RULE = /^[ \t]*([=\-~^*#+"'`:._])\1{2,}[ \t]*$/;
/** `* * *` and `- - -` separators. */
const SPACED_RULE = /^[ \t]*([-*_])(?:[ \t]*\1){2,}[ \t]*$/;

/** The repeated character when the line is a rule, else null. */
export function ruleChar(line: Line): string | null {
  const match = RULE.exec(line.text);
  return match === null ? null : match[1]!;
}

export function isSeparatorLine(line: Line): boolean {
  return ruleChar(line) !== null || SPACED_RULE.test(line.text);
}

export function ruleLength(line: Line): number {
  return line.text.trim().length;
}

/** `- item`, `* item`, `+ item`, `• item`, `1. item`, `1) item`. */
const LIST_ITEM = /^([ \t]*)(?:[-*+\u2022\u2023\u25e6]|\d{1,3}[.)])[ \t]+(?=\S)/;

/** Offset where a list item's text starts, or null when the line is not a list item. */
export function listItemContentStart(line: Line): number | null {
  const match = LIST_ITEM.exec(line.text);
  return match === null ? null : line.start + match[0].length;
}

const NUMBERED_HEADING = /^(\d{1,3}(?:\.\d{1,3})*)(\.?)[ \t]+(\p{L}.*)$/u;
const MAX_HEADING_LENGTH = 80;
const MAX_HEADING_WORDS = 10;

/** Shared shape rules for a one-line heading: short and not ending like a sentence or clause. */
function isShortTitle(text: string): boolean {
  return (
    text.length > 0 &&
    text.length <= MAX_HEADING_LENGTH &&
    text.split(/\s+/).length <= MAX_HEADING_WORDS &&
    !/[.,;:!?]$/.test(text)
  );
}

/** The number of levels of a numbered heading (`2.1 Design` → 2), or 0. */
export function numberedHeadingLevels(text: string): number {
  const trimmed = text.trim();
  const match = NUMBERED_HEADING.exec(trimmed);
  if (match === null || !isShortTitle(match[3]!.trim())) return 0;
  return match[1]!.split('.').length;
}

/** True when the number is followed by a period (`3. Results`), which also reads as a list item. */
export function numberedWithPeriod(text: string): boolean {
  const match = NUMBERED_HEADING.exec(text.trim());
  return match !== null && match[1]!.split('.').length === 1 && match[2] === '.';
}

/** A short line whose letters are all capitals (`RESULTS`, `FIELD NOTES 2`). */
export function isCapitalsHeading(text: string): boolean {
  const trimmed = text.trim();
  const letters = trimmed.match(LETTERS);
  if (letters === null || letters.length < 2) return false;
  if (LOWER.test(trimmed) || !UPPER.test(trimmed)) return false;
  return isShortTitle(trimmed);
}
