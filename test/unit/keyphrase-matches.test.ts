/**
 * Key phrase occurrences (src/core/keyphrases/phrase-matches.ts) against the regular expression
 * they stand for, run by the JavaScript engine itself: the same spans on generated sentences.
 */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { phraseMatches } from '../../src/core/keyphrases/phrase-matches';

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** The pattern the matcher follows. */
function expressionMatches(text: string, phrase: string): { start: number; end: number }[] {
  const pattern = new RegExp(`(?<![\\p{L}\\p{N}])${phrase.split(' ').map(escapeRegExp).join('[^\\p{L}\\p{N}]{1,12}')}(?![\\p{L}\\p{N}])`, 'giu');
  return [...text.matchAll(pattern)].map((m) => ({ start: m.index, end: m.index + m[0].length }));
}

// Case folding corners: Kelvin sign and long s fold to ASCII letters, U+0345 to a Greek letter;
// dotted I, sharp s, final sigma, a Deseret (astral) case pair; marks, digits and joiners in words.
const letters = ['a', 'b', 'k', 's', 'A', 'K', 'S', '\u212a', '\u017f', '\u0345', 'ι', 'İ', 'i', 'ß', 'ẞ', 'σ', 'ς', 'Σ', '\u{10400}', '\u{10428}', 'é', 'e\u0301', '\u0301', '\u0308', '1', '2'];
const joiners = ["'", '-', '.', '’'];
const separators = [' ', '  ', '\n', '*', '**', '`', ' - ', '_', '(', ')', '\u00a0', '\u{1F600}', ' '.repeat(11), ' '.repeat(12), ' '.repeat(13), '.'.repeat(12)];

const word = fc
  .tuple(fc.array(fc.constantFrom(...letters), { minLength: 1, maxLength: 3 }), fc.option(fc.constantFrom(...joiners)), fc.array(fc.constantFrom(...letters), { maxLength: 2 }))
  .map(([head, joiner, tail]) => head.join('') + (joiner !== null && tail.length > 0 ? joiner + tail.join('') : ''));
const phrase = fc.array(word, { minLength: 1, maxLength: 3 });

/** A text that often holds the phrase, its words recased and joined by generated gaps. */
const textFor = (words: readonly string[]) =>
  fc.array(
    fc.oneof(
      word,
      fc.constantFrom(...separators),
      fc.tuple(fc.array(fc.constantFrom(...separators), { minLength: words.length, maxLength: words.length }), fc.boolean()).map(([gaps, upper]) =>
        words.map((w, k) => (upper ? w.toUpperCase() : w) + (k < words.length - 1 ? gaps[k] : '')).join(''),
      ),
    ),
    { maxLength: 12 },
  ).map((parts) => parts.join(''));

describe('key phrase occurrences', () => {
  it('finds what the phrase pattern finds (generated phrases and sentences)', () => {
    fc.assert(
      fc.property(phrase.chain((words) => fc.tuple(fc.constant(words), textFor(words))), ([words, text]) => {
        const joined = words.join(' ');
        assert.deepEqual(phraseMatches(text, joined), expressionMatches(text, joined));
      }),
      { numRuns: 3000 },
    );
  });

  it('matches any case, across markup, never inside a word', () => {
    const text = 'Rider **Rewards** and rider-rewards; riderrewards, Rider\n\nrewards.';
    assert.deepEqual(phraseMatches(text, 'rider rewards'), expressionMatches(text, 'rider rewards'));
    assert.deepEqual(phraseMatches(text, 'rider rewards').map((s) => text.slice(s.start, s.end)), ['Rider **Rewards', 'rider-rewards', 'Rider\n\nrewards']);
    assert.deepEqual(phraseMatches('The \u212aelvin scale', 'kelvin'), [{ start: 4, end: 10 }]);
  });
});
