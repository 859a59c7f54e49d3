import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { analyze } from '../../src/core/analyze';
import { parseDocument } from '../../src/core/formats/registry';
import { rankMaxent } from '../../src/core/rank/trained/maxent-model';
import { rankBayes } from '../../src/core/rank/trained/model';
import type { RankResult } from '../../src/core/types';

const mean = (values: ArrayLike<number>) => Array.from(values).reduce((x, y) => x + y, 0) / values.length;

describe('rank: trained models explain a sentence against the document\'s average sentence', () => {
  const text = readFileSync(new URL('../../media/demo/bike-share-rebalancing.md', import.meta.url), 'utf8');
  const a = analyze(parseDocument(text, { format: 'markdown' }), 'en');

  for (const [name, rank] of [['maxent', rankMaxent], ['bayes', rankBayes]] as const) {
    it(`${name}: every feature's shares average 0, and a sentence's shares add up to its score minus the mean score (Lundberg & Lee 2017, linear models; from memory)`, () => {
      const ranked: RankResult = rank(a);
      const columns = Object.values(ranked.features!);
      assert.ok(columns.length > 5);
      for (const column of columns) assert.ok(Math.abs(mean(column)) < 1e-9);
      const average = mean(ranked.scores);
      for (let i = 0; i < ranked.scores.length; i++) {
        const shares = columns.reduce((sum, column) => sum + column[i]!, 0);
        assert.ok(Math.abs(shares - (ranked.scores[i]! - average)) < 1e-9, `sentence ${i}`);
      }
    });
  }
});
