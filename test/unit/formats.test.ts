import assert from 'node:assert/strict';
import { FORMATS, FORMAT_IDS, formatForEditorDocument, formatForFileName, formatForLanguageId, formatInfo, GENERIC_FORMAT } from '../../src/core/formats/catalog';
import { parseDocument } from '../../src/core/formats/registry';

describe('formats: the catalog and the readers', () => {
  it('chooses the format from a file name', () => {
    assert.equal(formatForFileName('notes/Plan.MD')?.id, 'markdown');
    assert.equal(formatForFileName('a.markdown')?.id, 'markdown');
    assert.equal(formatForFileName('page.mdx')?.id, 'markdown');
    assert.equal(formatForFileName('notes.txt')?.id, 'plaintext');
    assert.equal(formatForFileName('md'), undefined, 'a bare name without a dot names no format');
    assert.equal(formatForFileName('archive.tar.gz'), undefined);
  });

  it('chooses the format from an editor language id, and from the name when the editor says plain text', () => {
    assert.equal(formatForLanguageId('markdown')?.id, 'markdown');
    assert.equal(formatForLanguageId('plaintext')?.id, 'plaintext');
    assert.equal(formatForLanguageId('python'), undefined);
    assert.equal(formatForEditorDocument('markdown', 'untitled-1'), 'markdown');
    assert.equal(formatForEditorDocument('plaintext', '/w/notes.md'), 'markdown');
    assert.equal(formatForEditorDocument('python', '/w/tool.py'), GENERIC_FORMAT);
    assert.equal(formatForEditorDocument('plaintext', '/w/notes.txt'), 'plaintext');
  });

  it('lists each extension and language id under one format only', () => {
    const extensions = FORMATS.flatMap((f) => f.extensions);
    assert.equal(new Set(extensions).size, extensions.length);
    const ids = FORMATS.flatMap((f) => f.languageIds);
    assert.equal(new Set(ids).size, ids.length);
    for (const extension of extensions) assert.match(extension, /^\.[a-z0-9]+$/);
  });

  it('has a reader for every format and refuses an unknown one', () => {
    for (const id of FORMAT_IDS) {
      assert.equal(formatInfo(id).id, id);
      assert.equal(parseDocument('A sentence here.', { format: id }).sentences.length, 1, id);
    }
    assert.throws(() => parseDocument('x', { format: 'latex' as never }), /unknown document format "latex"/);
  });
});
