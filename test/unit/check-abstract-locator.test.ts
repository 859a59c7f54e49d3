import assert from 'node:assert/strict';
import { analyze } from '../../src/core/analyze';
import {
  findAbstractSection,
  locateAbstract,
  NO_ABSTRACT_MESSAGE,
  sectionWithDescendants,
} from '../../src/core/check/abstract-locator';
import { parseDocument } from '../../src/core/formats/registry';

const parse = (text: string) => parseDocument(text, { format: 'markdown' });
const headingOf = (text: string, heading?: string) => {
  const doc = parse(text);
  const index = findAbstractSection(doc, heading);
  return index === null ? null : doc.sections[index]!.heading;
};

describe('check: locating the abstract', () => {
  it('recognises the usual names whatever their case, numbering and punctuation', () => {
    for (const heading of ['Summary', 'ABSTRACT', 'TL;DR', 'tldr', '1. Summary', 'Executive summary', 'Summary:']) {
      assert.equal(headingOf(`# Doc\n\n## ${heading}\n\nShort text.\n\n## Body\n\nMore text.\n`), heading, heading);
    }
  });

  it('does not mistake headings that merely contain the word', () => {
    assert.equal(headingOf('# Doc\n\n## Summary of costs\n\nText.\n\n## Abstract classes\n\nText.\n'), null);
  });

  it('takes the first of several candidates, and Overview only as a fallback', () => {
    assert.equal(headingOf('## Overview\n\nA.\n\n## Abstract\n\nB.\n\n## Summary\n\nC.\n'), 'Abstract');
    assert.equal(headingOf('## Overview\n\nA.\n\n## Details\n\nB.\n'), 'Overview');
  });

  it('never takes a lone title that encloses the whole document', () => {
    assert.equal(headingOf('# Summary\n\nIntro.\n\n## Costs\n\nText.\n\n## Risks\n\nText.\n'), null);
  });

  it('finds a named heading, ignoring case and numbering', () => {
    assert.equal(headingOf('# Doc\n\n## 3. Key Findings\n\nText.\n', 'key findings'), '3. Key Findings');
    assert.equal(headingOf('# Doc\n\n## Findings\n\nText.\n', 'Conclusions'), null);
  });

  it('includes nested sections in the abstract', () => {
    const doc = parse('# Doc\n\n## Summary\n\nA.\n\n### Detail\n\nB.\n\n## Body\n\nC.\n');
    const inside = sectionWithDescendants(doc, findAbstractSection(doc)!);
    assert.deepEqual(doc.sections.filter((s) => inside[s.index] === 1).map((s) => s.heading), ['Summary', 'Detail']);
  });

  it('collects the abstract sentences with spans, or says what is missing', () => {
    const text = '# Doc\n\n## Summary\n\nThe ferry runs late. It stops at noon.\n\n## Timetable\n\nThe ferry leaves at nine.\n';
    const analyzed = analyze(parse(text), 'en');
    const located = locateAbstract(analyzed, undefined, 'en');
    assert.ok(!('error' in located));
    assert.deepEqual(located.sentences.map((s) => text.slice(s.span!.start, s.span!.end)), ['The ferry runs late.', 'It stops at noon.']);
    assert.deepEqual(located.sentences.map((s) => s.sentence), [0, 1]);
    assert.deepEqual(locateAbstract(analyze(parse('# Doc\n\n## Body\n\nText.\n'), 'en'), undefined, 'en'), { reason: 'noAbstract', error: NO_ABSTRACT_MESSAGE });
    const missing = locateAbstract(analyzed, { kind: 'heading', heading: 'Nope' }, 'en');
    assert.ok('error' in missing && missing.reason === 'missingHeading');
    assert.match(missing.error, /"Nope"/);
    const empty = locateAbstract(analyze(parse('# Doc\n\n## Summary\n\n```\ncode\n```\n\n## Body\n\nText.\n'), 'en'), undefined, 'en');
    assert.ok('error' in empty && empty.reason === 'emptyAbstract');
    assert.match(empty.error, /no sentences/);
  });

  it('reads an abstract given as separate text, without spans', () => {
    const analyzed = analyze(parse('# Doc\n\n## Body\n\nText here.\n'), 'en');
    const located = locateAbstract(analyzed, { kind: 'text', text: 'First claim. Second claim.' }, 'en');
    assert.ok(!('error' in located));
    assert.equal(located.origin, 'text');
    assert.deepEqual(located.sentences.map((s) => [s.text, s.span]), [['First claim.', null], ['Second claim.', null]]);
    const blank = locateAbstract(analyzed, { kind: 'text', text: '   ' }, 'en');
    assert.ok('error' in blank);
    assert.match(blank.error, /no sentences/);
  });
});
