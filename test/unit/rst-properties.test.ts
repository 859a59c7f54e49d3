/**
 * Property tests of the reStructuredText reader over generated documents whose prose is known
 * (helpers/rst-arbitraries.ts): the sentences hold exactly the words of the prose blocks, in
 * order, and none from literal blocks, comments, code, tables, fields or targets; spans keep the
 * invariant (helpers/span-invariant.ts) for any options, line endings, byte order mark and base
 * offset; raw markup noise never breaks the reader; and whole summaries of rst documents keep the
 * summary properties (helpers/summary-properties.ts).
 *
 * Case count and seed: propertyRuns() and the fixed seed of helpers/arbitraries.ts
 * (TERSELY_PROPERTY_RUNS, TERSELY_PROPERTY_SEED).
 */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { parseRestructuredText } from '../../src/core/formats/rst/index';
import { summarize, type SummarizeRequest } from '../../src/core/summarize';
import { deepFreeze, propertyRuns, requestOptions } from './helpers/arbitraries';
import { rstDocument, rstNoise } from './helpers/rst-arbitraries';
import { invariantFailures, words } from './helpers/span-invariant';
import { summaryFailures } from './helpers/summary-properties';

const parseOptions = fc.record({
  baseOffset: fc.oneof(fc.constant(0), fc.integer({ min: 1, max: 100_000 })),
  includeTables: fc.boolean(),
  includeFootnotes: fc.boolean(),
});

describe('property: reStructuredText reader', function () {
  // A limit for a slow shared machine, not a speed check.
  this.timeout(0);

  it('reads exactly the words of the prose blocks, in order', () => {
    fc.assert(
      fc.property(rstDocument, (doc) => {
        const parsed = parseRestructuredText(doc.source, { baseOffset: 0, includeTables: false });
        assert.deepEqual(parsed.sentences.flatMap((s) => words(s.text)), words(doc.prose));
      }),
      { numRuns: propertyRuns() },
    );
  });

  it('keeps the span invariant for generated documents and raw markup noise, with any options', () => {
    fc.assert(
      fc.property(fc.oneof(rstDocument.map((d) => d.source), rstNoise), parseOptions, (text, options) => {
        const parsed = parseRestructuredText(text, options);
        assert.equal(parsed.text, text);
        assert.deepEqual(invariantFailures(parsed), []);
      }),
      { numRuns: propertyRuns() },
    );
  });

  it('keeps the summary properties for rst documents', () => {
    fc.assert(
      fc.property(rstDocument, requestOptions, (doc, options) => {
        const request = deepFreeze({ ...options, format: 'restructuredtext' } as SummarizeRequest);
        const summary = summarize(doc.source, request);
        assert.deepEqual(summaryFailures(summary, doc.source, request, () => summarize(doc.source, { ...request, repair: 'suggest' })), []);
      }),
      { numRuns: Math.ceil(propertyRuns() / 10) },
    );
  });
});
