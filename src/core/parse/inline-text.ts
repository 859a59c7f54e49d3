/**
 * Normalized paragraph text with an offset map back into the original string.
 *
 * Every UTF-16 unit of the normalized text remembers the source range that produced it (one
 * character, or a whole escape or character reference such as `\*` or `&copy;`), so a span found
 * in the normalized text (a sentence) maps back to an exact source range:
 * `[starts[first], ends[last])`.
 *
 * Whitespace is collapsed when the text is finished: runs of blanks become one ' ', blanks around a
 * hard break ('\n') disappear, and both ends are trimmed. Soft line breaks are written as ' '.
 */

import { splitSentences, type LineBreaks } from '../segment/sentences';
import type { Span } from '../types';

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

const BLANK = /[ \t\f\v\u00a0\u1680\u2000-\u200a\u202f\u205f\u3000\r]/;

export interface InlineTextOptions {
  /** A line that ends early may end a sentence (plain text; see LineBreaks.deliberate). */
  readonly deliberateLines?: boolean;
}

export class InlineTextBuilder {
  constructor(private readonly options: InlineTextOptions = {}) {}

  private readonly chars: string[] = [];
  private readonly starts: number[] = [];
  private readonly ends: number[] = [];
  /** Indices in `chars` where a line ended (soft or hard break), for line-based checks. */
  private readonly lineBreaks: number[] = [];

  get length(): number {
    return this.chars.length;
  }

  /** One UTF-16 unit produced by the source range `[start, end)`. */
  push(unit: string, start: number, end: number): void {
    this.chars.push(unit);
    this.starts.push(start);
    this.ends.push(end);
  }

  /** Copies `source[start, end)` unit by unit, each produced by itself. */
  pushSource(source: string, start: number, end: number): void {
    for (let p = start; p < end; p++) this.push(source[p]!, p, p + 1);
  }

  /** A line ending that continues the paragraph; `offset` is where the line break is in the source. */
  softBreak(offset: number): void {
    this.lineBreaks.push(this.chars.length);
    this.push(' ', offset, offset + 1);
  }

  /** A line break the author forced; it also ends any sentence. */
  hardBreak(offset: number): void {
    this.lineBreaks.push(this.chars.length);
    this.push('\n', offset, offset + 1);
  }

  /** The raw (uncollapsed) text split at line breaks, trimmed; used by line-shaped checks. */
  lines(): string[] {
    const out: string[] = [];
    let from = 0;
    for (const at of [...this.lineBreaks, this.chars.length]) {
      out.push(this.chars.slice(from, at).join('').replace(/\s+/g, ' ').trim());
      from = at + 1;
    }
    return out;
  }

  finish(): NormalizedText {
    const chars: string[] = [];
    const starts: number[] = [];
    const ends: number[] = [];
    const softBreaks: number[] = [];
    const isSoftBreak = new Set(this.lineBreaks.filter((i) => this.chars[i] === ' '));
    let pendingBlank = -1; // index of the first blank of a run not yet written
    let pendingSoft = false; // that run holds a soft line break
    const keep = (unit: string, i: number): void => {
      chars.push(unit);
      starts.push(this.starts[i]!);
      ends.push(this.ends[i]!);
    };
    for (let i = 0; i < this.chars.length; i++) {
      const c = this.chars[i]!;
      if (c === '\n') {
        pendingBlank = -1;
        pendingSoft = false;
        // Collapse consecutive breaks and drop breaks at the start.
        if (chars.length > 0 && chars[chars.length - 1] !== '\n') keep('\n', i);
        continue;
      }
      if (BLANK.test(c)) {
        if (pendingBlank < 0) pendingBlank = i;
        if (isSoftBreak.has(i)) pendingSoft = true;
        continue;
      }
      if (pendingBlank >= 0 && chars.length > 0 && chars[chars.length - 1] !== '\n') {
        if (pendingSoft) softBreaks.push(chars.length);
        keep(' ', pendingBlank);
      }
      pendingBlank = -1;
      pendingSoft = false;
      keep(c, i);
    }
    while (chars.length > 0 && chars[chars.length - 1] === '\n') {
      chars.pop();
      starts.pop();
      ends.pop();
    }
    return { text: chars.join(''), starts: Int32Array.from(starts), ends: Int32Array.from(ends), lines: { softBreaks, deliberate: this.options.deliberateLines ?? false } };
  }
}

/** Maps a span of the normalized text back to a local source span. */
export function sourceSpan(normalized: NormalizedText, span: Span): Span {
  return { start: normalized.starts[span.start]!, end: normalized.ends[span.end - 1]! };
}

/** Splits a paragraph's normalized text into sentences, each with its local source range. */
export function sentencesOf(normalized: NormalizedText): LocalSentence[] {
  if (normalized.text.length === 0) return [];
  const out: LocalSentence[] = [];
  for (const span of splitSentences(normalized.text, normalized.lines)) {
    if (span.end <= span.start) continue;
    const text = normalized.text.slice(span.start, span.end).replace(/\s+/g, ' ').trim();
    if (!/[\p{L}\p{N}]/u.test(text)) continue; // stray punctuation is not a sentence
    const source = sourceSpan(normalized, span);
    out.push({ text, start: source.start, end: source.end });
  }
  return out;
}

/** The normalized text as one line (for headings). */
export function singleLine(normalized: NormalizedText): string {
  return normalized.text.replace(/\n/g, ' ');
}
