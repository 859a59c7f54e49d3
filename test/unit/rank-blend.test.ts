import assert from 'node:assert/strict';
import * as rank from '../../src/core/rank/blend';
import { BLEND_WEIGHTS, rankBlend, RANKERS, type RankOptions } from '../../src/core/rank/blend';
import { METHODS, rankWith } from '../../src/core/rank/registry';
import { METHOD_INFO, METHOD_NAMES } from '../../src/core/rank/methods';
import { rankBayes } from '../../src/core/rank/trained/model';
import { rankOptionsOf } from '../../src/core/summarize';
import { resolveOptions } from '../../src/core/options/resolve';
import { minMax, rankScale } from '../../src/core/scale';
import type { AnalyzedDocument } from '../../src/core/types';
import { analyzedDocument, analyzedFromTerms } from './helpers/analyzed-fixture';

function deepFreeze<T>(value: T): T {
  if (typeof value === 'object' && value !== null && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const child of Object.values(value)) deepFreeze(child);
  }
  return value;
}

// Invented scenario: a neighbourhood seed library writing up its first season.
const seedLibrary = (): AnalyzedDocument =>
  analyzedDocument({
    title: 'seed library season report',
    titleTerms: ['seed', 'librari', 'season', 'report'],
    sections: [
      { paragraphs: [[['seed', 'librari', 'lent', 'packet', 'season'], ['member', 'return', 'seed', 'harvest']]] },
      {
        heading: 'Lending',
        headingTerms: ['lend'],
        paragraphs: [
          [['packet', 'lent', 'tomato', 'bean', 'seed'], ['bean', 'seed', 'return', 'rate', 'high']],
          [['volunt', 'sort', 'packet', 'weekend']],
        ],
      },
      {
        heading: 'Problems',
        headingTerms: ['problem'],
        paragraphs: [[['damp', 'shelf', 'spoil', 'seed', 'packet'], ['new', 'shelf', 'cost', 'money']], [[]]],
      },
    ],
  });

const NAMES = ['centroid', 'edmundson', 'lexrank', 'luhn', 'position', 'textrank'];

