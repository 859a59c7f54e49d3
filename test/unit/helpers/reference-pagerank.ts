/**
 * External reference for the rankers' power iteration: PageRank from the npm packages `graphology`
 * + `graphology-metrics` (graphology-metrics/centrality/pagerank.js, read in node_modules).
 *
 * Its conventions, matched here so the comparison is exact:
 *  - `alpha` is the damping factor (0.85 ↔ our damping), start vector 1/n;
 *  - edge weights come from the `weight` attribute (`getEdgeWeight: 'weight'`), each node's
 *    out-weights are divided by their sum;
 *  - nodes with zero out-weight are dangling and spread their mass evenly over all nodes;
 *  - it stops when the L1 change is below n · tolerance, ours below tolerance: we pass
 *    tolerance / n so both stop after the same step;
 *  - it throws when it fails to converge within maxIterations.
 * A symmetric edge {i, j} becomes two directed edges i→j and j→i (no self-loops: graphology's
 * index sizes undirected self-loops as two slots, which we avoid altogether).
 */
import Graph from 'graphology';
import pagerank from 'graphology-metrics/centrality/pagerank.js';

export interface WeightedEdge {
  readonly i: number;
  readonly j: number;
  readonly weight: number;
}

export function referencePageRank(
  n: number,
  edges: readonly WeightedEdge[],
  settings: { damping: number; tolerance: number; maxIterations: number } = { damping: 0.85, tolerance: 1e-6, maxIterations: 200 },
): Float64Array {
  const graph = new Graph({ type: 'directed', multi: false, allowSelfLoops: false });
  for (let node = 0; node < n; node++) graph.addNode(String(node));
  for (const { i, j, weight } of edges) {
    graph.addDirectedEdge(String(i), String(j), { weight });
    graph.addDirectedEdge(String(j), String(i), { weight });
  }
  const ranks = pagerank(graph, {
    getEdgeWeight: 'weight',
    alpha: settings.damping,
    tolerance: settings.tolerance / n,
    maxIterations: settings.maxIterations,
  });
  return Float64Array.from({ length: n }, (_, node) => ranks[String(node)]!);
}

/** Edges of a dense symmetric similarity matrix, upper triangle, weight > 0. */
export function edgesOfMatrix(matrix: readonly (readonly number[])[]): WeightedEdge[] {
  const edges: WeightedEdge[] = [];
  matrix.forEach((row, i) => {
    for (let j = i + 1; j < row.length; j++) if (row[j]! > 0) edges.push({ i, j, weight: row[j]! });
  });
  return edges;
}
