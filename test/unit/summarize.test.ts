import assert from 'node:assert/strict';
import { AUTO_LENGTH, autoWords } from '../../src/core/reading';
import { readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { summarize } from '../../src/core/summarize';
import { corpusFiles, DEMO_DIR } from './helpers/corpus';

const wordsOf = (s: string) => s.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [];

function assertTraceable(text: string, summary: ReturnType<typeof summarize>) {
  let previousEnd = -1;
  for (const picked of summary.sentences) {
    assert.ok(picked.span.start >= 0 && picked.span.end <= text.length, 'range inside the document');
    assert.ok(picked.span.start > previousEnd - 1 && picked.span.start >= previousEnd, 'document order, no overlap');
    previousEnd = picked.span.end;
    const slice = wordsOf(text.slice(picked.span.start, picked.span.end));
    let k = 0;
    for (const w of wordsOf(picked.text)) {
      while (k < slice.length && slice[k] !== w) k++;
      assert.ok(k < slice.length, `"${w}" of "${picked.text}" not found in order in its source range`);
      k++;
    }
  }
}

describe('summarize: the demo documents', () => {
  const demos = ['bike-share-rebalancing.md', 'pull-request.md', 'field-report.txt'];
  for (const name of demos) {
    const text = readFileSync(join(DEMO_DIR, name), 'utf8');
    const format = name.endsWith('.md') ? 'markdown' : 'plaintext';

    it(`${name}: covers every section with content, in document order, each line traceable`, () => {
      const summary = summarize(text, { format });
      assert.ok(summary.sentences.length >= 3);
      assert.equal(summary.stats.sectionsCovered, summary.stats.sectionsWithContent);
      assert.ok(summary.stats.sectionsWithContent >= 3, `${summary.stats.sectionsWithContent} sections`);
      assertTraceable(text, summary);
    });

    it(`${name}: stays near the default length (a reading time that grows with the document, reading.ts)`, () => {
      const summary = summarize(text, { format });
      const limit = autoWords(summary.stats.wordsIn);
      assert.ok(summary.stats.wordsOut <= limit || summary.stats.sentencesOut <= 3, `${summary.stats.wordsOut} words for ${limit}`);
      assert.ok(summary.stats.wordsOut >= 0.5 * limit, `${summary.stats.wordsOut} words for ${limit}`);
      assert.ok(summary.stats.minutesToRead <= AUTO_LENGTH.maxMinutes);
    });
  }

  it('gives the same summary twice (determinism)', () => {
    const text = readFileSync(join(DEMO_DIR, 'bike-share-rebalancing.md'), 'utf8');
    assert.deepEqual(summarize(text, { format: 'markdown' }), summarize(text, { format: 'markdown' }));
  });

  it('summarizes a selection in whole-document coordinates', () => {
    const text = readFileSync(join(DEMO_DIR, 'bike-share-rebalancing.md'), 'utf8');
    const start = text.indexOf('## Truck routing');
    const end = text.indexOf('## Rollout plan');
    const summary = summarize(text.slice(start, end), { format: 'markdown', baseOffset: start, budget: { unit: 'sentences', value: 4 } });
    assert.equal(summary.sentences.length, 4);
    for (const picked of summary.sentences) {
      assert.ok(picked.span.start >= start && picked.span.end <= end);
      assert.equal(text.slice(picked.span.start, picked.span.end).replace(/\s+/g, ' ').includes(picked.text.slice(0, 10)), true);
    }
  });

  it('respects sentence and word budgets and turning balance off', () => {
    const text = readFileSync(join(DEMO_DIR, 'bike-share-rebalancing.md'), 'utf8');
    assert.equal(summarize(text, { budget: { unit: 'sentences', value: 5 } }).sentences.length, 5);
    const byWords = summarize(text, { budget: { unit: 'words', value: 120 } });
    assert.ok(byWords.stats.wordsOut <= 120, `${byWords.stats.wordsOut} words`);
    const unbalanced = summarize(text, { balance: false, budget: { unit: 'sentences', value: 5 } });
    assert.equal(unbalanced.sentences.length, 5);
  });

  it('leaves excluded sections out', () => {
    const text = readFileSync(join(DEMO_DIR, 'bike-share-rebalancing.md'), 'utf8');
    const summary = summarize(text, { excludeHeadings: ['Risks', 'Open questions'], budget: { unit: 'sentences', value: 30 } });
    assert.ok(summary.sentences.every((p) => !['Risks', 'Open questions'].includes(p.sectionPath[1] ?? p.sectionPath[0] ?? '')));
  });

  it('refuses oversized and binary input with a message instead of a summary', () => {
    const big = summarize('word '.repeat(3000), { maxChars: 1000 });
    assert.match(big.refused ?? '', /limit/);
    assert.equal(big.sentences.length, 0);
    assert.match(summarize('abc\u0000def ghi.').refused ?? '', /binary/);
  });

  it('explains an empty or code-only document', () => {
    for (const text of ['', '   \n\n', '```js\nconst a = 1;\n```\n', '# Only\n## Headings\n']) {
      const summary = summarize(text);
      assert.equal(summary.sentences.length, 0);
      assert.ok(summary.notices.some((n) => /No prose sentences/.test(n)), JSON.stringify(summary.notices));
    }
  });
});

describe('summarize: real design documents', () => {
  const files = corpusFiles();
  before(function () {
    if (files.length === 0) {
      console.log('      (shared corpus not found; skipped)');
      this.skip();
    }
  });

  // Five documents a reader can check by hand; the claims are structural (common practice, no source).
  const picks = ['0002-rfc-process.md', '0040-libstd-facade.md', '1068-rust-governance.md', '2094-nll.md', '3086-macro-metavar-expr.md'];
  for (const name of picks) {
    it(`${name}: covers its sections and quotes no code, contents or metadata lines`, function () {
      const path = files.find((f) => basename(f) === name);
      if (!path) this.skip();
      const text = readFileSync(path!, 'utf8');
      const summary = summarize(text, { format: 'markdown' });
      assert.ok(summary.sentences.length >= 3);
      assert.ok(summary.stats.sectionsCovered / summary.stats.sectionsWithContent >= 0.8, `${summary.stats.sectionsCovered}/${summary.stats.sectionsWithContent}`);
      assertTraceable(text, summary);
      for (const picked of summary.sentences) {
        const source = text.slice(picked.span.start, picked.span.end);
        assert.doesNotMatch(source, /```|^\s{4}\S/m, 'no code');
        assert.doesNotMatch(picked.text, /^(Start Date|RFC PR|Rust Issue|Feature Name)\b/i, 'no metadata line');
        assert.doesNotMatch(source, /^\s*[-*] \[[^\]]+\]\(#/, 'no table-of-contents entry');
      }
    });
  }
});
