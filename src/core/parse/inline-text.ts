/**
 * Normalized paragraph text with an offset map back into the original string.
 *
 * Every UTF-16 unit of the normalized text remembers the source range that produced it (one
 * character, or a whole escape or character reference such as `\*` or `&copy;`), so a span found
 * in the normalized text (a sentence) maps back to an exact source range:
 * `[starts[first], ends[last])`.
 *
 * Whitespace is collapsed when the text is finished: runs of blanks become one ' ', blanks around a
 * hard break ('\n') disappear, and both ends are trimmed. Soft line breaks are written as ' ', except
 * after a hyphen that the line wrap cut a compound at (see hyphenatedAcrossLines).
 */

import { splitSentences, type LineBreaks } from '../segment/sentences';
import type { Span } from '../types';

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const LETTER_OR_DIGIT = /[\p{L}\p{N}]/u;

export interface NormalizedText {
  readonly text: string;
  /** Start of the source range (local to the parsed string) that produced each UTF-16 unit. */
  readonly starts: Int32Array;
  /** End (exclusive) of that source range. */
  readonly ends: Int32Array;
  /** Where the soft line breaks were, for the sentence splitter (segment/sentences.ts). */
  readonly lines?: LineBreaks;
}

/** Source offsets (local) and the sentence text of one sentence found in a paragraph. */
export interface LocalSentence {
  readonly text: string;
  readonly start: number;
  readonly end: number;
}

export interface InlineTextOptions {
  /** A line that ends early may end a sentence (plain text; see LineBreaks.deliberate). */
  readonly deliberateLines?: boolean;
}

export class InlineTextBuilder {
  constructor(private readonly options: InlineTextOptions = {}) {}

  // Units are kept as codes and turned into strings with String.fromCharCode: joining arrays of
  // one-character strings cost several times more (measured on the corpus).
  private readonly units: number[] = [];
  private readonly starts: number[] = [];
  private readonly ends: number[] = [];
  /** Indices in `units` where a line ended (soft or hard break), for line-based checks. */
  private readonly lineBreaks: number[] = [];
  /** [from, to) ranges of `units` that hold code: no sentence ends inside one. */
  private readonly codeRanges: [number, number][] = [];
  private codeFrom = -1;

  get length(): number {
    return this.units.length;
  }

  /** One UTF-16 unit produced by the source range `[start, end)`. */
  push(unit: string, start: number, end: number): void {
    this.pushCode(unit.charCodeAt(0), start, end);
  }

  /** Copies `source[start, end)` unit by unit, each produced by itself. */
  pushSource(source: string, start: number, end: number): void {
    for (let p = start; p < end; p++) this.pushCode(source.charCodeAt(p), p, p + 1);
  }

  /** A line ending that continues the paragraph; `offset` is where the line break is in the source. */
  softBreak(offset: number): void {
    this.lineBreaks.push(this.units.length);
    this.pushCode(SPACE, offset, offset + 1);
  }

  /** A line break the author forced; it also ends any sentence. */
  hardBreak(offset: number): void {
    this.lineBreaks.push(this.units.length);
    this.pushCode(LINE_FEED, offset, offset + 1);
  }

  /** What is pushed until `endCode` is an inline code span, where no sentence ends ("`${ .. }`"). */
  beginCode(): void {
    this.codeFrom = this.units.length;
  }

  endCode(): void {
    if (this.codeFrom >= 0 && this.units.length > this.codeFrom) this.codeRanges.push([this.codeFrom, this.units.length]);
    this.codeFrom = -1;
  }

  /** The raw (uncollapsed) text split at line breaks, trimmed; used by line-shaped checks. */
  lines(): string[] {
    const out: string[] = [];
    let from = 0;
    for (const at of [...this.lineBreaks, this.units.length]) {
      out.push(codesToString(this.units, from, at).replace(/\s+/g, ' ').trim());
      from = at + 1;
    }
    return out;
  }

