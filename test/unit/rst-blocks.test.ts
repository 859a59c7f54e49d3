/**
 * reStructuredText body elements: which are prose (paragraphs, list items, definitions, quotes,
 * admonition and topic bodies, figure captions) and which are skipped with a reason (literal
 * blocks, comments, targets, directives with code or data, tables, field and option lists, line
 * blocks, doctest blocks). Examples marked "from memory" are recalled from the reStructuredText
 * specification (sections "Literal Blocks", "Comments", "Bullet Lists", "Enumerated Lists"), not
 * copied from it.
 */
import assert from 'node:assert/strict';
import { parseRestructuredText } from '../../src/core/formats/rst/index';
import type { ParsedDocument } from '../../src/core/types';
import { invariantFailures } from './helpers/span-invariant';

const rst = (text: string, options: { includeTables?: boolean; includeFootnotes?: boolean } = {}): ParsedDocument => {
  const doc = parseRestructuredText(text, { baseOffset: 0, includeTables: options.includeTables ?? false, includeFootnotes: options.includeFootnotes });
  assert.deepEqual(invariantFailures(doc), []);
  return doc;
};
const texts = (doc: ParsedDocument): string[] => doc.sentences.map((s) => s.text);
const kinds = (doc: ParsedDocument): string[] => doc.sentences.map((s) => doc.paragraphs[s.paragraph]!.kind);
/** Skipped stretches as "reason: source text". */
const skipped = (doc: ParsedDocument): string[] => doc.skipped.map((s) => `${s.reason}: ${doc.text.slice(s.span.start, s.span.end)}`);

