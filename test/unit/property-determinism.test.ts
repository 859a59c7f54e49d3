/**
 * Property: the same input gives the same output. The second run gets an equal string built
 * afresh and follows a summary of a different (short) document, so neither string identity nor
 * state left behind by an earlier call (caches, memoized models) can change the result.
 *
 * Case count: propertyRuns() (TERSELY_PROPERTY_RUNS, else DEFAULT_PROPERTY_RUNS in helpers/arbitraries.ts).
 */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { summarize } from '../../src/core/summarize';
import { anyDocument, propertyRuns, requestOptions, sentenceText } from './helpers/arbitraries';

/** A few sentences: enough to touch every cache (stems, language, models), cheap to summarize. */
const shortDocument = fc
  .tuple(fc.array(sentenceText, { minLength: 1, maxLength: 6 }), fc.constantFrom('markdown' as const, 'plaintext' as const))
  .map(([sentences, format]) => ({ text: sentences.join(' '), format }));

/** An equal string that is not the same string object (a rope flattened from pieces). */
const rebuilt = (text: string): string => [...text].join('');

describe('property: determinism', function () {
  this.timeout(0);

  it('summarizes equal inputs to deep-equal summaries, whatever ran in between', () => {
    fc.assert(
      fc.property(anyDocument, shortDocument, requestOptions, (doc, other, options) => {
        const request = { ...options, format: doc.format };
        const first = summarize(doc.text, request);
        summarize(other.text, { ...options, format: other.format });
        const second = summarize(rebuilt(doc.text), { ...request });
        assert.deepStrictEqual(second, first);
      }),
      { numRuns: propertyRuns() },
    );
  });
});
