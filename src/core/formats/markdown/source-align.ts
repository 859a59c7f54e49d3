/**
 * Aligns a Markdown text node's decoded `value` with the source range it came from.
 *
 * The parser decodes backslash escapes and character references and removes line-leading
 * indentation and block-quote markers, so the value is not a slice of the source. It is, however,
 * the source with characters removed, plus decoded references. A left-to-right walk that skips
 * source characters until the next value character appears recovers, for each value unit, the
 * source range that produced it.
 */

import { fromMarkdown } from 'mdast-util-from-markdown';

const REFERENCE = /&(?:#[xX][0-9a-fA-F]{1,6}|#[0-9]{1,7}|[A-Za-z][A-Za-z0-9]{0,31});/y;
const ASCII_PUNCTUATION = /[!-/:-@[-`{-~]/;

const decodedReferences = new Map<string, string>();

/** Decodes one character reference the way the Markdown parser does (it is the parser). */
function decodeReference(reference: string): string {
  let decoded = decodedReferences.get(reference);
  if (decoded === undefined) {
    const paragraph = fromMarkdown(`a${reference}a`).children[0];
    const text = paragraph?.type === 'paragraph' ? paragraph.children[0] : undefined;
    const value = text?.type === 'text' ? text.value : '';
    decoded = value.startsWith('a') && value.endsWith('a') && value.length > 2 ? value.slice(1, -1) : reference;
    decodedReferences.set(reference, decoded);
  }
  return decoded;
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
  const starts = new Int32Array(value.length);
  const ends = new Int32Array(value.length);
  let p = start;
  let i = 0;
  while (i < value.length) {
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
  return { starts, ends };
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
