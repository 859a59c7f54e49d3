/**
 * The span invariant: every sentence's span points at source text that holds the sentence's words
 * in order; spans lie inside the document, increase and never overlap. Checked on the demo
 * documents, on tricky snippets, and on every document of the shared Markdown corpus.
 */

import assert from 'node:assert/strict';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { formatForFileName, GENERIC_FORMAT } from '../../src/core/formats/catalog';
import { parseDocument } from '../../src/core/formats/registry';
import type { DocumentFormat } from '../../src/core/types';
import { invariantFailures, words } from './helpers/span-invariant';

function markdownFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir).sort()) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...markdownFiles(path));
    else if (name.endsWith('.md')) out.push(path);
  }
  return out;
}

describe('range invariant', () => {
  describe('tricky snippets', () => {
    const snippets: [string, DocumentFormat][] = [
      ['**Bold start.** Then *nested **strong** inside* it. Done.', 'markdown'],
      ['A [link with `code`](http://x.y) and ![img](p.png) then text.', 'markdown'],
      ['Escapes \\*here\\* and &amp; there &copy; 2031. Next one.', 'markdown'],
      ['> Quote line one\n> line two. And\n>  three.\n\n> > Deeper quote. Yes.', 'markdown'],
      ['- item one\n  continues here. Second.\n  - nested *item*. Ok.\n\n1) numbered. x', 'markdown'],
      ['Line with hard break  \nnext line\\\nlast line.', 'markdown'],
      ['\uFEFF# Title\r\n\r\nCRLF text\r\ncontinues. Second\tsentence.\r\n', 'markdown'],
      ['Emoji \u{1F600} before. \u{1D54F} math letter after. \u{1F680}\u{1F680} end.', 'markdown'],
      ['Intra**word**emphasis and snake\\_case\\_name. Done.', 'markdown'],
      ['| a | b |\n|---|---|\n| cell one. | two |\n\nAfter table.', 'markdown'],
      ['Term[^1] with note. Next.\n\n[^1]: The note.', 'markdown'],
      ['Text <span>inline</span> html <!-- c --> end. More.', 'markdown'],
      ['TITLE\n=====\n\nPlain text\n   indented wrap. Second.\n\n- item\n  wrap. x\n* star item.', 'plaintext'],
      ['\uFEFFA\r\nB. C\tD.\r\n\r\n\tcode\r\n\r\nEnd \u{1F600}.', 'plaintext'],
      ['Literal::\n\n   skipped\n\nAfter. ::\n\n  also skipped\n\nEnd.', 'plaintext'],
    ];
    snippets.forEach(([text, format], n) => {
      it(`snippet ${n + 1} (${format}) keeps the invariant`, () => {
        const doc = parseDocument(text, { format, includeTables: true });
        assert.ok(doc.sentences.length > 0, 'expected sentences');
        assert.deepEqual(invariantFailures(doc), []);
      });
    });
  });

  it('keeps the invariant for a selection parsed with baseOffset, inside the selection', () => {
    const whole = readDemo()?.text ?? '# Doc\n\nSome intro. More text here.\n\n## Part\n\nSelected sentence one. And two.\n';
    const start = Math.floor(whole.length / 3);
    const end = Math.floor((2 * whole.length) / 3);
    const selection = whole.slice(start, end);
    const doc = parseDocument(selection, { format: 'markdown', baseOffset: start });
    assert.ok(doc.sentences.length > 0, 'expected sentences in the selection');
    assert.deepEqual(invariantFailures(doc), []);
    for (const sentence of doc.sentences) {
      assert.ok(start <= sentence.span.start && sentence.span.end <= end, `sentence ${sentence.index} outside the selection`);
      // The span indexes the WHOLE document.
      assert.deepEqual(words(whole.slice(sentence.span.start, sentence.span.end)), words(selection.slice(sentence.span.start - start, sentence.span.end - start)));
    }
  });

  describe('demo documents (media/demo)', () => {
    const dir = resolve(process.cwd(), 'media/demo');
    const files = existsSync(dir) ? readdirSync(dir).filter((f) => /\.(md|markdown|txt|rst)$/.test(f)).sort() : [];
    if (files.length === 0) it.skip('no demo documents found in media/demo');
    for (const file of files) {
      it(`${file} keeps the invariant`, () => {
        const text = readFileSync(join(dir, file), 'utf8');
        const doc = parseDocument(text, { format: formatForFileName(file)?.id ?? GENERIC_FORMAT });
        assert.ok(doc.sentences.length > 0, 'expected sentences');
        assert.deepEqual(invariantFailures(doc), []);
      });
    }
  });

  it('keeps the invariant on every document of the shared Markdown corpus', function () {
    // Hundreds of documents: allow minutes on a busy machine (a limit, not a speed check).
    this.timeout(900_000);
    const dir = resolve(process.cwd(), '../shared/corpus/rust-rfcs/docs');
    if (!existsSync(dir)) {
      console.log(`    corpus not found at ${dir}; skipping`);
      this.skip();
    }
    const files = markdownFiles(dir);
    let sentences = 0;
    const failures: string[] = [];
    for (const file of files) {
      const doc = parseDocument(readFileSync(file, 'utf8'), { format: 'markdown' });
      sentences += doc.sentences.length;
      for (const failure of invariantFailures(doc)) failures.push(`${file}: ${failure}`);
    }
    console.log(`    corpus: ${files.length} documents, ${sentences} sentences, ${failures.length} failures`);
    assert.ok(files.length > 0, 'expected corpus documents');
    assert.deepEqual(failures.slice(0, 20), []);
  });
});

function readDemo(): { text: string } | null {
  const path = resolve(process.cwd(), 'media/demo/bike-share-rebalancing.md');
  return existsSync(path) ? { text: readFileSync(path, 'utf8') } : null;
}
