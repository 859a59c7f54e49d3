import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { findStandAloneProblems, repairAutomatically, type RepairInput } from '../../src/core/coherence/index';
import type { ParsedDocument } from '../../src/core/types';
import { buildDoc, wordCount, type DocBlock, type StandAlonePair } from './helpers/coherence-doc';

// An invented handbook of a community tool library (same shape as in coherence-detect.test.ts).
const doc = buildDoc([
  { paragraph: ['The tool library lends drills, ladders and saws to members.', 'It opens on Saturdays from nine to one.'] }, // 0, 1
  { heading: 'Borrowing' },
  { paragraph: ['Members can borrow up to three tools at once.', 'However, ladders count as two tools.', 'This rule keeps ladders available for more people.'] }, // 2-4
  { paragraph: ['Borrowers must follow three rules:'] }, // 5
  { item: ['Return tools clean and dry.'] }, // 6
  { item: ['They must report any damage at once.'] }, // 7
]);

const wordsIn = (d: ParsedDocument) => (i: number) => wordCount(d.sentences[i]!.text);
const total = (d: ParsedDocument, picked: readonly number[]) => picked.reduce((sum, i) => sum + wordsIn(d)(i), 0);

function input(picked: number[], scores: number[], slack: number, extra: Partial<RepairInput> = {}): RepairInput {
  return { doc, picked, scores: new Float64Array(scores), wordBudget: total(doc, picked) + slack, wordsOf: wordsIn(doc), ...extra };
}

describe('coherence: automatic repair', () => {
  it('adds the context chain when the budget has room', () => {
    // 4 ("This rule ...") leans on 3, which leans on 2 ("However, ..."); 15 words of room fit both.
    const out = repairAutomatically(input([4], [0, 0, 0.5, 0.9, 0.9, 0, 0, 0], 15));
    assert.deepEqual(out.picked, [2, 3, 4]);
    assert.equal(out.edited.size, 0);
    assert.match(out.log[0]!, /sentence 4 .*added context sentence 2, 3/);
  });

  it('swaps out the lowest-scored unflagged pick when the context scores higher and the budget is full', () => {
    // The swap step itself, with trimming and refilling turned off (the default trims 3 first).
    const out = repairAutomatically(input([0, 3], [0.2, 0, 0.5, 0.9, 0, 0, 0, 0], 0, { strategy: { trimFirst: false, refill: false } }));
    assert.deepEqual(out.picked, [2, 3]);
    assert.match(out.log[0]!, /in place of sentence 0/);
    assert.ok(total(doc, out.picked) <= total(doc, [0, 3]));
  });

  it('trims a leading connective before adding context, keeping the ranked sentence', () => {
    const out = repairAutomatically(input([0, 3], [0.2, 0, 0.5, 0.9, 0, 0, 0, 0], 0));
    assert.deepEqual(out.picked, [0, 3]);
    assert.deepEqual([...out.edited], [[3, 'Ladders count as two tools.']]);
  });

  it('refills freed words with the best-scored sentences that stand alone, and untrims a sentence whose context came back', () => {
    // Trimming 3 leaves 9 words of room: 2 (score 0.5, 9 words) fits; 4 (8 more words) no longer does.
    const out = repairAutomatically(input([3], [0, 0, 0.5, 0.9, 0.1, 0, 0, 0], 9));
    assert.deepEqual(out.picked, [2, 3]);
    assert.equal(out.edited.size, 0, 'sentence 3 has its context again, so it is shown as written');
    assert.match(out.log.join('\n'), /sentence 2: added to refill/);
    assert.deepEqual(findStandAloneProblems(doc, out.picked, { edited: out.edited }), []);
    const without = repairAutomatically(input([3], [0, 0, 0.5, 0.9, 0.1, 0, 0, 0], 9, { strategy: { refill: false } }));
    assert.deepEqual(without.picked, [3]);
  });

  it('trims a leading connective when its context cannot be added or swapped in', () => {
    const out = repairAutomatically(input([0, 3], [0.2, 0, 0.1, 0.9, 0, 0, 0, 0], 0));
    assert.deepEqual(out.picked, [0, 3]);
    assert.deepEqual([...out.edited], [[3, 'Ladders count as two tools.']]);
    assert.deepEqual(findStandAloneProblems(doc, out.picked, { edited: out.edited }), []);
  });

  it('replaces a dangling sentence with the best same-section sentence that stands alone and fits', () => {
    // 7 ("They must ...") leans on the lead-in 5, which scores below the other pick.
    const out = repairAutomatically(input([0, 7], [0.5, 0, 0.2, 0.9, 0.8, 0.1, 0.4, 0.9], 0));
    // 3 and 4 dangle, 2 is longer than 7 would free; 6 is the best that stands alone and fits.
    assert.deepEqual(out.picked, [0, 6]);
    assert.match(out.log[0]!, /replaced by sentence 6/);
  });

  it('drops a dangling sentence when nothing else works, but never empties the summary', () => {
    const hut = buildDoc([
      { paragraph: ['The mountain hut above the northern lake has twelve beds in two rooms.', 'It also has a drying room.'] },
      { heading: 'Access' },
      { paragraph: ['The path from the car park is marked with red paint.'] },
    ]);
    const w = wordsIn(hut);
    const base = { doc: hut, scores: new Float64Array([0.1, 0.9, 0.5]), wordsOf: w };
    const out = repairAutomatically({ ...base, picked: [1, 2], wordBudget: w(1) + w(2) });
    assert.deepEqual(out.picked, [2]);
    assert.match(out.log[0]!, /dropped/);
    const alone = repairAutomatically({ ...base, picked: [1], wordBudget: w(1) });
    assert.deepEqual(alone.picked, [1]);
  });

  it('brings in only sentences the caller allows', () => {
    const allowed = (i: number) => i !== 2 && i !== 0;
    const out = repairAutomatically(input([4], [0.9, 0, 0.9, 0.5, 0.9, 0, 0, 0], 20, { isCandidate: allowed }));
    assert.ok(out.picked.every((i) => i === 4 || allowed(i)), `picked ${out.picked}`);
    assert.ok(out.picked.includes(3), 'context 3 is allowed and added');
    assert.deepEqual(findStandAloneProblems(doc, out.picked, { edited: out.edited }), []);
  });
});