  finish(): NormalizedText {
    const count = this.units.length;
    const units: number[] = [];
    // Written into shared scratch arrays and copied out at their final length.
    const { starts, ends } = offsetsFor(count);
    const softBreaks: number[] = [];
    // Line breaks ascend, so one cursor finds whether unit i is a soft break.
    const { lineBreaks } = this;
    let nextBreak = 0;
    let pendingBlank = -1; // index of the first blank of a run not yet written
    let pendingSoft = false; // that run holds a soft line break
    /** Output index of each unit that was written, -1 for a unit collapsed away (code ranges only). */
    const written = this.codeRanges.length > 0 ? new Int32Array(count).fill(-1) : null;
    for (let i = 0; i < count; i++) {
      const code = this.units[i]!;
      if (code === LINE_FEED) {
        pendingBlank = -1;
        pendingSoft = false;
        // Collapse consecutive breaks and drop breaks at the start.
        if (units.length === 0 || units[units.length - 1] === LINE_FEED) continue;
      } else if (isBlank(code)) {
        if (pendingBlank < 0) pendingBlank = i;
        while (nextBreak < lineBreaks.length && lineBreaks[nextBreak]! < i) nextBreak++;
        if (lineBreaks[nextBreak] === i && code === SPACE) pendingSoft = true;
        continue;
      } else {
        if (pendingBlank >= 0 && units.length > 0 && units[units.length - 1] !== LINE_FEED && !(pendingSoft && this.hyphenatedAcrossLines(units, i))) {
          if (pendingSoft) softBreaks.push(units.length);
          starts[units.length] = this.starts[pendingBlank]!;
          ends[units.length] = this.ends[pendingBlank]!;
          units.push(SPACE);
        }
        pendingBlank = -1;
        pendingSoft = false;
      }
      if (written) written[i] = units.length;
      starts[units.length] = this.starts[i]!;
      ends[units.length] = this.ends[i]!;
      units.push(code);
    }
    while (units.length > 0 && units[units.length - 1] === LINE_FEED) units.pop();
    const length = units.length;
    const unbreakable: Span[] = [];
    if (written) {
      for (const [from, to] of this.codeRanges) {
        let first = from;
        while (first < to && (written[first]! < 0 || written[first]! >= length)) first++;
        let last = to - 1;
        while (last >= first && (written[last]! < 0 || written[last]! >= length)) last--;
        if (last > first) unbreakable.push({ start: written[first]!, end: written[last]! + 1 });
      }
    }
    return {
      text: codesToString(units, 0, length),
      ...finalOffsets(starts, ends, length),
      lines: { softBreaks, deliberate: this.options.deliberateLines ?? false, ...(unbreakable.length > 0 ? { unbreakable } : {}) },
    };
  }

  /**
   * A compound broken after its hyphen by the line wrap ("function-" at a line end, "like" on the
   * next line) reads as one word, as it does in the rendered text of a hard-wrapped paragraph;
   * a suspended hyphen ("pre- and post-") keeps its space. `units` is the output so far, `next`
   * the first unit after the line break. Common practice, no source.
   */
  private hyphenatedAcrossLines(units: readonly number[], next: number): boolean {
    const last = units.length - 1;
    if (last < 1 || (units[last] !== HYPHEN_MINUS && units[last] !== HYPHEN) || !LETTER.test(String.fromCharCode(units[last - 1]!))) return false;
    let word = '';
    for (let k = next; k < this.units.length && word.length < LETTERS_TO_READ; k++) {
      const unit = String.fromCharCode(this.units[k]!);
      if (!LOWER_LETTER.test(unit)) break;
      word += unit;
    }
    return word.length > 0 && !SUSPENDED_HYPHEN_WORDS.has(word);
  }

  /** One UTF-16 unit, given by its code, produced by the source range `[start, end)`. */
  pushCode(code: number, start: number, end: number): void {
    this.units.push(code);
    this.starts.push(start);
    this.ends.push(end);
  }
}

