/**
 * reStructuredText inline markup: what a sentence shows (markup stripped, link text kept, URLs
 * and footnote references dropped) and the exact source range it keeps. Examples marked "from
 * memory" are recalled from the reStructuredText specification's section "Inline markup
 * recognition rules", not copied from it.
 */
import assert from 'node:assert/strict';
import { parseRestructuredText } from '../../src/core/formats/rst/index';
import type { ParsedDocument } from '../../src/core/types';
import { invariantFailures } from './helpers/span-invariant';

const rst = (text: string): ParsedDocument => parseRestructuredText(text, { baseOffset: 0, includeTables: false });
const texts = (text: string): string[] => rst(text).sentences.map((s) => s.text);
/** The one sentence of a one-sentence paragraph. */
const shown = (text: string): string => {
  const all = texts(text);
  assert.equal(all.length, 1, `expected one sentence in ${JSON.stringify(text)}, got ${JSON.stringify(all)}`);
  return all[0]!;
};

describe('rst: inline markup', () => {
  describe('recognition rules of the specification (from memory)', () => {
    it('leaves start-strings followed by whitespace as text', () => {
      assert.equal(shown('Not markup: 2 * x  a ** b  (* BOM32_* ` `` _ __ | end.'), 'Not markup: 2 * x a ** b (* BOM32_* ` `` _ __ | end.');
    });

    it('leaves start-strings enclosed in matching quotes or brackets as text', () => {
      assert.equal(shown(`Quoted: "*" '|' (*) [*] {*} <*> end.`), `Quoted: "*" '|' (*) [*] {*} <*> end.`);
    });

    it('leaves start-strings preceded by non-whitespace as text', () => {
      assert.equal(shown('Inside words: 2*x a**b O(N**2) e**(x*y) f(x)*f(y) a|b file*.* __init__ __init__() end.'), 'Inside words: 2*x a**b O(N**2) e**(x*y) f(x)*f(y) a|b file*.* __init__ __init__() end.');
    });

    it('recognizes markup after an opener or delimiter and before a closer or delimiter', () => {
      assert.equal(shown('Around (*parens*), "*quotes*", -*dash*- and /*slash*/ it ends.'), 'Around (parens), "quotes", -dash- and /slash/ it ends.');
    });

    it('needs non-whitespace before the end-string, and at least one character inside', () => {
      // The first '*' preceded by non-whitespace closes: the emphasis is "not closed * here and *".
      assert.equal(shown('Open *not closed * here and ** nothing.'), 'Open not closed * here and * nothing.');
      assert.equal(shown('Empty ** and * * stay.'), 'Empty ** and * * stay.');
    });

    it('disables markup with a backslash before the start-string', () => {
      assert.equal(shown('Escaped \\*not emphasis\\* and \\`not interpreted\\` text.'), 'Escaped *not emphasis* and `not interpreted` text.');
    });
  });

  it('strips emphasis, strong emphasis and inline literals, keeping their text', () => {
    assert.equal(shown('Use *this*, **that** and ``the_literal(x)`` here.'), 'Use this, that and the_literal(x) here.');
  });

  it('never ends a sentence inside an inline literal (its "." and "?" are code)', () => {
    assert.deepEqual(texts('Both ``${ .. }`` and ``a?.b`` stay whole. The next sentence starts here.\n'), [
      'Both ${ .. } and a?.b stay whole.',
      'The next sentence starts here.',
    ]);
    assert.deepEqual(texts('Call ``run``. Then stop.\n'), ['Call run.', 'Then stop.']);
  });

  it('keeps backslashes inside inline literals and removes escaped whitespace elsewhere', () => {
    assert.equal(shown('Path ``C:\\temp\\new`` and joined\\ words.'), 'Path C:\\temp\\new and joinedwords.');
  });

  it('keeps the text of hyperlink references and drops their URLs', () => {
    assert.equal(
      shown('See `the guide <https://docs.example/guide>`_, `again <https://docs.example/a>`__, Python_ and `a phrase`_ and anon__ now.'),
      'See the guide, again, Python and a phrase and anon now.',
    );
  });

  it('shows the URL of an embedded link without text', () => {
    assert.equal(shown('The page `<https://docs.example/a>`_ is the address.'), 'The page https://docs.example/a is the address.');
  });

  it('drops footnote and citation references with the space before them', () => {
    assert.equal(shown('Measured twice [1]_, also [#note]_ and [*]_ see [CIT2002]_.'), 'Measured twice, also and see.');
  });

  it('shows substitution references and inline targets by their text', () => {
    assert.equal(shown('The |project| name and |logo|_ plus an _`inline target` here.'), 'The project name and logo plus an inline target here.');
  });

  it('shows the visible text of roles: standard, documentation-toolchain, domain and custom roles', () => {
    assert.equal(shown('Read :ref:`the setup <setup-label>` and :doc:`install` first.'), 'Read the setup and install first.');
    assert.equal(shown('Call :py:func:`~fleet.dock.move` or :func:`!plain.name` now.'), 'Call move or plain.name now.');
    assert.equal(shown('Set :oslo.config:option:`DEFAULT.debug` and :code:`x = 1` today.'), 'Set DEFAULT.debug and x = 1 today.');
    assert.equal(shown('As :rfc:`2822#section-3` and :PEP:`8` say, `text`:emphasis: is fine.'), 'As rfc 2822 and PEP 8 say, text is fine.');
    assert.equal(shown('Default role `interpreted text` shows its text.'), 'Default role interpreted text shows its text.');
  });

  it('keeps an unmatched start-string as text', () => {
    assert.equal(shown('A lone *star and ``open literal remain.'), 'A lone *star and ``open literal remain.');
  });

  it('lets markup span line breaks', () => {
    assert.equal(shown('One *emphasis over\ntwo lines* ends here.'), 'One emphasis over two lines ends here.');
  });

  it('keeps the source range from the first to the last visible unit, markup inside included (as the Markdown reader does)', () => {
    const text = '**Bold** start, `link <https://x.example>`_ and *end*.\n';
    const doc = rst(text);
    assert.equal(doc.sentences.length, 1);
    const sentence = doc.sentences[0]!;
    assert.equal(sentence.text, 'Bold start, link and end.');
    assert.equal(text.slice(sentence.span.start, sentence.span.end), 'Bold** start, `link <https://x.example>`_ and *end*.');
    assert.deepEqual(invariantFailures(doc), []);
  });

  it('maps sentence ranges through tabs, CRLF line ends and astral characters', () => {
    const text = 'First\tsentence \u{1F6B2} here.\r\nSecond *one* ends.\r\n';
    const doc = rst(text);
    assert.deepEqual(doc.sentences.map((s) => s.text), ['First sentence \u{1F6B2} here.', 'Second one ends.']);
    assert.deepEqual(doc.sentences.map((s) => text.slice(s.span.start, s.span.end)), ['First\tsentence \u{1F6B2} here.', 'Second *one* ends.']);
  });

  describe('link-only lines', () => {
    it('skips a paragraph that is only a URL or only references', () => {
      const doc = rst('https://blueprints.example/fleet/+spec/rebalance\n\n`Spec <https://x.example>`_, `Notes <https://y.example>`_\n\nKept sentence.\n');
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['linkList', 'linkList']);
      assert.deepEqual(doc.sentences.map((s) => s.text), ['Kept sentence.']);
    });

    it('skips a list of links, but keeps a sentence that contains a link', () => {
      const doc = rst('* https://a.example/one\n* `two <https://b.example>`_\n\nSee https://a.example/one for details.\n');
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['linkList']);
      assert.deepEqual(doc.sentences.map((s) => s.text), ['See https://a.example/one for details.']);
    });

    it('reads escapes and inline literals the same way when deciding (a backslash makes no word)', () => {
      // An escaped character is still text; a backslash alone is not a word; a literal that only holds a link is a link.
      const doc = rst('https://a.example/one\\_two\n\n\\*note\\* https://a.example\n\n``https://b.example``\n\nKept sentence.\n');
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['linkList', 'linkList']);
      assert.deepEqual(doc.sentences.map((s) => s.text), ['*note* https://a.example', 'Kept sentence.']);
    });
  });
});