// Property: on documents assembled from the invented pair sentences, repair ends with a summary
// that has no warnings (unless a single sentence is left), stays within the word budget, and is
// deterministic.
describe('coherence: automatic repair (properties)', () => {
  const fixture = JSON.parse(readFileSync(new URL('../fixtures/standalone-pairs.json', import.meta.url), 'utf8')) as { pairs: StandAlonePair[] };
  const sentences = fixture.pairs.filter((p) => p.context === 'sentence').flatMap((p) => [p.previous, p.sentence]);

  const blockArb: fc.Arbitrary<DocBlock> = fc.oneof(
    { weight: 1, arbitrary: fc.constantFrom('Setup', 'Daily use', 'Winter').map((heading) => ({ heading })) },
    { weight: 4, arbitrary: fc.array(fc.constantFrom(...sentences), { minLength: 1, maxLength: 4 }).map((paragraph) => ({ paragraph })) },
    { weight: 1, arbitrary: fc.array(fc.constantFrom(...sentences), { minLength: 1, maxLength: 2 }).map((item) => ({ item })) },
  );

  const caseArb = fc
    .array(blockArb, { minLength: 1, maxLength: 8 })
    .map((blocks) => buildDoc(blocks))
    .filter((d) => d.sentences.length >= 2)
    .chain((d) =>
      fc.record({
        doc: fc.constant(d),
        picked: fc.uniqueArray(fc.nat(d.sentences.length - 1), { minLength: 1, maxLength: Math.min(6, d.sentences.length) }),
        scores: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: d.sentences.length, maxLength: d.sentences.length }),
        slack: fc.nat(30),
      }),
    );

  it('leaves no warnings, keeps the budget and repeats itself exactly', () => {
    let cases = 0;
    let repairedSomething = 0;
    fc.assert(
      fc.property(caseArb, ({ doc: d, picked, scores, slack }) => {
        const wordsOf = wordsIn(d);
        const used = total(d, picked);
        const request: RepairInput = { doc: d, picked, scores: new Float64Array(scores), wordBudget: used + slack, wordsOf };
        const out = repairAutomatically(request);
        const again = repairAutomatically(request);
        assert.deepEqual(again.picked, out.picked);
        assert.deepEqual([...again.edited], [...out.edited]);

        assert.deepEqual(out.picked, [...new Set(out.picked)].sort((a, b) => a - b));
        assert.ok(total(d, out.picked) <= used + slack, 'over budget');
        for (const [i, text] of out.edited) {
          assert.ok(out.picked.includes(i));
          assert.ok(d.sentences[i]!.text.toLowerCase().endsWith(text.slice(1).toLowerCase()), `edited text is not a trimmed source: ${text}`);
        }
        const left = findStandAloneProblems(d, out.picked, { edited: out.edited });
        if (out.picked.length > 1) assert.deepEqual(left.map((w) => `${w.sentence}:${w.words}`), [], out.log.join('\n'));
        cases++;
        if (out.log.length > 0) repairedSomething++;
      }),
      { numRuns: 300, seed: 20240611 },
    );
    console.log(`      ${cases} random summaries, ${repairedSomething} needed repair`);
    assert.ok(repairedSomething > cases / 10, 'the generator hardly produces dangling summaries');
  });
});
