/**
 * Summary options: one named defaults object, and a validator that clamps whatever arrives
 * (command-line flags, editor settings, webview messages) into a safe, complete value.
 */
import type { Budget, BudgetUnit, CueWords, RankerName } from './types';

export type RepairMode = 'suggest' | 'auto';

export interface SummaryOptions {
  readonly budget: Budget;
  /** Never pick fewer sentences than this (when the document has them). */
  readonly minSentences: number;
  readonly method: RankerName;
  /** Apportion the budget across sections (topic balance). */
  readonly balance: boolean;
  /** How many heading levels below the document's top section level count as balance units (1 = top sections only). */
  readonly balanceDepth: number;
  /** Sentences every section with content gets when the budget allows. */
  readonly minPerSection: number;
  /** Sections whose heading matches one of these (case-insensitive, whole heading) are left out. */
  readonly excludeHeadings: readonly string[];
  readonly cueWords: CueWords;
  /** 'auto' or an ISO 639-1 code. */
  readonly language: string;
  /** Maximal Marginal Relevance trade-off: 1 = relevance only, 0 = novelty only. */
  readonly mmrLambda: number;
  readonly repair: RepairMode;
  /** Summarize table cells as prose. */
  readonly includeTables: boolean;
  /** Documents longer than this (UTF-16 code units) are refused with a message. */
  readonly maxChars: number;
  /** A trained sentence model for the 'bayes' method (validated by the caller); default model when absent. */
  readonly model?: unknown;
}

export const METHODS: readonly RankerName[] = [
  'blend',
  'position',
  'luhn',
  'edmundson',
  'lexrank',
  'textrank',
  'centroid',
  'bayes',
];

export const DEFAULT_OPTIONS: SummaryOptions = {
  budget: { unit: 'ratio', value: 0.15 },
  minSentences: 3,
  method: 'blend',
  balance: true,
  balanceDepth: 1,
  minPerSection: 1,
  excludeHeadings: ['References', 'Changelog', 'Change log', 'Table of contents', 'Contents', 'License', 'Acknowledgements', 'Acknowledgments'],
  cueWords: { bonus: [], stigma: [] },
  language: 'auto',
  // Carbonell & Goldstein (1998) leave λ to the application; 0.7 favours relevance while still
  // pushing out near-duplicates (common practice, no source).
  mmrLambda: 0.7,
  repair: 'suggest',
  includeTables: false,
  maxChars: 3_000_000,
};

const BUDGET_UNITS: readonly BudgetUnit[] = ['sentences', 'words', 'ratio'];

function clamp(value: unknown, min: number, max: number, fallback: number): number {
  return typeof value === 'number' && Number.isFinite(value) ? Math.min(max, Math.max(min, value)) : fallback;
}

function stringList(value: unknown, fallback: readonly string[], maxItems = 200, maxLength = 200): readonly string[] {
  if (!Array.isArray(value)) return fallback;
  return value
    .filter((item): item is string => typeof item === 'string')
    .map((item) => item.trim().slice(0, maxLength))
    .filter((item) => item.length > 0)
    .slice(0, maxItems);
}

function resolveBudget(value: unknown): Budget {
  if (typeof value !== 'object' || value === null) return DEFAULT_OPTIONS.budget;
  const { unit, value: amount } = value as { unit?: unknown; value?: unknown };
  if (typeof unit !== 'string' || !BUDGET_UNITS.includes(unit as BudgetUnit)) return DEFAULT_OPTIONS.budget;
  if (unit === 'ratio') return { unit, value: clamp(amount, 0.01, 1, DEFAULT_OPTIONS.budget.value) };
  return { unit: unit as BudgetUnit, value: Math.round(clamp(amount, 1, 1_000_000, unit === 'words' ? 150 : 5)) };
}

/** Completes and clamps partial options; unknown or malformed values fall back to the defaults. */
export function resolveOptions(partial: Partial<Record<keyof SummaryOptions, unknown>> = {}): SummaryOptions {
  const d = DEFAULT_OPTIONS;
  const cue = (partial.cueWords ?? {}) as { bonus?: unknown; stigma?: unknown };
  const language = typeof partial.language === 'string' && /^(auto|[a-z]{2,3})$/.test(partial.language) ? partial.language : d.language;
  return {
    budget: resolveBudget(partial.budget),
    minSentences: Math.round(clamp(partial.minSentences, 0, 1000, d.minSentences)),
    method: METHODS.includes(partial.method as RankerName) ? (partial.method as RankerName) : d.method,
    balance: typeof partial.balance === 'boolean' ? partial.balance : d.balance,
    balanceDepth: Math.round(clamp(partial.balanceDepth, 1, 6, d.balanceDepth)),
    minPerSection: Math.round(clamp(partial.minPerSection, 0, 20, d.minPerSection)),
    excludeHeadings: stringList(partial.excludeHeadings, d.excludeHeadings),
    cueWords: { bonus: stringList(cue.bonus, d.cueWords.bonus), stigma: stringList(cue.stigma, d.cueWords.stigma) },
    language,
    mmrLambda: clamp(partial.mmrLambda, 0, 1, d.mmrLambda),
    repair: partial.repair === 'auto' || partial.repair === 'suggest' ? partial.repair : d.repair,
    includeTables: typeof partial.includeTables === 'boolean' ? partial.includeTables : d.includeTables,
    maxChars: Math.round(clamp(partial.maxChars, 1_000, 50_000_000, d.maxChars)),
    ...(partial.model !== undefined ? { model: partial.model } : {}),
  };
}
