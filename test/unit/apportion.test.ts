import assert from 'node:assert/strict';
import { apportionHamilton } from '../../src/core/select/apportion';

describe('apportionHamilton', () => {
  // Worked example of the largest-remainder method (common practice, no source): 10 seats over
  // votes 47/16/15/6/5/11 → quotas 4.7/1.6/1.5/0.6/0.5/1.1 → floors 4/1/1/0/0/1 (7 seats),
  // the 3 remaining seats go to the largest remainders .7, .6 (party 2) and .6 (party 4).
  it('gives floors then largest remainders', () => {
    assert.deepEqual(apportionHamilton([47, 16, 15, 6, 5, 11], 10), [5, 2, 1, 1, 0, 1]);
  });

  it('always hands out exactly the seats', () => {
    for (const seats of [1, 2, 3, 7, 19, 100]) {
      const result = apportionHamilton([3, 1, 4, 1, 5, 9, 2, 6], seats);
      assert.equal(result.reduce((a, b) => a + b, 0), seats);
    }
  });

  it('guarantees the minimum only when every party can have it', () => {
    assert.deepEqual(apportionHamilton([100, 1, 1], 3, 1), [1, 1, 1]);
    assert.deepEqual(apportionHamilton([100, 1, 1], 2, 1), [2, 0, 0]);
  });

  it('gives nothing to zero or invalid weights', () => {
    assert.deepEqual(apportionHamilton([0, 5, Number.NaN], 4, 1), [0, 4, 0]);
    assert.deepEqual(apportionHamilton([], 4), []);
    assert.deepEqual(apportionHamilton([0, 0], 4), [0, 0]);
  });
});
