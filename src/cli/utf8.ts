/**
 * UTF-8 decoding that says what it did: whether a byte-order mark was removed and how many bytes
 * were not valid UTF-8 (each maximal invalid sequence becomes one U+FFFD, as the WHATWG Encoding
 * standard decodes it).
 */

export interface DecodedText {
  readonly text: string;
  /** The bytes began with EF BB BF, which is not part of `text`. */
  readonly byteOrderMark: boolean;
  /** Bytes that were not valid UTF-8 and now read as U+FFFD. */
  readonly invalidBytes: number;
}

export function decodeUtf8(bytes: Uint8Array): DecodedText {
  const byteOrderMark = bytes.length >= 3 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf;
  try {
    return { text: new TextDecoder('utf-8', { fatal: true }).decode(bytes), byteOrderMark, invalidBytes: 0 };
  } catch {
    return { text: new TextDecoder('utf-8').decode(bytes), byteOrderMark, invalidBytes: countInvalidBytes(bytes) };
  }
}

/** Bytes outside well-formed UTF-8 sequences (Unicode 15, table 3-7). */
export function countInvalidBytes(bytes: Uint8Array): number {
  let invalid = 0;
  let i = 0;
  while (i < bytes.length) {
    const lead = bytes[i]!;
    if (lead < 0x80) {
      i++;
      continue;
    }
    const [length, low, high] = sequenceShape(lead);
    if (length === 0) {
      invalid++;
      i++;
      continue;
    }
    // The bytes of a truncated or broken sequence that were valid so far are replaced together.
    let k = 1;
    for (; k < length && i + k < bytes.length; k++) {
      const next = bytes[i + k]!;
      const min = k === 1 ? low : 0x80;
      const max = k === 1 ? high : 0xbf;
      if (next < min || next > max) break;
    }
    if (k < length) invalid += k;
    i += k;
  }
  return invalid;
}

/** Length of the sequence a lead byte opens and the allowed range of its second byte; 0 for a byte that cannot lead. */
function sequenceShape(lead: number): readonly [number, number, number] {
  if (lead >= 0xc2 && lead <= 0xdf) return [2, 0x80, 0xbf];
  if (lead === 0xe0) return [3, 0xa0, 0xbf];
  if (lead === 0xed) return [3, 0x80, 0x9f];
  if (lead >= 0xe1 && lead <= 0xef) return [3, 0x80, 0xbf];
  if (lead === 0xf0) return [4, 0x90, 0xbf];
  if (lead >= 0xf1 && lead <= 0xf3) return [4, 0x80, 0xbf];
  if (lead === 0xf4) return [4, 0x80, 0x8f];
  return [0, 0, 0];
}
