import assert from 'node:assert/strict';
import { LSA_DEFAULTS, relatedness, relatedTerms, symmetricEigen, termSpace } from '../../src/core/check/related-terms';

describe('check: related terms (latent semantic analysis, Deerwester et al. 1990)', () => {
  it('decomposes a symmetric matrix exactly (cyclic Jacobi)', () => {
    // [[2, 1], [1, 2]] has eigenvalues 3 and 1 (textbook example, from memory; checked by hand: det(A - λI) = (2-λ)² - 1).
    const { values } = symmetricEigen(Float64Array.from([2, 1, 1, 2]), 2);
    assert.deepEqual([...values].map((v) => Math.round(v * 1e9) / 1e9).sort(), [1, 3]);
    // Invariance: V·Λ·Vᵀ gives the matrix back.
    const n = 4;
    const a = Float64Array.from([4, 1, 0.5, 0, 1, 3, 0.2, 0.1, 0.5, 0.2, 2, 0.3, 0, 0.1, 0.3, 1]);
    const { values: l, vectors: v } = symmetricEigen(a, n);
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) {
      let sum = 0;
      for (let k = 0; k < n; k++) sum += v[i * n + k]! * l[k]! * v[j * n + k]!;
      assert.ok(Math.abs(sum - a[i * n + j]!) < 1e-9, `entry ${i},${j}`);
    }
  });

  // An invented harbour document: boats and piers are talked about together, fares and tickets together.
  const sentences = [
    ['ferry', 'pier', 'harbour'], ['boat', 'pier', 'harbour'], ['ferry', 'crossing', 'pier'], ['boat', 'crossing', 'harbour'],
    ['ferry', 'harbour', 'dock'], ['boat', 'dock', 'pier'], ['ticket', 'fare', 'kiosk'], ['ticket', 'price', 'kiosk'],
    ['fare', 'price', 'card'], ['ticket', 'card', 'machine'], ['fare', 'machine', 'kiosk'], ['price', 'ticket', 'rise'],
    ['ferry', 'dock', 'crossing'], ['boat', 'harbour', 'crossing'],
  ];

  it('relates terms the document uses in the same contexts, not terms it keeps apart', () => {
    // Two latent dimensions for this 14-sentence example (the default, ⌈√14⌉ = 4, keeps ferry and boat apart).
    const space = termSpace(sentences, { ...LSA_DEFAULTS, dimensions: 2 });
    assert.ok(space);
    // "ferry" and "boat" never share a sentence but share every neighbour: second-order co-occurrence.
    assert.ok(relatedness(space, 'ferry', 'boat') > 0.8, String(relatedness(space, 'ferry', 'boat')));
    assert.ok(relatedness(space, 'ferry', 'fare') < 0.3, String(relatedness(space, 'ferry', 'fare')));
    assert.equal(relatedness(space, 'ferry', 'unknown'), 0);
  });

  it('relates nothing to a term of one sentence: its row only repeats that sentence (ours)', () => {
    const space = termSpace(sentences, { ...LSA_DEFAULTS, dimensions: 2 })!;
    // "rise" is only in ['price', 'ticket', 'rise']; without the rule it points where "price" and "ticket" point.
    const loose = termSpace(sentences, { ...LSA_DEFAULTS, dimensions: 2, minTermSentences: 1 })!;
    assert.ok(relatedness(loose, 'rise', 'price') > 0.9, String(relatedness(loose, 'rise', 'price')));
    assert.equal(relatedness(space, 'rise', 'price'), 0);
    assert.ok(!relatedTerms(space, 'price', 0.5).has('rise'));
    assert.equal(relatedTerms(space, 'rise', 0.5).size, 0);
    assert.ok(relatedTerms(space, 'ferry', 0.8).has('boat'));
  });

  it('is deterministic and gives nothing for a document too short to learn from', () => {
    const a = termSpace(sentences)!;
    const b = termSpace(sentences)!;
    assert.deepEqual([...a.rows], [...b.rows]);
    assert.equal(termSpace(sentences.slice(0, 5)), null);
  });
});
