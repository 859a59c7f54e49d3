/**
 * Summary length, written the same way everywhere (command line, settings, the panel's length box):
 *   "15%"   a share of the document's words
 *   "120w"  a number of words (a hard limit)
 *   "6s"    a number of sentences
 *   "2min"  a reading time (at WORDS_PER_MINUTE, reading.ts)
 * and the named presets of LENGTH_PRESETS: "tldr", "minute", "detailed", "auto" (the default,
 * which grows slowly with the document). The bounds of each unit live here and nowhere else.
 */
import type { Budget, BudgetUnit } from '../types';
import { accept, describe, reject, type Checked, type ValueKind } from './kinds';

export interface LengthBounds {
  readonly min: number;
  readonly max: number;
  /** Suffix in the grammar ('' for the preset-only unit). */
  readonly suffix: '%' | 'w' | 's' | 'min' | '';
  /** Unit name for people. */
  readonly noun: string;
}

/** Per unit: the smallest and largest value a person may ask for (ratio bounds are percentages). */
export const LENGTH_BOUNDS: Readonly<Record<BudgetUnit, LengthBounds>> = {
  ratio: { min: 1, max: 100, suffix: '%', noun: 'percent of the words' },
  words: { min: 1, max: 1_000_000, suffix: 'w', noun: 'words' },
  sentences: { min: 1, max: 1_000, suffix: 's', noun: 'sentences' },
  minutes: { min: 0.25, max: 60, suffix: 'min', noun: 'minutes of reading' },
  auto: { min: 0, max: 0, suffix: '', noun: 'the default length' },
};

/** Named lengths, in people's words. */
export const LENGTH_PRESETS: Readonly<Record<string, { readonly budget: Budget; readonly description: string }>> = {
  tldr: { budget: { unit: 'sentences', value: 3 }, description: 'a few sentences: a one-line TL;DR' },
  minute: { budget: { unit: 'minutes', value: 1 }, description: 'about a one-minute read' },
  detailed: { budget: { unit: 'ratio', value: 0.25 }, description: 'a detailed summary: a quarter of the words' },
  auto: { budget: { unit: 'auto', value: 0 }, description: 'grows slowly with the document: under a minute for short ones, two minutes for long ones' },
};

const UNITS = '%|w|words?|s|sentences?|min|mins|minutes?';
const GRAMMAR = new RegExp(`^(?:(\\d+(?:\\.\\d+)?)\\s*(${UNITS})|${Object.keys(LENGTH_PRESETS).join('|')})$`, 'i');
/** What people type that is close to the grammar (a sign, no unit), read so the message can say what is wrong. */
const NEAR_GRAMMAR = new RegExp(`^([+-]?\\d+(?:\\.\\d+)?)\\s*(${UNITS})?$`, 'i');

export const LENGTH_EXPECTS = `a length such as 15% (of the words), 120w (words), 6s (sentences), 2min (reading time) or one of ${Object.keys(LENGTH_PRESETS).join(', ')}`;

function unitOf(suffix: string): BudgetUnit {
  const s = suffix.toLowerCase();
  if (s === '%') return 'ratio';
  if (s.startsWith('m')) return 'minutes';
  return s.startsWith('w') ? 'words' : 'sentences';
}

function withinBounds(unit: BudgetUnit, amount: number): Checked<Budget> {
  const bounds = LENGTH_BOUNDS[unit];
  if (unit === 'auto') return accept({ unit, value: 0 });
  if (unit !== 'ratio' && unit !== 'minutes' && !Number.isInteger(amount)) return reject(`${bounds.noun} must be a whole number, got ${amount}`);
  if (!(amount >= bounds.min && amount <= bounds.max)) {
    return reject(`${amount}${bounds.suffix} is outside ${bounds.min}${bounds.suffix}..${bounds.max.toLocaleString('en')}${bounds.suffix}`);
  }
  return accept({ unit, value: unit === 'ratio' ? amount / 100 : amount });
}

/** Reads "15%", "120w", "6s", "2min" (also "120 words", "6 sentences", "2 minutes") and the preset names. */
export function parseLength(text: string): Checked<Budget> {
  const preset = Object.hasOwn(LENGTH_PRESETS, text.trim().toLowerCase()) ? LENGTH_PRESETS[text.trim().toLowerCase()] : undefined;
  if (preset) return accept(preset.budget);
  const match = NEAR_GRAMMAR.exec(text.trim());
  if (!match) return reject(`expected ${LENGTH_EXPECTS}, got ${describe(text)}`);
  const amount = Number(match[1]);
  if (match[2] === undefined) {
    return amount < 1
      ? reject(`${match[1]} is out of range: a length is at least 1%, 1w or 1s`)
      : reject(`${describe(text)} has no unit: write ${amount}% (of the words), ${amount}w (words) or ${amount}s (sentences)`);
  }
  return withinBounds(unitOf(match[2]), amount);
}

/** The grammar form of a budget: { unit: 'ratio', value: 0.15 } → "15%". */
export function formatLength(budget: Budget): string {
  if (budget.unit === 'auto') return 'auto';
  const bounds = LENGTH_BOUNDS[budget.unit];
  const amount = budget.unit === 'ratio' ? Math.round(budget.value * 100 * 1000) / 1000 : budget.value;
  return `${amount}${bounds.suffix}`;
}

export const lengthKind: ValueKind<Budget> = {
  expects: LENGTH_EXPECTS,
  json: { type: 'string', pattern: GRAMMAR.source, patternErrorMessage: `Use ${LENGTH_EXPECTS}.` },
  check(value) {
    if (typeof value === 'string') return parseLength(value);
    // Programs may pass the engine's own shape.
    if (typeof value === 'object' && value !== null && !Array.isArray(value)) {
      const { unit, value: amount } = value as { unit?: unknown; value?: unknown };
      if (unit === 'ratio' || unit === 'words' || unit === 'sentences' || unit === 'minutes' || unit === 'auto') {
        if (typeof amount !== 'number' || !Number.isFinite(amount)) return reject(`the length's value must be a number, got ${describe(amount)}`);
        return withinBounds(unit, unit === 'ratio' ? Math.round(amount * 100 * 1e9) / 1e9 : amount);
      }
      return reject(`the length's unit must be ratio, words, sentences, minutes or auto, got ${describe(unit)}`);
    }
    return reject(`expected ${LENGTH_EXPECTS}, got ${describe(value)}`);
  },
  fromText: parseLength,
  toText: formatLength,
};
