/**
 * The platform's Unicode text segmentation (`Intl.Segmenter`, UAX #29 rules from ICU) where the
 * runtime has it (Node, current browsers). The root locale ('und') keeps the result the same on
 * every machine whatever its language settings. Without `Intl.Segmenter` these return nothing
 * and callers fall back to their own boundaries.
 */

type Granularity = 'sentence' | 'grapheme';
const segmenters = new Map<Granularity, Intl.Segmenter | null>();

function segmenter(granularity: Granularity): Intl.Segmenter | null {
  if (!segmenters.has(granularity)) {
    segmenters.set(granularity, typeof Intl === 'object' && typeof Intl.Segmenter === 'function' ? new Intl.Segmenter('und', { granularity }) : null);
  }
  return segmenters.get(granularity)!;
}

/** Offsets strictly inside (from, to) where the platform's sentence rules start a new sentence. */
export function platformSentenceBreaks(text: string, from: number, to: number): number[] {
  const sentences = segmenter('sentence');
  if (sentences === null) return [];
  const breaks: number[] = [];
  for (const { index } of sentences.segment(text.slice(from, to))) if (index > 0) breaks.push(from + index);
  return breaks;
}

/**
 * The last offset in (from, limit] that does not split a user-perceived character (a letter with
 * its marks, an emoji sequence); without the platform's rules, the last one that does not split a
 * surrogate pair. `from` when the first character alone reaches past `limit`.
 */
export function characterBoundaryBefore(text: string, from: number, limit: number): number {
  const graphemes = segmenter('grapheme');
  if (graphemes !== null) {
    let last = from;
    // A little past the limit, so a character ending exactly at it is seen whole.
    for (const { index, segment } of graphemes.segment(text.slice(from, Math.min(text.length, limit + 64)))) {
      const end = from + index + segment.length;
      if (end > limit) break;
      last = end;
    }
    return last;
  }
  let at = limit;
  const code = text.charCodeAt(at);
  if (at > from && at < text.length && code >= 0xdc00 && code <= 0xdfff) at--;
  return at;
}
