import assert from 'node:assert/strict';
import type { FeatureMatrix } from '../../src/core/learn/features';
import { countFeatureValues, scoreNaiveBayes, valueLogOdds } from '../../src/core/learn/naive-bayes';

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

  it('smooths with add-one: P(a=1|S) = 3/4, P(a=1|¬S) = 2/6', () => {
    // By hand: (2 + 1) / (2 + 1·2) and (1 + 1) / (4 + 1·2).
    const table = valueLogOdds(counts.features.a!, 2, 4, 1);
    close(table[1]!, Math.log(3 / 4) - Math.log(2 / 6));
    close(table[0]!, Math.log(1 / 4) - Math.log(4 / 6));
  });

  it('scores the log-odds P(S)/P(¬S) · Π P(F|S)/P(F|¬S)', () => {
    const { scores, contributions } = scoreNaiveBayes(counts, 1, matrix, 6);
    // Sentence 0 (a=1, b=2): prior 2/4; a: (3/4)/(2/6) = 2.25; b: ((1+1)/(2+3)) / ((1+1)/(4+3)) = 0.4/(2/7) = 1.4.
    close(Math.exp(scores[0]!), 0.5 * 2.25 * 1.4);
    // Sentence 3 (a=0, b=1): a: (1/4)/(4/6) = 0.375; b: ((0+1)/5) / ((2+1)/7) = 0.2/(3/7) = 7/15.
    close(Math.exp(scores[3]!), 0.5 * 0.375 * (7 / 15));
    close(contributions.b![3]!, Math.log(7 / 15));
    // The posterior of sentence 0 is odds / (1 + odds) = 1.575 / 2.575.
    const odds = Math.exp(scores[0]!);
    close(odds / (1 + odds), 1.575 / 2.575);
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
