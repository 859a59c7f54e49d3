/** Trimmed pieces of text between cut offsets: the one way the splitter turns cuts into spans. */
import type { Span } from '../types';
import { isSpaceCode } from './characters';

/**
 * Trimmed, non-empty pieces of `text[from, to)` between consecutive cut offsets. `cuts` must be
 * ascending; cuts outside (from, to) are ignored.
 */
export function spansBetween(text: string, cuts: readonly number[], from = 0, to = text.length): Span[] {
  const spans: Span[] = [];
  let start = from;
  for (const cut of [...cuts, to]) {
    if (cut <= start || cut > to) continue;
    pushTrimmed(text, start, cut, spans);
    start = cut;
  }
  return spans;
}

function pushTrimmed(text: string, from: number, to: number, out: Span[]): void {
  let start = from;
  let end = to;
  while (start < end && isSpaceCode(text.charCodeAt(start))) start++;
  while (end > start && isSpaceCode(text.charCodeAt(end - 1))) end--;
  if (end > start) out.push({ start, end });
}

/** Ascending, without repeats. */
export function sortedCuts(cuts: readonly number[]): number[] {
  return [...new Set(cuts)].sort((a, b) => a - b);
}
