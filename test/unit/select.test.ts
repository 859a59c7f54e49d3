import assert from 'node:assert/strict';
import { selectSentences, type SelectionInput } from '../../src/core/select/select';
import { buildTermIndex, inverseFrequency, tfidfVectors } from '../../src/core/vectors';

type InputOverrides = Partial<Omit<SelectionInput, 'relevance' | 'vectors' | 'vocabularySize'>> & { scores: number[]; terms?: string[][] };

/** `scores` are used as the relevance directly (already in [0, 1]); `terms` become tf·idf vectors. */
function input({ scores, terms, ...overrides }: InputOverrides): SelectionInput {
  const n = scores.length;
  const index = buildTermIndex(terms ?? Array.from({ length: n }, (_, i) => [`t${i}`, `u${i}`]));
  return {
    wordCounts: new Array(n).fill(10),
    vectors: tfidfVectors(index, inverseFrequency(index, 'sentence')),
    vocabularySize: index.vocabulary.size,
    unitOf: new Int32Array(n),
    unitWeights: new Map([[0, n * 10]]),
    budget: { unit: 'sentences', value: 2 },
    minSentences: 0,
    minPerSection: 1,
    balance: true,
    mmrLambda: 0.7,
    ...overrides,
    relevance: Float64Array.from(scores),
  };
}

describe('selectSentences', () => {
  it('takes the best sentences and returns them in document order', () => {
    const result = selectSentences(input({ scores: [0.1, 0.9, 0.2, 0.8] }));
    assert.deepEqual(result.picked, [1, 3]);
  });

  it('gives every section with content a sentence when the budget allows (topic balance)', () => {
    // Section 1 holds all the high scores; section 2 must still be represented.
    const unitOf = Int32Array.from([1, 1, 1, 1, 2, 2]);
    const unitWeights = new Map([[1, 40], [2, 20]]);
    const scores = [0.9, 0.8, 0.85, 0.7, 0.1, 0.2];
    const balanced = selectSentences(input({ scores, unitOf, unitWeights, budget: { unit: 'sentences', value: 3 } }));
    assert.deepEqual(balanced.picked, [0, 2, 5]);
    assert.equal(balanced.quotas.get(1), 2);
    assert.equal(balanced.quotas.get(2), 1);
    const unbalanced = selectSentences(input({ scores, unitOf, unitWeights, balance: false, budget: { unit: 'sentences', value: 3 } }));
    assert.deepEqual(unbalanced.picked, [0, 1, 2]);
  });

  it('spreads a budget too small for every section over the sections with the best sentences', () => {
    // Unit 1 is longest but its sentences are weak; units 2 and 3 hold the best ones.
    const unitOf = Int32Array.from([1, 1, 1, 2, 2, 3, 4]);
    const unitWeights = new Map([[1, 60], [2, 20], [3, 10], [4, 10]]);
    const result = selectSentences(input({ scores: [0.2, 0.1, 0.15, 0.9, 0.85, 0.8, 0.3], unitOf, unitWeights, budget: { unit: 'sentences', value: 3 } }));
    assert.deepEqual(result.picked, [3, 5, 6]);
    assert.equal(result.quotas.size, 0);
    const unbalanced = selectSentences(input({ scores: [0.2, 0.1, 0.15, 0.9, 0.85, 0.8, 0.3], unitOf, unitWeights, balance: false, budget: { unit: 'sentences', value: 3 } }));
    assert.deepEqual(unbalanced.picked, [3, 4, 5]);
  });

  it('never passes a word budget', () => {
    const wordCounts = [30, 5, 8, 12, 20, 4];
    const result = selectSentences(input({ scores: [0.9, 0.8, 0.7, 0.6, 0.5, 0.4], wordCounts, budget: { unit: 'words', value: 25 } }));
    const total = result.picked.reduce((sum, i) => sum + wordCounts[i]!, 0);
    assert.ok(total <= 25, `picked ${total} words`);
    assert.ok(result.picked.length >= 2);
  });

  it('reaches the minimum sentence count of a ratio budget', () => {
    const result = selectSentences(input({ scores: [0.9, 0.8, 0.7, 0.6, 0.5], minSentences: 3, budget: { unit: 'ratio', value: 0.01 } }));
    assert.equal(result.picked.length, 3);
  });

  it('skips a near-duplicate of a picked sentence (MMR)', () => {
    const terms = [['bike', 'dock', 'truck'], ['bike', 'dock', 'truck'], ['rider', 'credit']];
    const result = selectSentences(input({ scores: [0.9, 0.89, 0.6], terms, budget: { unit: 'sentences', value: 2 }, mmrLambda: 0.5 }));
    assert.deepEqual(result.picked, [0, 2]);
  });

  it('ignores sentences that are not candidates and handles empty input', () => {
    const result = selectSentences(input({ scores: [0.9, 0.1], unitOf: Int32Array.from([-1, 0]) }));
    assert.deepEqual(result.picked, [1]);
    assert.deepEqual(selectSentences(input({ scores: [] })).picked, []);
  });
});
