import assert from 'node:assert/strict';
import { pageRank, PAGERANK_DEFAULTS } from '../../src/core/rank/power-iteration';
import type { CsrGraph } from '../../src/core/rank/similarity-graph';
import { referencePageRank, type WeightedEdge } from './helpers/reference-pagerank';

/** Symmetric CSR graph from an edge list (test-side construction, independent of sparse-vectors). */
function csr(n: number, edges: readonly WeightedEdge[]): CsrGraph {
  const rows: { target: number; weight: number }[][] = Array.from({ length: n }, () => []);
  for (const { i, j, weight } of edges) {
    rows[i]!.push({ target: j, weight });
    rows[j]!.push({ target: i, weight });
  }
  const offsets = new Int32Array(n + 1);
  rows.forEach((row, i) => (offsets[i + 1] = offsets[i]! + row.length));
  const flat = rows.flat();
  return { size: n, offsets, targets: Int32Array.from(flat, (e) => e.target), weights: Float64Array.from(flat, (e) => e.weight) };
}

const sum = (values: Float64Array) => values.reduce((s, v) => s + v, 0);

describe('rank/power-iteration', () => {
  it('matches graphology-metrics PageRank on a weighted graph with a dangling node', () => {
    // External reference: npm `graphology` + `graphology-metrics` (centrality/pagerank.js).
    const edges: WeightedEdge[] = [
      { i: 0, j: 1, weight: 0.9 },
      { i: 0, j: 2, weight: 0.2 },
      { i: 1, j: 2, weight: 0.5 },
      { i: 2, j: 3, weight: 1.3 },
      { i: 3, j: 4, weight: 0.05 },
    ]; // node 5 has no edges: dangling
    const ours = pageRank(csr(6, edges));
    const reference = referencePageRank(6, edges);
    assert.equal(ours.converged, true);
    for (let i = 0; i < 6; i++) assert.ok(Math.abs(ours.scores[i]! - reference[i]!) < 1e-12, `node ${i}: ${ours.scores[i]} vs ${reference[i]}`);
  });

  it('matches the closed form of an undirected star', () => {
    // Centre c of a star with k leaves: c = (1 - d)/N + d·k·l and l = (1 - d)/N + d·c/k give
    // c = (1 + d·k) / (N·(1 + d)); for k = 3, d = 0.85, N = 4: c = 3.55 / 7.4 (derived by hand).
    const star = csr(4, [
      { i: 0, j: 1, weight: 1 },
      { i: 0, j: 2, weight: 1 },
      { i: 0, j: 3, weight: 1 },
    ]);
    const { scores } = pageRank(star);
    assert.ok(Math.abs(scores[0]! - 3.55 / 7.4) < 1e-6);
    assert.ok(Math.abs(scores[1]! - (1 - 3.55 / 7.4) / 3) < 1e-6);
  });

  it('keeps a probability distribution and converges under the L1 tolerance', () => {
    const { scores, converged, iterations } = pageRank(csr(5, [{ i: 0, j: 1, weight: 2 }, { i: 1, j: 2, weight: 1 }]));
    assert.ok(Math.abs(sum(scores) - 1) < 1e-12);
    assert.ok(scores.every((s) => s > 0));
    assert.equal(converged, true);
    assert.ok(iterations > 1 && iterations <= PAGERANK_DEFAULTS.maxIterations);
  });

  it('spreads dangling mass evenly: with no edges at all every node gets 1/n after one step', () => {
    const { scores, converged, iterations } = pageRank(csr(4, []));
    assert.deepEqual(Array.from(scores), [0.25, 0.25, 0.25, 0.25]);
    assert.equal(converged, true);
    assert.equal(iterations, 1);
  });

  it('reports a missed convergence instead of hiding it', () => {
    const result = pageRank(csr(3, [{ i: 0, j: 1, weight: 1 }]), { ...PAGERANK_DEFAULTS, maxIterations: 2 });
    assert.equal(result.converged, false);
    assert.equal(result.iterations, 2);
  });

  it('handles the empty graph', () => {
    const result = pageRank(csr(0, []));
    assert.equal(result.scores.length, 0);
    assert.equal(result.converged, true);
  });

  it('is invariant under relabelling the nodes', () => {
    const edges: WeightedEdge[] = [
      { i: 0, j: 1, weight: 0.3 },
      { i: 1, j: 2, weight: 0.7 },
      { i: 2, j: 3, weight: 0.1 },
      { i: 0, j: 3, weight: 0.4 },
    ];
    const relabel = [2, 0, 3, 1];
    const original = pageRank(csr(4, edges)).scores;
    const moved = pageRank(csr(4, edges.map((e) => ({ i: relabel[e.i]!, j: relabel[e.j]!, weight: e.weight })))).scores;
    for (let i = 0; i < 4; i++) assert.ok(Math.abs(original[i]! - moved[relabel[i]!]!) < 1e-12);
  });
});
