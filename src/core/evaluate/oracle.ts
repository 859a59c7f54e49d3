/**
 * Greedy extractive oracle: the ceiling any sentence-picking method can reach against a reference.
 *
 * Sentences are added one at a time, each time the one that raises ROUGE-1 F1 + ROUGE-2 F1 the
 * most, while the word budget allows; the search stops when no fitting sentence raises the sum.
 * Greedy search under-estimates the true (exponential-search) ceiling a little; summing ROUGE-1
 * and ROUGE-2 is a common choice for such oracles (common practice, no source). Bigrams are counted
 * within sentences here; the final score of the picked set is computed by the ROUGE module.
 */
import { ngramCounts } from './rouge';

export interface OracleInput {
  /** ROUGE tokens of every body sentence. */
  readonly sentences: readonly (readonly string[])[];
  /** Budget word count of every body sentence (the unit the word limit is in). */
  readonly wordCounts: readonly number[];
  /** Sentences that may be picked (default: all with at least one token). */
  readonly candidates?: readonly number[];
  /** ROUGE tokens of the reference, all sentences together. */
  readonly reference: readonly string[];
  readonly wordLimit: number;
}

class GramTally {
  readonly counts = new Map<string, number>();
  total = 0;
  matches = 0;

  constructor(private readonly reference: ReadonlyMap<string, number>) {}

  /** Matches gained if `grams` were added. */
  gain(grams: ReadonlyMap<string, number>): number {
    let gained = 0;
    for (const [gram, count] of grams) {
      const cap = this.reference.get(gram);
      if (cap === undefined) continue;
      const have = this.counts.get(gram) ?? 0;
      gained += Math.min(have + count, cap) - Math.min(have, cap);
    }
    return gained;
  }

  add(grams: ReadonlyMap<string, number>, size: number): void {
    this.matches += this.gain(grams);
    for (const [gram, count] of grams) this.counts.set(gram, (this.counts.get(gram) ?? 0) + count);
    this.total += size;
  }
}

function f1(matches: number, candidateTotal: number, referenceTotal: number): number {
  if (matches === 0 || candidateTotal === 0 || referenceTotal === 0) return 0;
  return (2 * matches) / (candidateTotal + referenceTotal);
}

/** Picked sentence indices in document order. */
export function greedyOracle(input: OracleInput): number[] {
  const referenceUnigrams = ngramCounts(input.reference, 1);
  const referenceBigrams = ngramCounts(input.reference, 2);
  const referenceUnigramTotal = input.reference.length;
  const referenceBigramTotal = Math.max(0, input.reference.length - 1);
  const unigrams = new GramTally(referenceUnigrams);
  const bigrams = new GramTally(referenceBigrams);

  const candidates = (input.candidates ?? input.sentences.map((_, i) => i)).filter((i) => input.sentences[i]!.length > 0);
  const grams = new Map(candidates.map((i) => [i, { one: ngramCounts(input.sentences[i]!, 1), two: ngramCounts(input.sentences[i]!, 2) }]));
  const picked: number[] = [];
  let words = 0;
  let current = 0;
  for (;;) {
    let best = -1;
    let bestValue = current;
    for (const i of candidates) {
      if (picked.includes(i) || words + input.wordCounts[i]! > input.wordLimit) continue;
      const g = grams.get(i)!;
      const tokens = input.sentences[i]!.length;
      const value =
        f1(unigrams.matches + unigrams.gain(g.one), unigrams.total + tokens, referenceUnigramTotal) +
        f1(bigrams.matches + bigrams.gain(g.two), bigrams.total + Math.max(0, tokens - 1), referenceBigramTotal);
      if (value > bestValue) {
        bestValue = value;
        best = i;
      }
    }
    if (best < 0) break;
    const g = grams.get(best)!;
    const tokens = input.sentences[best]!.length;
    unigrams.add(g.one, tokens);
    bigrams.add(g.two, Math.max(0, tokens - 1));
    picked.push(best);
    words += input.wordCounts[best]!;
    current = bestValue;
  }
  return picked.sort((a, b) => a - b);
}
