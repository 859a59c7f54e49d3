import assert from 'node:assert/strict';
import { paragraphPlaces, positionRank, POSITION_DEFAULTS } from '../../src/core/rank/position';
import { analyzedDocument, analyzedFromTerms } from './helpers/analyzed-fixture';

describe('rank/position', () => {
  // Root: P0 = [s0 s1 s2]            Section "Costs": P1 = [s3 s4], P2 = [s5]
  // Section "Schedule": P3 = [s6]
  const doc = analyzedDocument({
    title: 'Depot plan',
    sections: [
      { paragraphs: [[['a'], ['b'], ['c']]] },
      { heading: 'Costs', paragraphs: [[['d'], ['e']], [['f']]] },
      { heading: 'Schedule', paragraphs: [[['g']]] },
    ],
  });

  it('marks first/last paragraphs of each section', () => {
    const places = paragraphPlaces(doc.doc);
    assert.deepEqual(Array.from(places.first), [1, 1, 0, 1]);
    // Root and Schedule have one paragraph each: "first" only.
    assert.deepEqual(Array.from(places.last), [0, 0, 1, 0]);
  });

  it('scores each sentence as the weighted sum of its structural features', () => {
    const { scores, features } = positionRank(doc);
    const w = POSITION_DEFAULTS.weights;
    // s0: paragraph start, section start, lead 1
    assert.equal(scores[0], w.paragraphStart + w.sectionStart + w.documentLead * 1);
    // s1: middle of paragraph, section start, lead 1 − 1/5
    assert.equal(scores[1], w.sectionStart + w.documentLead * 0.8);
    // s2: paragraph end, section start, lead 0.6
    assert.equal(scores[2], w.paragraphEnd + w.sectionStart + w.documentLead * 0.6);
    // s5: lone sentence of the last paragraph of "Costs" (no lead: index 5 ≥ 5)
    assert.equal(scores[5], w.paragraphStart + w.sectionEnd);
    assert.deepEqual(Array.from(features!.documentLead!), [1, 0.8, 0.6, 0.4, 0.2, 0, 0]);
    assert.deepEqual(Array.from(features!.paragraphEnd!), [0, 0, 1, 0, 1, 0, 0]);
  });

  it('follows Baxendale: a paragraph\u2019s first sentence beats its last, which beats its middle', () => {
    // Baxendale (1958), from memory: topic sentence first in ~85% of paragraphs, last in ~7%.
    const flat = analyzedDocument({ sections: [{ paragraphs: [[['x']], [['a'], ['b'], ['c']], [['y']]] }] });
    const { scores } = positionRank(flat, { position: { leadSentences: 0 } });
    // s1 = first, s2 = middle, s3 = last of the middle paragraph (no section or lead bonus there).
    assert.ok(scores[1]! > scores[3]! && scores[3]! > scores[2]!);
    assert.equal(scores[2], 0);
  });

  it('gives list items no paragraph start/end bonus', () => {
    const list = analyzedDocument({ sections: [{ paragraphs: [[['intro']], [['one'], ['more']], [['two']]], kinds: ['paragraph', 'listItem', 'listItem'] }] });
    const { features } = positionRank(list);
    assert.deepEqual(Array.from(features!.paragraphStart!), [1, 0, 0, 0]);
    assert.deepEqual(Array.from(features!.paragraphEnd!), [0, 0, 0, 0]);
  });

  it('lets options override the weights', () => {
    const { scores } = positionRank(doc, { position: { weights: { paragraphStart: 0, sectionStart: 0, documentLead: 0, paragraphEnd: 0, sectionEnd: 1 } } });
    assert.deepEqual(Array.from(scores), [0, 0, 0, 0, 0, 1, 0]);
  });

  it('handles an empty document and a single sentence', () => {
    assert.equal(positionRank(analyzedFromTerms([])).scores.length, 0);
    const one = positionRank(analyzedFromTerms([[]]));
    const w = POSITION_DEFAULTS.weights;
    assert.deepEqual(Array.from(one.scores), [w.paragraphStart + w.sectionStart + w.documentLead]);
  });
});
