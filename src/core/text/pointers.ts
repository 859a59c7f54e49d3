/**
 * Pointer sentences: a sentence whose whole job is to send the reader elsewhere ("See RFC 1234.",
 * "Please refer to the operator guide.", "For more information, see Building with Ninja."). Read
 * out of its document it says nothing, so it never fills a summary seat, and the trained ranker
 * sees it as a feature. The phrases are general English (ours, common practice, no source).
 */

/** Longest pointer, in words: longer sentences starting this way usually say something themselves. */
export const POINTER_MAX_WORDS = 12;

const POINTER =
  /^[("'“‘[]*(?:(?:please\s+)?(?:see|refer\s+to|check\s+out)\b|cf\.?\s|(?:for\s+(?:more|further|additional|full)\s+(?:information|details|info|context|background|discussion)|for\s+details|more\s+(?:information|details)\s+(?:is|are|can\s+be)\s+(?:found|available))\b)/iu;

/** Whether the sentence (its normalized text, and its word count) only points elsewhere. */
export function isPointerSentence(text: string, wordCount: number): boolean {
  return wordCount <= POINTER_MAX_WORDS && POINTER.test(text.trim());
}
