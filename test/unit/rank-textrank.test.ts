import assert from 'node:assert/strict';
import fc from 'fast-check';
import { overlapSimilarity, textRank, textRankGraph } from '../../src/core/rank/textrank';
import { analyzedFromTerms } from './helpers/analyzed-fixture';
import { edgesOfMatrix, referencePageRank } from './helpers/reference-pagerank';

/** Mihalcea & Tarau (2004), eq. for sentence similarity, written densely in the test (with the ln 2 floor). */
function denseOverlap(sentences: readonly (readonly string[])[]): number[][] {
  return sentences.map((x, i) =>
    sentences.map((y, j) => {
      if (i === j) return 0;
      const shared = [...new Set(x)].filter((w) => y.includes(w)).length;
      if (shared === 0) return 0;
      return shared / Math.max(Math.log(x.length) + Math.log(y.length), Math.LN2);
    }),
  );
}

describe('rank/textrank', () => {
  it('scores overlap as |shared| / (log|Si| + log|Sj|)', () => {
    // Hand-computed: 4 and 3 terms sharing 2 → 2 / (ln 4 + ln 3) = 2 / ln 12 ≈ 0.804859.
    assert.ok(Math.abs(overlapSimilarity(2, 4, 3) - 0.804859) < 1e-6);
    assert.equal(overlapSimilarity(0, 4, 3), 0);
    // Guard: two one-term sentences would divide by ln 1 + ln 1 = 0; the floor is ln 2.
    assert.equal(overlapSimilarity(1, 1, 1), 1 / Math.LN2);
    assert.ok(Number.isFinite(overlapSimilarity(1, 1, 1)));
    // One-term and two-term sentence: ln 1 + ln 2 = ln 2, unaffected by the floor.
    assert.equal(overlapSimilarity(1, 1, 2), 1 / Math.log(2));
  });

  it('counts distinct shared terms and the sentence length in term tokens', () => {
    // s0 = [grid grid storage cell] (4 tokens), s1 = [grid storage] (2): shared {grid, storage} = 2
    // → 2 / (ln 4 + ln 2) = 2 / ln 8.
    const graph = textRankGraph(analyzedFromTerms([['grid', 'grid', 'storage', 'cell'], ['grid', 'storage']]));
    assert.equal(graph.targets[0], 1);
    assert.ok(Math.abs(graph.weights[0]! - 2 / Math.log(8)) < 1e-15);
  });

  it('equals graphology-metrics PageRank on the same overlap graph (property)', () => {
    // External reference: npm `graphology` + `graphology-metrics` pagerank (weighted, alpha 0.85).
    const documents = fc.array(fc.array(fc.integer({ min: 0, max: 12 }).map((t) => `w${t}`), { maxLength: 6 }), { minLength: 2, maxLength: 30 });
    fc.assert(
      fc.property(documents, (sentences) => {
        const reference = referencePageRank(sentences.length, edgesOfMatrix(denseOverlap(sentences)));
        const ours = textRank(analyzedFromTerms(sentences));
        assert.equal(ours.converged, true);
        for (let i = 0; i < sentences.length; i++) assert.ok(Math.abs(ours.scores[i]! - reference[i]!) < 1e-9);
      }),
      { numRuns: 80, seed: 11 },
    );
  });

  it('ranks the sentence that overlaps most above the others', () => {
    const { scores } = textRank(
      analyzedFromTerms([
        ['tide', 'gauge', 'harbour', 'record'],
        ['tide', 'gauge', 'sensor'],
        ['harbour', 'record', 'archive'],
        ['lunch', 'menu'],
      ]),
    );
    assert.ok(scores[0]! > scores[1]! && scores[0]! > scores[2]!);
    assert.ok(scores[3]! < scores[1]!);
  });

  it('handles empty, single, termless and unrelated documents', () => {
    assert.equal(textRank(analyzedFromTerms([])).scores.length, 0);
    assert.deepEqual(Array.from(textRank(analyzedFromTerms([['x']])).scores), [1]);
    const termless = textRank(analyzedFromTerms([[], ['a'], []]));
    assert.ok(termless.scores.every((s) => Math.abs(s - 1 / 3) < 1e-15));
    assert.equal(termless.converged, true);
  });
});
