/**
 * Which Markdown reader parseDocument uses in this run: the mdast reader in `npm test`'s first
 * run, the markdown-it reader in its twin run (npm run test:markdown-it), which sets
 * TERSELY_MARKDOWN_READER. Without this check a broken swap would run the same tests twice.
 */
import assert from 'node:assert/strict';
import { parseDocument } from '../../src/core/formats/registry';

describe('Markdown reader in use', () => {
  it(`is the ${process.env.TERSELY_MARKDOWN_READER ?? 'mdast'} reader`, () => {
    // The one reading the two disagree on (see parse-markdown-it.test.ts): after indented code,
    // the mdast reader reads `3. x` as a paragraph, markdown-it as a list item.
    const doc = parseDocument('    code\n\n3. Item three.\n', { format: 'markdown' });
    const expected = process.env.TERSELY_MARKDOWN_READER === 'markdown-it' ? ['listItem', 'Item three.'] : ['paragraph', '3. Item three.'];
    assert.deepEqual([doc.paragraphs[0]?.kind, doc.sentences[0]?.text], expected);
  });
});
