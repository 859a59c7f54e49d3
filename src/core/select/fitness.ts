/**
 * How well a sentence can serve as a summary line on its own, independent of any ranker:
 * a lead-in that ends with a colon only announces the list after it, and a two-word label
 * ("Driver acceptance.") says little without its paragraph. Such lines are demoted, not banned,
 * so a document made only of them still gets a summary.
 */
import { minMax } from '../scale';
import type { AnalyzedDocument } from '../types';

export const FITNESS_DEFAULTS = {
  /** Multiplier for a sentence ending with a colon (common practice, no source). */
  leadIn: 0.35,
  /** Multiplier for a sentence shorter than `shortWords` words. */
  short: 0.25,
  shortWords: 4,
} as const;

export function sentenceFitness(a: AnalyzedDocument, settings = FITNESS_DEFAULTS): Float64Array {
  const fitness = new Float64Array(a.doc.sentences.length).fill(1);
  a.doc.sentences.forEach((sentence, i) => {
    if (/:\s*$/.test(sentence.text)) fitness[i]! *= settings.leadIn;
    if ((a.words[i]?.length ?? 0) < settings.shortWords) fitness[i]! *= settings.short;
  });
  return fitness;
}

/**
 * What the selector compares: ranker scores scaled to [0, 1] over the candidates (scale.ts, once)
 * and multiplied by fitness; the order among equally fit sentences is the ranker's.
 */
export function summaryRelevance(scores: Float64Array, fitness: Float64Array, candidates: readonly number[]): Float64Array {
  const relevance = minMax(scores, candidates);
  for (const i of candidates) relevance[i] = relevance[i]! * (fitness[i] ?? 1);
  return relevance;
}
