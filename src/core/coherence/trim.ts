/**
 * "However, the desk closes at noon." → "The desk closes at noon." — display text only; the
 * source document is never changed, and callers mark the sentence as edited.
 */
import type { TriggerHit } from './triggers';

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const WORD_CHARACTER = /[\p{L}\d]/u;
const LETTER = /\p{L}/u;
const LEADING_WORD = /^[\p{L}\p{M}'’-]+/u;
const UPPER = /\p{Lu}/u;

/** Fewer words than this left after trimming is not a sentence worth showing. */
const MIN_WORDS_LEFT = 3;

export function trimLeadingConnective(text: string, hit: Pick<TriggerHit, 'start' | 'end'>): string | null {
  const before = text.slice(0, hit.start);
  if (WORD_CHARACTER.test(before)) return null; // only a connective that opens the sentence
  const rest = text.slice(hit.end).replace(/^\s*[,;:—–-]?\s*/u, '');
  if (rest.split(/\s+/).filter((w) => WORD_CHARACTER.test(w)).length < MIN_WORDS_LEFT) return null;
  return before + capitalizeFirstLetter(rest);
}

function capitalizeFirstLetter(text: string): string {
  const at = text.search(LETTER);
  if (at < 0) return text;
  // Leave words like "iPhone" or "eBay" alone: a capital later in the word means it is a name.
  const word = LEADING_WORD.exec(text.slice(at))?.[0] ?? '';
  if (UPPER.test(word.slice(1))) return text;
  return text.slice(0, at) + text[at]!.toUpperCase() + text.slice(at + 1);
}
