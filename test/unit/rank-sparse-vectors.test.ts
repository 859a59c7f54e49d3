import assert from 'node:assert/strict';
import {
  buildTermIndex,
  cosine,
  dot,
  inverseSentenceFrequency,
  invertedIndex,
  makeVector,
  presenceVectors,
  tfidfVectors,
} from '../../src/core/rank/sparse-vectors';

describe('rank/sparse-vectors', () => {
  const sentences = [['pump', 'river', 'pump'], ['river', 'farm'], [], ['farm', 'pump']];

  it('indexes terms in order of first appearance with counts and sentence frequencies', () => {
    const index = buildTermIndex(sentences);
    assert.deepEqual([...index.vocabulary.entries()], [['pump', 0], ['river', 1], ['farm', 2]]);
    assert.deepEqual(Array.from(index.counts[0]!.ids), [0, 1]);
    assert.deepEqual(Array.from(index.counts[0]!.values), [2, 1]);
    assert.equal(index.counts[2]!.ids.length, 0);
    assert.deepEqual(Array.from(index.sentenceFrequency), [2, 2, 2]);
    assert.deepEqual(Array.from(index.totalCount), [3, 2, 2]);
  });

  it('weights terms by tf·log(n/sf) and drops zero weights', () => {
    // n = 4, every term in 2 sentences: idf = ln 2 (published definition, Erkan & Radev 2004).
    const index = buildTermIndex(sentences);
    const idf = inverseSentenceFrequency(index);
    assert.ok(idf.every((v) => Math.abs(v - Math.LN2) < 1e-15));
    const vectors = tfidfVectors(index, idf);
    assert.deepEqual(Array.from(vectors[0]!.values), [2 * Math.LN2, Math.LN2]);
    const everywhere = buildTermIndex([['a', 'b'], ['a']]);
    assert.deepEqual(Array.from(tfidfVectors(everywhere, inverseSentenceFrequency(everywhere))[1]!.ids), []);
  });

  it('computes dot and cosine like their dense definitions, and 0/1 presence vectors', () => {
    const a = makeVector(Int32Array.of(0, 2, 5), Float64Array.of(1, 2, 3));
    const b = makeVector(Int32Array.of(2, 3, 5), Float64Array.of(4, 1, 1));
    assert.equal(dot(a, b), 2 * 4 + 3 * 1);
    assert.ok(Math.abs(cosine(a, b) - 11 / (Math.sqrt(14) * Math.sqrt(18))) < 1e-15);
    assert.equal(cosine(a, a), 1);
    assert.equal(cosine(a, makeVector(new Int32Array(0), new Float64Array(0))), 0);
    const presence = presenceVectors(buildTermIndex([['x', 'y', 'x'], ['y', 'z']]));
    assert.deepEqual(Array.from(presence[0]!.values), [1, 1]);
    assert.equal(dot(presence[0]!, presence[1]!), 1, 'one distinct shared term');
  });

  it('lists postings per term in ascending sentence order', () => {
    const index = buildTermIndex(sentences);
    const postings = invertedIndex(index.counts, 3);
    const of = (t: number) => Array.from(postings.sentences.subarray(postings.offsets[t], postings.offsets[t + 1]));
    assert.deepEqual(of(0), [0, 3]);
    assert.deepEqual(of(1), [0, 1]);
    assert.deepEqual(of(2), [1, 3]);
    assert.deepEqual(Array.from(postings.values.subarray(postings.offsets[0], postings.offsets[1])), [2, 1], 'pump: twice in s0, once in s3');
  });
});
