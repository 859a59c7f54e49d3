/**
 * The lazy selector (lazy-pool.ts) against a full-scan selector: the selector as it was before
 * (test/unit/helpers/eager-select.ts, a verbatim copy of the scan that rescanned every candidate
 * for every pick). Same inputs must give the same picks, on real design documents
 * (../shared/corpus/rust-rfcs) and at several budgets, with and without balance.
 */
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { prepareDocument, rankPrepared } from '../../src/core/summarize';
import { sentenceFitness, summaryRelevance } from '../../src/core/select/fitness';
import { LazyPool } from '../../src/core/select/lazy-pool';
import { selectSentences, type SelectionInput } from '../../src/core/select/select';
import { candidateUnits } from '../../src/core/select/units';
import type { Budget } from '../../src/core/types';
import { sentenceVectorsOf, termIndexOf } from '../../src/core/vectors';
import { corpusFiles } from './helpers/corpus';
import { selectSentences as eagerSelect } from './helpers/eager-select';

function inputsOf(text: string): Omit<SelectionInput, 'budget' | 'balance'> {
  const preparation = prepareDocument(text);
  assert.ok(preparation.ok);
  const { prepared } = preparation;
  const { analyzed, options } = prepared;
  const wordCounts = analyzed.words.map((w) => w.length);
  const { unitOf, unitWeights } = candidateUnits(analyzed.doc, wordCounts, options);
  const candidates = [...unitOf.keys()].filter((i) => unitOf[i]! >= 0);
  return {
    relevance: summaryRelevance(rankPrepared(prepared).scores, sentenceFitness(analyzed), candidates),
    wordCounts,
    vectors: sentenceVectorsOf(analyzed),
    vocabularySize: termIndexOf(analyzed).vocabulary.size,
    unitOf,
    unitWeights,
    minSentences: options.minSentences,
    minPerSection: options.minPerSection,
    mmrLambda: options.mmrLambda,
  };
}

const BUDGETS: readonly Budget[] = [
  { unit: 'ratio', value: 0.15 },
  { unit: 'words', value: 60 },
  { unit: 'sentences', value: 3 },
  { unit: 'sentences', value: 25 },
];

describe('lazy MMR selection', () => {
  const files = corpusFiles();
  before(function () {
    if (files.length === 0) this.skip();
  });

  it('picks exactly what the full-scan selector picks on 40 corpus documents (rust-rfcs)', () => {
    // Every 16th document of the corpus, in name order: a fixed, spread sample.
    const sample = files.filter((_, k) => k % 16 === 0).slice(0, 40);
    assert.ok(sample.length >= 30);
    let compared = 0;
    for (const file of sample) {
      const base = inputsOf(readFileSync(file, 'utf8'));
      for (const budget of BUDGETS) {
        for (const balance of [true, false]) {
          const input = { ...base, budget, balance };
          const lazy = selectSentences(input);
          const eager = eagerSelect(input);
          assert.deepEqual(lazy.picked, eager.picked, `${file} ${JSON.stringify(budget)} balance=${balance}`);
          assert.deepEqual([...lazy.quotas], [...eager.quotas]);
          compared++;
        }
      }
    }
    assert.equal(compared, sample.length * BUDGETS.length * 2);
  });
});

describe('LazyPool', () => {
  it('returns members best first, ties to the lower index, re-evaluating stale values', () => {
    const values = [0.5, 0.9, 0.9, 0.1];
    const versions = [0, 0, 0, 0];
    const pool = new LazyPool([0, 1, 2, 3], { value: (i) => values[i]!, version: (i) => versions[i]!, usable: () => true });
    assert.equal(pool.takeBest(), 1);
    // Sentence 2's value falls below sentence 0's: the stale 0.9 must not win.
    values[2] = 0.2;
    versions[2] = 1;
    assert.equal(pool.takeBest(), 0);
    assert.equal(pool.takeBest(), 2);
    assert.equal(pool.takeBest(), 3);
    assert.equal(pool.takeBest(), -1);
  });

  it('drops members that are no longer usable', () => {
    const pool = new LazyPool([0, 1, 2], { value: (i) => 3 - i, version: () => 0, usable: (i) => i !== 0 });
    assert.equal(pool.takeBest(), 1);
    assert.equal(pool.takeBest(), 2);
    assert.equal(pool.takeBest(), -1);
  });
});