describe('rank: the method registry and the blend', () => {
  it('pins the blend module and its weights', () => {
    assert.deepEqual(Object.keys(rank).sort(), ['BLEND_NORMALIZATION', 'BLEND_WEIGHTS', 'RANKERS', 'rankBlend']);
    assert.deepEqual(Object.keys(RANKERS).sort(), NAMES);
    assert.deepEqual(BLEND_WEIGHTS, { bayes: 1, lexrank: 0.3, centroid: 0.1, textrank: 0, position: 0, title: 0, luhn: 0, edmundson: 0 });
  });

  it('registers every method once, the default first, each described in words with a citation', () => {
    assert.deepEqual(METHOD_NAMES, ['blend', 'position', 'luhn', 'edmundson', 'lexrank', 'textrank', 'centroid', 'maxent', 'bayes']);
    assert.deepEqual(METHODS.map((m) => m.name), [...METHOD_NAMES]);
    for (const info of METHOD_INFO) {
      assert.ok(info.label.length > 0 && info.detail.length > 0 && info.citation.length > 0, info.name);
      // Menus describe what a method does; the published name stays in the detail and the citation.
      if (info.name !== 'blend' && info.name !== 'bayes' && info.name !== 'maxent') assert.doesNotMatch(info.label.toLowerCase(), new RegExp(info.name));
    }
    const doc = seedLibrary();
    for (const name of NAMES) assert.deepEqual(Array.from(rankWith(name as never, doc, {}).scores), Array.from(RANKERS[name as keyof typeof RANKERS](doc).scores), name);
    assert.deepEqual(Array.from(rankWith('bayes', doc, {}).scores), Array.from(rankBayes(doc).scores));
    assert.deepEqual(Array.from(rankWith('blend', doc, {}).scores), Array.from(rankBlend(doc).scores));
  });

  it('every ranker is pure: one finite score per sentence, input untouched, same result twice', () => {
    const doc = deepFreeze(seedLibrary());
    for (const name of NAMES) {
      const ranker = RANKERS[name as keyof typeof RANKERS];
      const first = ranker(doc);
      const second = ranker(doc);
      assert.equal(first.scores.length, 8, name);
      assert.ok(first.scores.every(Number.isFinite), name);
      assert.deepEqual(Array.from(first.scores), Array.from(second.scores), name);
      for (const [feature, values] of Object.entries(first.features ?? {})) assert.equal(values.length, 8, `${name}.${feature}`);
    }
  });

  it('every ranker copes with empty, single-sentence and termless documents', () => {
    const cases: [string, AnalyzedDocument, number][] = [
      ['empty', analyzedFromTerms([]), 0],
      ['single', analyzedFromTerms([['only']]), 1],
      ['termless', analyzedFromTerms([[], [], []]), 3],
      ['unrelated', analyzedFromTerms([['a'], ['b']]), 2],
    ];
    for (const [label, doc, n] of cases) {
      for (const name of NAMES) {
        const result = RANKERS[name as keyof typeof RANKERS](doc);
        assert.equal(result.scores.length, n, `${name} on ${label}`);
        assert.ok(result.scores.every(Number.isFinite), `${name} on ${label}`);
        if (result.converged !== undefined) assert.equal(result.converged, true, `${name} on ${label}`);
      }
      const blended = rankBlend(doc);
      assert.equal(blended.scores.length, n);
      assert.ok(blended.scores.every(Number.isFinite));
    }
  });

  it('blends by default the trained model with LexRank and the centroid', () => {
    const doc = seedLibrary();
    const result = rankBlend(doc);
    assert.deepEqual(Object.keys(result.features!).sort(), ['bayes', 'centroid', 'lexrank']);
    const bayes = minMax(rankBayes(doc).scores);
    const centroid = minMax(RANKERS.centroid(doc).scores);
    const lexrank = minMax(RANKERS.lexrank(doc).scores);
    for (let i = 0; i < 8; i++) {
      const expected = 1 * bayes[i]! + 0.3 * lexrank[i]! + 0.1 * centroid[i]!;
      assert.ok(Math.abs(result.scores[i]! - expected) < 1e-12);
    }
  });

  it('blends normalised component scores with given weights and records each component', () => {
    const doc = seedLibrary();
    const result = rankBlend(doc, { blend: { bayes: 0, centroid: 0.35, lexrank: 0.35, position: 0.2, title: 0.1 } });
    assert.deepEqual(Object.keys(result.features!).sort(), ['centroid', 'lexrank', 'position', 'title']);
    const centroid = minMax(RANKERS.centroid(doc).scores);
    const lexrank = minMax(RANKERS.lexrank(doc).scores);
    const position = minMax(RANKERS.position(doc).scores);
    for (let i = 0; i < 8; i++) {
      assert.equal(result.features!.centroid![i], centroid[i]);
      const expected = 0.35 * centroid[i]! + 0.35 * lexrank[i]! + 0.2 * position[i]! + 0.1 * result.features!.title![i]!;
      assert.ok(Math.abs(result.scores[i]! - expected) < 1e-12);
    }
    assert.equal(result.converged, true);
    // The title feature is the title-word overlap: s0 holds four title terms, s7 none.
    assert.equal(result.features!.title![0], 1);
    assert.equal(result.features!.title![7], 0);
  });

  it('accepts other weights and rank normalisation', () => {
    const doc = seedLibrary();
    const luhnOnly = rankBlend(doc, { blend: { bayes: 0, centroid: 0, lexrank: 0, position: 0, title: 0, luhn: 1 } });
    assert.deepEqual(Object.keys(luhnOnly.features!), ['luhn']);
    assert.deepEqual(Array.from(luhnOnly.scores), Array.from(minMax(RANKERS.luhn(doc).scores)));
    assert.equal(luhnOnly.converged, undefined, 'no iterative component, nothing to report');

    const ranked = rankBlend(doc, { normalization: 'rank', blend: { bayes: 0, centroid: 0, lexrank: 0, title: 0, position: 0.2 } });
    const expected = rankScale(RANKERS.position(doc).scores).map((v) => 0.2 * v);
    assert.deepEqual(Array.from(ranked.scores), Array.from(expected));
  });

  it('accepts the pipeline\u2019s summary options as rank options (preferred phrases pass through)', () => {
    const summaryOptions = resolveOptions({ preferPhrases: ['volunt'] });
    const options: RankOptions = rankOptionsOf(summaryOptions); // the pipeline's conversion (src/core/summarize.ts)
    const { features } = RANKERS.edmundson(seedLibrary(), options);
    // Only s4 ("volunt sort packet weekend") holds the bonus word.
    assert.deepEqual(Array.from(features!.cue!), [0, 0, 0, 0, 1, 0, 0, 0]);
  });

  it('passes ranker options through the blend', () => {
    const doc = seedLibrary();
    const a = rankBlend(doc, { blend: { bayes: 0, centroid: 0, position: 0, title: 0 }, lexrank: { variant: 'continuous' } });
    assert.deepEqual(Array.from(a.features!.lexrank!), Array.from(minMax(RANKERS.lexrank(doc, { lexrank: { variant: 'continuous' } }).scores)));
  });
});
