/**
 * Reading time, the measure the length presets are written in. One reading speed for the whole
 * engine: the "reads in" figures, the minute presets and the default length.
 */

/** Silent reading speed, words per minute (common practice, no source). */
export const WORDS_PER_MINUTE = 230;

export function minutesToRead(words: number): number {
  return words / WORDS_PER_MINUTE;
}

export const AUTO_LENGTH = {
  /** Minutes for a document of `referenceMinutes` (or shorter)… */
  baseMinutes: 0.75,
  referenceMinutes: 1,
  /** …plus this much per doubling of the document's reading time… */
  perDoubling: 0.25,
  /** …between these bounds: a TL;DR is not a chapter (common practice, no source). */
  minMinutes: 0.5,
  maxMinutes: 2,
  /** Never more than this share of a short document's words. */
  maxShare: 1 / 3,
} as const;

/**
 * The default length: a reading time that grows with the logarithm of the document's, so a 16 KB
 * design document (about 2,300 words, a 10-minute read) gives about 1.6 minutes and an 84 KB one
 * (about 12,000 words, 52 minutes) 2 minutes; never more than a third of a short document.
 */
export function autoMinutes(documentWords: number, settings = AUTO_LENGTH): number {
  const documentMinutes = minutesToRead(documentWords);
  const grown = settings.baseMinutes + settings.perDoubling * Math.log2(Math.max(1, documentMinutes / settings.referenceMinutes));
  return Math.min(settings.maxMinutes, Math.max(settings.minMinutes, grown));
}

/** Words of the default length for a document of `documentWords` words. */
export function autoWords(documentWords: number, settings = AUTO_LENGTH): number {
  return Math.round(Math.min(autoMinutes(documentWords, settings) * WORDS_PER_MINUTE, documentWords * settings.maxShare));
}
