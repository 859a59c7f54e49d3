import assert from 'node:assert/strict';
import natural from 'natural';
import {
  buildTermIndex,
  cosine,
  dot,
  inverseFrequency,
  invertedIndex,
  makeVector,
  presenceVectors,
  similarities,
  tfidfVectors,
  topMatches,
  type SparseVector,
} from '../../src/core/vectors';

describe('vectors: sparse term vectors', () => {
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
    const idf = inverseFrequency(index, 'sentence');
    assert.ok(idf.every((v) => Math.abs(v - Math.LN2) < 1e-15));
    const vectors = tfidfVectors(index, idf);
    assert.deepEqual(Array.from(vectors[0]!.values), [2 * Math.LN2, Math.LN2]);
    const everywhere = buildTermIndex([['a', 'b'], ['a']]);
    assert.deepEqual(Array.from(tfidfVectors(everywhere, inverseFrequency(everywhere, 'sentence'))[1]!.ids), []);
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

describe("vectors: the 'smoothed' idf and matching (the abstract check's space)", () => {
  const sentences: string[][] = [
    ['van', 'route', 'station', 'station'],
    ['rider', 'reward', 'station'],
    ['forecast', 'demand', 'station'],
    ['van', 'capac', 'bike'],
  ];
  const index = buildTermIndex(sentences);
  const vectors = tfidfVectors(index, inverseFrequency(index, 'smoothed'));
  const weightOf = (vector: SparseVector, term: string) => {
    const id = index.vocabulary.get(term)!;
    const k = Array.from(vector.ids).indexOf(id);
    return k < 0 ? 0 : vector.values[k]!;
  };

  it('gives the same idf and tf-idf weights as the natural package (npm) TfIdf class', () => {
    // Reference library: natural's TfIdf (npm, installed), idf = 1 + ln(N / (1 + df)), tf = raw count.
    const reference = new natural.TfIdf();
    for (const terms of sentences) reference.addDocument(terms);
    const idf = inverseFrequency(index, 'smoothed');
    for (const term of ['station', 'van', 'bike', 'reward', 'forecast']) {
      assert.ok(Math.abs(idf[index.vocabulary.get(term)!]! - reference.idf(term)) < 1e-12, term);
    }
    sentences.forEach((terms, d) => {
      for (const term of new Set(terms)) assert.ok(Math.abs(weightOf(vectors[d]!, term) - reference.tfidf(term, d)) < 1e-12, `${term} in ${d}`);
    });
  });

  it('matches a cosine worked by hand', () => {
    // N = 4. idf(station) = 1 + ln(4/4) = 1; idf(van) = 1 + ln(4/3); idf(route) = 1 + ln 2.
    const query = buildTermIndex([...sentences, ['van', 'station']]);
    const all = tfidfVectors(query, inverseFrequency(buildTermIndex(sentences), 'smoothed'));
    const van = 1 + Math.log(4 / 3);
    const route = 1 + Math.log(2);
    const station = 1;
    const expected = (van * van + 2 * station * station) / (Math.sqrt(van ** 2 + route ** 2 + (2 * station) ** 2) * Math.sqrt(van ** 2 + station ** 2));
    assert.ok(Math.abs(cosine(all[0]!, all[4]!) - expected) < 1e-12);
    // Spot value so a formula change cannot slip through unnoticed: computed by hand, 3.658 / (2.920 × 1.630) ≈ 0.7685.
    assert.ok(Math.abs(expected - 0.7685) < 5e-4, String(expected));
  });

  it('is symmetric, 1 for identical sentences, 0 for disjoint or empty ones', () => {
    for (const a of vectors) {
      assert.equal(cosine(a, a), 1);
      for (const b of vectors) assert.equal(cosine(a, b), cosine(b, a));
    }
    assert.equal(cosine(vectors[1]!, vectors[3]!), 0, 'rider/reward/station against van/capac/bike');
    assert.equal(cosine(makeVector(new Int32Array(0), new Float64Array(0)), vectors[0]!), 0);
  });

  it('weighs a rare shared term above a common one', () => {
    const extended = buildTermIndex([...sentences, ['station', 'forecast'], ['forecast', 'rider'], ['station', 'rider']]);
    const v = tfidfVectors(extended, inverseFrequency(buildTermIndex(sentences), 'smoothed'));
    assert.ok(cosine(v[4]!, v[5]!) > cosine(v[4]!, v[6]!));
  });

  it('returns the top matches best first, earlier candidate on ties, without zero matches', () => {
    const scores = similarities(vectors[0]!, vectors);
    assert.deepEqual([...scores], vectors.map((v) => cosine(vectors[0]!, v)));
    const top = topMatches(scores, 3);
    assert.equal(top[0]!.index, 0);
    for (let i = 1; i < top.length; i++) assert.ok(top[i - 1]!.similarity >= top[i]!.similarity);
    assert.deepEqual(topMatches([0.5, 0.5, 0.2], 1).map((m) => m.index), [0]);
    assert.deepEqual(topMatches([0.1, 0.3, 0.3, 0.2], 2).map((m) => m.index), [1, 2]);
    assert.deepEqual(topMatches([0, 0, 0], 3), []);
    assert.deepEqual(topMatches([0.1, NaN], 2).map((m) => m.index), [0]);
    assert.deepEqual(topMatches(scores, 0), []);
  });
});
