import assert from 'node:assert/strict';
import { corpusDirectory, documentNumber, halfOf, prepareDocument } from '../../bench/corpus';
import { splitReference } from '../../src/core/evaluate/reference-split';

// Invented design note (a school bicycle shed), used only to exercise the corpus procedure.
const BODY = `
## Motivation

The bicycle shed holds forty bicycles but ninety pupils cycle to school.
Bicycles left outside the shed get wet and are sometimes damaged.
Parents have asked for a second shed near the east gate.

## Design

A second shed of the same size goes beside the east gate.
It opens with the same key as the first shed.
`;
const SUMMARY = 'Build a second bicycle shed near the east gate, because the first shed is full every morning and pupils leave bicycles in the rain.';

describe('benchmark corpus: split by document number', () => {
  const numbers = Array.from({ length: 400 }, (_, i) => i + 1);

  it('is deterministic, disjoint and covers every document', () => {
    const train = numbers.filter((n) => halfOf(n) === 'train');
    const test = numbers.filter((n) => halfOf(n) === 'test');
    assert.equal(train.length + test.length, numbers.length);
    assert.ok(train.every((n) => !test.includes(n)));
    assert.deepEqual(numbers.map(halfOf), numbers.map(halfOf));
    // Even numbers train, odd numbers test (as bench/RESULTS.md states).
    assert.equal(halfOf(42), 'train');
    assert.equal(halfOf(43), 'test');
    assert.ok(Math.abs(train.length - test.length) <= 1);
  });

  it('reads the number from the file name', () => {
    assert.equal(documentNumber('0042-regexps.md'), 42);
    assert.equal(documentNumber('3984-something.md'), 3984);
    assert.equal(documentNumber('README.md'), null);
  });
});

describe('benchmark corpus: the README procedure', () => {
  it('cuts the Summary section out as the reference and keeps the rest as the body', () => {
    const prepared = prepareDocument('0010-shed.md', `# Second shed\n\n## Summary\n\n${SUMMARY}\n${BODY}`);
    assert.ok(!('skipped' in prepared));
    assert.deepEqual(prepared.referenceSentences, [SUMMARY]);
    assert.equal(prepared.referenceWords, 24); // counted by hand
    assert.equal(prepared.half, 'train');
    assert.ok(!prepared.bodyText.includes('first shed is full'));
    assert.ok(prepared.body.sentences.length >= 5);
  });

  it('matches the heading at any level and in any case', () => {
    const split = splitReference(`# Title\n\n#### SUMMARY\n\n${SUMMARY}\n\n# Next\n\nMore text.\n`, 'Summary');
    assert.ok(split);
    assert.equal(split.referenceText.trim(), SUMMARY);
    assert.match(split.bodyText, /# Next/);
  });

  it('skips references under 15 words and bodies under 5 sentences', () => {
    const shortReference = prepareDocument('0011-shed.md', `## Summary\n\nBuild a second shed.\n${BODY}`);
    assert.deepEqual(shortReference, { skipped: 'reference under 15 words' });
    const shortBody = prepareDocument('0013-shed.md', `## Summary\n\n${SUMMARY}\n\n## Motivation\n\nThe shed is full. Pupils complain.\n`);
    assert.deepEqual(shortBody, { skipped: 'body under 5 sentences' });
    assert.deepEqual(prepareDocument('0015-shed.md', BODY), { skipped: 'no Summary section' });
  });

  it('finds the corpus from --corpus, then TERSELY_CORPUS, then the shared folder', () => {
    assert.equal(corpusDirectory(['--corpus', '/data/docs'], {}), '/data/docs');
    assert.equal(corpusDirectory([], { TERSELY_CORPUS: '/env/docs' }), '/env/docs');
    assert.match(corpusDirectory([], {}), /shared\/corpus\/rust-rfcs\/docs$/);
  });
});
