/**
 * Aligns a Markdown text node's decoded `value` with the source range it came from.
 *
 * The parser decodes backslash escapes and character references and removes line-leading
 * indentation and block-quote markers, so the value is not a slice of the source. It is, however,
 * the source with characters removed, plus decoded references. A left-to-right walk that skips
 * source characters until the next value character appears recovers, for each value unit, the
 * source range that produced it.
 */

import { decodeHTMLStrict } from 'entities';

const REFERENCE = /&(?:#[xX][0-9a-fA-F]{1,6}|#[0-9]{1,7}|[A-Za-z][A-Za-z0-9]{0,31});/y;
const ASCII_PUNCTUATION = /[!-/:-@[-`{-~]/;
const REPLACEMENT_CHARACTER = '\uFFFD';
const BACKSLASH = 0x5c;
const AMPERSAND = 0x26;

/**
 * True for a code point a numeric reference may produce. Both Markdown readers replace the rest
 * with U+FFFD: surrogates, noncharacters, C0 controls other than tab and line endings, DEL and C1
 * controls, and anything past U+10FFFF (markdown-it's `utils.isValidEntityCode`; micromark's
 * `decodeNumericCharacterReference` tests the same ranges).
 */
function isDecodableCodePoint(code: number): boolean {
  if (code >= 0xd800 && code <= 0xdfff) return false;
  if (code >= 0xfdd0 && code <= 0xfdef) return false;
  if ((code & 0xffff) === 0xffff || (code & 0xffff) === 0xfffe) return false;
  if (code <= 0x08 || code === 0x0b || (code >= 0x0e && code <= 0x1f) || (code >= 0x7f && code <= 0x9f)) return false;
  return code <= 0x10ffff;
}

/**
 * Decodes one character reference the way the Markdown readers do (CommonMark 0.31.2, Entity and
 * numeric character references): a name from the HTML5 list (the `entities` package, which
 * markdown-it decodes with), or a decimal or hexadecimal code point. Returns the reference itself
 * when it is not one.
 */
function decodeReference(reference: string): string {
  if (reference[1] !== '#') return decodeHTMLStrict(reference);
  const hex = reference[2] === 'x' || reference[2] === 'X';
  const code = Number.parseInt(reference.slice(hex ? 3 : 2, -1), hex ? 16 : 10);
  return isDecodableCodePoint(code) ? String.fromCodePoint(code) : REPLACEMENT_CHARACTER;
}

/** Source range `[starts[i], ends[i])` that produced each UTF-16 unit of a value. */
export interface Alignment {
  readonly starts: Int32Array;
  readonly ends: Int32Array;
}

/**
 * Aligns each UTF-16 unit of `value` with `source[start, end)`. A unit that cannot be found
 * (which should not happen) gets the position reached so far.
 */
export function alignValue(
  value: string,
  source: string,
  start: number,
  end: number,
  codeSpan = false,
): Alignment {
  const alignment = { starts: new Int32Array(value.length), ends: new Int32Array(value.length) };
  alignInto(value, source, start, end, codeSpan, alignment);
  return alignment;
}

/**
 * alignValue into arrays of at least `value.length` units (the first `value.length` are written):
 * a reader aligning thousands of short text nodes reuses one pair instead of allocating two each.
 */
export function alignInto(value: string, source: string, start: number, end: number, codeSpan: boolean, { starts, ends }: Alignment): void {
  let p = start;
  let i = 0;
  while (i < value.length) {
    // The common case, a unit copied as is (neither an escape nor a reference can start there).
    const unit = value.charCodeAt(i);
    if (p < end && source.charCodeAt(p) === unit && unit !== BACKSLASH && unit !== AMPERSAND) {
      starts[i] = p;
      ends[i] = p + 1;
      i++;
      p++;
      continue;
    }
    const matched = matchAt(value, i, source, p, end, codeSpan);
    if (matched !== null) {
      const [units, sourceLength] = matched;
      for (let k = 0; k < units; k++) {
        starts[i + k] = p;
        ends[i + k] = p + sourceLength;
      }
      i += units;
      p += sourceLength;
      continue;
    }
    // Skip source characters the parser removed (escapes' backslashes, indentation, '>' markers).
    let q = p + 1;
    while (q < end && matchAt(value, i, source, q, end, codeSpan) === null) q++;
    if (q < end) {
      p = q;
      continue;
    }
    // Not found: keep going without consuming the source, so later units can still align.
    const at = Math.min(p, Math.max(start, end - 1));
    starts[i] = at;
    ends[i] = at + 1;
    i++;
  }
}

/** If value[i...] is produced by source[p...], returns [value units consumed, source units consumed]. */
function matchAt(
  value: string,
  i: number,
  source: string,
  p: number,
  end: number,
  codeSpan: boolean,
): [number, number] | null {
  const c = value[i]!;
  const s = source[p];
  if (s === undefined || p >= end) return null;
  // Code spans are literal: no backslash escapes, no character references (CommonMark 6.1).
  if (!codeSpan && s === '\\' && p + 1 < end && source[p + 1] === c && ASCII_PUNCTUATION.test(c)) return [1, 2];
  if (!codeSpan && s === '&') {
    REFERENCE.lastIndex = p;
    const reference = REFERENCE.exec(source);
    if (reference !== null && p + reference[0].length <= end) {
      const decoded = decodeReference(reference[0]);
      if (decoded !== reference[0] && decoded.length > 0 && value.startsWith(decoded, i)) {
        return [decoded.length, reference[0].length];
      }
    }
  }
  if (s === c) return [1, 1];
  // A CRLF line ending is a single '\n' in the value.
  if (c === '\n' && s === '\r') return p + 1 < end && source[p + 1] === '\n' ? [1, 2] : [1, 1];
  // A code span turns its line endings into spaces.
  if (codeSpan && c === ' ' && (s === '\n' || s === '\r')) {
    return s === '\r' && p + 1 < end && source[p + 1] === '\n' ? [1, 2] : [1, 1];
  }
  return null;
}
