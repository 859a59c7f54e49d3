/**
 * The selector's rules: MMR as published (Carbonell & Goldstein 1998: pick argmax over the rest of
 * λ·Sim1(D, Q) − (1 − λ)·max over picks of Sim2(D, D')), fragments never filling a seat, the
 * quality floor with the sections it leaves out, the run limit and no text twice; and the engine
 * end to end on the pull-request demo (boilerplate never picked, left-out sections reported).
 */
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { selectSentences, type SelectionInput } from '../../src/core/select/select';
import { summarize } from '../../src/core/summarize';
import { buildTermIndex, inverseFrequency, tfidfVectors } from '../../src/core/vectors';
import { barredKind } from '../../src/core/select/sentence-kinds';
import { DEMO_DIR } from './helpers/corpus';

function input(scores: number[], terms: string[][], overrides: Partial<SelectionInput> = {}): SelectionInput {
  const index = buildTermIndex(terms);
  return {
    relevance: Float64Array.from(scores),
    wordCounts: scores.map(() => 10),
    vectors: tfidfVectors(index, inverseFrequency(index, 'sentence')),
    vocabularySize: index.vocabulary.size,
    unitOf: new Int32Array(scores.length),
    unitWeights: new Map([[0, 1]]),
    budget: { unit: 'sentences', value: 2 },
    minSentences: 0,
    minPerSection: 1,
    balance: false,
    mmrLambda: 0.7,
    ...overrides,
  };
}

describe('selection: MMR (Carbonell & Goldstein 1998)', () => {
  // Sentence 1 repeats sentence 0's terms (cosine 1); sentence 2 shares none (cosine 0).
  const terms = [['ferry', 'pier'], ['ferry', 'pier'], ['dock', 'crew']];
  const scores = [1, 0.95, 0.5];

  it('λ = 0.7: the near-duplicate still wins (0.7·0.95 − 0.3·1 = 0.365 > 0.7·0.5 = 0.35)', () => {
    assert.deepEqual(selectSentences(input(scores, terms)).picked, [0, 1]);
  });

  it('λ = 0.5: novelty wins (0.5·0.95 − 0.5·1 = −0.025 < 0.5·0.5 = 0.25)', () => {
    assert.deepEqual(selectSentences(input(scores, terms, { mmrLambda: 0.5 })).picked, [0, 2]);
  });

  it('λ = 1 is plain relevance order', () => {
    assert.deepEqual(selectSentences(input(scores, terms, { mmrLambda: 1 })).picked, [0, 1]);
  });
});

describe('selection: rules beyond MMR', () => {
  const spread = [['a1'], ['a2'], ['a3'], ['b1'], ['b2'], ['c1']];

  it('a fragment never takes a section’s seat; a section of fragments only is left out and says so', () => {
    const unitOf = Int32Array.from([1, 1, 1, 2, 2, 3]);
    const fragment = Uint8Array.from([0, 0, 0, 0, 0, 1]);
    const result = selectSentences(
      input([0.9, 0.8, 0.7, 0.6, 0.5, 0.95], spread, { unitOf, unitWeights: new Map([[1, 3], [2, 2], [3, 1]]), balance: true, budget: { unit: 'sentences', value: 4 }, fragment, fragmentFloor: 0.99, qualityFloor: 0 }),
    );
    assert.ok(!result.picked.includes(5), JSON.stringify(result.picked));
    assert.equal(result.leftOut.get(3), 'onlyFragments');
    assert.equal(result.picked.length, 4);
  });

  it('a section whose best sentence is below the floor gets no seat and no sentence (no filler)', () => {
    const unitOf = Int32Array.from([1, 1, 1, 2, 2, 3]);
    const result = selectSentences(
      input([0.9, 0.8, 0.7, 0.6, 0.5, 0.05], spread, { unitOf, unitWeights: new Map([[1, 3], [2, 2], [3, 1]]), balance: true, budget: { unit: 'sentences', value: 5 }, qualityFloor: 0.2, qualityRank: 3 }),
    );
    assert.equal(result.leftOut.get(3), 'belowQualityFloor');
    assert.ok(!result.picked.includes(5));
    assert.equal(result.quotas.get(3), undefined);
    // Without the floor, the old rule gives the weak section its seat.
    const forced = selectSentences(input([0.9, 0.8, 0.7, 0.6, 0.5, 0.05], spread, { unitOf, unitWeights: new Map([[1, 3], [2, 2], [3, 1]]), balance: true, budget: { unit: 'sentences', value: 5 } }));
    assert.ok(forced.picked.includes(5));
  });

  it('takes at most two consecutive sentences of one paragraph', () => {
    const terms = [['a'], ['b'], ['c'], ['d'], ['e']];
    const paragraphOf = Int32Array.from([0, 0, 0, 0, 1]);
    const result = selectSentences(input([0.9, 0.89, 0.88, 0.87, 0.1], terms, { budget: { unit: 'sentences', value: 4 }, paragraphOf, maxRun: 2 }));
    assert.deepEqual(result.picked, [0, 1, 3, 4]);
    const unlimited = selectSentences(input([0.9, 0.89, 0.88, 0.87, 0.1], terms, { budget: { unit: 'sentences', value: 4 }, paragraphOf, maxRun: Infinity }));
    assert.deepEqual(unlimited.picked, [0, 1, 2, 3]);
  });

  it('never picks the same text twice', () => {
    const terms = [['ferry'], ['ferry'], ['dock']];
    const result = selectSentences(input([0.9, 0.9, 0.2], terms, { mmrLambda: 1, textKey: Int32Array.from([7, 7, 8]) }));
    assert.deepEqual(result.picked, [0, 2]);
  });
});

describe('selection end to end: the pull-request demo', () => {
  const text = readFileSync(join(DEMO_DIR, 'pull-request.md'), 'utf8');

  it('never picks its issue-closing line, at any length', () => {
    for (const budget of ['tldr', 'minute', 'detailed', 'auto', '100%']) {
      const summary = summarize(text, { budget });
      for (const pick of summary.sentences) assert.equal(barredKind(pick.text, pick.text.split(/\s+/).length), null, `${budget}: ${pick.text}`);
      assert.ok(summary.barred!.some((b) => /Closes #812/.test(summary.document.sentences[b.sentence]!.text)));
    }
  });

  it('never picks a sentence twice even when the source repeats it', () => {
    const doubled = `${text}\n\n## Again\n\n${text.split('\n').slice(4, 12).join('\n')}\n`;
    const summary = summarize(doubled, { budget: '100%' });
    const texts = summary.sentences.map((s) => s.text.trim().toLowerCase());
    assert.equal(new Set(texts).size, texts.length);
  });

  it('reports sections covered and those left out, with a reason', () => {
    const summary = summarize('# Plan\n\n## Route\n\nThe night ferry leaves the north pier at nine and returns at midnight with the crew.\nRiders can bring bikes on every crossing of the night ferry from the north pier.\n\n## Open questions\n\nNone.\n\nTBD\n', { budget: 'detailed' });
    assert.equal(summary.stats.sectionsCovered, 1);
    assert.deepEqual(summary.leftOut!.map((l) => [l.heading, l.reason]), [['Open questions', 'onlyBarred']]);
  });
});
