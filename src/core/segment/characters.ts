/** Character classes the sentence splitter needs, by UTF-16 code unit where that is enough. */

export function isSpaceCode(code: number): boolean {
  return (
    code === 0x20 ||
    (code >= 0x09 && code <= 0x0d) ||
    code === 0x85 ||
    code === 0xa0 ||
    code === 0x1680 ||
    (code >= 0x2000 && code <= 0x200a) ||
    code === 0x2028 ||
    code === 0x2029 ||
    code === 0x202f ||
    code === 0x205f ||
    code === 0x3000 ||
    code === 0xfeff
  );
}

/** Hard line breaks: every one ends a sentence. */
const LINE_BREAKS = '\n\r\u2028\u2029';

export function isLineBreakCode(code: number): boolean {
  return code === 0x0a || code === 0x0d || code === 0x2028 || code === 0x2029;
}

/** Punctuation that may close a sentence and still needs a following space to do so. */
export const PERIOD = '.';
export const ELLIPSIS = '\u2026';
const STRONG_TERMINATORS = '?!\u203d';
/** Full stops of scripts written without spaces; they end a sentence even when text follows at once. */
const IDEOGRAPHIC_TERMINATORS = '\u3002\uff01\uff1f\uff61';

// Every helper below rejects '' (what charAt returns past the end): ''.includes('') is true.

export function isStrongTerminator(ch: string): boolean {
  return ch !== '' && STRONG_TERMINATORS.includes(ch);
}

export function isIdeographicTerminator(ch: string): boolean {
  return ch !== '' && IDEOGRAPHIC_TERMINATORS.includes(ch);
}

/** Quotes and brackets that may follow terminal punctuation and still belong to the sentence. */
const CLOSERS = '"\'\u201d\u2019\u00bb\u203a)]}\u300d\u300f\u3011\u3015\uff09';
/** Quotes and brackets that may open the next sentence. */
const OPENERS = '"\'\u201c\u2018\u201e\u00ab\u2039([{\u00bf\u00a1\u300c\u300e\u3010\u3014\uff08';

export function isCloser(ch: string): boolean {
  return ch !== '' && CLOSERS.includes(ch);
}

export function isOpener(ch: string): boolean {
  return ch !== '' && OPENERS.includes(ch);
}

/** Bullet characters that start an item when written inline ("• one • two"). */
const BULLETS = '\u2022\u2043\u25e6\u2023\u25aa\u25cf\u25cb\u25a0';

export function isBullet(ch: string): boolean {
  return ch !== '' && BULLETS.includes(ch);
}

/**
 * A character class matching every character the scanner must stop at: line breaks, terminal
 * punctuation and bullets. A native regular-expression search skips plain text between them fast.
 */
export const SCAN_STOPS_SOURCE = `[${escapeForClass(
  LINE_BREAKS + PERIOD + ELLIPSIS + STRONG_TERMINATORS + IDEOGRAPHIC_TERMINATORS + BULLETS,
)}]`;

function escapeForClass(chars: string): string {
  return chars.replace(/[\\\]\[^-]/g, '\\$&').replace(/\n/g, '\\n').replace(/\r/g, '\\r');
}

export type LetterCase = 'lower' | 'upper' | 'digit' | 'other';

const LOWER = /\p{Ll}/u;
const LETTER = /\p{L}/u;
const DIGIT = /\p{Nd}/u;

/**
 * Case of the character (code point) at `index`. Letters of scripts without case count as
 * 'upper': after a period they can start a sentence just as a capital can.
 */
export function letterCaseAt(text: string, index: number): LetterCase {
  const code = text.codePointAt(index);
  if (code === undefined) return 'other';
  if (code < 0x80) {
    if (code >= 0x61 && code <= 0x7a) return 'lower';
    if (code >= 0x41 && code <= 0x5a) return 'upper';
    return code >= 0x30 && code <= 0x39 ? 'digit' : 'other';
  }
  const ch = String.fromCodePoint(code);
  if (LOWER.test(ch)) return 'lower';
  if (LETTER.test(ch)) return 'upper';
  if (DIGIT.test(ch)) return 'digit';
  return 'other';
}

const ALPHANUMERIC = /[\p{L}\p{N}]/u;

export function isAlphanumericAt(text: string, index: number): boolean {
  const code = text.codePointAt(index);
  if (code === undefined) return false;
  if (code < 0x80) return (code >= 0x30 && code <= 0x39) || ((code | 0x20) >= 0x61 && (code | 0x20) <= 0x7a);
  return ALPHANUMERIC.test(String.fromCodePoint(code));
}

/** Longest word `lettersAt` reads; enough for any sentence starter or abbreviation. */
const MAX_WORD_READ = 32;
const LETTER_OR_MARK = /[\p{L}\p{M}]/u;

/** The run of letters starting at `index` (at most MAX_WORD_READ code units). */
export function lettersAt(text: string, index: number): string {
  const limit = Math.min(text.length, index + MAX_WORD_READ);
  let end = index;
  while (end < limit) {
    const code = text.charCodeAt(end);
    if (code < 0x80) {
      if ((code | 0x20) < 0x61 || (code | 0x20) > 0x7a) break;
      end++;
    } else {
      const width = code >= 0xd800 && code <= 0xdbff ? 2 : 1;
      if (end + width > limit || !LETTER_OR_MARK.test(text.slice(end, end + width))) break;
      end += width;
    }
  }
  return text.slice(index, end);
}
