import assert from 'node:assert/strict';
import { balanceUnits, excludedSections, topSectionDepth } from '../../src/core/select/units';
import { normalizeHeading } from '../../src/core/text/headings';
import type { ParsedDocument, Section } from '../../src/core/types';

function docWith(sections: Array<[heading: string, depth: number, parent: number | null]>): ParsedDocument {
  const all: Section[] = [{ index: 0, heading: '', depth: 0, headingSpan: null, span: { start: 0, end: 100 }, parent: null }];
  sections.forEach(([heading, depth, parent], k) =>
    all.push({ index: k + 1, heading, depth, headingSpan: { start: k, end: k + 1 }, span: { start: k, end: 100 }, parent }),
  );
  return { text: '', baseOffset: 0, format: 'markdown', title: null, sections: all, paragraphs: [], sentences: [], skipped: [] };
}

describe('balance units', () => {
  // # Title / ## A / ### A.1 / ## B
  const doc = docWith([
    ['Title', 1, 0],
    ['A', 2, 1],
    ['A.1', 3, 2],
    ['B', 2, 1],
  ]);

  it('skips a lone H1 title when finding the top section level', () => {
    assert.equal(topSectionDepth(doc), 2);
    assert.equal(topSectionDepth(docWith([['One', 1, 0], ['Two', 1, 0]])), 1);
  });

  it('rolls sub-sections up into their top-level section', () => {
    assert.deepEqual([...balanceUnits(doc, 1).unitOfSection], [0, 0, 2, 2, 4]);
    assert.deepEqual([...balanceUnits(doc, 2).unitOfSection], [0, 0, 2, 3, 4]);
  });

  it('excludes sections by heading, ignoring numbering and case, with their sub-sections', () => {
    const d = docWith([['Design', 1, 0], ['7. References', 1, 0], ['Papers', 2, 2]]);
    assert.deepEqual([...excludedSections(d, ['references'])], [0, 0, 1, 1]);
    assert.equal(normalizeHeading('2.1 Truck Routing'), 'truck routing');
    assert.equal(normalizeHeading('IV. Results'), 'results');
  });
});
