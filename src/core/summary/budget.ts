/**
 * Whether a selection honours the length asked for, and the notice that says so when it cannot.
 * A length in words is a hard limit: when no sentence fits it, the summary is empty and the
 * notice says why, rather than quietly quoting a longer sentence. A share of the words may be
 * passed to keep the minimum number of sentences, and a number of sentences may exceed what the
 * document has; both are said too.
 */
import type { Budget } from '../types';

export interface BudgetInput {
  readonly budget: Budget;
  readonly minSentences: number;
  /** Picked sentence indices. */
  readonly picked: readonly number[];
  readonly wordCounts: readonly number[];
  /** Sentences that could be picked. */
  readonly candidates: readonly number[];
  /** Words the budget allows (Infinity for a number of sentences). */
  readonly wordLimit: number;
}

export interface BudgetOutcome {
  readonly picked: readonly number[];
  readonly notices: readonly string[];
}

const plural = (n: number, noun: string) => `${n.toLocaleString('en-US')} ${noun}${n === 1 ? '' : 's'}`;

export function honourBudget(input: BudgetInput): BudgetOutcome {
  const { budget, picked, wordCounts, candidates } = input;
  if (candidates.length === 0) return { picked, notices: [] };
  const words = picked.reduce((sum, i) => sum + wordCounts[i]!, 0);
  if (budget.unit === 'words') {
    if (words <= budget.value) return { picked, notices: [] };
    const shortest = Math.min(...candidates.map((i) => wordCounts[i]!));
    return {
      picked: [],
      notices: [`No sentence fits in ${plural(budget.value, 'word')} (the shortest has ${shortest}), so the summary is empty; allow more words or ask for a number of sentences.`],
    };
  }
  if (budget.unit === 'sentences') {
    if (candidates.length >= budget.value) return { picked, notices: [] };
    return { picked, notices: [`The document has only ${plural(candidates.length, 'sentence')} to pick from, fewer than the ${budget.value} asked for.`] };
  }
  if (words <= input.wordLimit || picked.length === 0) return { picked, notices: [] };
  const floor = Math.min(input.minSentences, candidates.length);
  const why = picked.length <= floor ? `it keeps at least ${plural(floor, 'sentence')} (the minimum-sentences option)` : 'no sentence is that short';
  const allowance =
    budget.unit === 'minutes' ? `a ${budget.value}-minute read` : budget.unit === 'auto' ? 'the default length' : `${Math.round(budget.value * 1000) / 10}% of the document`;
  return {
    picked,
    notices: [`The summary has ${plural(words, 'word')}, more than the ${input.wordLimit.toLocaleString('en-US')} that ${allowance} allows, because ${why}.`],
  };
}
