import assert from 'node:assert/strict';
import type { FeatureMatrix } from '../../src/core/rank/trained/features';
import { countFeatureValues, scoreNaiveBayes, valueLogOdds } from '../../src/core/rank/trained/naive-bayes';

const close = (actual: number, expected: number, tolerance = 1e-12) =>
  assert.ok(Math.abs(actual - expected) <= tolerance, `expected ${expected}, got ${actual}`);

// A hand-made training set of six sentences with two features:
//   sentence  label  a (2 values)  b (3 values)
//   0         1      1             2
//   1         1      1             0
//   2         0      0             0
//   3         0      0             1
//   4         0      0             1
//   5         0      1             2
const matrix = { a: Uint8Array.from([1, 1, 0, 0, 0, 1]), b: Uint8Array.from([2, 0, 0, 1, 1, 2]) } as unknown as FeatureMatrix;
const labels = Uint8Array.from([1, 1, 0, 0, 0, 0]);
const arities = { a: 2, b: 3 };

describe('naive Bayes (Kupiec et al. 1995) on a hand-made set', () => {
  const counts = countFeatureValues([{ features: matrix, labels }], arities);

  it('counts feature values per class', () => {
    assert.equal(counts.positive, 2);
    assert.equal(counts.negative, 4);
    assert.deepEqual(counts.features.a, { positive: [0, 2], negative: [3, 1] });
    assert.deepEqual(counts.features.b, { positive: [1, 0, 1], negative: [1, 2, 1] });
  });

  it('smooths with pseudo-counts in proportion to class size: P(a=1|S) = 0.8, P(a=1|¬S) = 0.35', () => {
    // By hand: mean class size 3, so α_S = 2/3 and α_¬S = 4/3.
    // P(a=1|S) = (2 + 2/3) / (2 + 2·2/3) = 0.8; P(a=1|¬S) = (1 + 4/3) / (4 + 2·4/3) = 0.35.
    const table = valueLogOdds(counts.features.a!, 2, 4, 1);
    close(table[1]!, Math.log(0.8) - Math.log(0.35));
    // P(a=0|S) = (0 + 2/3) / (10/3) = 0.2; P(a=0|¬S) = (3 + 4/3) / (20/3) = 0.65.
    close(table[0]!, Math.log(0.2) - Math.log(0.65));
  });

  it('gives a value never seen in either class no weight', () => {
    const table = valueLogOdds({ positive: [2, 0], negative: [4, 0] }, 2, 4, 1);
    close(table[1]!, 0);
  });

  it('scores the log-odds P(S)/P(¬S) · Π P(F|S)/P(F|¬S)', () => {
    const { scores, contributions } = scoreNaiveBayes(counts, 1, matrix, 6);
    // Sentence 0 (a=1, b=2): prior 2/4; a: 0.8/0.35; b: ((1 + 2/3)/4) / ((1 + 4/3)/8) = (5/12)/(7/24) = 10/7.
    close(Math.exp(scores[0]!), 0.5 * (0.8 / 0.35) * (10 / 7));
    // Sentence 3 (a=0, b=1): a: 0.2/0.65; b: ((0 + 2/3)/4) / ((2 + 4/3)/8) = (1/6)/(5/12) = 0.4.
    close(Math.exp(scores[3]!), 0.5 * (0.2 / 0.65) * 0.4);
    close(contributions.b![3]!, Math.log(0.4));
    // The posterior of sentence 0 is odds / (1 + odds).
    const odds = 0.5 * (0.8 / 0.35) * (10 / 7);
    close(Math.exp(scores[0]!) / (1 + Math.exp(scores[0]!)), odds / (1 + odds));
  });

  it('gives equal features equal scores, and rewards the value seen with positives', () => {
    const { scores } = scoreNaiveBayes(counts, 1, matrix, 6);
    // Sentences 0 and 5 have the same features (a=1, b=2) though their labels differ.
    assert.equal(scores[0], scores[5]);
    // Sentences 1 and 2 differ only in a; a=1 was seen with both positives.
    assert.ok(scores[1]! > scores[2]!);
  });

  it('refuses a value beyond the feature’s arity', () => {
    const bad = { a: Uint8Array.from([2]), b: Uint8Array.from([0]) } as unknown as FeatureMatrix;
    assert.throws(() => countFeatureValues([{ features: bad, labels: Uint8Array.from([1]) }], arities), RangeError);
  });
});
