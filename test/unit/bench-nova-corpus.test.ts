/**
 * The reStructuredText benchmark corpus (bench/nova-corpus.ts): the split into halves, the
 * introduction/body split of the corpus README, the skip rules — on a small invented spec, and on
 * the real corpus against the README's own figures ("704 of the 795 files have an introduction
 * of 15 words or more (median 38 words)", ../shared/corpus/nova-specs/README.md).
 */
import assert from 'node:assert/strict';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { nameHash, novaCorpusDirectory, novaHalfOf, prepareNovaDocument, splitIntroduction } from '../../bench/nova-corpus';
import { parseRestructuredText } from '../../src/core/formats/rst/index';

const readRst = (text: string) => parseRestructuredText(text, { baseOffset: 0, includeTables: false });

// Invented spec (a school bicycle shed), used only to exercise the corpus procedure.
const INTRODUCTION =
  'Build a second bicycle shed near the east gate, because the first shed is full every morning and pupils leave bicycles in the rain.';
const SPEC = `..
 This work is licensed under a Creative Commons Attribution 3.0 Unported
 License.

================
Second shed
================

https://blueprints.example/school/+spec/second-shed

${INTRODUCTION}

Problem description
===================

The bicycle shed holds forty bicycles but ninety pupils cycle to school.
Bicycles left outside the shed get wet and are sometimes damaged.

Use Cases
---------

Parents have asked for a second shed near the east gate.

Proposed change
===============

A second shed of the same size goes beside the east gate.
It opens with the same key as the first shed.
`;

const CORPUS = resolve(process.cwd(), '../shared/corpus/nova-specs/docs');

describe('nova corpus: split by a hash of the file name', () => {
  const names = Array.from({ length: 400 }, (_, i) => `release--approved--spec-${i}.rst`);

  it('is deterministic, disjoint, covers every document and is about even', () => {
    const train = names.filter((n) => novaHalfOf(n) === 'train');
    const test = names.filter((n) => novaHalfOf(n) === 'test');
    assert.equal(train.length + test.length, names.length);
    assert.ok(train.every((n) => !test.includes(n)));
    assert.deepEqual(names.map(novaHalfOf), names.map(novaHalfOf));
    assert.ok(Math.abs(train.length - test.length) < 60, `${train.length} / ${test.length}`);
  });

  it('uses FNV-1a: reference values of the 32-bit hash (common practice, from memory)', () => {
    assert.equal(nameHash(''), 0x811c9dc5);
    assert.equal(nameHash('a'), 0xe40c292c);
    assert.equal(nameHash('foobar'), 0xbf9cf968);
  });

  it('finds the corpus from a flag, the environment, or the shared folder', () => {
    assert.equal(novaCorpusDirectory(['--nova-corpus', '/tmp/specs'], {}), '/tmp/specs');
    assert.equal(novaCorpusDirectory([], { TERSELY_NOVA_CORPUS: '/tmp/env' }), '/tmp/env');
    assert.match(novaCorpusDirectory([], {}), /shared\/corpus\/nova-specs\/docs$/);
  });
});

describe('nova corpus: the README procedure', () => {
  it('takes the introduction as the reference, without the blueprint URL line', () => {
    const prepared = prepareNovaDocument('shed.rst', SPEC);
    assert.ok(!('skipped' in prepared), JSON.stringify(prepared));
    assert.deepEqual(prepared.referenceSentences, [INTRODUCTION]);
    assert.equal(prepared.referenceWords, 24); // counted by hand
  });

  it('keeps the title and everything from the first section on as the body', () => {
    const split = splitIntroduction(SPEC)!;
    assert.ok(!split.bodyText.includes('first shed is full'));
    assert.ok(!split.bodyText.includes('blueprints.example'));
    const body = readRst(split.bodyText);
    assert.equal(body.title, 'Second shed');
    assert.deepEqual(body.sections.filter((s) => s.depth > 0).map((s) => s.heading), ['Second shed', 'Problem description', 'Use Cases', 'Proposed change']);
    assert.equal(body.sentences[0]!.text, 'The bicycle shed holds forty bicycles but ninety pupils cycle to school.');
  });

  it('takes the text before the first heading when there is no title block', () => {
    const split = splitIntroduction(`${INTRODUCTION}\n\nProblem\n=======\n\nText.\n\nMore\n====\n\nText.\n`)!;
    assert.equal(split.referenceText.trim(), INTRODUCTION);
    assert.match(split.bodyText, /^\n\nProblem\n=======/);
  });

  it('skips references under 15 words and bodies under 5 sentences', () => {
    assert.deepEqual(prepareNovaDocument('a.rst', SPEC.replace(INTRODUCTION, 'A short introduction.')), { skipped: 'reference under 15 words' });
    const shortBody = SPEC.slice(0, SPEC.indexOf('Use Cases'));
    assert.deepEqual(prepareNovaDocument('b.rst', shortBody), { skipped: 'body under 5 sentences' });
    assert.deepEqual(prepareNovaDocument('c.rst', `${INTRODUCTION}\n`), { skipped: 'no section heading after the introduction' });
  });

  it("reproduces the corpus README's figures: 704 of 795 introductions of 15 words or more, median 38", function () {
    if (!existsSync(CORPUS)) {
      console.log(`    nova-specs corpus not found at ${CORPUS}; skipping`);
      this.skip();
    }
    const files = readdirSync(CORPUS).filter((f) => f.endsWith('.rst')).sort();
    // The README counts words as whitespace-separated tokens of the introduction's prose.
    const counts = files.map((file) => {
      const split = splitIntroduction(readFileSync(join(CORPUS, file), 'utf8'));
      const doc = readRst(split?.referenceText ?? '');
      return doc.sentences.reduce((sum, s) => sum + s.text.split(/\s+/).filter(Boolean).length, 0);
    });
    const sorted = [...counts].sort((a, b) => a - b);
    console.log(`    nova-specs: ${counts.filter((c) => c >= 15).length} of ${files.length} introductions of 15+ words, median ${sorted[Math.floor(sorted.length / 2)]}`);
    assert.equal(files.length, 795);
    assert.equal(counts.filter((c) => c >= 15).length, 704);
    assert.equal(sorted[Math.floor(sorted.length / 2)], 38);
  });
});
