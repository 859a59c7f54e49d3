import assert from 'node:assert/strict';
import { parseDocument } from '../../src/core/formats/registry';
import type { ParsedDocument } from '../../src/core/types';

const plain = (text: string, baseOffset = 0): ParsedDocument => parseDocument(text, { format: 'plaintext', baseOffset });
const texts = (doc: ParsedDocument): string[] => doc.sentences.map((s) => s.text);
const sourceOf = (doc: ParsedDocument): string[] =>
  doc.sentences.map((s) => doc.text.slice(s.span.start - doc.baseOffset, s.span.end - doc.baseOffset));
const headings = (doc: ParsedDocument): [string, number, number | null][] =>
  doc.sections.slice(1).map((s) => [s.heading, s.depth, s.parent]);

describe('parse: plain text', () => {
  it('splits paragraphs at blank lines and joins wrapped lines with a space', () => {
    const text = 'The first paragraph\nwraps onto a second line.\n\nThe second paragraph.\n';
    const doc = plain(text);
    assert.deepEqual(texts(doc), ['The first paragraph wraps onto a second line.', 'The second paragraph.']);
    assert.deepEqual(sourceOf(doc), ['The first paragraph\nwraps onto a second line.', 'The second paragraph.']);
    assert.equal(doc.paragraphs.length, 2);
  });

  describe('headings', () => {
    it('reads underlined headings; depths follow the order styles first appear (reStructuredText rule)', () => {
      // Source: reStructuredText Markup Specification, "Sections": the level of an adornment style
      // is fixed by the order in which the styles are first encountered.
      const text = 'Field Notes\n===========\n\nIntro line.\n\nGround Work\n-----------\n\nDug a trench.\n\nLater Work\n----------\n\nFilled it.\n';
      const doc = plain(text);
      assert.equal(doc.title, 'Field Notes');
      assert.deepEqual(headings(doc), [
        ['Field Notes', 1, 0],
        ['Ground Work', 2, 1],
        ['Later Work', 2, 1],
      ]);
      assert.equal(text.slice(doc.sections[2]!.headingSpan!.start, doc.sections[2]!.headingSpan!.end), 'Ground Work\n-----------');
      assert.deepEqual(doc.sentences.map((s) => s.section), [1, 2, 3]);
    });

    it('reads overlined-and-underlined titles as their own style', () => {
      const doc = plain('=======\n Title\n=======\n\nSub\n===\n\nText here.\n');
      assert.deepEqual(headings(doc), [
        ['Title', 1, 0],
        ['Sub', 2, 1],
      ]);
      assert.equal(doc.title, 'Title');
    });

    it('reads numbered headings and nests 2.1 under 2.', () => {
      const text = '1. Scope\n\nWhat we covered.\n\n2. Design\n\nHow it works.\n\n2.1 Storage\nData sits on disk.\n\n3. Results\n\nIt held up.\n';
      const doc = plain(text);
      assert.deepEqual(headings(doc), [
        ['1. Scope', 1, 0],
        ['2. Design', 1, 0],
        ['2.1 Storage', 2, 2],
        ['3. Results', 1, 0],
      ]);
      assert.deepEqual(texts(doc), ['What we covered.', 'How it works.', 'Data sits on disk.', 'It held up.']);
    });

    it('does not take a numbered sentence or a list item for a heading', () => {
      const doc = plain('3. We measured the flow twice.\n\n1. First step\n2. Second step\n');
      assert.equal(doc.sections.length, 1);
      assert.deepEqual(doc.paragraphs.map((p) => p.kind), ['listItem', 'listItem', 'listItem']);
    });

    it('reads short ALL-CAPS lines as headings, but not long or punctuated ones', () => {
      const doc = plain('SUMMARY\n\nThe pumps ran.\n\nTHIS LINE IS SHOUTED AND ENDS WITH A PERIOD.\n\nRESULTS\nFlow doubled.\n');
      assert.deepEqual(headings(doc), [
        ['SUMMARY', 1, 0],
        ['RESULTS', 1, 0],
      ]);
      assert.deepEqual(texts(doc), ['The pumps ran.', 'THIS LINE IS SHOUTED AND ENDS WITH A PERIOD.', 'Flow doubled.']);
    });
  });

  describe('lists', () => {
    it('starts a list item at each marker line, with depth from indentation and a lead-in', () => {
      const text = 'We need three things:\n- a boat that floats\n  and steers,\n- a crew,\n    * fed daily,\n- a map.\n';
      const doc = plain(text);
      assert.deepEqual(
        doc.paragraphs.map((p) => [p.kind, p.listDepth, p.leadIn]),
        [
          ['paragraph', 0, null],
          ['listItem', 0, 0],
          ['listItem', 0, 0],
          ['listItem', 1, 2],
          ['listItem', 0, 0],
        ],
      );
      assert.deepEqual(texts(doc), ['We need three things:', 'a boat that floats and steers,', 'a crew,', 'fed daily,', 'a map.']);
    });

    it('keeps numbered list items apart from the paragraph before them', () => {
      const doc = plain('Steps follow.\n1. Open the valve.\n2. Close it.\n');
      assert.deepEqual(texts(doc), ['Steps follow.', 'Open the valve.', 'Close it.']);
      assert.deepEqual(doc.paragraphs.map((p) => p.leadIn), [null, 0, 0]);
    });
  });

  describe('skipped blocks', () => {
    it('skips indented code blocks, including ones indented with a tab', () => {
      const text = 'Run this:\n\n    make all\n\n    make test\n\n\tcat log\n\nDone.\n';
      const doc = plain(text);
      assert.deepEqual(texts(doc), ['Run this:', 'Done.']);
      assert.deepEqual(
        doc.skipped.map((s) => [s.reason, text.slice(s.span.start, s.span.end)]),
        [['code', 'make all\n\n    make test\n\n\tcat log']],
      );
    });

    it('skips the literal block after a "::" paragraph and reads "::" as ":"', () => {
      const text = 'For example::\n\n  x = 1\n  y = 2\n\nBack to prose.\n';
      const doc = plain(text);
      assert.deepEqual(texts(doc), ['For example:', 'Back to prose.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['code']);
    });

    it('skips separator lines, reStructuredText comments and grid tables', () => {
      const text = 'Before.\n\n* * *\n\n.. note that is hidden\n   and continues\n\n+---+---+\n| a | b |\n+---+---+\n\nAfter.\n';
      const doc = plain(text);
      assert.deepEqual(texts(doc), ['Before.', 'After.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['thematicBreak', 'comment', 'table']);
    });

    it('skips a run of Key: value lines at the start of the document', () => {
      const doc = plain('Status: Draft\nOwner: Ops team\nUpdated: 3 May\n\nThe plan starts here.\n');
      assert.deepEqual(texts(doc), ['The plan starts here.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['metadata']);
    });
  });

  describe('offsets', () => {
    it('keeps exact offsets with CRLF, a byte order mark, tabs and astral characters', () => {
      const text = '\uFEFFNOTES\r\n\r\nThe \u{1F30A} tide\trose\r\n  at dawn. It fell \u{1D400}t noon.\r\n';
      const doc = plain(text);
      assert.deepEqual(headings(doc), [['NOTES', 1, 0]]);
      assert.deepEqual(texts(doc), ['The \u{1F30A} tide rose at dawn.', 'It fell \u{1D400}t noon.']);
      assert.deepEqual(sourceOf(doc), ['The \u{1F30A} tide\trose\r\n  at dawn.', 'It fell \u{1D400}t noon.']);
    });

    it('shifts every span by baseOffset', () => {
      const whole = 'Intro.\n\nSelected part one. Part two.\n';
      const start = whole.indexOf('Selected');
      const doc = plain(whole.slice(start), start);
      assert.deepEqual(
        doc.sentences.map((s) => whole.slice(s.span.start, s.span.end)),
        ['Selected part one.', 'Part two.'],
      );
    });
  });
});
