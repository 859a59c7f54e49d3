/** The abstract-check benchmark's perturbation rules (bench/perturb.ts): the modal swap and whether the body gives evidence against it. Invented sentences. */
import assert from 'node:assert/strict';
import { BodyFacts, perturbAbstract } from '../../bench/perturb';

const ABSTRACT = 'Every ferry operator must publish the winter timetable before the first crossing.\n';

function modalSwap(body: string) {
  const found = perturbAbstract({ abstractText: ABSTRACT, format: 'markdown', facts: new BodyFacts(body), foreignSentences: [], seed: 7 }).filter((p) => p.kind === 'modal');
  assert.equal(found.length, 1, 'one modal swap');
  return found[0]!;
}

describe('benchmark perturbations: modal swaps', () => {
  it('swaps "must" for a modal of another strength', () => {
    const swap = modalSwap('Operators publish the timetable in October.\n');
    assert.match(swap.after, /\b(should|may|will) publish\b/);
    assert.doesNotMatch(swap.after, /\bmust\b/);
  });

  it('marks the swap as having body evidence only when a body sentence about the same thing puts the original modal on the word', () => {
    assert.equal(modalSwap('Each ferry operator must publish its winter timetable on the harbour board.\n').bodyStatesModal, true);
    // The body states it plainly: nothing there to set against the swap.
    assert.equal(modalSwap('Each ferry operator publishes its winter timetable on the harbour board.\n').bodyStatesModal, false);
    // The original modal on the word, but in a sentence about something else.
    assert.equal(modalSwap('Cafés must publish their menus.\n').bodyStatesModal, false);
  });
});

describe('benchmark perturbations: negation flips', () => {
  const flips = (abstract: string, body: string) =>
    perturbAbstract({ abstractText: abstract, format: 'markdown', facts: new BodyFacts(body), foreignSentences: [], seed: 7 }).filter((p) => p.kind === 'negation');

  it('inserts "not" after an auxiliary the body grounds, but never makes the idiom "not only" (common practice, no source)', () => {
    const body = 'The winter timetable is available on the harbour board.\n';
    const [flip] = flips('The winter timetable is available on the harbour board.\n', body);
    assert.ok(flip);
    assert.match(flip!.after, /\bis not available\b/);
    assert.deepEqual(flips('The winter timetable is only available on the harbour board.\n', body).map((p) => p.after), []);
  });
});
