/**
 * Fallback boundaries: text the punctuation scanner leaves whole (other scripts' full stops, Thai,
 * HTML pasted as text, one item per line, no punctuation at all) is still split into units no
 * longer than a long sentence, while every span keeps the splitter's contract (trimmed, in
 * order, covering every non-space character, never splitting a character).
 */
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { parseDocument } from '../../src/core/formats/registry';
import { FALLBACK_PIECE_CHARS, MAX_SENTENCE_CHARS, splitSentences, type LineBreaks } from '../../src/core/segment/sentences';
import type { Span } from '../../src/core/types';

const split = (text: string, lines?: LineBreaks) => splitSentences(text, lines).map((s) => text.slice(s.start, s.end));

/** The splitter's contract for any input; the failures as text. */
function contractFailures(text: string, spans: readonly Span[]): string[] {
  const failures: string[] = [];
  let previous = 0;
  const covered = new Uint8Array(text.length);
  for (const { start, end } of spans) {
    if (!(start >= previous && end > start && end <= text.length)) failures.push(`span ${start}-${end} out of order or empty`);
    if (/^\s|\s$/u.test(text.slice(start, end))) failures.push(`span ${start}-${end} not trimmed`);
    for (const edge of [start, end]) {
      const code = text.charCodeAt(edge);
      if (edge > 0 && code >= 0xdc00 && code <= 0xdfff && text.charCodeAt(edge - 1) >= 0xd800 && text.charCodeAt(edge - 1) <= 0xdbff) failures.push(`offset ${edge} splits a surrogate pair`);
    }
    covered.fill(1, start, end);
    previous = end;
  }
  for (let i = 0; i < text.length; i++) if (!/\s/u.test(text.charAt(i)) && covered[i] !== 1) failures.push(`character ${i} not covered`);
  return failures;
}

