import assert from 'node:assert/strict';
import { alignTermsToWords, luhnRank, significanceFactor, significantTerms, termPositions } from '../../src/core/rank/luhn';
import { contentTerms } from '../../src/core/text/tokens';
import { analyzedFromTerms } from './helpers/analyzed-fixture';

describe('rank/luhn', () => {
  // Worked example, computed by hand.
  //   A: the river* pump* was fixed and then the pump* station* sent river* water* to farms
  //   B: river* water* levels rose
  //   C: a new pump* station* opened
  // Content-term tokens: 9 + 4 + 4 = 17, so the lower cutoff is max(2, ⌈log10 17⌉) = 2; 11
  // distinct terms × 1% drops none. Counts: river 3, pump 3, station 2, water 2, every other
  // term 1 → significant = {river, pump, station, water} (starred).
  // A's significant word positions (0-based, stop words counted): 1 2 8 9 11 12.
  // Insignificant words between neighbours: 0, 5, 0, 1, 0. The gap of 5 exceeds Luhn's limit of
  // 4, so the clusters are [1..2] and [8..12]:
  //   [1..2]:  2 significant, span 2  → 2²/2 = 2
  //   [8..12]: 4 significant, span 5  → 4²/5 = 3.2      → score(A) = 3.2
  //   B: positions 0 1 → 2²/2 = 2;   C: positions 2 3 → 2²/2 = 2.
  // With a gap limit of 5 A is one cluster: 6 significant over span 12 → 36/12 = 3.
  const worked = analyzedFromTerms([
    {
      words: ['the', 'river', 'pump', 'was', 'fixed', 'and', 'then', 'the', 'pump', 'station', 'sent', 'river', 'water', 'to', 'farms'],
      terms: ['river', 'pump', 'fix', 'pump', 'station', 'sent', 'river', 'water', 'farm'],
    },
    { words: ['river', 'water', 'levels', 'rose'], terms: ['river', 'water', 'level', 'rose'] },
    { words: ['a', 'new', 'pump', 'station', 'opened'], terms: ['new', 'pump', 'station', 'open'] },
  ]);

  it('picks significant words from the frequency band', () => {
    const { terms, minCount } = significantTerms(worked);
    assert.equal(minCount, 2);
    assert.deepEqual([...terms].sort(), ['pump', 'river', 'station', 'water']);
  });

  it('scores the hand-computed worked example', () => {
    const result = luhnRank(worked);
    assert.deepEqual(Array.from(result.scores), [3.2, 2, 2]);
    assert.deepEqual(Array.from(result.features!.significantWords!), [6, 2, 2]);
  });

  it('merges clusters when the gap limit allows', () => {
    assert.deepEqual(Array.from(luhnRank(worked, { luhn: { gapLimit: 5 } }).scores), [3, 2, 2]);
  });

  it('matches the cluster of Luhn\u2019s illustration: 4 significant words in 7 → 16/7', () => {
    // From memory: Luhn (1958), the figure computing a significance factor of (4)²/7 ≈ 2.3 for a
    // bracketed cluster of seven words holding four significant words.
    assert.equal(significanceFactor([0, 3, 4, 6]), 16 / 7);
    assert.equal(Math.round(significanceFactor([0, 3, 4, 6]) * 10) / 10, 2.3);
  });

  it('allows exactly four insignificant words inside a cluster, not five', () => {
    assert.equal(significanceFactor([0, 5]), 4 / 6); // gap 4: one cluster, 2²/6
    assert.equal(significanceFactor([0, 6]), 1); // gap 5: two clusters of 1²/1
    assert.equal(significanceFactor([]), 0);
    assert.equal(significanceFactor([3]), 1);
  });

  it('raises the lower cutoff with document size and drops the most frequent terms', () => {
    // 200 distinct terms once each plus 'alpha' ×9, 'beta' ×5, 'gamma' ×4, 'delta' ×3:
    // tokens = 221 → cutoff max(2, ⌈log10 221⌉) = 3; 204 distinct × 1% = 2 dropped: counts sorted
    // 9, 5, 4, 3, …, so terms above 4 (alpha, beta) go; gamma and delta remain.
    const filler = Array.from({ length: 200 }, (_, i) => [`filler${i}`]);
    const doc = analyzedFromTerms([
      ...filler,
      Array(9).fill('alpha'),
      Array(5).fill('beta'),
      Array(4).fill('gamma'),
      Array(3).fill('delta'),
    ]);
    const band = significantTerms(doc);
    assert.equal(band.minCount, 3);
    assert.equal(band.maxCount, 4);
    assert.deepEqual([...band.terms].sort(), ['delta', 'gamma']);
  });

  it('recovers which word each stemmed term came from', () => {
    // "the" shares a prefix with "therm", but only "thermal" lets every term be placed well.
    assert.deepEqual(Array.from(alignTermsToWords(['the', 'thermal', 'pump'], ['therm', 'pump'])), [1, 2]);
    assert.deepEqual(Array.from(alignTermsToWords(['a', 'happy', 'city'], ['happi', 'citi'])), [1, 2]);
    // Accents folded: a stemmer that strips them still lines up.
    assert.deepEqual(Array.from(alignTermsToWords(['die', 'häuser'], ['haus'])), [1]);
    assert.deepEqual(Array.from(alignTermsToWords([], [])), []);
  });

  it('places terms in word slots: exactly through the analyzer, by alignment otherwise', () => {
    const words = ['the', 'rate-limit', 'rules', 'apply'];
    const analyzer = (word: string) => ({ 'rate-limit': ['rate', 'limit'], rules: ['rule'], apply: ['appli'] })[word] ?? [];
    // Exact: "the" one slot, "rate-limit" two slots (rate 1, limit 2), rules 3, apply 4.
    assert.deepEqual(Array.from(termPositions(words, ['rate', 'limit', 'rule', 'appli'], analyzer)), [1, 2, 3, 4]);
    // Terms the analyzer would not produce: fall back to aligning with the hyphen-split parts.
    assert.deepEqual(Array.from(termPositions(words, ['limit', 'appli'], analyzer)), [2, 4]);
    assert.deepEqual(Array.from(termPositions(words, ['rate', 'limit', 'rule', 'appli'])), [1, 2, 3, 4]);
    // The project's analyzer (src/core/text/tokens.ts) reproduces the worked example's first sentence.
    const expected = [1, 2, 4, 8, 9, 10, 11, 12, 14];
    assert.deepEqual(Array.from(termPositions(worked.words[0]!, worked.terms[0]!, (word) => contentTerms([word], 'en'))), expected);
    assert.deepEqual(Array.from(termPositions(worked.words[0]!, worked.terms[0]!)), expected);
  });

  it('gives 0 to sentences without significant words and handles empty documents', () => {
    assert.equal(luhnRank(analyzedFromTerms([])).scores.length, 0);
    const result = luhnRank(analyzedFromTerms([{ words: ['it', 'is'], terms: [] }, ['solo']]));
    assert.deepEqual(Array.from(result.scores), [0, 0]);
  });
});
