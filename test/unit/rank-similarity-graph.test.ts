import assert from 'node:assert/strict';
import fc from 'fast-check';
import { linkCounts, similarityGraph, termsOverBudget, type CsrGraph } from '../../src/core/rank/similarity-graph';
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

  it('skips the most widespread terms only when the pair-visit budget is exceeded', () => {
    // sf = 4, 3, 2, 1 → visits 6, 3, 1, 0 (total 10).
    const index = buildTermIndex([['a', 'b', 'c', 'd'], ['a', 'b', 'c'], ['a', 'b'], ['a']]);
    const { offsets } = invertedIndex(index.counts, 4);
    assert.deepEqual(Array.from(termsOverBudget(offsets, 10)), [0, 0, 0, 0]);
    assert.deepEqual(Array.from(termsOverBudget(offsets, 9)), [1, 0, 0, 0]);
    assert.deepEqual(Array.from(termsOverBudget(offsets, 4)), [1, 0, 0, 0]);
    assert.deepEqual(Array.from(termsOverBudget(offsets, 3)), [1, 1, 0, 0]);
    assert.deepEqual(Array.from(termsOverBudget(offsets, 0)), [1, 1, 1, 0], 'a term held by one sentence visits no pair');
  });

  it('keeps exact weights under the visit budget and loses only pairs linked by skipped terms alone (property)', () => {
    fc.assert(
      fc.property(termLists(8, 20), fc.integer({ min: 0, max: 40 }), (lists, maxPairVisits) => {
        const index = buildTermIndex(lists);
        const presence = presenceVectors(index);
        const skipped = termsOverBudget(invertedIndex(presence, index.vocabulary.size).offsets, maxPairVisits);
        const edges = edgeMap(similarityGraph(presence, index.vocabulary.size, product, 0, { maxPairVisits, maxLinks: 1e9 }));
        const proposes = (t: string) => skipped[index.vocabulary.get(t)!] === 0;
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

  it('keeps only the strongest links when there are more than maxLinks', () => {
    // Shared-term counts: (0,1) = 3, (0,2) = 2, (1,2) = 2, (2,3) = 1.
    const index = buildTermIndex([['a', 'b', 'c'], ['a', 'b', 'c', 'x'], ['a', 'b', 'y'], ['y']]);
    const presence = presenceVectors(index);
    const build = (maxLinks: number) => edgeMap(similarityGraph(presence, index.vocabulary.size, product, 0, { maxPairVisits: 1e9, maxLinks }));
    assert.equal(build(4).size, 8);
    assert.deepEqual([...build(3).keys()].sort(), ['0,1', '0,2', '1,0', '1,2', '2,0', '2,1']);
    assert.deepEqual([...build(1).keys()].sort(), ['0,1', '1,0']);
    // The two links of weight 2 are tied: with room for 2 links neither is kept over the other.
    assert.deepEqual([...build(2).keys()].sort(), ['0,1', '1,0']);
    assert.equal(build(0).size, 0);
  });

  it('drops pairs at or below minSimilarity and counts links per node', () => {
    const index = buildTermIndex([['a', 'b'], ['a', 'b'], ['b'], []]);
    const graph = similarityGraph(presenceVectors(index), index.vocabulary.size, product, 1);
    assert.deepEqual([...edgeMap(graph).keys()].sort(), ['0,1', '1,0']);
    assert.deepEqual(Array.from(linkCounts(graph)), [1, 1, 0, 0]);
  });
});
