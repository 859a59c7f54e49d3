/**
 * Summary length, written the same way everywhere (command line, settings, the panel's length box):
 *   "15%"  a share of the document's words
 *   "120w" a number of words (a hard limit)
 *   "6s"   a number of sentences
 * The bounds of each unit live here and nowhere else.
 */
import type { Budget, BudgetUnit } from '../types';
import { accept, describe, reject, type Checked, type ValueKind } from './kinds';

export interface LengthBounds {
  readonly min: number;
  readonly max: number;
  /** Suffix in the grammar. */
  readonly suffix: '%' | 'w' | 's';
  /** Unit name for people. */
  readonly noun: string;
}

/** Per unit: the smallest and largest value a person may ask for (ratio bounds are percentages). */
export const LENGTH_BOUNDS: Readonly<Record<BudgetUnit, LengthBounds>> = {
  ratio: { min: 1, max: 100, suffix: '%', noun: 'percent of the words' },
  words: { min: 1, max: 1_000_000, suffix: 'w', noun: 'words' },
  sentences: { min: 1, max: 1_000, suffix: 's', noun: 'sentences' },
};

const GRAMMAR = /^(\d+(?:\.\d+)?)\s*(%|w|words?|s|sentences?)$/i;
/** What people type that is close to the grammar (a sign, no unit), read so the message can say what is wrong. */
const NEAR_GRAMMAR = /^([+-]?\d+(?:\.\d+)?)\s*(%|w|words?|s|sentences?)?$/i;

export const LENGTH_EXPECTS = 'a length such as 15% (of the words), 120w (words) or 6s (sentences)';

function unitOf(suffix: string): BudgetUnit {
  const s = suffix.toLowerCase();
  if (s === '%') return 'ratio';
  return s.startsWith('w') ? 'words' : 'sentences';
}

function withinBounds(unit: BudgetUnit, amount: number): Checked<Budget> {
  const bounds = LENGTH_BOUNDS[unit];
  if (unit !== 'ratio' && !Number.isInteger(amount)) return reject(`${bounds.noun} must be a whole number, got ${amount}`);
  if (!(amount >= bounds.min && amount <= bounds.max)) {
    return reject(`${amount}${bounds.suffix} is outside ${bounds.min}${bounds.suffix}..${bounds.max.toLocaleString('en')}${bounds.suffix}`);
  }
  return accept({ unit, value: unit === 'ratio' ? amount / 100 : amount });
}

/** Reads "15%", "120w", "6s" (also "120 words", "6 sentences"). */
export function parseLength(text: string): Checked<Budget> {
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
      if (unit === 'ratio' || unit === 'words' || unit === 'sentences') {
        if (typeof amount !== 'number' || !Number.isFinite(amount)) return reject(`the length's value must be a number, got ${describe(amount)}`);
        return withinBounds(unit, unit === 'ratio' ? Math.round(amount * 100 * 1e9) / 1e9 : amount);
      }
      return reject(`the length's unit must be ratio, words or sentences, got ${describe(unit)}`);
    }
    return reject(`expected ${LENGTH_EXPECTS}, got ${describe(value)}`);
  },
  fromText: parseLength,
  toText: formatLength,
};
