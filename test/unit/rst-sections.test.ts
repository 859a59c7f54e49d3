/**
 * reStructuredText structure: section titles by adornment, levels by first appearance, the
 * document title and subtitle, transitions. The examples marked "from memory" are recalled from
 * the reStructuredText specification (docutils' "reStructuredText Markup Specification", sections
 * "Sections" and "Transitions"), not copied from it.
 */
import assert from 'node:assert/strict';
import { parseRestructuredText } from '../../src/core/formats/rst/index';
import type { ParsedDocument } from '../../src/core/types';
import { invariantFailures } from './helpers/span-invariant';

const rst = (text: string, baseOffset = 0): ParsedDocument => parseRestructuredText(text, { baseOffset, includeTables: false });
/** Headings as "depth heading", the root left out. */
const outline = (doc: ParsedDocument): string[] => doc.sections.filter((s) => s.depth > 0).map((s) => `${s.depth} ${s.heading}`);
const reasons = (doc: ParsedDocument): string[] => doc.skipped.map((s) => s.reason);

describe('rst: sections', () => {
  it('reads every adornment style of the specification as a distinct level, in order of appearance (from memory)', () => {
    // The specification lists these styles as examples; each new style nests one level deeper.
    const styles = ['=', '-', '`', "'", '.', '~', '*', '+', '^'];
    const text = styles.map((c, k) => `Title ${k + 1}\n${c.repeat(9)}\n\nText ${k + 1}.\n`).join('\n');
    const doc = rst(text);
    // A lone top-level section is the document title; the others keep their order of appearance.
    assert.equal(doc.title, 'Title 1');
    assert.deepEqual(outline(doc), ['1 Title 1', '2 Title 2', '3 Title 3', '4 Title 4', '5 Title 5', '6 Title 6', '6 Title 7', '6 Title 8', '6 Title 9']);
    assert.deepEqual(reasons(doc), []);
    assert.deepEqual(invariantFailures(doc), []);
  });

  it('reads a lone second-level title right after the document title as the subtitle', () => {
    const doc = rst('=======\n Title\n=======\n\nSubtitle\n--------\n\nIntro text.\n\nPart\n~~~~\n\nPart text.\n');
    assert.equal(doc.title, 'Title');
    // The subtitle is no section: its level is used up, so "Part" is a section of the title.
    assert.deepEqual(outline(doc), ['1 Title', '2 Part']);
    assert.deepEqual(reasons(doc), ['subtitle']);
    assert.deepEqual(doc.sentences.map((s) => [s.text, doc.sections[s.section]!.heading]), [['Intro text.', 'Title'], ['Part text.', 'Part']]);
  });

  it('tells an over- and underlined style from the same character underlined only (from memory)', () => {
    const doc = rst(['=======', ' Title', '=======', '', 'Intro.', '', 'Part A', '=======', '', 'A text.', '', 'Part B', '=======', '', 'B text.', ''].join('\n'));
    assert.equal(doc.title, 'Title');
    assert.deepEqual(outline(doc), ['1 Title', '2 Part A', '2 Part B']);
    assert.equal(doc.sentences[0]!.text, 'Intro.');
    assert.equal(doc.sentences[0]!.section, 1);
  });

  it('keeps sibling sections at one depth when there is no document title', () => {
    const doc = rst('One\n===\n\nFirst text.\n\nSub\n---\n\nSecond text.\n\nTwo\n===\n\nThird text.\n');
    assert.deepEqual(outline(doc), ['1 One', '2 Sub', '1 Two']);
    assert.equal(doc.title, 'One');
    assert.deepEqual(doc.sentences.map((s) => doc.sections[s.section]!.heading), ['One', 'Sub', 'Two']);
  });

  it('gives the heading span the whole adornment, and the section runs to the next title of its level', () => {
    const text = '=====\nTitle\n=====\n\nBody one.\n\nPart\n----\n\nBody two.\n';
    const doc = rst(text);
    const [, title, part] = doc.sections;
    assert.equal(text.slice(title!.headingSpan!.start, title!.headingSpan!.end), '=====\nTitle\n=====');
    assert.equal(text.slice(part!.headingSpan!.start, part!.headingSpan!.end), 'Part\n----');
    assert.equal(title!.span.end, text.length);
    assert.equal(part!.parent, title!.index);
  });

  it('reads an inset title between over- and underline, and strips inline markup from headings', () => {
    const doc = rst('==================\n  *Emphasized* ``x``\n==================\n\nText.\n');
    assert.deepEqual(outline(doc), ['1 Emphasized x']);
  });

  it('accepts an underline shorter than the title only when it is at least four characters long (from memory)', () => {
    // "Title underline too short" is a warning from four characters up; shorter lines are text.
    const long = rst('A long title\n----\n\nText.\n');
    assert.deepEqual(outline(long), ['1 A long title']);
    const short = rst('A long title\n---\n\nText.\n');
    assert.deepEqual(outline(short), []);
    assert.deepEqual(short.sentences.map((s) => s.text), ['A long title ---', 'Text.']);
  });

  it('reports a title whose level is inconsistent as malformed, not as a section', () => {
    // After "=" (level 1) and "-" (level 2), "~" (new, level 3) under a level-1 section is fine,
    // but a new style right after a level-1 title that skips a level is not.
    const doc = rst('One\n===\n\nText one.\n\nTwo\n---\n\nText two.\n\nThree\n=====\n\nText three.\n\nFour\n~~~~\n\nText four.\n');
    assert.deepEqual(outline(doc), ['1 One', '2 Two', '1 Three']);
    assert.deepEqual(reasons(doc), ['malformed']);
    assert.deepEqual(doc.sentences.map((s) => s.text), ['Text one.', 'Text two.', 'Text three.', 'Text four.']);
  });

  it('does not read titles inside indented blocks (the specification allows them only at the top)', () => {
    const doc = rst('Intro.\n\n  Quoted\n  ------\n\n  Quote text.\n');
    assert.deepEqual(outline(doc), []);
    assert.deepEqual(reasons(doc), ['malformed']);
    assert.deepEqual(doc.sentences.map((s) => s.text), ['Intro.', 'Quote text.']);
  });

  it('skips transitions: four or more punctuation characters between blank lines (from memory)', () => {
    const doc = rst('Para one.\n\n----------\n\nPara two.\n\n--- x\n\n---\n\nPara three.\n');
    assert.deepEqual(reasons(doc), ['thematicBreak']);
    // Three characters are too short for a transition: a paragraph (without words, so no sentence).
    assert.deepEqual(doc.sentences.map((s) => s.text), ['Para one.', 'Para two.', '--- x', 'Para three.']);
    assert.equal(doc.paragraphs.length, 4);
  });

  it('keeps the document title after the licence comment, targets and substitution definitions', () => {
    const text = '..\n This work is licensed.\n\n.. _top:\n\n.. |ok| replace:: fine\n\n=====\nTitle\n=====\n\nSection\n-------\n\nBody.\n\nOther\n-----\n\nMore.\n';
    const doc = rst(text);
    assert.equal(doc.title, 'Title');
    assert.deepEqual(outline(doc), ['1 Title', '2 Section', '2 Other']);
    assert.deepEqual(reasons(doc), ['comment', 'definition', 'definition']);
  });

  it('does not promote a title preceded by a paragraph', () => {
    const doc = rst('Preface.\n\nTitle\n=====\n\nBody.\n');
    assert.deepEqual(outline(doc), ['1 Title']);
    assert.equal(doc.sentences[0]!.section, 0);
  });

  it('counts offsets from the original string when it starts with a byte order mark', () => {
    const text = '\uFEFFTitle\n=====\n\nFirst sentence.\r\nSecond one.\r\n';
    const doc = rst(text);
    assert.deepEqual(outline(doc), ['1 Title']);
    assert.equal(doc.sections[1]!.headingSpan!.start, 1);
    assert.deepEqual(doc.sentences.map((s) => text.slice(s.span.start, s.span.end)), ['First sentence.', 'Second one.']);
  });

  it('adds the base offset of a selection to every span', () => {
    const text = 'Part\n====\n\nSelected text here.\n';
    const doc = rst(text, 500);
    assert.equal(doc.sections[1]!.headingSpan!.start, 500);
    assert.deepEqual(doc.sentences.map((s) => [s.span.start, s.span.end]), [[511, 530]]);
    assert.deepEqual(invariantFailures(doc), []);
  });
});
