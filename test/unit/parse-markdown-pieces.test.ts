import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { parseDocument } from '../../src/core/formats/registry';
import { parseMarkdownTree } from '../../src/core/formats/markdown/markdown-tree';
import { corpusFiles } from './helpers/corpus';

// Parsing a long document in pieces must give exactly the document parsing it whole gives.
function sameTree(text: string, pieceLength: number) {
  const whole = parseMarkdownTree(text, Infinity);
  const pieces = parseMarkdownTree(text, pieceLength);
  const shape = (tree: ReturnType<typeof parseMarkdownTree>) =>
    JSON.stringify(tree.children, (key, value) => (key === 'line' || key === 'column' ? undefined : value));
  assert.equal(shape(pieces), shape(whole));
}

describe('Markdown parsed in pieces', () => {
  it('keeps link references that are defined in another piece', () => {
    const text = '# One\n\nSee [the guide][g] for details.\n\n# Two\n\nMore text here.\n\n[g]: https://example.test/guide\n';
    sameTree(text, 10);
  });

  it('does not cut inside fenced code or multi-line HTML', () => {
    const text = '# A\n\ntext\n\n```\n# not a heading\n```\n\n<!--\n# not a heading either\n-->\n\n# B\n\nmore\n\n<pre>\n# kept\n</pre>\n\n# C\n\nend\n';
    sameTree(text, 5);
  });

  it('joins a piece to the next when a block runs past its end', () => {
    // An unclosed fence in the first piece swallows the rest of the document in one parse.
    const text = '# A\n\n```\nopen fence\n\n# B\n\n[r]: https://example.test/r\n\n# C\n\nSee [r].\n';
    sameTree(text, 3);
    const closedLater = '# A\n\ntext [r]\n\n# B\n\n```\ncode\n# C\n```\n\n# D\n\n[r]: https://example.test/r\n';
    sameTree(closedLater, 3);
  });

  it('gives the same sentences and ranges as one parse on 2 MB of real design documents', function () {
    const files = corpusFiles();
    if (files.length === 0) this.skip();
    let text = '';
    for (const file of files) {
      if (text.length > 2_000_000) break;
      text += readFileSync(file, 'utf8') + '\n\n';
    }
    sameTree(text, 64_000);
    const doc = parseDocument(text, { format: 'markdown' });
    assert.ok(doc.sentences.length > 5000);
  });
});
