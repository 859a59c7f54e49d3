/**
 * Hysteresis for live summaries: the previous summary's sentences keep their place unless a new
 * sentence is clearly better. A kept sentence's relevance is raised by a margin, so a newcomer
 * must beat it by more than the margin (on the [0, 1] relevance scale) to replace it.
 */
import type { ParsedDocument, Span } from '../types';
import { normalizeSentence } from './sentence-kinds';

export const HYSTERESIS_DEFAULTS = {
  /**
   * How much better (relevance, 0-1) a new sentence must be to replace a previous pick. Chosen on
   * the train half with `node dist/bench.cjs churn --split train` (see bench/RESULTS.md).
   */
  margin: 0.15,
} as const;

/** 1 for each sentence that was picked before: same text, or a span covering most of it. */
export function previousPicks(doc: ParsedDocument, previous: readonly (string | Span)[]): Uint8Array {
  const marks = new Uint8Array(doc.sentences.length);
  if (previous.length === 0) return marks;
  const texts = new Set(previous.filter((p): p is string => typeof p === 'string').map(normalizeSentence));
  const spans = previous.filter((p): p is Span => typeof p !== 'string').sort((a, b) => a.start - b.start);
  doc.sentences.forEach((sentence, i) => {
    if (texts.has(normalizeSentence(sentence.text))) marks[i] = 1;
    else if (spans.length > 0 && coveredMostly(sentence.span, spans)) marks[i] = 1;
  });
  return marks;
}

/** Whether one of the sorted spans overlaps more than half of `span`. */
function coveredMostly(span: Span, sorted: readonly Span[]): boolean {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid]!.end <= span.start) lo = mid + 1;
    else hi = mid;
  }
  const length = Math.max(1, span.end - span.start);
  for (let k = Math.max(0, lo - 1); k < sorted.length && sorted[k]!.start < span.end; k++) {
    const overlap = Math.min(span.end, sorted[k]!.end) - Math.max(span.start, sorted[k]!.start);
    if (overlap * 2 > length) return true;
  }
  return false;
}

/** Relevance with the margin added to previous picks. */
export function withHysteresis(relevance: Float64Array, kept: Uint8Array, margin = HYSTERESIS_DEFAULTS.margin): Float64Array {
  const out = Float64Array.from(relevance);
  for (let i = 0; i < out.length; i++) if (kept[i] === 1) out[i] = out[i]! + margin;
  return out;
}
