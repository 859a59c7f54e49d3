import assert from 'node:assert/strict';
import { CONNECTIVES, PDTB2_CONNECTIVES, danglingTrigger } from '../../src/core/coherence/index';
import { leadingConnectiveOf } from '../../src/core/coherence/connectives';

describe('coherence: connective inventory', () => {
  it('lists the 100 explicit connective types of the Penn Discourse Treebank 2.0', () => {
    // Prasad et al. (2008), "The Penn Discourse TreeBank 2.0": 100 distinct explicit connective
    // types are annotated — count and list from memory.
    assert.equal(PDTB2_CONNECTIVES.length, 100);
    assert.equal(new Set(PDTB2_CONNECTIVES.map((c) => c.phrase)).size, 100);
    assert.ok(PDTB2_CONNECTIVES.every((c) => c.source === 'pdtb2'));
    const phrases = new Set(CONNECTIVES.map((c) => c.phrase));
    assert.equal(phrases.size, CONNECTIVES.length, 'project additions must not repeat PDTB types');
  });

  it('marks the connectives the brief names as depending on prior context, and subordinators as not', () => {
    const byPhrase = new Map(CONNECTIVES.map((c) => [c.phrase, c]));
    for (const phrase of ['however', 'therefore', 'in addition', 'as a result', 'on the other hand', 'also', 'finally', 'second']) {
      assert.equal(byPhrase.get(phrase)?.dependsOnPrior, true, phrase);
    }
    for (const phrase of ['because', 'although', 'if', 'when', 'while', 'since', 'unless', 'once']) {
      assert.equal(byPhrase.get(phrase)?.dependsOnPrior, false, phrase);
      assert.equal(byPhrase.get(phrase)?.role, 'subordinating', phrase);
    }
    // A subordinating conjunction finds both arguments inside its sentence: none depends on prior text.
    assert.ok(CONNECTIVES.filter((c) => c.role === 'subordinating').every((c) => !c.dependsOnPrior));
    assert.ok(CONNECTIVES.filter((c) => c.role === 'paired').every((c) => !c.dependsOnPrior));
  });

  it('flags every context-dependent connective at the start of a sentence', () => {
    const missed: string[] = [];
    for (const c of CONNECTIVES.filter((x) => x.dependsOnPrior)) {
      const opener = c.phrase.split('..')[0]!;
      const sentence = `${opener[0]!.toUpperCase()}${opener.slice(1)}, the valve opens at dawn.`;
      const hit = danglingTrigger(sentence);
      if (hit?.trigger !== 'connective' || hit.words.toLowerCase() !== opener) missed.push(sentence);
    }
    assert.deepEqual(missed, []);
  });

  it('does not flag a subordinating or paired connective at the start of a sentence', () => {
    const flagged: string[] = [];
    for (const c of CONNECTIVES.filter((x) => x.role === 'subordinating' || x.role === 'paired')) {
      const opener = c.phrase.split('..')[0]!;
      const sentence = `${opener[0]!.toUpperCase()}${opener.slice(1)} the valve opens, the pump starts at dawn.`;
      if (danglingTrigger(sentence) !== null) flagged.push(sentence);
    }
    assert.deepEqual(flagged, []);
  });
});

describe('coherence: leading connective matching', () => {
  const match = (text: string) => leadingConnectiveOf(text)?.connective.phrase ?? null;

  it('prefers the longest connective', () => {
    assert.equal(match('On the other hand, rye needs longer.'), 'on the other hand');
    assert.equal(match('In other words, nobody approves alone.'), 'in other words');
    assert.equal(match('As a result, fewer loaves are baked.'), 'as a result');
  });

  it('needs a comma after connectives that are also adjectives or "no matter how"', () => {
    assert.equal(match('However, the ferry was late.'), 'however');
    assert.equal(match('However the booking is made, the email arrives.'), null);
    assert.equal(match('Earlier versions did not show fares.'), null);
    assert.equal(match('Next week the dome is repaired.'), null);
    assert.equal(match('Further tests are planned.'), null);
    assert.equal(match('Second-hand tools are welcome.'), null);
  });

  it('steps aside when a preposition follows ("As a result of", "In addition to", "Instead of")', () => {
    // "As" alone is then the subordinator, which does not point back.
    assert.equal(match('As a result of the probes, water use fell.'), 'as');
    assert.equal(match('In addition to drills, the library lends ladders.'), null);
    assert.equal(match('Instead of a log, the desk uses a tablet.'), null);
    assert.equal(match('So far, no station has failed.'), null);
    assert.equal(danglingTrigger('As a result of the probes, water use fell.'), null);
    assert.equal(danglingTrigger('In contrast to the valley, the summit is windy.'), null);
  });

  it('reports the connective words and offsets as written, after leading quotes', () => {
    const text = '“Therefore, the app downloads the timetable.”';
    const hit = danglingTrigger(text)!;
    assert.equal(hit.trigger, 'connective');
    assert.equal(hit.words, 'Therefore');
    assert.equal(text.slice(hit.start, hit.end), 'Therefore');
    assert.equal(hit.start, 1);
  });
});
