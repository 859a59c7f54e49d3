/**
 * Counting the bytes that are not valid UTF-8, checked against the platform's WHATWG decoder
 * (TextDecoder with fatal: true) as the judge of what is valid, and against the worked example of
 * "U+FFFD substitution of maximal subparts" in the Unicode Standard, chapter 3 (from memory).
 */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { countInvalidBytes, decodeUtf8 } from '../../src/cli/utf8';

const strict = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });

/** Reference count: at each position, a well-formed sequence of 1-4 bytes is skipped, anything else is one invalid byte. */
function referenceCount(bytes: Uint8Array): number {
  let invalid = 0;
  let i = 0;
  while (i < bytes.length) {
    let length = 0;
    for (let n = 1; n <= 4 && i + n <= bytes.length && length === 0; n++) {
      try {
        const decoded = strict.decode(bytes.subarray(i, i + n));
        if ([...decoded].length === 1) length = n;
      } catch {
        // not a whole sequence of n bytes
      }
    }
    if (length === 0) {
      invalid++;
      i++;
    } else i += length;
  }
  return invalid;
}

describe('UTF-8 decoding with a count of invalid bytes', () => {
  it('matches the Unicode Standard example: 61 F1 80 80 E1 80 C2 62 80 63 80 BF 64', () => {
    const bytes = Uint8Array.from([0x61, 0xf1, 0x80, 0x80, 0xe1, 0x80, 0xc2, 0x62, 0x80, 0x63, 0x80, 0xbf, 0x64]);
    const decoded = decodeUtf8(bytes);
    // Three, one and two replacement characters as the standard shows; nine bytes in all.
    assert.equal(decoded.text, 'a\ufffd\ufffd\ufffdb\ufffdc\ufffd\ufffdd');
    assert.equal(decoded.invalidBytes, 9);
  });

  it('counts nothing for valid text, and reports and removes a byte-order mark', () => {
    const valid = decodeUtf8(Buffer.from('\ufeffcafé 𠀋 €'));
    assert.deepEqual(valid, { text: 'café 𠀋 €', byteOrderMark: true, invalidBytes: 0 });
    assert.equal(decodeUtf8(Buffer.from('plain')).byteOrderMark, false);
  });

  it('agrees with the platform decoder on random bytes', () => {
    const byte = fc.oneof(fc.integer({ min: 0, max: 0x7f }), fc.integer({ min: 0x80, max: 0xbf }), fc.integer({ min: 0xc0, max: 0xff }));
    fc.assert(
      fc.property(fc.array(byte, { maxLength: 40 }), (values) => {
        const bytes = Uint8Array.from(values);
        assert.equal(countInvalidBytes(bytes), referenceCount(bytes));
      }),
      { numRuns: 3000, seed: 1016 },
    );
  });
});
