import assert from 'node:assert/strict';
import { toString } from 'mdast-util-to-string';
import { fromMarkdown } from 'mdast-util-from-markdown';
import { gfmFromMarkdown } from 'mdast-util-gfm';
import { gfm } from 'micromark-extension-gfm';
import { parseDocument } from '../../src/core/formats/registry';
import type { ParsedDocument } from '../../src/core/types';

const md = (text: string, includeTables = false): ParsedDocument =>
  parseDocument(text, { format: 'markdown', includeTables });

/** Source text under each sentence's span. */
const sourceOf = (doc: ParsedDocument): string[] =>
  doc.sentences.map((s) => doc.text.slice(s.span.start - doc.baseOffset, s.span.end - doc.baseOffset));

const texts = (doc: ParsedDocument): string[] => doc.sentences.map((s) => s.text);

describe('parse: Markdown', () => {
  describe('inline code', () => {
    // CommonMark 0.30 §6.1: a code span's content is literal, so its "." and "?" are syntax, not
    // sentence punctuation (common practice, no source, for the splitting rule itself).
    it('never ends a sentence inside a code span', () => {
      const doc = md('Both `${ .. }` and `a?.b` stay whole. The next sentence starts here.\n');
      assert.deepEqual(texts(doc), ['Both ${ .. } and a?.b stay whole.', 'The next sentence starts here.']);
      assert.deepEqual(sourceOf(doc), ['Both `${ .. }` and `a?.b` stay whole.', 'The next sentence starts here.']);
    });

    it('still ends a sentence right after a code span, and never inside one spread over lines', () => {
      const doc = md('Call `run`. Then call\n`stop. now`. Done.\n');
      assert.deepEqual(texts(doc), ['Call run.', 'Then call stop. now.', 'Done.']);
    });
  });

  describe('public API', () => {
    it('returns an empty document for empty input, with the root section', () => {
      const doc = md('');
      assert.equal(doc.sentences.length, 0);
      assert.equal(doc.sections.length, 1);
      assert.deepEqual(doc.sections[0], { index: 0, heading: '', depth: 0, headingSpan: null, span: { start: 0, end: 0 }, parent: null });
      assert.equal(doc.title, null);
    });
  });

  describe('inline normalization', () => {
    it('strips emphasis, strong and deleted-text markers but keeps their words', () => {
      const doc = md('The *first* and **second** and ~~third~~ words stay.');
      assert.deepEqual(texts(doc), ['The first and second and third words stay.']);
      assert.deepEqual(sourceOf(doc), ['The *first* and **second** and ~~third~~ words stay.']);
    });

    it('keeps link text and drops the URL; keeps autolinks as their text', () => {
      const doc = md('Read [the guide](https://example.org/guide "Guide") or <https://example.org/faq> today.');
      assert.deepEqual(texts(doc), ['Read the guide or https://example.org/faq today.']);
    });

    it('keeps reference-style link text', () => {
      const doc = md('See [the notes][n] first.\n\n[n]: https://example.org/n');
      assert.deepEqual(texts(doc), ['See the notes first.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['definition']);
    });

    it('keeps inline code as text, including backticks inside double fences', () => {
      const doc = md('Call `run()` and then `` `quoted` `` values.');
      assert.deepEqual(texts(doc), ['Call run() and then `quoted` values.']);
      assert.deepEqual(sourceOf(doc), ['Call `run()` and then `` `quoted` `` values.']);
    });

    it('drops images, footnote references and inline HTML', () => {
      const text = 'A plot ![chart](c.png) shows growth[^1] in <span class="x">red</span> bars.\n\n[^1]: Source data.';
      const doc = md(text);
      assert.deepEqual(texts(doc), ['A plot shows growth in red bars.']);
      assert.deepEqual(
        doc.skipped.map((s) => [s.reason, text.slice(s.span.start, s.span.end)]),
        [
          ['image', '![chart](c.png)'],
          ['definition', '[^1]: Source data.'],
        ],
      );
    });

    it('turns soft line breaks (with indentation) into one space', () => {
      const doc = md('One long\n   sentence across\nthree lines.');
      assert.deepEqual(texts(doc), ['One long sentence across three lines.']);
      assert.deepEqual(sourceOf(doc), ['One long\n   sentence across\nthree lines.']);
    });

    it('joins a compound the line wrap broke after its hyphen, in every format (common practice, no source)', () => {
      // Invented demo sentences; the same break occurs in the rust-rfcs corpus ("function-\nlike", "hard-\nwired").
      const text = 'The parser is hard-\nwired into a function-\nlike shape, and long-\nand short-term plans differ by Rust-\nBased tools.';
      const expected = ['The parser is hard-wired into a function-like shape, and long- and short-term plans differ by Rust- Based tools.'];
      for (const format of ['markdown', 'plaintext', 'restructuredtext'] as const) {
        const doc = parseDocument(text, { format });
        assert.deepEqual(texts(doc), expected, format);
        assert.deepEqual(sourceOf(doc), [text], format);
      }
      assert.deepEqual(texts(md('A function-\n   like shape.')), ['A function-like shape.']);
    });

    it('treats a hard break as a sentence boundary', () => {
      const doc = md('First line without stop  \nsecond line\\\nthird line');
      assert.deepEqual(texts(doc), ['First line without stop', 'second line', 'third line']);
    });

    it('maps spans through backslash escapes (CommonMark spec 0.30, Backslash escapes, example 14)', () => {
      // Source: CommonMark spec 0.30 §2.4 example 14: `\*not emphasized*` renders as "*not emphasized*".
      const doc = md('\\*not emphasized* here.');
      assert.deepEqual(texts(doc), ['*not emphasized* here.']);
      assert.deepEqual(sourceOf(doc), ['\\*not emphasized* here.']);
    });

    it('decodes entity references and maps each to its reference (CommonMark spec 0.30, example 25)', () => {
      // Source: CommonMark spec 0.30 §2.5 example 25 renders these references as
      // "\u00a0 &amp; © Æ Ď / ¾ ℋ ⅆ / ∲ ≧̸"; '≧̸' is two code points from one reference.
      const text = '&nbsp; &amp; &copy; &AElig; &Dcaron;\n&frac34; &HilbertSpace; &DifferentialD;\n&ClockwiseContourIntegral; &ngE;';
      const doc = md(text);
      assert.deepEqual(texts(doc), ['& © Æ Ď ¾ ℋ ⅆ ∲ \u2267\u0338']);
      assert.deepEqual(sourceOf(doc), ['&amp; &copy; &AElig; &Dcaron;\n&frac34; &HilbertSpace; &DifferentialD;\n&ClockwiseContourIntegral; &ngE;']);
    });

    it('reads GFM strikethrough with one or two tildes (GFM spec 0.29, example 491)', () => {
      // Source: GFM spec 0.29-gfm, Strikethrough (extension), example 491:
      // "~~Hi~~ Hello, ~there~ world!" → "<del>Hi</del> Hello, <del>there</del> world!".
      assert.deepEqual(texts(md('~~Hi~~ Hello, ~there~ world!')), ['Hi Hello, there world!']);
    });

    it('reads GFM literal autolinks as their text (GFM spec 0.29, example 622)', () => {
      // Source: GFM spec 0.29-gfm, Autolinks (extension), example 622.
      const doc = md('Visit www.commonmark.org/help for more information.');
      assert.deepEqual(texts(doc), ['Visit www.commonmark.org/help for more information.']);
    });

    it('agrees with mdast-util-to-string on paragraphs without images or HTML', () => {
      // Reference library: mdast-util-to-string (npm), the syntax tree's own text serializer.
      const samples = [
        'Plain *emphasis* and **strong** with [a link](http://x.y) and `code`.',
        'Escapes \\_like\\_ this &amp; entities &copy; too.',
        'A ~~struck~~ word and an autolink <https://a.example/b>.',
      ];
      for (const sample of samples) {
        const tree = fromMarkdown(sample, { extensions: [gfm()], mdastExtensions: [gfmFromMarkdown()] });
        const reference = toString(tree, { includeImageAlt: false }).replace(/\s+/g, ' ').trim();
        assert.equal(texts(md(sample)).join(' '), reference, sample);
      }
    });
  });

  describe('sections and title', () => {
    const text = '# Plan\n\nIntro text.\n\n## Costs\n\nCosts rise.\n\n### Detail\n\nDetail here.\n\n## Risks\n\nRisks fall.\n';

    it('builds the section tree with parents, depths and spans', () => {
      const doc = md(text);
      assert.equal(doc.title, 'Plan');
      assert.deepEqual(
        doc.sections.map((s) => [s.heading, s.depth, s.parent]),
        [
          ['', 0, null],
          ['Plan', 1, 0],
          ['Costs', 2, 1],
          ['Detail', 3, 2],
          ['Risks', 2, 1],
        ],
      );
      const costs = doc.sections[2]!;
      assert.equal(text.slice(costs.span.start, costs.span.end), '## Costs\n\nCosts rise.\n\n### Detail\n\nDetail here.\n\n');
      assert.equal(text.slice(costs.headingSpan!.start, costs.headingSpan!.end), '## Costs');
      assert.equal(doc.sections[4]!.span.end, text.length);
      assert.deepEqual(
        doc.sentences.map((s) => s.section),
        [1, 2, 3, 4],
      );
    });

    it('uses a setext H1 as the title and strips markup from headings', () => {
      const doc = md('The *Bold* Plan\n===============\n\nBody text.');
      assert.equal(doc.title, 'The Bold Plan');
      assert.equal(doc.sections[1]!.heading, 'The Bold Plan');
    });

    it('falls back to the front matter title when there is no H1', () => {
      const doc = md('---\ntitle: "Harbour Survey"\nauthor: someone\n---\n\n## Findings\n\nThe survey ended.');
      assert.equal(doc.title, 'Harbour Survey');
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['frontMatter']);
      const toml = md('+++\ntitle = "Tide Tables"\n+++\n\nText here.');
      assert.equal(toml.title, 'Tide Tables');
      assert.deepEqual(toml.skipped.map((s) => s.reason), ['frontMatter']);
    });

    it('prefers the first H1 over the front matter title', () => {
      assert.equal(md('---\ntitle: Meta\n---\n\n# Heading Title\n\nText.').title, 'Heading Title');
    });

    it('counts positions within paragraphs and sections', () => {
      const doc = md('## A\n\nOne. Two.\n\nThree.\n\n## B\n\nFour.');
      assert.deepEqual(
        doc.sentences.map((s) => [s.positionInParagraph, s.paragraphLength, s.positionInSection, s.sectionLength]),
        [
          [0, 2, 0, 3],
          [1, 2, 1, 3],
          [0, 1, 2, 3],
          [0, 1, 0, 1],
        ],
      );
    });
  });

  describe('lists and quotes', () => {
    it('gives list items their depth and the lead-in paragraph', () => {
      const doc = md('We considered three options:\n\n- Build it.\n- Buy it.\n  - From a vendor.\n- Skip it.\n');
      assert.deepEqual(
        doc.paragraphs.map((p) => [p.kind, p.listDepth, p.leadIn]),
        [
          ['paragraph', 0, null],
          ['listItem', 0, 0],
          ['listItem', 0, 0],
          ['listItem', 1, 2],
          ['listItem', 0, 0],
        ],
      );
    });

    it('has no lead-in when a heading or other block stands between', () => {
      const doc = md('Intro.\n\n## Next\n\n- Item one.\n\nText.\n\n```\ncode\n```\n\n- Item two.');
      assert.deepEqual(doc.paragraphs.map((p) => p.leadIn), [null, null, null, null]);
    });

    it('reads every paragraph of a loose list item', () => {
      const doc = md('1. First part.\n\n   Second part.\n2. Next item.');
      assert.deepEqual(doc.paragraphs.map((p) => [p.kind, p.listDepth]), [
        ['listItem', 0],
        ['listItem', 0],
        ['listItem', 0],
      ]);
    });

    it('marks block quotes, and maps spans across the quote markers', () => {
      const text = '> A quoted claim\n> spans two lines.\n>\n> > Nested quote.';
      const doc = md(text);
      assert.deepEqual(doc.paragraphs.map((p) => p.kind), ['quote', 'quote']);
      assert.deepEqual(texts(doc), ['A quoted claim spans two lines.', 'Nested quote.']);
      assert.deepEqual(sourceOf(doc), ['A quoted claim\n> spans two lines.', 'Nested quote.']);
    });
  });

  describe('tables', () => {
    const table = 'Intro line.\n\n| Option | Note |\n|---|---|\n| Fast | Costs more. |\n| Slow | Costs less. |\n';

    it('skips tables by default', () => {
      const doc = md(table);
      assert.deepEqual(texts(doc), ['Intro line.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['table']);
    });

    it('reads body cells as tableCell paragraphs when asked, skipping the header row', () => {
      const doc = md(table, true);
      assert.deepEqual(texts(doc), ['Intro line.', 'Fast', 'Costs more.', 'Slow', 'Costs less.']);
      assert.deepEqual(doc.paragraphs.map((p) => p.kind), ['paragraph', 'tableCell', 'tableCell', 'tableCell', 'tableCell']);
      assert.equal(table.slice(doc.skipped[0]!.span.start, doc.skipped[0]!.span.end), '| Option | Note |');
    });
  });

  describe('offsets', () => {
    it('keeps exact UTF-16 offsets with CRLF, a byte order mark, tabs and astral characters', () => {
      const text = '\uFEFF# T\u{1F600}tle\r\n\r\nFirst \u{1D54F} sentence.\tSecond one \u{1F680}\r\ncontinues here.\r\n';
      const doc = md(text);
      assert.equal(doc.title, 'T\u{1F600}tle');
      assert.deepEqual(texts(doc), ['First \u{1D54F} sentence.', 'Second one \u{1F680} continues here.']);
      assert.deepEqual(sourceOf(doc), ['First \u{1D54F} sentence.', 'Second one \u{1F680}\r\ncontinues here.']);
      assert.equal(text.slice(doc.sections[1]!.headingSpan!.start, doc.sections[1]!.headingSpan!.end), '# T\u{1F600}tle');
    });

    it('shifts every span by baseOffset', () => {
      const whole = 'Lead text.\n\n## Part\n\nA sentence here. Another one.';
      const start = whole.indexOf('## Part');
      const doc = parseDocument(whole.slice(start), { format: 'markdown', baseOffset: start });
      assert.equal(doc.baseOffset, start);
      assert.deepEqual(
        doc.sentences.map((s) => whole.slice(s.span.start, s.span.end)),
        ['A sentence here.', 'Another one.'],
      );
      assert.equal(whole.slice(doc.sections[1]!.headingSpan!.start, doc.sections[1]!.headingSpan!.end), '## Part');
      assert.deepEqual(doc.sections[0]!.span, { start, end: whole.length });
    });
  });
});
