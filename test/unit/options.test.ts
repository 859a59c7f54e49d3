import assert from 'node:assert/strict';
import { DEFAULT_OPTIONS, resolveOptions } from '../../src/core/options';

describe('resolveOptions', () => {
  it('fills in the defaults', () => {
    assert.deepEqual(resolveOptions({}), DEFAULT_OPTIONS);
  });

  it('clamps numbers and rejects malformed values', () => {
    const o = resolveOptions({
      budget: { unit: 'ratio', value: 7 },
      minSentences: -4,
      method: 'nonsense',
      balance: 'yes',
      balanceDepth: 99,
      mmrLambda: Number.NaN,
      language: '../../etc',
      repair: 'always',
      maxChars: 10,
    });
    assert.deepEqual(o.budget, { unit: 'ratio', value: 1 });
    assert.equal(o.minSentences, 0);
    assert.equal(o.method, 'blend');
    assert.equal(o.balance, true);
    assert.equal(o.balanceDepth, 6);
    assert.equal(o.mmrLambda, DEFAULT_OPTIONS.mmrLambda);
    assert.equal(o.language, 'auto');
    assert.equal(o.repair, 'suggest');
    assert.equal(o.maxChars, 1000);
  });

  it('treats cue words and excluded headings as data: strings only, trimmed and bounded', () => {
    const o = resolveOptions({
      cueWords: { bonus: ['  key ', 3, '', 'x'.repeat(500)], stigma: 'not a list' },
      excludeHeadings: ['Appendix', null, '(a+)+$'],
    });
    assert.deepEqual(o.cueWords.bonus, ['key', 'x'.repeat(200)]);
    assert.deepEqual(o.cueWords.stigma, []);
    assert.deepEqual(o.excludeHeadings, ['Appendix', '(a+)+$']);
  });

  it('keeps valid budgets in each unit', () => {
    assert.deepEqual(resolveOptions({ budget: { unit: 'sentences', value: 4.4 } }).budget, { unit: 'sentences', value: 4 });
    assert.deepEqual(resolveOptions({ budget: { unit: 'words', value: 120 } }).budget, { unit: 'words', value: 120 });
    assert.deepEqual(resolveOptions({ budget: { unit: 'pages', value: 1 } }).budget, DEFAULT_OPTIONS.budget);
  });
});
