/**
 * Shrunk failing cases from the property tests, kept as fixed tests (test/fixtures/regressions).
 * Each fixture names the property that found it, the problem and where it was fixed; it must keep
 * every summary property, and, when it lists `expectSentences`, parse into exactly those sentences.
 */
import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { summarize, type SummarizeRequest } from '../../src/core/summarize';
import { inOrder } from './helpers/span-invariant';
import { summaryFailures } from './helpers/summary-properties';

interface RegressionFixture {
  readonly found: string;
  readonly problem: string;
  readonly fixedIn: string;
  readonly format: 'markdown' | 'plaintext';
  readonly text: string;
  readonly request: SummarizeRequest;
  readonly expectSentences?: readonly string[];
}

const DIR = join(process.cwd(), 'test', 'fixtures', 'regressions');
const fixtures = readdirSync(DIR)
  .filter((name) => name.endsWith('.json'))
  .sort()
  .map((name) => ({ name, fixture: JSON.parse(readFileSync(join(DIR, name), 'utf8')) as RegressionFixture }));

describe('property regressions (test/fixtures/regressions)', () => {
  it('has fixtures', () => assert.ok(fixtures.length > 0));

  for (const { name, fixture } of fixtures) {
    it(`${name}: ${fixture.problem.slice(0, 70)}…`, () => {
      const request: SummarizeRequest = { ...fixture.request, format: fixture.format };
      const summary = summarize(fixture.text, request);
      const unrepaired = () => summarize(fixture.text, { ...request, repair: 'suggest' });
      assert.deepEqual(summaryFailures(summary, fixture.text, request, unrepaired), []);
      if (fixture.expectSentences) assert.deepEqual(summary.document.sentences.map((s) => s.text), fixture.expectSentences);
    });
  }

  it('the word matcher finds an order that first fit misses (image-path-digits)', () => {
    // "42" must not be built from the "4" and "2" of image paths when the real "42" follows.
    assert.equal(inOrder(['42', 'night'], ['4', 'png', '42', 'night', '2']), true);
    assert.equal(inOrder(['night', '42'], ['42', 'night']), false);
    // A word joined across dropped markup still matches (`Attr`s → "Attrs").
    assert.equal(inOrder(['Attrs', 'here'], ['Attr', 's', 'here']), true);
  });
});
