import assert from 'node:assert/strict';
import { minMax, normalize, rankScale } from '../../src/core/scale';

describe('scale', () => {
  it('min-max scales to [0, 1]', () => {
    assert.deepEqual(Array.from(minMax(Float64Array.of(2, 4, 3))), [0, 1, 0.5]);
    assert.deepEqual(Array.from(minMax(Float64Array.of(-1, 1))), [0, 1]);
  });

  it('rank-scales with tied scores sharing their mean rank', () => {
    // Sorted: 1 (rank 0), 5 and 5 (ranks 1 and 2 → 1.5), 9 (rank 3); divided by n − 1 = 3.
    assert.deepEqual(Array.from(rankScale(Float64Array.of(5, 1, 9, 5))), [0.5, 0, 1, 0.5]);
    assert.deepEqual(Array.from(rankScale(Float64Array.of(0.1, 100, 0.2))), [0, 1, 0.5]);
  });

  it('scales constant and single inputs to 1 (no preference: each is as good as the best), empty to empty', () => {
    for (const method of ['minmax', 'rank'] as const) {
      assert.deepEqual(Array.from(normalize(Float64Array.of(3, 3, 3), method)), [1, 1, 1]);
      assert.deepEqual(Array.from(normalize(Float64Array.of(7), method)), [1]);
      assert.equal(normalize(new Float64Array(0), method).length, 0);
    }
  });

  it('treats non-finite scores as the lowest', () => {
    assert.deepEqual(Array.from(minMax(Float64Array.of(NaN, 2, 4))), [0, 0, 1]);
    assert.deepEqual(Array.from(rankScale(Float64Array.of(NaN, 2, 4))), [0, 0.5, 1]);
    assert.deepEqual(Array.from(minMax(Float64Array.of(Infinity, 5))), [0, 1]);
  });

  it('scales over the given indices only', () => {
    assert.deepEqual(Array.from(minMax(Float64Array.of(100, 2, 4, 3), [1, 2, 3])), [0, 0, 1, 0.5]);
    assert.deepEqual(Array.from(minMax(Float64Array.of(9, 3, 3), [1, 2])), [0, 1, 1]);
  });

  it('preserves order, so either scale keeps the same best sentence', () => {
    const scores = Float64Array.of(0.3, 0.9, 0.1, 0.5);
    for (const scaled of [minMax(scores), rankScale(scores)]) {
      const order = (xs: Float64Array) => Array.from(xs.keys()).sort((a, b) => xs[b]! - xs[a]!);
      assert.deepEqual(order(scaled), order(scores));
    }
  });
});
