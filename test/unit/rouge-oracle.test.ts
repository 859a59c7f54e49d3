import assert from 'node:assert/strict';
import { greedyOracle } from '../../src/core/evaluate/oracle';
import { rougeN } from '../../src/core/evaluate/rouge';

const split = (s: string) => s.split(' ');

describe('greedy extractive oracle', () => {
  const sentences = ['the ferry leaves at noon', 'tickets cost four coins', 'the ferry leaves at noon on sundays', 'gulls follow the boat'].map(split);
  const reference = split('the ferry leaves at noon and tickets cost four coins');

  it('picks the sentences that cover the reference, in document order', () => {
    const picked = greedyOracle({ sentences, wordCounts: sentences.map((s) => s.length), reference, wordLimit: 20 });
    assert.deepEqual(picked, [0, 1]);
  });

  it('never passes the word limit', () => {
    const picked = greedyOracle({ sentences, wordCounts: sentences.map((s) => s.length), reference, wordLimit: 5 });
    assert.deepEqual(picked, [0]);
    assert.deepEqual(greedyOracle({ sentences, wordCounts: sentences.map((s) => s.length), reference, wordLimit: 3 }), []);
  });

  it('scores at least as well as any single sentence that fits (greedy first step)', () => {
    const picked = greedyOracle({ sentences, wordCounts: sentences.map((s) => s.length), reference, wordLimit: 10 });
    const text = (indices: readonly number[]) => indices.map((i) => sentences[i]!.join(' '));
    const oracle = rougeN(text(picked), [reference.join(' ')], 1).f1 + rougeN(text(picked), [reference.join(' ')], 2).f1;
    for (let i = 0; i < sentences.length; i++) {
      const single = rougeN(text([i]), [reference.join(' ')], 1).f1 + rougeN(text([i]), [reference.join(' ')], 2).f1;
      assert.ok(oracle >= single - 1e-12, `sentence ${i}`);
    }
  });

  it('respects the candidate list', () => {
    const picked = greedyOracle({ sentences, wordCounts: sentences.map((s) => s.length), candidates: [2, 3], reference, wordLimit: 20 });
    assert.ok(picked.every((i) => i === 2 || i === 3));
  });
});
