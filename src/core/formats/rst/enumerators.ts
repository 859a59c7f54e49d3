/**
 * Enumerated list markers: `1.`, `(a)`, `iv)`, `#.` — which sequence a marker belongs to, its
 * ordinal, and whether a line is really a list item (the specification's rule: the next line must
 * be blank, indented, the end of the text, or start with the next marker of the same list).
 */
import type { Region } from './source-lines';

export type EnumSequence = 'arabic' | 'loweralpha' | 'upperalpha' | 'lowerroman' | 'upperroman' | '#';
export type EnumFormat = 'parens' | 'rparen' | 'period';

export interface Enumerator {
  readonly format: EnumFormat;
  readonly sequence: EnumSequence;
  /** null for a marker that is not a valid number in its sequence (e.g. `iiii.`). */
  readonly ordinal: number | null;
}

const SEQUENCE_PATTERNS: readonly (readonly [EnumSequence, RegExp])[] = [
  ['arabic', /^[0-9]+$/],
  ['loweralpha', /^[a-z]$/],
  ['upperalpha', /^[A-Z]$/],
  ['lowerroman', /^[ivxlcdm]+$/],
  ['upperroman', /^[IVXLCDM]+$/],
];

const FORMAT_AFFIXES: Readonly<Record<EnumFormat, readonly [string, string]>> = {
  parens: ['(', ')'],
  rparen: ['', ')'],
  period: ['', '.'],
};

/** Reads a marker matched by `BODY.enumerator` (groups 1-3: parens, rparen, period). */
export function readEnumerator(match: RegExpExecArray, expected?: EnumSequence): Enumerator {
  const format: EnumFormat = match[1] !== undefined ? 'parens' : match[2] !== undefined ? 'rparen' : 'period';
  const text = match[1] ?? match[2] ?? match[3]!;
  let sequence: EnumSequence | undefined;
  if (text === '#') sequence = '#';
  else if (expected !== undefined && expected !== '#') sequence = SEQUENCE_PATTERNS.find(([s]) => s === expected)![1].test(text) ? expected : undefined;
  else if (text === 'i') sequence = 'lowerroman';
  else if (text === 'I') sequence = 'upperroman';
  sequence ??= SEQUENCE_PATTERNS.find(([, pattern]) => pattern.test(text))![0];
  return { format, sequence, ordinal: ordinalOf(text, sequence) };
}

function ordinalOf(text: string, sequence: EnumSequence): number | null {
  switch (sequence) {
    case '#':
      return 1;
    case 'arabic':
      return Number(text);
    case 'loweralpha':
    case 'upperalpha':
      return text.toLowerCase().charCodeAt(0) - 96;
    default:
      return fromRoman(text.toUpperCase());
  }
}

const ROMAN: readonly (readonly [string, number])[] = [
  ['M', 1000], ['CM', 900], ['D', 500], ['CD', 400], ['C', 100], ['XC', 90],
  ['L', 50], ['XL', 40], ['X', 10], ['IX', 9], ['V', 5], ['IV', 4], ['I', 1],
];

export function toRoman(n: number): string | null {
  if (!Number.isInteger(n) || n < 1 || n > 4999) return null;
  let out = '';
  for (const [letters, value] of ROMAN) {
    while (n >= value) {
      out += letters;
      n -= value;
    }
  }
  return out;
}

/** Strict reading: only the canonical spelling counts (`IIII` is not 4). */
export function fromRoman(text: string): number | null {
  let n = 0;
  let rest = text;
  for (const [letters, value] of ROMAN) {
    while (rest.startsWith(letters)) {
      n += value;
      rest = rest.slice(letters.length);
    }
  }
  return rest.length === 0 && n > 0 && toRoman(n) === text ? n : null;
}

/** The marker that would come next, and the auto-numbered marker, each followed by a space. */
function nextMarkers(enumerator: Enumerator): readonly string[] {
  const [prefix, suffix] = FORMAT_AFFIXES[enumerator.format];
  const auto = `${prefix}#${suffix} `;
  const next = enumerator.ordinal! + 1;
  let text: string | null;
  switch (enumerator.sequence) {
    case '#':
      text = '#';
      break;
    case 'arabic':
      text = String(next);
      break;
    case 'loweralpha':
    case 'upperalpha':
      text = next > 26 ? null : String.fromCharCode(96 + next);
      if (text !== null && enumerator.sequence === 'upperalpha') text = text.toUpperCase();
      break;
    default:
      text = toRoman(next);
      if (text !== null && enumerator.sequence === 'lowerroman') text = text.toLowerCase();
  }
  return text === null ? [] : [`${prefix}${text}${suffix} `, auto];
}

/** True when line i of the region really starts a list item with this marker. */
export function isListItem(region: Region, i: number, enumerator: Enumerator): boolean {
  if (enumerator.ordinal === null) return false;
  if (i + 1 >= region.length) return true;
  const next = region.text(i + 1);
  if (next.length === 0 || next[0] === ' ') return true;
  return nextMarkers(enumerator).some((marker) => next.startsWith(marker));
}
