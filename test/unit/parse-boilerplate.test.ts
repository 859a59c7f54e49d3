import assert from 'node:assert/strict';
import { isMetadataRun } from '../../src/core/parse/boilerplate';
import { parseDocument } from '../../src/core/formats/registry';
import type { ParsedDocument, SkipReason } from '../../src/core/types';

const md = (text: string): ParsedDocument => parseDocument(text, { format: 'markdown' });
const texts = (doc: ParsedDocument): string[] => doc.sentences.map((s) => s.text);
const skippedAs = (doc: ParsedDocument): [SkipReason, string][] =>
  doc.skipped.map((s) => [s.reason, doc.text.slice(s.span.start, s.span.end)]);

describe('parse: non-content blocks', () => {
  describe('metadata runs', () => {
    it('recognizes Key: value lines by shape', () => {
      assert.equal(isMetadataRun(['Start Date: 2031-04-02', 'Review Ticket: #77', 'Owner:']), true);
      assert.equal(isMetadataRun(['Status: Draft']), true);
      assert.equal(isMetadataRun(['Approver #: 12']), true);
      // No space after the colon, as long as it is not a URL scheme.
      assert.equal(isMetadataRun(['Start Date: 2031-04-02', 'Tracker:https://example.org/9']), true);
      // A sentence after the colon is prose, not a field.
      assert.equal(isMetadataRun(['Note: the pump was replaced in May.']), false);
      assert.equal(isMetadataRun(['Summary: a pump that moves twice the water']), false);
      assert.equal(isMetadataRun(["There's one alternative: Not doing anything."]), false);
      // A path separator is not a key's colon.
      assert.equal(isMetadataRun(['In `core::mem` today:']), false);
      // Lower-case keys read as definitions inside prose, not as fields...
      assert.equal(isMetadataRun(['input: a token tree', 'output: a tree']), false);
      // ...unless they sit in a run with capitalized keys.
      assert.equal(isMetadataRun(['Start Date: 2031-04-02', 'eRFC PR: #12']), true);
      // A long run may hold one sentence-like value; a short one may not.
      assert.equal(isMetadataRun(['Name: quiet', 'Start Date: 2031-04-02', 'Tracker: N/A. The change ships itself.']), true);
      assert.equal(isMetadataRun(['Name: quiet', 'Tracker: N/A. The change ships itself.']), false);
      // Keys are 1-4 words.
      assert.equal(isMetadataRun(['The team that ran the pilot last year: north']), false);
      // A URL is not a key.
      assert.equal(isMetadataRun(['https://example.org/a']), false);
      // Every line must be a field.
      assert.equal(isMetadataRun(['Status: Draft', 'We then met twice.']), false);
      assert.equal(isMetadataRun(['Owner:', 'Reviewer:']), false);
      assert.equal(isMetadataRun([]), false);
    });

    it('skips a metadata bullet list at the start of the document', () => {
      const doc = md('- Proposal Name: quiet_mode\n- Start Date: 2031-04-02\n- Tracking: [board#12](https://example.org/12)\n\n# Quiet mode\n\nThe mode mutes alerts.');
      assert.deepEqual(texts(doc), ['The mode mutes alerts.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['metadata']);
    });

    it('reads a field whose value wraps or is a nested list', () => {
      const text = [
        '- Proposal Name: quiet_mode',
        '- Tracking: [board#12](https://example.org/12)',
        '  [board#13](https://example.org/13)',
        '- Related:',
        '  - [board#2](https://example.org/2)',
        '  - [board#3](https://example.org/3) - the first try',
        '',
        'The mode mutes alerts.',
      ].join('\n');
      const doc = md(text);
      assert.deepEqual(texts(doc), ['The mode mutes alerts.']);
      assert.deepEqual(skippedAs(doc), [['metadata', text.slice(0, text.indexOf('\n\nThe'))]]);
    });

    it('skips metadata lines at the start of a section, with emphasized keys', () => {
      const doc = md('# Report\n\n**Status**: Draft\n**Owner**: Ops\n\nThe report begins.');
      assert.deepEqual(texts(doc), ['The report begins.']);
      assert.deepEqual(skippedAs(doc), [['metadata', '**Status**: Draft\n**Owner**: Ops']]);
    });

    it('keeps Key: value lines that come after prose in the section', () => {
      const doc = md('# Report\n\nThe report begins.\n\n- Cost: high\n- Risk: low');
      assert.deepEqual(texts(doc), ['The report begins.', 'Cost: high', 'Risk: low']);
    });

    it('keeps a list of explanatory Key: sentence items', () => {
      const doc = md('## Options\n\n- Speed: the new pump moves twice the water of the old one.\n- Cost: it uses less power than the old pump did.');
      assert.equal(doc.sentences.length, 2);
    });
  });

  describe('lists that are not prose', () => {
    it('skips GFM task lists as checklists (GFM spec 0.29, Task list items, example 279)', () => {
      // Source: GFM spec 0.29-gfm, Task list items (extension), example 279: "- [ ] foo\n- [x] bar".
      const doc = md('- [ ] foo\n- [x] bar');
      assert.deepEqual(skippedAs(doc), [['checklist', '- [ ] foo\n- [x] bar']]);
      assert.equal(doc.sentences.length, 0);
    });

    it('skips only the task items of a mixed list', () => {
      const doc = md('Plan:\n\n- Pour the base.\n- [x] Order gravel\n- Lay the slabs.');
      assert.deepEqual(texts(doc), ['Plan:', 'Pour the base.', 'Lay the slabs.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['checklist']);
    });

    it('skips a table of contents (links to anchors only, nested)', () => {
      const text = '## Contents\n\n1. [Intro](#intro)\n2. [Design](#design)\n   - [Storage](#storage)\n\n## Intro\n\nText.';
      const doc = md(text);
      assert.deepEqual(texts(doc), ['Text.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['tableOfContents']);
    });

    it('skips lists whose items are only links', () => {
      const doc = md('See also:\n\n- [Pump manual](https://example.org/pump)\n- [Valve notes](valves.md) | [Old notes](old.md)\n\nEnd.');
      assert.deepEqual(texts(doc), ['See also:', 'End.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['linkList']);
    });

    it('keeps lists whose items describe their links', () => {
      const doc = md('- [Pump manual](https://example.org/pump) explains the seals.\n- [Valve notes](v.md) list the torques.');
      assert.equal(doc.sentences.length, 2);
      assert.deepEqual(doc.skipped, []);
    });
  });

  describe('images and badges', () => {
    it('skips a row of badge images wrapped in links', () => {
      const text = '[![build](https://ci.example/b.svg)](https://ci.example) [![cover](c.svg)](https://cov.example)\n\nReal text.';
      const doc = md(text);
      assert.deepEqual(texts(doc), ['Real text.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['badge']);
    });

    it('skips a paragraph that is a single image as an image', () => {
      const doc = md('![Site map](map.png)\n\nText.');
      assert.deepEqual(skippedAs(doc), [['image', '![Site map](map.png)']]);
    });
  });

  describe('other non-prose blocks', () => {
    it('skips fenced and indented code, HTML blocks, comments, definitions and thematic breaks', () => {
      const text = [
        'Prose one.',
        '```sh\nmake\n```',
        '    indented code',
        '<div align="center">\n<b>banner</b>\n</div>',
        '<!-- template: fill in below -->',
        '[ref]: https://example.org',
        '***',
        'Prose two.',
      ].join('\n\n');
      const doc = md(text);
      assert.deepEqual(texts(doc), ['Prose one.', 'Prose two.']);
      assert.deepEqual(
        doc.skipped.map((s) => s.reason),
        ['code', 'code', 'html', 'comment', 'definition', 'thematicBreak'],
      );
    });

    it('reports inline HTML comments but keeps the sentence around them', () => {
      const doc = md('Fill this in <!-- describe the change --> before merging.');
      assert.deepEqual(texts(doc), ['Fill this in before merging.']);
      assert.deepEqual(doc.skipped.map((s) => s.reason), ['comment']);
    });
  });
});
