/**
 * Quantities in a sentence: numbers in digits or words ("12", "8,200", "twelve", "two hundred"),
 * percentages ("7.4%", "ten percent"), ratio words ("half", "twice"), dates ("1 March 2024",
 * "2024-03-01") and versions ("1.2.3", "v2"), each with what it counts: the content words right
 * after it and the one right before ("12 stations", "Rust 1.50"). A range ("18 to 40") is two
 * quantities with the same context.
 *
 * The number-word grammar is ordinary English (common practice, no source). "one" counts only when
 * a content word follows and no determiner precedes ("one field", not "this one" or "one of").
 */
import type { CheckedText, ClaimToken } from './claim-tokens';

export type QuantityKind = 'number' | 'percent' | 'ratio' | 'date' | 'version';

export interface Quantity {
  readonly kind: QuantityKind;
  /** Numeric value for numbers, percentages and ratios; a normalized key for dates and versions. */
  readonly value: number | string;
  /** The quantity with the word it counts, as written ("12 stations"). */
  readonly phrase: string;
  /** Stems of the counted word(s) after it and the word before it. */
  readonly context: ReadonlySet<string>;
  /** Index of the first token. */
  readonly token: number;
}

const UNITS: Readonly<Record<string, number>> = {
  zero: 0, one: 1, two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10, eleven: 11, twelve: 12,
  thirteen: 13, fourteen: 14, fifteen: 15, sixteen: 16, seventeen: 17, eighteen: 18, nineteen: 19,
};
const TENS: Readonly<Record<string, number>> = { twenty: 20, thirty: 30, forty: 40, fifty: 50, sixty: 60, seventy: 70, eighty: 80, ninety: 90 };
const SCALES: Readonly<Record<string, number>> = { hundred: 100, thousand: 1000, million: 1e6, billion: 1e9 };
const RATIOS: Readonly<Record<string, number>> = { half: 0.5, halved: 0.5, halves: 0.5, twice: 2, double: 2, doubled: 2, doubles: 2, triple: 3, tripled: 3, quarter: 0.25, tenth: 0.1 };
const MONTHS = ['january', 'february', 'march', 'april', 'may', 'june', 'july', 'august', 'september', 'october', 'november', 'december'];
const DETERMINERS = new Set(['the', 'this', 'that', 'each', 'any', 'which', 'no', 'every', 'a', 'an', 'another', 'only', 'such', 'new', 'old']);
const VERSION_WORDS = new Set(['version', 'versions', 'release', 'v', 'edition', 'rust', 'python', 'api', 'microversion']);
const PERCENT_WORDS = new Set(['percent', 'per-cent', 'pct']);
/** Punctuation between two tokens ends the phrase a number counts. */
const BREAK = /[,;:()[\]{}!?]|\.\s/u;

/** The value of a number word or a hyphenated one ("twenty-one"); null otherwise. */
export function numberWordValue(word: string): number | null {
  if (word in UNITS) return UNITS[word]!;
  if (word in TENS) return TENS[word]!;
  const [tens, unit] = word.split('-');
  if (tens !== undefined && unit !== undefined && tens in TENS && unit in UNITS && UNITS[unit]! < 10) return TENS[tens]! + UNITS[unit]!;
  return null;
}

function digitValue(word: string): number | null {
  const plain = word.replace(/%$/u, '');
  if (/^\d+(?:\.\d+)?$/u.test(plain)) return Number(plain);
  if (/^\d{1,3}(?:,\d{3})+(?:\.\d+)?$/u.test(plain)) return Number(plain.replaceAll(',', ''));
  return null;
}

function broken(text: CheckedText, from: ClaimToken, to: ClaimToken): boolean {
  return BREAK.test(text.text.slice(from.end, to.start));
}

/** Stems of up to two content words after token `last` and the content word before `first`. */
function contextOf(text: CheckedText, first: number, last: number): Set<string> {
  const context = new Set<string>();
  const tokens = text.tokens;
  let taken = 0;
  for (let k = last + 1; k < tokens.length && k <= last + 3 && taken < 2; k++) {
    if (broken(text, tokens[k - 1]!, tokens[k]!)) break;
    const term = tokens[k]!.term;
    if (term !== null && digitValue(tokens[k]!.lower) === null) {
      context.add(term);
      taken++;
    }
  }
  const before = tokens[first - 1];
  if (before && before.term !== null && !broken(text, before, tokens[first]!) && digitValue(before.lower) === null) context.add(before.term);
  return context;
}

function phraseOf(text: CheckedText, first: number, last: number): string {
  const tokens = text.tokens;
  let end = last;
  // Take the counted word along, when one follows directly.
  const next = tokens[last + 1];
  if (next && next.term !== null && !broken(text, tokens[last]!, next)) end = last + 1;
  return text.text.slice(tokens[first]!.start, tokens[end]!.end);
}

/** An ISO date (2014-12-19) gives its year; its month and day are not figures the text gives. */
const ISO_DATE = /\b(\d{4})-\d{2}-\d{2}\b/gu;

