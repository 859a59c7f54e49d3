/**
 * Naive Bayes over discrete sentence features (Kupiec, Pedersen & Chen, "A Trainable Document
 * Summarizer", SIGIR 1995).
 *
 * Kupiec et al. scored P(s ∈ S | F1..Fk) ∝ P(s ∈ S) · Π P(Fj | s ∈ S) / Π P(Fj). We rank by the
 * two-class log-odds instead,
 *     log P(S)/P(¬S) + Σ_j log P(Fj = v | S) / P(Fj = v | ¬S),
 * which is the same independence model written against the negative class rather than the
 * marginal; it stays a proper posterior when the features are not independent in the marginal.
 * Probabilities are smoothed with pseudo-counts in proportion to the class sizes:
 *     P(F = v | c) = (count(v, c) + α_c) / (N_c + α_c · arity),   α_c = α · N_c / mean(N_S, N_¬S).
 * Plain add-α (the same α for both classes) would hand a value never seen in either class a large
 * log-odds in favour of the smaller class — (α / N_S) / (α / N_¬S) — here it is 0: no evidence, no
 * effect. The proportional pseudo-counts are a Dirichlet prior shaped like the class sizes
 * (common practice, no source).
 */
import type { FeatureMatrix } from './features';

/** Per-feature value counts of one class. */
export interface ClassCounts {
  readonly positive: readonly number[];
  readonly negative: readonly number[];
}

export interface NaiveBayesCounts {
  /** Number of positive and negative training sentences. */
  readonly positive: number;
  readonly negative: number;
  readonly features: Readonly<Record<string, ClassCounts>>;
}

export interface LabelledDocument {
  readonly features: FeatureMatrix;
  /** 1 = the sentence belongs in a summary, 0 = it does not. */
  readonly labels: Uint8Array;
}

/** Counts feature values per class over all sentences of all documents. */
export function countFeatureValues(documents: readonly LabelledDocument[], arities: Readonly<Record<string, number>>): NaiveBayesCounts {
  const names = Object.keys(arities);
  const features: Record<string, { positive: number[]; negative: number[] }> = {};
  for (const name of names) features[name] = { positive: new Array<number>(arities[name]!).fill(0), negative: new Array<number>(arities[name]!).fill(0) };
  let positive = 0;
  let negative = 0;
  for (const { features: matrix, labels } of documents) {
    labels.forEach((label, i) => {
      if (label === 1) positive++;
      else negative++;
      for (const name of names) {
        const value = (matrix as Readonly<Record<string, Uint8Array>>)[name]![i]!;
        if (value >= arities[name]!) throw new RangeError(`feature ${name} has value ${value}, beyond its ${arities[name]} values`);
        features[name]![label === 1 ? 'positive' : 'negative'][value]!++;
      }
    });
  }
  return { positive, negative, features };
}

/** log P(F = v | S) − log P(F = v | ¬S) for every value of one feature. */
export function valueLogOdds(counts: ClassCounts, positiveTotal: number, negativeTotal: number, smoothing: number): Float64Array {
  const arity = counts.positive.length;
  const out = new Float64Array(arity);
  const meanClass = (positiveTotal + negativeTotal) / 2;
  const alphaPositive = (smoothing * positiveTotal) / meanClass;
  const alphaNegative = (smoothing * negativeTotal) / meanClass;
  for (let v = 0; v < arity; v++) {
    const pPositive = (counts.positive[v]! + alphaPositive) / (positiveTotal + alphaPositive * arity);
    const pNegative = (counts.negative[v]! + alphaNegative) / (negativeTotal + alphaNegative * arity);
    out[v] = Math.log(pPositive) - Math.log(pNegative);
  }
  return out;
}

export interface NaiveBayesScores {
  /** Log-odds of each sentence belonging in a summary. */
  readonly scores: Float64Array;
  /** Each feature's contribution to the log-odds, per sentence (for "why this sentence"). */
  readonly contributions: Readonly<Record<string, Float64Array>>;
}

export function scoreNaiveBayes(counts: NaiveBayesCounts, smoothing: number, matrix: FeatureMatrix, sentenceCount: number): NaiveBayesScores {
  const prior = Math.log(counts.positive) - Math.log(counts.negative);
  const scores = new Float64Array(sentenceCount).fill(prior);
  const contributions: Record<string, Float64Array> = {};
  for (const [name, classCounts] of Object.entries(counts.features)) {
    const values = (matrix as Readonly<Record<string, Uint8Array>>)[name];
    if (!values) continue;
    const table = valueLogOdds(classCounts, counts.positive, counts.negative, smoothing);
    const contribution = new Float64Array(sentenceCount);
    for (let i = 0; i < sentenceCount; i++) {
      contribution[i] = table[values[i]!] ?? 0;
      scores[i]! += contribution[i]!;
    }
    contributions[name] = contribution;
  }
  return { scores, contributions };
}
