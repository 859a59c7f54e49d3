import assert from 'node:assert/strict';
import { centroidRank, documentCentroid } from '../../src/core/rank/centroid';
import { analyzedFromTerms } from './helpers/analyzed-fixture';

const close = (actual: Float64Array, expected: readonly number[], tolerance = 1e-12) => {
  assert.equal(actual.length, expected.length);
  expected.forEach((value, i) => assert.ok(Math.abs(actual[i]! - value) < tolerance, `sentence ${i}: ${actual[i]} vs ${value}`));
};

describe('rank/centroid', () => {
  // Worked example (by hand, definitions of Radev et al. 2004 with sentences as documents).
  // n = 4, L = ln 2. idf: bike, dock = ln(4/2) = L; rebalance, truck, weather = ln 4 = 2L.
  // Occurrences: bike 3, dock 2, the others 1. Centroid c(t) = idf · count / n:
  //   bike 3L/4, dock 2L/4, rebalance 2L/4, truck 2L/4, weather 2L/4  ∝ (3, 2, 2, 2, 2), norm 5.
  // Sentence tf·idf vectors (÷ L): s0 = bike 2, dock 1; s1 = bike 1, rebalance 2;
  // s2 = dock 1, truck 2; s3 = weather 2.
  //   cos(s0) = (2·3 + 1·2) / (√5 · 5) = 8 / (5√5)
  //   cos(s1) = (1·3 + 2·2) / (√5 · 5) = 7 / (5√5)
  //   cos(s2) = (1·2 + 2·2) / (√5 · 5) = 6 / (5√5)
  //   cos(s3) = (2·2) / (2 · 5)       = 2 / 5
  const worked = analyzedFromTerms([['bike', 'dock', 'bike'], ['bike', 'rebalance'], ['dock', 'truck'], ['weather']]);
  const root5 = Math.sqrt(5);

  it('scores the worked example by cosine to the tf·idf centroid', () => {
    const result = centroidRank(worked);
    close(result.scores, [8 / (5 * root5), 7 / (5 * root5), 6 / (5 * root5), 2 / 5]);
    assert.equal(result.features!.centroid, result.scores);
  });

  it('builds the centroid as average tf·idf over the sentences', () => {
    const c = documentCentroid(worked);
    const L = Math.LN2;
    assert.deepEqual(Array.from(c.ids), [0, 1, 2, 3, 4]);
    close(c.values, [(3 * L) / 4, (2 * L) / 4, (2 * L) / 4, (2 * L) / 4, (2 * L) / 4]);
  });

  it('keeps only the strongest centroid terms when maxTerms is set', () => {
    // Top 1 = {bike}: s0 = 2/√5, s1 = 1/√5, the rest share nothing with it.
    close(centroidRank(worked, { centroid: { maxTerms: 1 } }).scores, [2 / root5, 1 / root5, 0, 0]);
    // Top 2: bike, then the first-seen of the tied terms (dock); centroid (3, 2), norm √13.
    close(centroidRank(worked, { centroid: { maxTerms: 2 } }).scores, [8 / (root5 * Math.sqrt(13)), 3 / (root5 * Math.sqrt(13)), 2 / (root5 * Math.sqrt(13)), 0]);
  });

  it('does not favour a sentence for being long (cosine, not a sum)', () => {
    const doc = analyzedFromTerms([['tram', 'depot'], ['tram', 'depot', 'tram', 'depot'], ['ferry']]);
    const { scores } = centroidRank(doc);
    assert.ok(Math.abs(scores[0]! - scores[1]!) < 1e-12);
  });

  it('handles degenerate documents explicitly', () => {
    assert.equal(centroidRank(analyzedFromTerms([])).scores.length, 0);
    close(centroidRank(analyzedFromTerms([['lonely']])).scores, [1]);
    // Termless sentences score 0; terms present in every sentence have idf 0, so the centroid is empty.
    close(centroidRank(analyzedFromTerms([[], ['a', 'b'], []])).scores, [0, 1, 0]);
    close(centroidRank(analyzedFromTerms([['a', 'b'], ['b', 'a'], ['a', 'b']])).scores, [0, 0, 0]);
  });
});