/** Numbers written anywhere in a text (digits, with decimals or thousands commas, and number words), for "the body never gives N". */
export function numbersInText(lowerText: string): Set<number> {
  const found = new Set<number>();
  for (const m of lowerText.replace(ISO_DATE, '$1').matchAll(/\d{1,3}(?:,\d{3})+(?:\.\d+)?|\d+(?:\.\d+)?|[a-z]+(?:-[a-z]+)?/gu)) {
    const value = /\d/u.test(m[0]) ? digitValue(m[0]) : numberWordValue(m[0]);
    if (value !== null) found.add(value);
    // "1.50" also states 1 and 50 as written parts (a version, a section number).
    if (/\d\.\d/u.test(m[0])) for (const part of m[0].split('.')) found.add(Number(part));
  }
  for (const [word, value] of Object.entries(SCALES)) if (lowerText.includes(word)) found.add(value);
  return found;
}

/** Every quantity of the sentence, in order. */
export function quantitiesIn(text: CheckedText): Quantity[] {
  const tokens = text.tokens;
  const found: Quantity[] = [];
  const push = (kind: QuantityKind, value: number | string, first: number, last: number) =>
    found.push({ kind, value, phrase: phraseOf(text, first, last), context: contextOf(text, first, last), token: first });

  for (let i = 0; i < tokens.length; i++) {
    const token = tokens[i]!;
    const word = token.lower;
    const next = tokens[i + 1]?.lower;
    const previous = tokens[i - 1]?.lower;

    const iso = /^(\d{4})-(\d{2})(?:-(\d{2}))?$/u.exec(word);
    if (iso) {
      push('date', iso[3] ? `${iso[1]}-${iso[2]}-${iso[3]}` : `${iso[1]}-${iso[2]}`, i, i);
      continue;
    }
    const month = MONTHS.indexOf(word);
    if (month >= 0 && word !== 'may' && (digitValue(next ?? '') !== null || digitValue(previous ?? '') !== null)) {
      const day = digitValue(previous ?? '');
      const after = digitValue(next ?? '');
      const mm = String(month + 1).padStart(2, '0');
      if (after !== null && after > 31 && day !== null && day <= 31) push('date', `${after}-${mm}-${String(day).padStart(2, '0')}`, i - 1, i + 1);
      else if (after !== null && after > 31) push('date', `${after}-${mm}`, i, i + 1);
      else if (after !== null) push('date', `${mm}-${String(after).padStart(2, '0')}`, i, i + 1);
      else if (day !== null && day <= 31) push('date', `${mm}-${String(day).padStart(2, '0')}`, i - 1, i);
      continue;
    }
    if (/^v?\d+(?:\.\d+){2,}$/u.test(word) || /^v\d+(?:\.\d+)?$/u.test(word) || (/^\d+\.\d+$/u.test(word) && previous !== undefined && VERSION_WORDS.has(previous))) {
      push('version', word.replace(/^v/u, ''), i, i);
      continue;
    }
    if (word in RATIOS) {
      push('ratio', RATIOS[word]!, i, i);
      continue;
    }

    // "6-style", "64-bit": the number counts the word it is joined to.
    const joined = /^(\d+(?:\.\d+)?)-\p{L}+$/u.exec(word);
    if (joined) {
      push('number', Number(joined[1]), i, i);
      continue;
    }
    let value = digitValue(word);
    let last = i;
    if (value === null) {
      value = numberWordValue(word);
      if (value === null) continue;
      if (word === 'one' && (next === undefined || next === 'of' || tokens[i + 1]!.term === null || (previous !== undefined && DETERMINERS.has(previous)))) continue;
    }
    // A month name right after a day belongs to the date found above.
    if (next !== undefined && MONTHS.includes(next) && next !== 'may' && value <= 31) continue;
    if (previous !== undefined && MONTHS.includes(previous) && previous !== 'may') continue;
    while (tokens[last + 1] && tokens[last + 1]!.lower in SCALES) value *= SCALES[tokens[++last]!.lower]!;
    if (word.endsWith('%') || (tokens[last + 1] && PERCENT_WORDS.has(tokens[last + 1]!.lower))) {
      if (!word.endsWith('%')) last++;
      push('percent', value, i, last);
    } else {
      push('number', value, i, last);
    }
    i = last;
  }
  return found;
}

/** Percentages and ratios compare on one scale (50% = half); other kinds only with their own. */
export function sameQuantity(a: Quantity, b: Quantity): boolean {
  const scale = (q: Quantity) => (q.kind === 'percent' ? (q.value as number) / 100 : (q.value as number));
  if ((a.kind === 'percent' || a.kind === 'ratio') && (b.kind === 'percent' || b.kind === 'ratio')) return Math.abs(scale(a) - scale(b)) < 1e-9;
  if (a.kind !== b.kind) return a.kind === 'number' && b.kind === 'number';
  return typeof a.value === 'number' ? Math.abs(a.value - (b.value as number)) < 1e-9 : a.value === b.value;
}

/** Kinds that can contradict each other: a count against a count, a date against a date, … */
export function comparable(a: Quantity, b: Quantity): boolean {
  const group = (q: Quantity) => (q.kind === 'ratio' ? 'percent' : q.kind);
  return group(a) === group(b);
}
