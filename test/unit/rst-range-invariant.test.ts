/**
 * The span invariant for reStructuredText (helpers/span-invariant.ts, as for Markdown): every
 * sentence's span points at source text holding the sentence's words in order; spans lie inside
 * the document, increase and never overlap. Checked on tricky snippets, on the rst demo
 * documents, on a selection, and on every document of the nova-specs corpus
 * (../shared/corpus/nova-specs/docs, 795 specifications), with tables and footnotes read or not.
 */
import assert from 'node:assert/strict';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { parseRestructuredText } from '../../src/core/formats/rst/index';
import { invariantFailures } from './helpers/span-invariant';

const CORPUS = resolve(process.cwd(), '../shared/corpus/nova-specs/docs');
const DEMO = resolve(process.cwd(), 'media/demo');

const SNIPPETS: readonly string[] = [
  '**Bold start.** Then *emphasis* and ``literal \\*x``. Done.',
  'A `link with ``code`` <http://x.y>`_ and |sub|_ then `text`:role: and :role:`text`.',
  'Escapes \\*here\\* and a\\ b and trailing\\\nline. Next one.',
  '\uFEFF=====\nTitle\n=====\n\r\nCRLF text\r\ncontinues. Second\tsentence.\r\n',
  'Emoji \u{1F600} before. \u{1D54F} math letter after. \u{1F680}\u{1F680} end.',
  '- item one\n  continues here. Second.\n\n  - nested *item*. Ok.\n\n1) numbered. x\n2) next',
  'term : class\n   Definition *here*. More.\n\n    Quote text. And more.\n\n    -- Someone',
  '.. note:: Noted **here**.\n   Second line.\n\n.. figure:: a.png\n\n   Caption text. Two.\n',
  '+------+------+\n| a. b | c    |\n+======+======+\n| d e. | f g. |\n+------+------+\n\nAfter table.',
  '=====  =====\nA      B\n=====  =====\nx y.   z w.\n       more.\n=====  =====\n\nAfter the table.',
  'Footnote [1]_ ref. Cite [CIT]_.\n\n.. [1] Body *one*. Two.\n.. [CIT] Citation.\n',
  'Tabs\tin\ttext.\n\n\tindented with a tab. Quote.\n',
];

describe('rst: range invariant', () => {
  SNIPPETS.forEach((text, n) => {
    it(`snippet ${n + 1} keeps the invariant, with tables and footnotes read or not`, () => {
      for (const includeTables of [false, true]) {
        for (const includeFootnotes of [false, true]) {
          const doc = parseRestructuredText(text, { baseOffset: 0, includeTables, includeFootnotes });
          assert.ok(doc.sentences.length > 0, 'expected sentences');
          assert.deepEqual(invariantFailures(doc), []);
        }
      }
    });
  });

  describe('demo documents (media/demo)', () => {
    const files = existsSync(DEMO) ? readdirSync(DEMO).filter((f) => /\.(rst|rest)$/.test(f)).sort() : [];
    if (files.length === 0) it.skip('no rst demo documents found in media/demo');
    for (const file of files) {
      it(`${file} keeps the invariant`, () => {
        const doc = parseRestructuredText(readFileSync(join(DEMO, file), 'utf8'), { baseOffset: 0, includeTables: false });
        assert.ok(doc.sentences.length > 0, 'expected sentences');
        assert.deepEqual(invariantFailures(doc), []);
      });
    }
  });

  it('keeps the invariant on every nova-specs document, and for a selection of one', function () {
    // 795 documents, parsed three ways: a limit for a busy machine, not a speed check.
    this.timeout(600_000);
    if (!existsSync(CORPUS)) {
      console.log(`    nova-specs corpus not found at ${CORPUS}; corpus invariant NOT RUN`);
      this.skip();
    }
    const files = readdirSync(CORPUS).filter((f) => f.endsWith('.rst')).sort();
    let sentences = 0;
    const failures: string[] = [];
    for (const file of files) {
      const text = readFileSync(join(CORPUS, file), 'utf8');
      for (const [includeTables, includeFootnotes] of [[false, false], [true, true]] as const) {
        const doc = parseRestructuredText(text, { baseOffset: 0, includeTables, includeFootnotes });
        if (!includeTables) sentences += doc.sentences.length;
        for (const failure of invariantFailures(doc)) failures.push(`${file} (tables ${includeTables}): ${failure}`);
      }
      // A selection: the middle third, parsed on its own with its offset.
      const start = Math.floor(text.length / 3);
      const selection = text.slice(start, Math.floor((2 * text.length) / 3));
      const part = parseRestructuredText(selection, { baseOffset: start, includeTables: false });
      for (const failure of invariantFailures(part)) failures.push(`${file} (selection): ${failure}`);
      // Spans index the whole document.
      for (const s of part.sentences) {
        if (text.slice(s.span.start, s.span.end) !== selection.slice(s.span.start - start, s.span.end - start)) failures.push(`${file} (selection): sentence ${s.index} off its place`);
      }
    }
    console.log(`    nova-specs: ${files.length} documents, ${sentences} sentences, ${failures.length} failures`);
    assert.ok(files.length > 0, 'expected corpus documents');
    assert.deepEqual(failures.slice(0, 20), []);
  });
});