describe('fallback sentence boundaries', () => {
  it('splits at the full stops of other scripts by the platform rules (Intl.Segmenter, ICU), leaving English to the scanner', () => {
    // Expected pieces are what ICU's sentence rules (UAX #29) give for each text, checked by hand against Intl.Segmenter in Node 20 (ICU 78).
    assert.deepEqual(split('यह पहला वाक्य है। यह दूसरा है।'), ['यह पहला वाक्य है।', 'यह दूसरा है।']);
    assert.deepEqual(split('Սա առաջինն է։ Սա երկրորդն է։'), ['Սա առաջինն է։', 'Սա երկրորդն է։']);
    assert.deepEqual(split('ይህ የመጀመሪያ ነው። ይህ ሁለተኛ ነው።'), ['ይህ የመጀመሪያ ነው።', 'ይህ ሁለተኛ ነው።']);
    assert.deepEqual(split('هل هذا أول؟ نعم هذا ثان.'), ['هل هذا أول؟', 'نعم هذا ثان.']);
    // The platform would also cut after "Dr."; the scanner decides that one and does not.
    assert.deepEqual(split('Dr. Rao wrote यह पहला है। Then he left.'), ['Dr. Rao wrote यह पहला है।', 'Then he left.']);
  });

  it('splits Thai at the spaces between Thai words (Thai writes phrases and sentences apart, words together; from memory)', () => {
    // Written for this test: "Hello. Today the weather is very nice. We will go to the sea. ..."
    const thai = 'สวัสดีครับ วันนี้อากาศดีมาก เราจะไปเที่ยวทะเลกัน แล้วก็กินข้าวที่ร้านอาหารริมหาด หลังจากนั้นเราจะกลับบ้านตอนเย็น พรุ่งนี้ต้องทำงานแต่เช้า';
    assert.equal(split(thai).length, 6);
    // A space next to a number or a Latin word is not a Thai phrase boundary.
    assert.deepEqual(split('ราคา 100 บาท'), ['ราคา 100 บาท']);
  });

  it('ends a unit after an HTML block element pasted as text, with the closing tags that follow it', () => {
    const html = '<html><body><p>First paragraph about ferry routes</p><p>Second paragraph about dock repairs</p><ul><li>one item</li><li>two item</li></ul></body></html>';
    assert.deepEqual(split(html), [
      '<html><body><p>First paragraph about ferry routes</p>',
      '<p>Second paragraph about dock repairs</p>',
      '<ul><li>one item</li>',
      '<li>two item</li></ul></body></html>',
    ]);
  });

  it('in plain text, a line that ends before the next word would have run out of room ends a unit', () => {
    const list = parseDocument('Groceries\n\napples\nbread for the week\nmilk from the corner shop\nolive oil\nrice and beans\ntea\n', { format: 'plaintext' });
    assert.deepEqual(
      list.sentences.map((s) => s.text),
      // "milk from the corner shop" is the longest line: nothing shows its break was not wrapping.
      ['Groceries', 'apples', 'bread for the week', 'milk from the corner shop olive oil', 'rice and beans', 'tea'],
    );
    // Text wrapped to a width (here 40 columns) is never cut at its line ends, punctuated or not.
    const wrapped = 'the crew moves the bikes between docks at\nnight and the vans follow them across the\nriver before the morning counts begin and\nthe riders come';
    assert.equal(parseDocument(wrapped, { format: 'plaintext' }).sentences.length, 1);
    // Markdown joins the lines of a paragraph by definition (CommonMark 0.30, 6.7 soft line breaks).
    assert.equal(parseDocument('apples\nbread for the week\nmilk\n', { format: 'markdown' }).sentences.length, 1);
  });

  it(`cuts a run without punctuation longer than ${MAX_SENTENCE_CHARS} characters into pieces of at most ${FALLBACK_PIECE_CHARS}, at spaces`, () => {
    const words = ['the', 'river', 'crossing', 'team', 'met', 'again', 'and', 'talked', 'about', 'boats'];
    const text = Array.from({ length: 400 }, (_, i) => words[(i * 7) % words.length]).join(' ');
    const pieces = split(text);
    assert.ok(pieces.length >= text.length / FALLBACK_PIECE_CHARS, `${pieces.length} pieces`);
    assert.ok(pieces.every((p) => p.length <= FALLBACK_PIECE_CHARS && p.length >= 100), JSON.stringify(pieces.map((p) => p.length)));
    assert.equal(pieces.join(' '), text);
    // Short enough, it stays whole.
    assert.equal(split(text.slice(0, MAX_SENTENCE_CHARS)).length, 1);
  });

  it('prefers a clause mark to a space, and in a long plain-text run a line break to either', () => {
    const clauses = Array.from({ length: 30 }, (_, i) => `the crew moved bikes to dock ${i}; then`).join(' ');
    assert.ok(split(clauses).slice(0, -1).every((p) => p.endsWith(';')));
    const lines = Array.from({ length: 2_000 }, (_, i) => `dock${i}`).join('\n');
    const doc = parseDocument(lines, { format: 'plaintext' });
    assert.ok(doc.sentences.length > 40 && doc.sentences.every((s) => s.text.length <= FALLBACK_PIECE_CHARS));
    // Each piece ends where a line ended: no line is cut in two.
    assert.ok(doc.sentences.every((s) => /^dock\d+( dock\d+)*$/.test(s.text)));
  });

  it('cuts a long run of a script without spaces between characters, never inside one (emoji sequences, surrogate pairs)', () => {
    const family = '\u{1F468}\u200D\u{1F469}\u200D\u{1F467}';
    const text = `夜間の再配置${family}作業員𠀋`.repeat(200);
    const spans = splitSentences(text);
    assert.deepEqual(contractFailures(text, spans), []);
    assert.ok(spans.length > 1 && spans.every((s) => s.end - s.start <= FALLBACK_PIECE_CHARS));
    for (const s of spans) assert.ok(!text.slice(s.start, s.end).startsWith('\u200D'), 'an emoji sequence was cut');
  });

  it('keeps a long token without spaces in a spaced script as one unit (data, not prose)', () => {
    assert.equal(split(`Key: ${'Qm9va2luZ3M'.repeat(500)}`).length, 1);
  });

  it('keeps the contract on arbitrary mixes of scripts, tags, line breaks and long runs', () => {
    const piece = fc.constantFrom('the crew ', 'วันนี้ ', 'อากาศ ', '</p>', '<br>', '; ', ', ', '। ', '؟ ', '\n', '  ', 'Dr. ', 'x'.repeat(40), '夜間', '𠀋', '\u0301', 'a.', ' ');
    fc.assert(
      fc.property(fc.array(piece, { maxLength: 200 }), fc.boolean(), (parts, deliberate) => {
        const text = parts.join('');
        const softBreaks: number[] = [];
        for (let i = 0; i < text.length; i++) if (text[i] === ' ' && i % 7 === 0) softBreaks.push(i);
        const spans = splitSentences(text, { softBreaks, deliberate });
        assert.deepEqual(contractFailures(text, spans), []);
        for (const { start, end } of spans) assert.ok(!text.slice(start, end).includes('\n'));
      }),
      { numRuns: 400, seed: 16 },
    );
  });
});
