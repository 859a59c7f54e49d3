import assert from 'node:assert/strict';
import { CopyIndex } from '../../src/core/check/copy';
import { wordTokens } from '../../src/core/text/tokens';

// Containment of word 3-grams (Broder 1997): c(a, b) = |S(a) ∩ S(b)| / |S(a)|. Invented sentences.
const body = [
  'The late ferry leaves the harbour at eleven on Fridays and Saturdays.',
  'Ticket machines on every pier accept contactless cards.',
  'Paper tickets stay on sale at the kiosks.',
];
const index = new CopyIndex(body.map(wordTokens));

describe('check: copy detection', () => {
  it('marks a verbatim copy with containment 1', () => {
    const match = index.match(wordTokens('The late ferry leaves the harbour at eleven on Fridays and Saturdays.'));
    assert.deepEqual(match, { kind: 'verbatim', positions: [0], containment: 1 });
  });

  it('marks a copy with one word changed as near-verbatim (7 of 10 shingles, by hand)', () => {
    const match = index.match(wordTokens('The late ferry leaves the port at eleven on Fridays and Saturdays.'));
    assert.equal(match?.kind, 'nearVerbatim');
    assert.equal(match?.containment, 0.7);
  });

  it('finds a claim that joins two consecutive sentences', () => {
    const match = index.match(wordTokens('Ticket machines on every pier accept contactless cards. Paper tickets stay on sale at the kiosks.'));
    assert.deepEqual(match?.positions, [1, 2]);
    // The two 3-grams that straddle the full stop are in neither sentence: 12 of 14.
    assert.equal(match?.kind, 'nearVerbatim');
    assert.ok(Math.abs(match!.containment - 12 / 14) < 1e-12, String(match?.containment));
  });

  it('does not mark a paraphrase or a very short claim', () => {
    assert.equal(index.match(wordTokens('Contactless cards work at the pier machines.')), null);
    assert.equal(index.match(wordTokens('The late ferry.')), null);
  });
});
