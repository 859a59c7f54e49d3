/**
 * Property tests of the whole pipeline over generated Markdown, plain text and raw strings: for
 * every case, summarize() does not throw, and its summary keeps the span invariant (inside the
 * document, in order, no overlap, the sentence's words in the source slice, no split surrogate
 * pair), respects the budget, has no duplicates, is in document order, and hands the document
 * text back unchanged — with a deep-frozen request, so the engine writes to nothing it is given.
 *
 * Case count: propertyRuns() (TERSELY_PROPERTY_RUNS, else DEFAULT_PROPERTY_RUNS in helpers/arbitraries.ts);
 * one case checks every property above.
 */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { summarize, type SummarizeRequest } from '../../src/core/summarize';
import { anyDocument, deepFreeze, markdownDocument, propertyRuns, requestOptions } from './helpers/arbitraries';
import { summaryFailures } from './helpers/summary-properties';

function check(text: string, request: SummarizeRequest): void {
  const frozen = deepFreeze({ ...request });
  const summary = summarize(text, frozen);
  assert.deepEqual(summaryFailures(summary, text, frozen, () => summarize(text, { ...frozen, repair: 'suggest' })), []);
}

describe('property: summaries of generated documents', function () {
  // A limit for a slow shared machine, not a speed check.
  this.timeout(0);

  it('keeps spans, budget, order and the input intact for any document and options', () => {
    fc.assert(
      fc.property(anyDocument, requestOptions, (doc, options) => check(doc.text, { ...options, format: doc.format })),
      { numRuns: propertyRuns() },
    );
  });

  it('keeps them for Markdown with the default options', () => {
    fc.assert(
      fc.property(markdownDocument, (text) => check(text, { format: 'markdown' })),
      { numRuns: Math.ceil(propertyRuns() / 10) },
    );
  });
});
