/**
 * Property: summarizing a selection (the selected substring plus its start offset) gives spans
 * inside the selection, in whole-document coordinates, that keep every summary property; and the
 * offset only shifts spans: the same selection at offset 0 gives the same sentences, each span
 * moved by exactly the offset.
 *
 * Case count: propertyRuns() (TERSELY_PROPERTY_RUNS, else DEFAULT_PROPERTY_RUNS in helpers/arbitraries.ts).
 */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { summarize } from '../../src/core/summarize';
import type { Summary } from '../../src/core/types';
import { anyDocument, propertyRuns, requestOptions } from './helpers/arbitraries';
import { splitsSurrogatePair, summaryFailures } from './helpers/summary-properties';

/** A selection as an editor makes one: never between the halves of a surrogate pair. */
function selectionBounds(text: string, a: number, b: number): [number, number] {
  let start = Math.min(a, b) % (text.length + 1);
  let end = Math.max(start, Math.max(a, b) % (text.length + 1));
  if (splitsSurrogatePair(text, start)) start--;
  if (splitsSurrogatePair(text, end)) end++;
  return [start, end];
}

const spans = (summary: Summary, shift: number) =>
  summary.document.sentences.map((s) => ({ text: s.text, start: s.span.start + shift, end: s.span.end + shift }));

describe('property: selections', function () {
  this.timeout(0);

  it('keeps spans inside the selection, in whole-document coordinates', () => {
    fc.assert(
      fc.property(anyDocument, fc.nat(), fc.nat(), requestOptions, (doc, a, b, options) => {
        const [start, end] = selectionBounds(doc.text, a, b);
        const selected = doc.text.slice(start, end);
        const request = { ...options, format: doc.format, baseOffset: start };
        const summary = summarize(selected, request);

        assert.equal(summary.document.baseOffset, start);
        assert.deepEqual(summaryFailures(summary, selected, request, () => summarize(selected, { ...request, repair: 'suggest' })), []);
        for (const s of [...summary.document.sentences, ...summary.sentences]) {
          assert.ok(start <= s.span.start && s.span.end <= end, `span ${s.span.start}-${s.span.end} outside the selection ${start}-${end}`);
        }
        for (const s of summary.sentences) {
          assert.equal(doc.text.slice(s.span.start, s.span.end), selected.slice(s.span.start - start, s.span.end - start));
        }
        // The offset only moves spans.
        const atZero = summarize(selected, { ...request, baseOffset: 0 });
        assert.deepEqual(spans(atZero, start), spans(summary, 0));
        assert.deepEqual(atZero.sentences.map((s) => s.sentence), summary.sentences.map((s) => s.sentence));
      }),
      { numRuns: propertyRuns() },
    );
  });
});
