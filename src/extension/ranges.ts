/**
 * Engine spans (0-based UTF-16 offsets, half-open `[start, end)`) checked against the text they
 * are shown in. Free of the editor API; the one span → editor range conversion is `rangeOf` in
 * editor-ranges.ts, and the editor's line rules for code that only has a string are the engine's
 * `LineIndex`.
 */
import type { Span } from '../core/index';

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