describe('rst: body elements', () => {
  describe('literal blocks (from memory)', () => {
    it('drops a "::" paragraph, the " ::" after text, and one colon of a closing "::"', () => {
      const doc = rst('Paragraph one:\n\n::\n\n    literal one\n\nParagraph two: ::\n\n    literal two\n\nParagraph three::\n\n    literal three\n\nAfter.\n');
      assert.deepEqual(texts(doc), ['Paragraph one:', 'Paragraph two:', 'Paragraph three:', 'After.']);
      assert.deepEqual(skipped(doc), ['code: literal one', 'code: literal two', 'code: literal three']);
    });

    it('reads a quoted literal block: unindented lines starting with one punctuation character', () => {
      const doc = rst("Jo wrote::\n\n>> Great idea!\n>\n> Why not earlier?\n\nYou just did!  ;-)\n");
      // ";-)" has no letters: the sentence splitter leaves it out.
      assert.deepEqual(texts(doc), ['Jo wrote:', 'You just did!']);
      assert.deepEqual(skipped(doc), ['code: >> Great idea!\n>\n> Why not earlier?']);
    });

    it('ends the literal block at the first line back at the paragraph indentation', () => {
      const doc = rst('Example::\n\n  x = 1\n\n  y = 2\nBack to text.\n');
      assert.deepEqual(texts(doc), ['Example:', 'Back to text.']);
    });

    it('does not treat an escaped "::" as a literal block marker', () => {
      const doc = rst('Not a marker\\::\n\n  indented quote.\n');
      assert.deepEqual(texts(doc), ['Not a marker::', 'indented quote.']);
      assert.deepEqual(kinds(doc), ['paragraph', 'quote']);
    });

    it('skips doctest blocks', () => {
      const doc = rst('Try it:\n\n>>> print(1)\n1\n\nDone.\n');
      assert.deepEqual(skipped(doc), ['code: >>> print(1)\n1']);
    });
  });

  describe('lists', () => {
    it('reads bullet list items with their lead-in and nesting', () => {
      const doc = rst('The parts are:\n\n- first item\n  continues here.\n- second item\n\n  * nested item\n\n- third item\nback at the margin\n');
      // An unindented line ends the item (the reference parser warns) and starts a paragraph.
      assert.deepEqual(texts(doc), ['The parts are:', 'first item continues here.', 'second item', 'nested item', 'third item', 'back at the margin']);
      assert.deepEqual(doc.paragraphs.map((p) => [p.kind, p.listDepth, p.leadIn]), [
        ['paragraph', 0, null], ['listItem', 0, 0], ['listItem', 0, 0], ['listItem', 1, 2], ['listItem', 0, 0], ['paragraph', 0, null],
      ]);
    });

    it('needs a blank line before a list (from memory): a bullet line inside a paragraph is text', () => {
      const doc = rst('Some text\n- not an item\n');
      assert.deepEqual(texts(doc), ['Some text - not an item']);
    });

    it('reads enumerated lists: arabic, letters, roman numerals, auto-numbering (from memory)', () => {
      const doc = rst('1. one\n2. two\n\na) alpha\nb) beta\n\n(i) roman one\n(ii) roman two\n\n#. auto one\n#. auto two\n');
      assert.deepEqual(texts(doc), ['one', 'two', 'alpha', 'beta', 'roman one', 'roman two', 'auto one', 'auto two']);
      assert.ok(kinds(doc).every((k) => k === 'listItem'));
    });

    it('reads a line that only looks like an enumerator as text (the next line must fit)', () => {
      // "A. Einstein was..." followed by a non-indented line is a paragraph, not a list.
      const doc = rst('A. Einstein was a really\nsmart dude.\n');
      assert.deepEqual(texts(doc), ['A. Einstein was a really smart dude.']);
      assert.deepEqual(kinds(doc), ['paragraph']);
    });

    it('reads definition lists: the term (classifiers dropped) introduces its definition', () => {
      const doc = rst('Intro.\n\nterm one : classifier\n    Definition one.\n\nterm two\n    Definition two.\n\n    Second paragraph.\n');
      assert.deepEqual(texts(doc), ['Intro.', 'term one', 'Definition one.', 'term two', 'Definition two.', 'Second paragraph.']);
      assert.deepEqual(doc.paragraphs.map((p) => p.leadIn), [null, 0, 1, 0, 3, 3]);
    });

    it('skips a definition list of short fields at the start of a section (assignee style)', () => {
      const doc = rst('Assignees\n=========\n\nPrimary assignee:\n  jdoe\n\nOther contributors:\n  None\n\nThe work starts soon.\n');
      assert.deepEqual(texts(doc), ['The work starts soon.']);
      assert.deepEqual(skipped(doc), ['metadata: Primary assignee:\n  jdoe\n\nOther contributors:\n  None']);
    });

    it('skips field lists, option lists and line blocks', () => {
      const doc = rst(':Status: Draft\n:Authors: J. Doe,\n  A. Roe\n\n-v, --verbose  Say more.\n--out=FILE     Write here.\n\n| Line one\n| Line two\n\nProse.\n');
      assert.deepEqual(texts(doc), ['Prose.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['metadata', 'optionList', 'lineBlock']);
    });
  });

  describe('block quotes', () => {
    it('reads an indented block as a quote and skips its attribution', () => {
      const doc = rst('Said:\n\n    Keep it simple.\n\n    -- A. Writer\n\nAfter.\n');
      assert.deepEqual(texts(doc), ['Said:', 'Keep it simple.', 'After.']);
      assert.deepEqual(kinds(doc), ['paragraph', 'quote', 'paragraph']);
      assert.deepEqual(skipped(doc), ['metadata: -- A. Writer']);
    });
  });

  describe('explicit markup', () => {
    it('skips comments, including an indented comment block after a bare ".." (from memory)', () => {
      const doc = rst('..\n  This work is licensed.\n\n  Still the comment.\n\n.. a one-line comment\n\n..\n\n    Not a comment: an empty comment ends at the blank line.\n');
      assert.deepEqual(texts(doc), ['Not a comment: an empty comment ends at the blank line.']);
      assert.deepEqual(kinds(doc), ['quote']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['comment', 'comment', 'comment']);
    });

    it('skips hyperlink targets, anonymous targets and substitution definitions', () => {
      const doc = rst('.. _guide: https://docs.example/guide\n.. _`two words`: https://docs.example/two\n__ https://docs.example/anon\n.. |name| replace:: Fleet Tool\n\nText.\n');
      assert.deepEqual(texts(doc), ['Text.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['definition', 'definition', 'definition', 'definition']);
    });

    it('skips footnote and citation bodies unless asked to read them', () => {
      const text = 'Text [1]_.\n\n.. [1] The footnote body.\n.. [CIT] A citation body.\n';
      assert.deepEqual(texts(rst(text)), ['Text.']);
      assert.deepEqual(texts(rst(text, { includeFootnotes: true })), ['Text.', 'The footnote body.', 'A citation body.']);
    });

    it('reads admonition bodies as prose of their section', () => {
      const doc = rst('Part\n====\n\n.. note:: This is noted\n   on two lines.\n\n   And a second paragraph.\n\n.. WARNING::\n\n   Careful now.\n\n.. admonition:: A custom title\n\n   Custom body.\n');
      assert.deepEqual(texts(doc), ['This is noted on two lines.', 'And a second paragraph.', 'Careful now.', 'Custom body.']);
      assert.ok(doc.sentences.every((s) => s.section === 1));
      assert.deepEqual(skipped(doc), ['directive: .. admonition:: A custom title']);
    });

    it('reads topic and sidebar bodies, skipping their titles and options', () => {
      const doc = rst('.. topic:: Topic Title\n   :class: wide\n\n   Topic body.\n\n.. sidebar:: Side\n\n   Side body.\n');
      assert.deepEqual(texts(doc), ['Topic body.', 'Side body.']);
      assert.deepEqual(skipped(doc), ['directive: .. topic:: Topic Title\n   :class: wide', 'directive: .. sidebar:: Side']);
    });

    it('skips code, math, include, table-of-contents, image and unknown directives', () => {
      const doc = rst(
        '.. code-block:: python\n   :linenos:\n\n   print(1)\n\n.. math:: x^2\n\n.. toctree::\n   :maxdepth: 2\n\n   intro\n\n.. image:: a.png\n\n.. include:: other.rst\n\n.. blockdiag::\n\n   a -> b\n\n.. unknown-thing:: arg\n\n   Body text.\n\nProse.\n',
      );
      assert.deepEqual(texts(doc), ['Prose.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['code', 'code', 'tableOfContents', 'image', 'directive', 'code', 'directive']);
    });

    it("keeps a figure's caption and legend as prose and skips the image", () => {
      const doc = rst('.. figure:: dock.png\n   :width: 40%\n\n   The dock at night.\n\n   Legend text here.\n');
      assert.deepEqual(texts(doc), ['The dock at night.', 'Legend text here.']);
      assert.deepEqual(skipped(doc), ['image: .. figure:: dock.png\n   :width: 40%']);
    });
  });

  describe('tables', () => {
    const grid = ['+-------+--------------+', '| Head  | Other head   |', '+=======+==============+', '| cell  | Body cell.   |', '+-------+--------------+', '| two   | Spans. Two.  |', '+-------+--------------+'].join('\n');
    const simple = ['=====  ==========', 'Head   Other', '=====  ==========', 'one    Body cell.', 'two    Second row', '       continues.', '=====  =========='].join('\n');
    const listTable = ['.. list-table:: Title', '   :header-rows: 1', '', '   * - Head', '     - Other', '   * - one', '     - List cell.'].join('\n');
    const csvTable = ['.. csv-table:: Title', '   :header-rows: 1', '', '   Head, Other', '   one, "CSV cell, quoted."'].join('\n');

    it('skips grid, simple, list and CSV tables by default', () => {
      for (const table of [grid, simple, listTable, csvTable]) {
        const doc = rst(`${table}\n\nAfter.\n`);
        assert.deepEqual(texts(doc), ['After.'], table);
        assert.deepEqual(doc.skipped.map((s) => s.reason), ['table'], table);
      }
    });

    it('reads body cells as table cells when tables are included, leaving header rows out', () => {
      assert.deepEqual(texts(rst(grid, { includeTables: true })), ['cell', 'Body cell.', 'two', 'Spans.', 'Two.']);
      // Side-by-side cells over several lines are read line by line, so ranges never overlap.
      assert.deepEqual(texts(rst(simple, { includeTables: true })), ['one', 'Body cell.', 'two', 'Second row', 'continues.']);
      assert.deepEqual(texts(rst(listTable, { includeTables: true })), ['one', 'List cell.']);
      const csv = rst(csvTable, { includeTables: true });
      assert.deepEqual(texts(csv), ['one', 'CSV cell, quoted.']);
      assert.ok(kinds(csv).every((k) => k === 'tableCell'));
    });

    it('reads side-by-side grid cells over several lines in reading order, without overlapping ranges', () => {
      const table = ['+-----------+-----------+', '| Left one  | Right one |', '| left two. | right two |', '+-----------+-----------+'].join('\n');
      const doc = rst(table, { includeTables: true });
      assert.deepEqual(texts(doc), ['Left one', 'Right one', 'left two.', 'right two']);
      // (rst() has checked the span invariant: increasing, non-overlapping ranges.)
    });

    it('reports a grid table without a bottom border as malformed', () => {
      const doc = rst('+-----+\n| a   |\n\nAfter.\n');
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['malformed']);
    });
  });
});
