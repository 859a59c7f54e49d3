import assert from 'node:assert/strict';
import { countPhrases, edmundsonRank, phraseIndex, effectiveCueWords, EDMUNDSON_DEFAULTS, titleComponent } from '../../src/core/rank/edmundson';
import { analyzedDocument, analyzedFromTerms } from './helpers/analyzed-fixture';

const s = (words: string[], terms: string[]) => ({ words, terms });

describe('rank/edmundson', () => {
  // Worked example (by hand). Title "harbour ferry timetable"; root P0 = [s0];
  // "Introduction" P1 = [s1 s2]; "Costs" P2 = [s3], P3 = [s4].
  const doc = analyzedDocument({
    title: 'harbour ferry timetable',
    sections: [
      { paragraphs: [[s(['the', 'ferry', 'timetable', 'is', 'important'], ['ferry', 'timetable', 'important'])]] },
      {
        heading: 'Introduction',
        paragraphs: [
          [
            s(['perhaps', 'the', 'harbour', 'ferry', 'runs', 'late'], ['harbour', 'ferry', 'runs', 'late']),
            s(['for', 'example', 'the', 'late', 'ferry', 'costs', 'money'], ['example', 'late', 'ferry', 'costs', 'money']),
          ],
        ],
      },
      { heading: 'Costs', paragraphs: [[s(['costs', 'rise', 'in', 'winter'], ['costs', 'rise', 'winter'])], [s(['in', 'summary', 'costs', 'matter'], ['summary', 'costs', 'matter'])]] },
    ],
  });

  it('computes the four components of the worked example', () => {
    const { features } = edmundsonRank(doc);
    // cue: "important" +1; "perhaps" −1; "for example" −1; none; "in summary" +1 (max |·| = 1).
    assert.deepEqual(Array.from(features!.cue!), [1, -1, -1, 0, 1]);
    // key (terms occurring ≥ 2 times: ferry 3, late 2, costs 3): 3, 3+2, 2+3+3, 3, 3 → ÷ 8.
    assert.deepEqual(Array.from(features!.key!), [3 / 8, 5 / 8, 1, 3 / 8, 3 / 8]);
    // title (title word 2, own heading word 1): ferry+timetable 4, harbour+ferry 4, ferry 2,
    // costs (heading) 1, costs 1 → ÷ 4.
    assert.deepEqual(Array.from(features!.title!), [1, 1, 0.5, 0.25, 0.25]);
    // location: s0 first paragraph + paragraph start = 2; s1 "Introduction" + start = 2;
    // s2 "Introduction" + paragraph end = 2; s3 start = 1; s4 last paragraph + start = 2 → ÷ 2.
    assert.deepEqual(Array.from(features!.location!), [1, 1, 1, 0.5, 1]);
  });

  it('combines the components linearly with the documented weights', () => {
    // cue·1 + key·0.5 + title·1 + location·1
    const { scores } = edmundsonRank(doc);
    assert.deepEqual(EDMUNDSON_DEFAULTS.weights, { cue: 1, key: 0.5, title: 1, location: 1 });
    assert.deepEqual(Array.from(scores), [3.1875, 1.3125, 1, 0.9375, 2.4375]);
    const keyOnly = edmundsonRank(doc, { edmundson: { weights: { cue: 0, title: 0, location: 0, key: 1 } } });
    assert.deepEqual(Array.from(keyOnly.scores), [3 / 8, 5 / 8, 1, 3 / 8, 3 / 8]);
  });

  it('adds the caller\u2019s cue words, the caller winning over a default list', () => {
    const cues = effectiveCueWords({ bonus: ['Winter', 'perhaps'], stigma: ['rise'] }, true);
    assert.ok(cues.bonus.includes('winter') && cues.bonus.includes('perhaps'));
    assert.ok(!cues.stigma.includes('perhaps'));
    const { features } = edmundsonRank(doc, { cueWords: { bonus: ['winter', 'perhaps'], stigma: ['rise'] } });
    // s1 "perhaps" now +1; s3 "rise" −1 and "winter" +1 → 0.
    assert.deepEqual(Array.from(features!.cue!), [1, 1, -1, 0, 1]);
    const only = edmundsonRank(doc, { cueWords: { bonus: ['money'], stigma: [] }, edmundson: { useDefaultCueWords: false } });
    assert.deepEqual(Array.from(only.features!.cue!), [0, 0, 1, 0, 0]);
  });

  it('matches cue phrases word by word', () => {
    const phrases = phraseIndex(['for example', 'example']);
    assert.equal(countPhrases(['for', 'example', 'for', 'example'], phrases), 4, 'two phrases, two single words');
    assert.equal(countPhrases(['example', 'for'], phraseIndex(['for example'])), 0);
    assert.equal(countPhrases(['for'], phraseIndex(['for example'])), 0, 'no match past the sentence end');
    assert.equal(countPhrases(['in', 'summary', 'we', 'agree'], ['in summary', 'agree']), 2, 'a plain list works too');
  });

  it('gives no heading bonus in a section titled like the document', () => {
    const titled = analyzedDocument({
      title: 'Tide tables',
      sections: [{ heading: 'Tide tables', depth: 1, paragraphs: [[['tide'], ['moon']]] }],
    });
    // "tide" counts once as a title word (2), not again as a heading word (would be 3).
    assert.deepEqual(Array.from(titleComponent(titled)), [2, 0]);
  });

  it('gives list items no paragraph-position credit in location', () => {
    const list = analyzedDocument({ sections: [{ paragraphs: [[['a']], [['b']], [['c']], [['d']]], kinds: ['paragraph', 'listItem', 'listItem', 'paragraph'] }] });
    // a: first paragraph + start = 2; b, c: list items = 0; d: last paragraph + start = 2.
    assert.deepEqual(Array.from(edmundsonRank(list).features!.location!), [1, 0, 0, 1]);
  });

  it('handles empty documents, termless sentences and all-zero components', () => {
    assert.equal(edmundsonRank(analyzedFromTerms([])).scores.length, 0);
    const single = edmundsonRank(analyzedFromTerms([{ words: ['it', 'is'], terms: [] }]));
    assert.deepEqual(Array.from(single.features!.key!), [0]);
    assert.deepEqual(Array.from(single.features!.cue!), [0]);
    assert.ok(single.scores.every(Number.isFinite));
  });
});
