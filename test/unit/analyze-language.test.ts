/**
 * Language detection inside analysis (src/core/analyze.ts): the detection sample's word tokens are
 * taken from the sentences' own tokens, which must be what tokenizing the sample itself gives.
 */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { languageSample, resolveLanguage, sampleTokens, sentenceWords } from '../../src/core/analyze';
import { parseDocument } from '../../src/core/formats/registry';
import { DETECTION_SAMPLE, wordTokens } from '../../src/core/text/tokens';
import type { ParsedDocument } from '../../src/core/types';

/** Just what the sample reads: the sentences' texts. */
const docOf = (texts: readonly string[]): ParsedDocument => ({ sentences: texts.map((text, index) => ({ index, text })) }) as unknown as ParsedDocument;

// Pieces that test the joins: final sigma, apostrophes, digit groups, marks, unspaced scripts, surrogate pairs.
const piece = fc.constantFrom('ΑΣ', 'Σα', 'ς', "'", '’', '1,0', ',', '5', '.', '-', '\u2010', 'e\u0301', '\u0301', '漢字', 'ไทย', '\u{1DF00}', '\u{20000}', 'Word', ' ', 'ß', 'İ');
const sentence = fc.array(piece, { minLength: 1, maxLength: 8 }).map((parts) => parts.join(''));

describe('analysis: the language sample', () => {
  it('takes the sample tokens from the sentences, as tokenizing the cut sample does', () => {
    fc.assert(
      fc.property(fc.array(sentence, { minLength: 1, maxLength: 12 }), fc.nat({ max: 40 }), (texts, padding) => {
        // A long first sentence puts the limit inside one of the generated ones.
        const all = ['x'.repeat(DETECTION_SAMPLE - 30 - padding), ...texts];
        const doc = docOf(all);
        const expected = wordTokens(languageSample(doc).slice(0, DETECTION_SAMPLE));
        assert.deepEqual(sampleTokens(doc, sentenceWords(doc)), expected);
      }),
      { numRuns: 300 },
    );
  });

  it('detects the same language with and without the sentences’ tokens', () => {
    const text = ['# Notas', '', 'La reunión de mañana es en la sala grande y todos los equipos deben venir con sus datos.', '', 'Die Fähre fährt um neun Uhr, und alle Gäste müssen vorher ihre Karten zeigen.'].join('\n');
    const doc = parseDocument(text, { format: 'markdown' });
    assert.equal(resolveLanguage(doc, 'auto', sentenceWords(doc)), resolveLanguage(doc, 'auto'));
    assert.equal(resolveLanguage(doc, 'fr', sentenceWords(doc)), 'fr');
  });
});
