import assert from 'node:assert/strict';
import fc from 'fast-check';
import { lexRank, lexRankGraph, LEXRANK_DEFAULTS } from '../../src/core/rank/lexrank';
import { analyzedFromTerms } from './helpers/analyzed-fixture';
import { edgesOfMatrix, referencePageRank } from './helpers/reference-pagerank';

/**
 * idf-modified cosine written straight from Erkan & Radev (2004), eq. 3, with idf = log(n / sf)
 * over the sentences; dense and map-based, sharing no code with the engine.
 */
function denseIdfCosine(sentences: readonly (readonly string[])[]): number[][] {
  const n = sentences.length;
  const sf = new Map<string, number>();
  for (const terms of sentences) for (const t of new Set(terms)) sf.set(t, (sf.get(t) ?? 0) + 1);
  const idf = (t: string) => Math.log(n / sf.get(t)!);
  const tf = sentences.map((terms) => {
    const m = new Map<string, number>();
    for (const t of terms) m.set(t, (m.get(t) ?? 0) + 1);
    return m;
  });
  const norm = tf.map((m) => Math.sqrt([...m].reduce((s, [t, c]) => s + (c * idf(t)) ** 2, 0)));
  return tf.map((x, i) =>
    tf.map((y, j) => {
      if (i === j || norm[i] === 0 || norm[j] === 0) return 0;
      let numerator = 0;
      for (const [t, c] of x) numerator += c * (y.get(t) ?? 0) * idf(t) ** 2;
      return numerator / (norm[i]! * norm[j]!);
    }),
  );
}

const close = (actual: Float64Array, expected: ArrayLike<number>, tolerance: number) => {
  assert.equal(actual.length, expected.length);
  for (let i = 0; i < actual.length; i++) assert.ok(Math.abs(actual[i]! - expected[i]!) < tolerance, `sentence ${i}: ${actual[i]} vs ${expected[i]}`);
};

describe('rank/lexrank', () => {
  // Worked example (computed by hand). n = 4; solar, panel, roof, grant occur in 2 sentences
  // (idf ln 2), repair and deadline in 1 (idf ln 4 = 2 ln 2).
  //   cos(s0, s1) = 2·ln²2 / (√3·ln2 · √3·ln2)            = 2/3
  //   cos(s0, s2) = ln²2 / (√3·ln2 · √(ln²2 + 4·ln²2))   = 1/√15 ≈ 0.258
  //   cos(s1, s3) = 1/√15 by symmetry; every other pair 0.
  // With threshold 0.1 the graph is the path s2 – s0 – s1 – s3. For a 4-node path with d = 0.85,
  // ends e and middles m satisfy e = 0.0375 + 0.425·m, m = 0.0375 + 0.85·e + 0.425·m,
  // so m = 37/114 and e = 20/114.
  const worked = analyzedFromTerms([
    ['solar', 'panel', 'roof'],
    ['solar', 'panel', 'grant'],
    ['roof', 'repair'],
    ['grant', 'deadline'],
  ]);

  it('computes the idf-modified cosine of the worked example', () => {
    const graph = lexRankGraph(worked, { ...LEXRANK_DEFAULTS, variant: 'continuous' });
    const weight = (i: number, j: number) => {
      for (let e = graph.offsets[i]!; e < graph.offsets[i + 1]!; e++) if (graph.targets[e] === j) return graph.weights[e]!;
      return 0;
    };
    assert.ok(Math.abs(weight(0, 1) - 2 / 3) < 1e-12);
    assert.ok(Math.abs(weight(0, 2) - 1 / Math.sqrt(15)) < 1e-12);
    assert.ok(Math.abs(weight(3, 1) - 1 / Math.sqrt(15)) < 1e-12);
    assert.equal(weight(2, 3), 0);
  });

  it('ranks the worked example as the hand-solved path graph', () => {
    const result = lexRank(worked);
    close(result.scores, [37 / 114, 37 / 114, 20 / 114, 20 / 114], 1e-6);
    assert.equal(result.converged, true);
    assert.deepEqual(Array.from(result.features!.links!), [2, 2, 1, 1]);
  });

  it('equals graphology-metrics PageRank on the same graph, both variants (property)', () => {
    // External reference: npm `graphology` + `graphology-metrics` pagerank, alpha 0.85, tolerance
    // matched (see helpers/reference-pagerank.ts), on a graph built from the dense formula above.
    const documents = fc.array(fc.array(fc.integer({ min: 0, max: 15 }).map((t) => `w${t}`), { maxLength: 7 }), { minLength: 2, maxLength: 30 });
    fc.assert(
      fc.property(documents, fc.boolean(), (sentences, continuous) => {
        const dense = denseIdfCosine(sentences);
        const matrix = continuous ? dense : dense.map((row) => row.map((c) => (c > LEXRANK_DEFAULTS.threshold ? 1 : 0)));
        const reference = referencePageRank(sentences.length, edgesOfMatrix(matrix));
        const ours = lexRank(analyzedFromTerms(sentences), { lexrank: { variant: continuous ? 'continuous' : 'threshold' } });
        assert.equal(ours.converged, true);
        close(ours.scores, reference, 1e-9);
      }),
      { numRuns: 80, seed: 7 },
    );
  });

  it('honours a custom threshold', () => {
    // At 0.3 only the 2/3 link survives: s0 and s1 share the walk, s2 and s3 are dangling.
    const { scores } = lexRank(worked, { lexrank: { threshold: 0.3 } });
    const reference = referencePageRank(4, [{ i: 0, j: 1, weight: 1 }]);
    close(scores, reference, 1e-9);
    assert.ok(scores[0]! > scores[2]!);
  });

  it('handles the degenerate documents explicitly', () => {
    const empty = lexRank(analyzedFromTerms([]));
    assert.equal(empty.scores.length, 0);
    assert.equal(empty.converged, true);

    const single = lexRank(analyzedFromTerms([['only', 'sentence']]));
    assert.deepEqual(Array.from(single.scores), [1]);

    // Sentences without terms and documents without any similarity: every node is dangling,
    // so the walk is uniform.
    const termless = lexRank(analyzedFromTerms([[], [], []]));
    close(termless.scores, [1 / 3, 1 / 3, 1 / 3], 1e-15);
    assert.equal(termless.converged, true);
    const unrelated = lexRank(analyzedFromTerms([['a'], ['b'], ['c'], ['d']]));
    close(unrelated.scores, [0.25, 0.25, 0.25, 0.25], 1e-15);
  });

  it('does not depend on sentence order (LexRank ignores position)', () => {
    const reversed = analyzedFromTerms([...worked.terms].reverse());
    const a = lexRank(worked).scores;
    const b = lexRank(reversed).scores;
    for (let i = 0; i < 4; i++) assert.ok(Math.abs(a[i]! - b[3 - i]!) < 1e-12);
  });
});