const SPACE = 0x20;
const LINE_FEED = 0x0a;
const HYPHEN_MINUS = 0x2d;
const HYPHEN = 0x2010;
const LETTER = /\p{L}/u;
const LOWER_LETTER = /\p{Ll}/u;
/** Words after a hyphen that leave it suspended ("long- and short-term"; English and German). */
const SUSPENDED_HYPHEN_WORDS: ReadonlySet<string> = new Set(['and', 'or', 'nor', 'to', 'und', 'oder', 'bis']);
/** Letters read after the break: one more than the longest of those words tells it from a longer word. */
const LETTERS_TO_READ = Math.max(...[...SUSPENDED_HYPHEN_WORDS].map((w) => w.length)) + 1;

/** Offsets scratch of finish() for paragraphs up to this many units; a longer one gets its own. */
const SCRATCH_UNITS = 4096;
const scratch = { starts: new Int32Array(SCRATCH_UNITS), ends: new Int32Array(SCRATCH_UNITS) };

function offsetsFor(count: number): { starts: Int32Array; ends: Int32Array } {
  return count <= SCRATCH_UNITS ? scratch : { starts: new Int32Array(count), ends: new Int32Array(count) };
}

/** The first `length` starts and ends, copied into one buffer (one allocation per paragraph, not two). */
function finalOffsets(starts: Int32Array, ends: Int32Array, length: number): { starts: Int32Array; ends: Int32Array } {
  const both = new Int32Array(2 * length);
  both.set(starts.subarray(0, length));
  both.set(ends.subarray(0, length), length);
  return { starts: both.subarray(0, length), ends: both.subarray(length) };
}
/** Units per String.fromCharCode call, far below engines' argument limits. */
const CODES_PER_CALL = 4096;

/** `codes[from, to)` as a string, unit for unit (lone surrogates stay as they are). */
function codesToString(codes: readonly number[], from: number, to: number): string {
  if (from === 0 && to === codes.length && to <= CODES_PER_CALL) return String.fromCharCode.apply(null, codes as number[]);
  let text = '';
  for (let p = from; p < to; p += CODES_PER_CALL) {
    text += String.fromCharCode.apply(null, codes.slice(p, Math.min(to, p + CODES_PER_CALL)));
  }
  return text;
}

/**
 * The blanks that collapse: space, tab, form feed, vertical tab, CR, no-break space, ogham space
 * mark, U+2000-U+200A, narrow no-break, medium mathematical and ideographic space. Tested by code,
 * not by a regular expression: this runs once per unit of every paragraph.
 */
function isBlank(code: number): boolean {
  if (code <= 0x20) return code === 0x20 || code === 0x09 || code === 0x0c || code === 0x0b || code === 0x0d;
  if (code < 0xa0) return false;
  return code === 0xa0 || code === 0x1680 || (code >= 0x2000 && code <= 0x200a) || code === 0x202f || code === 0x205f || code === 0x3000;
}

/** Maps a span of the normalized text back to a local source span. */
export function sourceSpan(normalized: NormalizedText, span: Span): Span {
  return { start: normalized.starts[span.start]!, end: normalized.ends[span.end - 1]! };
}

/** Two blanks in a row, or a blank other than ' ': what /\s+/ → ' ' would change. */
const NEEDS_COLLAPSE = /\s\s|[^\S ]/;

/** Splits a paragraph's normalized text into sentences, each with its local source range. */
export function sentencesOf(normalized: NormalizedText): LocalSentence[] {
  if (normalized.text.length === 0) return [];
  const out: LocalSentence[] = [];
  for (const span of splitSentences(normalized.text, normalized.lines)) {
    if (span.end <= span.start) continue;
    const raw = normalized.text.slice(span.start, span.end);
    // Finished text has its blank runs collapsed already; the replace is needed only where not.
    const text = (NEEDS_COLLAPSE.test(raw) ? raw.replace(/\s+/g, ' ') : raw).trim();
    if (!LETTER_OR_DIGIT.test(text)) continue; // stray punctuation is not a sentence
    const source = sourceSpan(normalized, span);
    out.push({ text, start: source.start, end: source.end });
  }
  return out;
}

/** The normalized text as one line (for headings). */
export function singleLine(normalized: NormalizedText): string {
  return normalized.text.replace(/\n/g, ' ');
}
