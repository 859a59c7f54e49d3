import assert from 'node:assert/strict';
import fc from 'fast-check';
import { commonTerms, linkCounts, similarityGraph, SPARSE_GRAPH_DEFAULTS, type CsrGraph } from '../../src/core/rank/similarity-graph';
import { buildTermIndex, dot, inverseFrequency, invertedIndex, presenceVectors, tfidfVectors } from '../../src/core/vectors';

/** Edge map {"i,j": w} of a CSR graph, checking symmetry, row order and self-loops on the way. */
function edgeMap(graph: CsrGraph): Map<string, number> {
  const edges = new Map<string, number>();
  for (let i = 0; i < graph.size; i++) {
    let previous = -1;
    for (let e = graph.offsets[i]!; e < graph.offsets[i + 1]!; e++) {
      const j = graph.targets[e]!;
      assert.notEqual(j, i, 'no self-loops');
      assert.ok(j > previous, 'row sorted');
      previous = j;
      edges.set(`${i},${j}`, graph.weights[e]!);
    }
  }
  for (const [key, w] of edges) {
    const [i, j] = key.split(',');
    assert.equal(edges.get(`${j},${i}`), w, 'symmetric');
  }
  return edges;
}

const product = (_i: number, _j: number, value: number) => value;
const termLists = (maxTerm: number, maxSentences: number) =>
  fc.array(fc.array(fc.integer({ min: 0, max: maxTerm }).map((t) => `t${t}`), { maxLength: 6 }), { maxLength: maxSentences });

describe('rank/similarity-graph', () => {
  it('links exactly the pairs a dense all-pairs scan finds, with the same weights (property)', () => {
    fc.assert(
      fc.property(termLists(12, 25), (lists) => {
        const index = buildTermIndex(lists);
        const vectors = tfidfVectors(index, inverseFrequency(index, 'sentence'));
        const edges = edgeMap(similarityGraph(vectors, index.vocabulary.size, product, 0));
        for (let i = 0; i < lists.length; i++) {
          for (let j = 0; j < lists.length; j++) {
            if (i !== j) assert.ok(Math.abs((edges.get(`${i},${j}`) ?? 0) - dot(vectors[i]!, vectors[j]!)) < 1e-12);
          }
        }
      }),
      { numRuns: 60, seed: 20240601 },
    );
  });

  it('flags the terms held by more sentences than the proposing limit', () => {
    // sf = 4, 3, 2, 1.
    const index = buildTermIndex([['a', 'b', 'c', 'd'], ['a', 'b', 'c'], ['a', 'b'], ['a']]);
    const { offsets } = invertedIndex(index.counts, 4);
    assert.deepEqual(Array.from(commonTerms(offsets, 4).flags), [0, 0, 0, 0]);
    assert.deepEqual(Array.from(commonTerms(offsets, 3).flags), [1, 0, 0, 0]);
    assert.deepEqual(Array.from(commonTerms(offsets, 1).flags), [1, 1, 1, 0]);
    assert.equal(commonTerms(offsets, 0).count, 4);
  });

  it('keeps exact weights and loses only pairs linked by common terms alone (property)', () => {
    fc.assert(
      fc.property(termLists(8, 20), fc.integer({ min: 0, max: 8 }), (lists, maxProposingFrequency) => {
        const index = buildTermIndex(lists);
        const presence = presenceVectors(index);
        const common = commonTerms(invertedIndex(presence, index.vocabulary.size).offsets, maxProposingFrequency).flags;
        const edges = edgeMap(similarityGraph(presence, index.vocabulary.size, product, 0, { maxProposingFrequency, maxNeighbours: 1e9 }));
        const proposes = (t: string) => common[index.vocabulary.get(t)!] === 0;
        for (let i = 0; i < lists.length; i++) {
          for (let j = i + 1; j < lists.length; j++) {
            const shared = [...new Set(lists[i])].filter((t) => lists[j]!.includes(t));
            assert.equal(edges.get(`${i},${j}`) ?? 0, shared.some(proposes) ? shared.length : 0);
          }
        }
      }),
      { numRuns: 80, seed: 99 },
    );
  });

  it('keeps every link that is among the k strongest of one of its ends, and no other (property)', () => {
    fc.assert(
      fc.property(termLists(10, 30), fc.integer({ min: 0, max: 6 }), (lists, maxNeighbours) => {
        const index = buildTermIndex(lists);
        const vectors = tfidfVectors(index, inverseFrequency(index, 'sentence'));
        const graph = similarityGraph(vectors, index.vocabulary.size, product, 0, { maxNeighbours, maxProposingFrequency: 1e9 });
        const edges = edgeMap(graph);
        const n = lists.length;
        // Each sentence's k strongest partners by the dense definition (ties: the earlier sentence).
        const strongest = (i: number) =>
          Array.from({ length: n }, (_, j) => j)
            .filter((j) => j !== i && dot(vectors[i]!, vectors[j]!) > 0)
            .sort((x, y) => dot(vectors[i]!, vectors[y]!) - dot(vectors[i]!, vectors[x]!) || x - y)
            .slice(0, maxNeighbours);
        const top = Array.from({ length: n }, (_, i) => new Set(strongest(i)));
        for (let i = 0; i < n; i++) {
          for (let j = 0; j < n; j++) {
            if (i === j) continue;
            const expected = top[i]!.has(j) || top[j]!.has(i);
            assert.equal(edges.has(`${i},${j}`), expected, `link ${i}-${j}`);
            if (expected) assert.ok(Math.abs(edges.get(`${i},${j}`)! - dot(vectors[i]!, vectors[j]!)) < 1e-12);
          }
        }
        assert.ok(edges.size <= 2 * n * maxNeighbours, 'at most n·k links');
      }),
      { numRuns: 80, seed: 7 },
    );
  });

  it('grows linearly: identical sentences keep k partners each, common terms propose nothing', () => {
    const sentences = Array.from({ length: 500 }, () => ['grid', 'cell', 'storage']);
    const index = buildTermIndex(sentences);
    const presence = presenceVectors(index);
    const limited = similarityGraph(presence, index.vocabulary.size, product, 0, { maxNeighbours: 8, maxProposingFrequency: 1e9 });
    // Ties keep the earlier sentences: every node links to 0..7 (or to 0..8 without itself), and
    // those eight keep links to everyone who kept them.
    assert.ok(limited.targets.length <= 2 * 500 * 8);
    assert.deepEqual(Array.from(limited.targets.subarray(limited.offsets[100]!, limited.offsets[101]!)), [0, 1, 2, 3, 4, 5, 6, 7]);
    // 500 sentences share every term, above a proposing limit of 200: no pair is proposed.
    const pruned = similarityGraph(presence, index.vocabulary.size, product, 0, { maxNeighbours: 8, maxProposingFrequency: 200 });
    assert.equal(pruned.targets.length, 0);
    assert.ok(SPARSE_GRAPH_DEFAULTS.maxNeighbours >= 1 && SPARSE_GRAPH_DEFAULTS.maxProposingFrequency > SPARSE_GRAPH_DEFAULTS.maxNeighbours);
  });

  it('drops pairs at or below minSimilarity and counts links per node', () => {
    const index = buildTermIndex([['a', 'b'], ['a', 'b'], ['b'], []]);
    const graph = similarityGraph(presenceVectors(index), index.vocabulary.size, product, 1);
    assert.deepEqual([...edgeMap(graph).keys()].sort(), ['0,1', '1,0']);
    assert.deepEqual(Array.from(linkCounts(graph)), [1, 1, 0, 0]);
  });
});
