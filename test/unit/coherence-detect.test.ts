import assert from 'node:assert/strict';
import { findStandAloneProblems } from '../../src/core/coherence/index';
import type { ParsedDocument, Repair } from '../../src/core/types';
import { buildDoc, type DocBlock } from './helpers/coherence-doc';

// An invented handbook of a community tool library.
const handbook: DocBlock[] = [
  { paragraph: ['The tool library lends drills, ladders and saws to members.', 'It opens on Saturdays from nine to one.'] }, // 0, 1
  { heading: 'Borrowing' },
  {
    paragraph: [
      'Members can borrow up to three tools at once.', // 2
      'However, ladders count as two tools.', // 3
      'This rule keeps ladders available for more people.', // 4
    ],
  },
  { paragraph: ['Borrowers must follow three rules:'] }, // 5
  { item: ['Return tools clean and dry.'] }, // 6
  { item: ['They must report any damage at once.'] }, // 7
  { heading: 'Opening hours' },
  { paragraph: ['It opens earlier in summer.', 'Also, the desk stays open late on Thursdays.'] }, // 8, 9
];

const slice = (doc: ParsedDocument, span: { start: number; end: number }) =>
  doc.text.slice(span.start - doc.baseOffset, span.end - doc.baseOffset);

describe('coherence: findStandAloneProblems', () => {
  const doc = buildDoc(handbook);

  it('flags a leading connective whose previous sentence is not picked, naming words, span and context', () => {
    const [warning, ...rest] = findStandAloneProblems(doc, [3]);
    assert.equal(rest.length, 0);
    assert.equal(warning!.sentence, 3);
    assert.equal(warning!.trigger, 'connective');
    assert.equal(warning!.words, 'However');
    assert.equal(slice(doc, warning!.span), 'However');
    assert.deepEqual(warning!.context, [2]);
    assert.match(warning!.message, /However/);
  });

  it('accepts a sentence whose previous sentence is in the summary', () => {
    assert.deepEqual(findStandAloneProblems(doc, [2, 3]), []);
    assert.deepEqual(findStandAloneProblems(doc, [0, 1]), []);
  });

  it('follows the context back while the context sentence dangles too', () => {
    const [warning] = findStandAloneProblems(doc, [4]);
    assert.equal(warning!.words, 'This rule');
    assert.deepEqual(warning!.context, [2, 3]);
    // With the connective sentence picked, "This rule" has its context and that one is flagged instead.
    assert.deepEqual(
      findStandAloneProblems(doc, [3, 4]).map((w) => w.sentence),
      [3],
    );
  });

  it('uses the lead-in line as the context of a list item, and accepts the item when the lead-in is picked', () => {
    const [warning] = findStandAloneProblems(doc, [7]);
    assert.equal(warning!.trigger, 'pronoun');
    assert.deepEqual(warning!.context, [5]);
    assert.deepEqual(findStandAloneProblems(doc, [5, 7]), []);
    assert.deepEqual(findStandAloneProblems(doc, [6]), []);
  });

  it('lets a section heading resolve a pronoun in the first sentence, but not a connective', () => {
    assert.deepEqual(findStandAloneProblems(doc, [8]), []);
    const [warning] = findStandAloneProblems(doc, [9]);
    assert.equal(warning!.words, 'Also');
    assert.deepEqual(warning!.context, [8]);
  });

  it('points a connective that opens a section at the last sentence of the section before', () => {
    const winter = buildDoc([
      { heading: 'Stations' },
      { paragraph: ['The network has forty stations.', 'Most run on solar power.'] },
      { heading: 'Winter' },
      { paragraph: ['However, the summit station cannot be reached in January.'] },
    ]);
    const [warning] = findStandAloneProblems(winter, [2]);
    assert.deepEqual(warning!.context, [1]);
  });

  it('does not flag the very first sentence of a document: the source reader had no more context', () => {
    const opening = buildDoc([{ paragraph: ['However, this handbook is short.', 'Members read it once.'] }]);
    assert.deepEqual(findStandAloneProblems(opening, [0]), []);
  });

  it('finds the trigger words in the source when the sentence text had markup stripped', () => {
    const marked = buildDoc([
      { paragraph: ['Members can borrow three tools.', { text: 'However, ladders count as two.', source: '**However**, ladders count as two.' }] },
    ], 40);
    const [warning] = findStandAloneProblems(marked, [1]);
    assert.equal(slice(marked, warning!.span), 'However');
    assert.ok(warning!.span.start >= 40, 'spans are in whole-document coordinates');
  });

  it('ignores duplicate, unordered and out-of-range picks and reports warnings in document order', () => {
    const a = findStandAloneProblems(doc, [9, 3, 3, 7, -1, 99, 1.5]);
    const b = findStandAloneProblems(doc, [3, 7, 9]);
    assert.deepEqual(a, b);
    assert.deepEqual(
      b.map((w) => w.sentence),
      [3, 7, 9],
    );
  });
});

describe('coherence: suggested repairs', () => {
  const doc = buildDoc(handbook);
  const kinds = (repairs: readonly Repair[]) => repairs.map((r) => r.kind);

  it('offers add-context, replace and, for a connective, the trimmed sentence', () => {
    const [warning] = findStandAloneProblems(doc, [3]);
    assert.deepEqual(kinds(warning!.repairs), ['addContext', 'replace', 'trimConnective']);
    assert.deepEqual(warning!.repairs[0], { kind: 'addContext', sentences: [2] });
    assert.deepEqual(warning!.repairs[2], { kind: 'trimConnective', text: 'Ladders count as two tools.' });
  });

  it('does not offer trimming when the sentence would still dangle', () => {
    const hedge = buildDoc([{ paragraph: ['The desk has two hedge trimmers.', 'However, they need sharpening monthly.'] }]);
    const [warning] = findStandAloneProblems(hedge, [1]);
    assert.deepEqual(kinds(warning!.repairs), ['addContext', 'replace']);
  });

  it('suggests the best-scored same-section sentence that stands alone as the replacement', () => {
    // Sentence 4 dangles; 5 stands alone; 7 dangles; 2 stands alone but scores lower than 5.
    const scores = new Float64Array([0.1, 0.1, 0.4, 0.2, 0.9, 0.6, 0.3, 0.8, 0.1, 0.1]);
    const [warning] = findStandAloneProblems(doc, [4], { scores });
    assert.deepEqual(warning!.repairs.find((r) => r.kind === 'replace'), { kind: 'replace', replacement: 5 });
  });

  it('suggests no replacement without scores', () => {
    const [warning] = findStandAloneProblems(doc, [4]);
    assert.deepEqual(warning!.repairs.find((r) => r.kind === 'replace'), { kind: 'replace', replacement: null });
  });

  it('checks the edited display text when one is given', () => {
    const edited = new Map([[3, 'Ladders count as two tools.']]);
    assert.deepEqual(findStandAloneProblems(doc, [3], { edited }), []);
  });
});
