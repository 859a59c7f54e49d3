import assert from 'node:assert/strict';
import fc from 'fast-check';
import { splitSentences } from '../../src/core/segment/sentences';

/** The sentences as text, for readable expectations. */
function split(text: string): string[] {
  return splitSentences(text).map((span) => text.slice(span.start, span.end));
}

describe('splitSentences', () => {
  describe('plain boundaries', () => {
    it('splits on periods, question marks and exclamation marks', () => {
      assert.deepEqual(split('The pump failed. Was it the seal? No! It was the valve.'), [
        'The pump failed.',
        'Was it the seal?',
        'No!',
        'It was the valve.',
      ]);
    });

    it('keeps runs of ? and ! together', () => {
      assert.deepEqual(split('Really?! Yes!!! Are you sure??? Fine.'), ['Really?!', 'Yes!!!', 'Are you sure???', 'Fine.']);
    });

    it('returns nothing for empty or blank text', () => {
      assert.deepEqual(splitSentences(''), []);
      assert.deepEqual(splitSentences(' \n\t '), []);
    });

    it('keeps text without terminal punctuation as one sentence', () => {
      assert.deepEqual(split('  a heading-like line without a period  '), ['a heading-like line without a period']);
    });

    it('gives offsets into the input, trimmed', () => {
      assert.deepEqual(splitSentences('  One.  Two.  '), [
        { start: 2, end: 6 },
        { start: 8, end: 12 },
      ]);
    });
  });

  describe('hard line breaks', () => {
    it('ends a sentence at every newline, punctuated or not', () => {
      assert.deepEqual(split('Install the agent\nRestart the node.\nCheck the log'), [
        'Install the agent',
        'Restart the node.',
        'Check the log',
      ]);
    });

    it('treats CRLF as one break and drops empty lines', () => {
      assert.deepEqual(split('First line\r\n\r\nSecond line'), ['First line', 'Second line']);
    });
  });

  describe('abbreviations', () => {
    it('does not split after titles', () => {
      assert.deepEqual(split('Mr. Okafor met Dr. Lindqvist and Prof. Aalto at noon.'), [
        'Mr. Okafor met Dr. Lindqvist and Prof. Aalto at noon.',
      ]);
    });

    it('does not split after e.g., i.e., etc. or vs. in mid-sentence', () => {
      assert.deepEqual(split('Use a light model, e.g. Ridge, i.e. linear, or trees vs. Forests etc. in tests.'), [
        'Use a light model, e.g. Ridge, i.e. linear, or trees vs. Forests etc. in tests.',
      ]);
    });

    it('splits after etc. or Inc. when they end a sentence', () => {
      assert.deepEqual(split('We sell bolts, nuts, etc. The rest is imported from Ferrovia Inc. It arrives weekly.'), [
        'We sell bolts, nuts, etc.',
        'The rest is imported from Ferrovia Inc.',
        'It arrives weekly.',
      ]);
    });

    it('keeps page, figure and number references together', () => {
      assert.deepEqual(split('See p. 12 and Fig. 3 for run No. 7 on Jan. 5 in vol. 2.'), [
        'See p. 12 and Fig. 3 for run No. 7 on Jan. 5 in vol. 2.',
      ]);
    });

    it('handles multi-period abbreviations by what follows', () => {
      assert.deepEqual(split('The U.S. Navy bought two. They left the U.S. In May they came back at 6 a.m. and slept.'), [
        'The U.S. Navy bought two.',
        'They left the U.S.',
        'In May they came back at 6 a.m. and slept.',
      ]);
    });

    it('keeps initials with the name', () => {
      assert.deepEqual(split('The report by J. R. Halvorsen was late. It was long.'), [
        'The report by J. R. Halvorsen was late.',
        'It was long.',
      ]);
    });
  });

  describe('numbers, names and addresses', () => {
    it('does not split decimals, versions, money or ordinals', () => {
      assert.deepEqual(split('Pi is 3.14 and v1.2.3 costs $4.50 today. Version 2.0 is out.'), [
        'Pi is 3.14 and v1.2.3 costs $4.50 today.',
        'Version 2.0 is out.',
      ]);
    });

    it('does not split file names, even at a sentence end', () => {
      assert.deepEqual(split('Edit config.yaml and README.md first. Then run build.sh. Done.'), [
        'Edit config.yaml and README.md first.',
        'Then run build.sh.',
        'Done.',
      ]);
    });

    it('does not split URLs or e-mail addresses', () => {
      assert.deepEqual(
        split('Docs live at https://docs.example.org/v2/Setup.Guide.html. Mail Ana.Lopes@example.net. Or visit www.Example.com today.'),
        [
          'Docs live at https://docs.example.org/v2/Setup.Guide.html.',
          'Mail Ana.Lopes@example.net.',
          'Or visit www.Example.com today.',
        ],
      );
    });

    it('splits run-together sentences but not code-like names', () => {
      assert.deepEqual(split('The cache was cold.Then it warmed up. Call Math.Round here.'), [
        'The cache was cold.',
        'Then it warmed up.',
        'Call Math.Round here.',
      ]);
    });
  });

  describe('quotes, brackets and ellipses', () => {
    it('keeps closing quotes and brackets with the sentence they end', () => {
      assert.deepEqual(split('She said, "The gate is open." He nodded. (As shown above.) Next step.'), [
        'She said, "The gate is open."',
        'He nodded.',
        '(As shown above.)',
        'Next step.',
      ]);
    });

    it('does not split a quotation followed by a lower-case word', () => {
      assert.deepEqual(split('"Stop here." she said. \u201cWhy?\u201d he asked.'), [
        '"Stop here." she said.',
        '\u201cWhy?\u201d he asked.',
      ]);
    });

    it('does not split inside a parenthesis that continues the sentence', () => {
      assert.deepEqual(split('The valve (replaced in May.) held up well. Good.'), [
        'The valve (replaced in May.) held up well.',
        'Good.',
      ]);
    });

    it('keeps a note marker after the full stop with its sentence', () => {
      assert.deepEqual(split('Pumps wear out.[1] Seals last longer.[^note] Done.'), [
        'Pumps wear out.[1]',
        'Seals last longer.[^note]',
        'Done.',
      ]);
    });

    it('treats ellipses by what follows', () => {
      assert.deepEqual(split('We waited\u2026 and waited... Nothing came.... The end.'), [
        'We waited\u2026 and waited...',
        'Nothing came....',
        'The end.',
      ]);
    });
  });

  describe('lists', () => {
    it('does not split after a leading item number or letter', () => {
      assert.deepEqual(split('1. Open the valve. 2. Close the tap.'), ['1. Open the valve.', '2. Close the tap.']);
      assert.deepEqual(split('b. Choose a pump.'), ['b. Choose a pump.']);
    });

    it('splits a one-line numbered list at each following marker', () => {
      assert.deepEqual(split('1) mix the dough 2) let it rest 3) bake'), ['1) mix the dough', '2) let it rest', '3) bake']);
    });

    it('leaves a stray number alone when the text is not a list', () => {
      assert.deepEqual(split('We ordered 2. Then we ordered 3 more.'), ['We ordered 2.', 'Then we ordered 3 more.']);
      assert.deepEqual(split('Step 1) is easy and step 2) is hard'), ['Step 1) is easy and step 2) is hard']);
    });

    it('splits at inline bullets', () => {
      assert.deepEqual(split('\u2022 first point \u2022 second point'), ['\u2022 first point', '\u2022 second point']);
    });
  });

  describe('scripts without spaces', () => {
    it('splits Chinese and Japanese full stops without a following space', () => {
      assert.deepEqual(split('\u4eca\u65e5\u306f\u6674\u308c\u3002\u660e\u65e5\u306f\u96e8\uff01\u672c\u5f53\uff1f'), [
        '\u4eca\u65e5\u306f\u6674\u308c\u3002',
        '\u660e\u65e5\u306f\u96e8\uff01',
        '\u672c\u5f53\uff1f',
      ]);
    });

    it('keeps emoji (surrogate pairs) whole', () => {
      const text = 'Ship it \u{1F680}. Done \u{1F389}!';
      assert.deepEqual(split(text), ['Ship it \u{1F680}.', 'Done \u{1F389}!']);
    });
  });

  describe('invariants (property-based)', () => {
    // Text built from the characters that drive the decisions, so odd combinations come up often.
    const pieces = fc.constantFrom(
      'word', 'Word', 'I', 'e.g', 'U.S', 'Mr', '3', '14', 'v1', 'x@y', 'http://a', '\u{1F600}', '\u4e2d',
      '.', '.', '?', '!', '\u2026', '\u3002', '"', '\u201d', ')', '(', '[', ']', "'", '\u2022', '1)', 'a.',
      ' ', ' ', ' ', '\n', '\t', '\u00a0',
    );
    const texts = fc.array(pieces, { maxLength: 60 }).map((parts) => parts.join(''));

    it('returns trimmed, ordered, non-overlapping spans covering every non-space character', () => {
      fc.assert(
        fc.property(texts, (text) => {
          const spans = splitSentences(text);
          let previousEnd = 0;
          const covered = new Uint8Array(text.length);
          for (const { start, end } of spans) {
            assert.ok(start >= previousEnd && start < end && end <= text.length, `bad span ${start}-${end}`);
            assert.ok(!/\s/u.test(text.charAt(start)) && !/\s/u.test(text.charAt(end - 1)), 'span not trimmed');
            assert.ok(!isLowSurrogate(text.charCodeAt(start)), 'span starts inside a surrogate pair');
            assert.ok(!isLowSurrogate(text.charCodeAt(end)), 'span ends inside a surrogate pair');
            covered.fill(1, start, end);
            previousEnd = end;
          }
          for (let i = 0; i < text.length; i++) {
            if (!/\s/u.test(text.charAt(i))) assert.equal(covered[i], 1, `character ${i} not covered`);
          }
        }),
        { numRuns: 2000, seed: 20240601 },
      );
    });

    it('never puts a line break inside a sentence', () => {
      fc.assert(
        fc.property(texts, (text) => {
          for (const { start, end } of splitSentences(text)) assert.ok(!text.slice(start, end).includes('\n'));
        }),
        { numRuns: 500, seed: 7 },
      );
    });
  });

  describe('large input', () => {
    it('splits a long text with long tokens and many periods', () => {
      // Shapes that would be quadratic for a scanner that looks back to the token start each time.
      const dotted = 'a.'.repeat(50_000);
      const sentences = 'The line ran. '.repeat(20_000);
      const text = `${dotted} ${sentences}Then ${'x'.repeat(100_000)}.`;
      const spans = splitSentences(text);
      assert.equal(spans.length, 1 + 20_000 + 1);
      assert.equal(text.slice(spans[1]!.start, spans[1]!.end), 'The line ran.');
    });
  });
});

function isLowSurrogate(code: number): boolean {
  return code >= 0xdc00 && code <= 0xdfff;
}
