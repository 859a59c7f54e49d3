import assert from 'node:assert/strict';
import natural from 'natural';
import {
  cosineSimilarity,
  documentFrequencies,
  idfTable,
  inverseDocumentFrequency,
  similarities,
  termVector,
  topMatches,
} from '../../src/core/check/term-vectors';

const sentences: string[][] = [
  ['van', 'route', 'station', 'station'],
  ['rider', 'reward', 'station'],
  ['forecast', 'demand', 'station'],
  ['van', 'capac', 'bike'],
];

describe('check: term vectors', () => {
  it('counts each term once per sentence', () => {
    const df = documentFrequencies(sentences);
    assert.equal(df.get('station'), 3);
    assert.equal(df.get('van'), 2);
    assert.equal(df.get('bike'), 1);
    assert.equal(df.has('absent'), false);
  });

  it('gives the same idf and tf-idf weights as the natural package (npm) TfIdf class', () => {
    // Reference library: natural's TfIdf (npm, installed), idf = 1 + ln(N / (1 + df)), tf = raw count.
    const reference = new natural.TfIdf();
    for (const terms of sentences) reference.addDocument(terms);
    const table = idfTable(sentences);
    for (const term of ['station', 'van', 'bike', 'reward', 'forecast']) {
      assert.ok(Math.abs(inverseDocumentFrequency(table, term) - reference.idf(term)) < 1e-12, term);
    }
    sentences.forEach((terms, d) => {
      const vector = termVector(terms, table);
      for (const term of new Set(terms)) {
        assert.ok(Math.abs(vector.weights.get(term)! - reference.tfidf(term, d)) < 1e-12, `${term} in ${d}`);
      }
    });
  });

  it('matches a cosine worked by hand', () => {
    // N = 4. idf(station) = 1 + ln(4/4) = 1; idf(van) = 1 + ln(4/3); idf(route) = idf(rider) = 1 + ln 2.
    const table = idfTable(sentences);
    const a = termVector(['van', 'route', 'station', 'station'], table);
    const b = termVector(['van', 'station'], table);
    const van = 1 + Math.log(4 / 3);
    const route = 1 + Math.log(2);
    const station = 1;
    const dot = van * van + 2 * station * station;
    const expected = dot / (Math.sqrt(van ** 2 + route ** 2 + (2 * station) ** 2) * Math.sqrt(van ** 2 + station ** 2));
    assert.ok(Math.abs(cosineSimilarity(a, b) - expected) < 1e-12);
    // Spot value so a formula change cannot slip through unnoticed: computed by hand, 3.658 / (2.920 × 1.630) ≈ 0.7685.
    assert.ok(Math.abs(expected - 0.7685) < 5e-4, String(expected));
  });

  it('is symmetric, 1 for identical sentences, 0 for disjoint or empty ones', () => {
    const table = idfTable(sentences);
    const vectors = sentences.map((terms) => termVector(terms, table));
    for (const a of vectors) {
      assert.equal(cosineSimilarity(a, a), 1);
      for (const b of vectors) assert.equal(cosineSimilarity(a, b), cosineSimilarity(b, a));
    }
    assert.equal(cosineSimilarity(termVector(['rider'], table), termVector(['bike'], table)), 0);
    assert.equal(cosineSimilarity(termVector([], table), vectors[0]!), 0);
  });

  it('does not change when a sentence is repeated word for word', () => {
    // Cosine ignores vector length: doubling every count leaves the direction unchanged.
    const table = idfTable(sentences);
    const once = termVector(['van', 'route'], table);
    const twice = termVector(['van', 'route', 'van', 'route'], table);
    const other = termVector(['van', 'bike', 'station'], table);
    assert.ok(Math.abs(cosineSimilarity(once, other) - cosineSimilarity(twice, other)) < 1e-12);
  });

  it('weighs a rare shared term above a common one', () => {
    const table = idfTable(sentences);
    const query = termVector(['station', 'forecast'], table);
    const viaRare = termVector(['forecast', 'rider'], table);
    const viaCommon = termVector(['station', 'rider'], table);
    assert.ok(cosineSimilarity(query, viaRare) > cosineSimilarity(query, viaCommon));
  });

  it('returns the top matches best first, earlier candidate on ties, without zero matches', () => {
    const table = idfTable(sentences);
    const vectors = sentences.map((terms) => termVector(terms, table));
    const query = termVector(['van', 'station'], table);
    const scores = similarities(query, vectors);
    assert.deepEqual([...scores], vectors.map((v) => cosineSimilarity(query, v)));
    const top = topMatches(scores, 3);
    assert.deepEqual(top.map((m) => m.index), [0, 3, 1]);
    for (let i = 1; i < top.length; i++) assert.ok(top[i - 1]!.similarity >= top[i]!.similarity);
    // Sentences 1 and 2 share only 'station' with the query and have the same shape: a tie.
    assert.equal(scores[1], scores[2]);
    assert.deepEqual(topMatches([0.5, 0.5, 0.2], 1).map((m) => m.index), [0]);
    assert.deepEqual(topMatches([0.1, 0.3, 0.3, 0.2], 2).map((m) => m.index), [1, 2]);
    assert.deepEqual(topMatches(similarities(termVector(['absent'], table), vectors), 3), []);
    assert.deepEqual(topMatches(scores, 0), []);
  });
});
