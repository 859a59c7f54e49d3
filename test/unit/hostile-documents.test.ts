/**
 * Hostile and unusual documents, generated here (nothing big is committed). Each must give a
 * sensible summary (every summary property holds) or a clear one-line message — never an
 * exception. No timing assertions: speed is the benchmark's job (bench/speed.ts); mocha's
 * timeout only stops a hang.
 */
import assert from 'node:assert/strict';
import defaultModelJson from '../../media/models/default-model.json';
import { OptionsError } from '../../src/core/options/resolve';
import { FALLBACK_PIECE_CHARS } from '../../src/core/segment/sentences';
import { summarize, type SummarizeRequest } from '../../src/core/summarize';
import type { Summary } from '../../src/core/types';
import { summaryFailures } from './helpers/summary-properties';

/** Sentences of an invented bike-share operations report, reused to build long documents. */
const PROSE = [
  'The depot crew moves bikes between docks at night.',
  'Each route is planned from the morning counts at every dock.',
  'Riders should find a bike within five minutes of walking.',
  'The van carries twenty bikes on each trip across the river.',
];
const sentence = (i: number) => PROSE[i % PROSE.length]!.replace(/\.$/, ` on shift ${i}.`);

function run(text: string, request: SummarizeRequest = {}): Summary {
  const summary = summarize(text, request);
  assert.deepEqual(summaryFailures(summary, text, request), []);
  return summary;
}

/** No summary, but exactly the kind of one-line message a person can act on. */
function assertMessageOnly(summary: Summary, pattern: RegExp): void {
  assert.equal(summary.sentences.length, 0);
  assert.ok(summary.notices.length > 0, 'expected a notice');
  for (const notice of summary.notices) {
    assert.ok(!notice.includes('\n') && notice.length < 200, `not a one-line message: ${JSON.stringify(notice)}`);
  }
  assert.match(summary.notices.join(' '), pattern);
}

const NO_PROSE = /No prose sentences/;

describe('hostile documents', function () {
  // A busy two-core machine parses a few hundred KB per second; this is a hang guard, not a speed check.
  this.timeout(120_000);

  for (const format of ['markdown', 'plaintext'] as const) {
    describe(format, () => {
      it('an empty file gets a message', () => {
        assertMessageOnly(run('', { format }), NO_PROSE);
      });

      it('only whitespace (spaces, tabs, CR/LF, no-break and ideographic spaces) gets a message', () => {
        assertMessageOnly(run(' \t\r\n\n\u00a0\u3000\u2003\r\n   \n', { format }), NO_PROSE);
      });

      it('binary content with NUL bytes is refused with a message', () => {
        const binary = Array.from({ length: 4096 }, (_, i) => String.fromCharCode((i * 37) % 256)).join('');
        const summary = run(binary, { format });
        assert.ok(summary.refused, 'expected a refusal');
        assertMessageOnly(summary, /binary/);
      });

      it('invalid (lone) surrogates do not break spans or the summary', () => {
        const text = [0, 1, 2, 3, 4, 5].map((i) => sentence(i).replace('bikes', i % 2 ? 'bikes\uD800' : '\uDC00bikes')).join(' ') + ' \uD83D';
        const summary = run(text, { format, budget: { unit: 'sentences', value: 2 } });
        assert.equal(summary.document.sentences.length, 6);
        assert.equal(summary.sentences.length, 2);
      });

      it('a 10 MB document stops at the size cap with a message naming the limit', () => {
        const text = `${sentence(0)} `.repeat(Math.ceil(10_000_000 / (sentence(0).length + 1)));
        assert.ok(text.length >= 10_000_000);
        const summary = run(text, { format });
        assert.ok(summary.refused, 'expected a refusal');
        assertMessageOnly(summary, /above the 3,000,000-character limit/);
      });
    });
  }

  it('only headings (ATX of every level and setext) gets a message, with the sections kept', () => {
    const atx = Array.from({ length: 60 }, (_, i) => `${'#'.repeat(1 + (i % 6))} Heading ${i}`);
    const summary = run([...atx, 'Setext one\n==========', 'Setext two\n----------'].join('\n\n'));
    assertMessageOnly(summary, NO_PROSE);
    assert.equal(summary.document.sections.length, 1 + 62);
  });

  it('only code (fenced, tilde, indented, unclosed) gets a message and reports the code as skipped', () => {
    const text = '```ts\nconst crew = 3;\n```\n\n~~~\nplain fence\n~~~\n\n    indented(); // code\n\n```\nunclosed fence. With sentences.';
    const summary = run(text);
    assertMessageOnly(summary, NO_PROSE);
    assert.ok(summary.document.skipped.filter((s) => s.reason === 'code').length >= 3);
  });

  for (const format of ['markdown', 'plaintext'] as const) {
    it(`one 200,000-character line of prose (${format}) is summarized within the ratio budget`, () => {
      let line = '';
      let pieces = 0;
      while (line.length < 200_000) line += `${sentence(pieces++)} `;
      line = line.slice(0, 200_000);
      const summary = run(line, { format });
      assert.equal(summary.document.sentences.length, pieces);
      assert.ok(summary.sentences.length > 0 && summary.stats.compression <= 0.16);
    });

    it(`one 200,000-character token without spaces (${format}) gives at most one sentence, no exception`, () => {
      const summary = run('Qm9va2luZ3M'.repeat(20_000).slice(0, 200_000), { format });
      assert.ok(summary.document.sentences.length <= 1);
    });
  }

  it('50,000 one-word lines: Markdown reads one soft-wrapped paragraph, plain text the same, both summarized', () => {
    const text = Array.from({ length: 50_000 }, (_, i) => `dock${i}`).join('\n');
    for (const format of ['markdown', 'plaintext'] as const) {
      const summary = run(text, { format });
      assert.ok(summary.document.sentences.length >= 1);
      assert.equal(summary.sentences.length >= 1, true);
    }
  });

  it('10,000 headings, each with one sentence: the budget is spread and respected', () => {
    const text = Array.from({ length: 10_000 }, (_, i) => `## Dock ${i}\n\n${sentence(i)}`).join('\n\n');
    const summary = run(text, { budget: { unit: 'sentences', value: 40 } });
    assert.equal(summary.document.sections.length, 10_001);
    assert.equal(summary.sentences.length, 40);
    // Balance spreads the picks: no two come from the same section.
    assert.equal(new Set(summary.sentences.map((s) => s.section)).size, 40);
  });

  it('lists nested 100 deep keep every item as a sentence with its list depth', () => {
    const text = Array.from({ length: 100 }, (_, d) => `${'  '.repeat(d)}- ${sentence(d)}`).join('\n');
    const summary = run(text);
    assert.equal(summary.document.sentences.length, 100);
    assert.equal(Math.max(...summary.document.paragraphs.map((p) => p.listDepth)), 99);
    assert.ok(summary.sentences.length >= 3);
  });

  it('block quotes nested 100 deep are read as quotes', () => {
    const text = Array.from({ length: 100 }, (_, d) => `${'> '.repeat(d + 1)}${sentence(d)}`).join('\n\n');
    const summary = run(text);
    assert.equal(summary.document.sentences.length, 100);
    assert.ok(summary.document.paragraphs.every((p) => p.kind === 'quote'));
  });

  it('a document that is one huge table: skipped by default with a message, summarized with tables included', () => {
    const rows = Array.from({ length: 3_000 }, (_, i) => `| Dock ${i} | ${sentence(i)} | ${i * 3} |`);
    const text = ['| Dock | Note | Bikes |', '|---|---|---|', ...rows].join('\n');
    const skipped = run(text);
    assertMessageOnly(skipped, NO_PROSE);
    assert.deepEqual(skipped.document.skipped.map((s) => s.reason), ['table']);
    const included = run(text, { includeTables: true, budget: { unit: 'sentences', value: 10 } });
    assert.ok(included.document.sentences.length >= 3_000);
    assert.ok(included.document.paragraphs.every((p) => p.kind === 'tableCell'));
    assert.equal(included.sentences.length, 10);
  });

  describe('languages written without spaces between words', () => {
    // Written for these tests: a night-shift note of an invented bike-share service.
    const japanese =
      '夜間の再配置は毎晩二十三時に始まります。作業員は倉庫から空の自転車を運び出します。' +
      '満車の駅からは自転車を回収して、空の駅に並べます。雨の日は作業を一時間早く終えます。' +
      '朝の点検では、各駅の台数を端末に記録します。記録は翌日の経路計画に使われます。';
    const chinese =
      '夜间调度每天晚上十一点开始。工作人员把空车从仓库运到各个站点。' +
      '满车的站点会先把多余的车辆收回来。下雨的时候，调度会提前一个小时结束。' +
      '早上检查时，每个站点的车辆数量都会被记录下来。这些记录用来规划第二天的路线。';

    for (const [name, text, language] of [['Japanese', japanese, 'ja'], ['Chinese', chinese, 'zh']] as const) {
      it(`${name} prose is split at its full stops and summarized`, () => {
        for (const format of ['markdown', 'plaintext'] as const) {
          const summary = run(text, { format, budget: { unit: 'sentences', value: 2 } });
          assert.equal(summary.document.sentences.length, 6);
          assert.ok(summary.document.sentences.every((s) => s.text.endsWith('。')));
          assert.equal(summary.language, language);
          assert.equal(summary.sentences.length, 2);
        }
      });
    }
  });

  describe('text without sentence punctuation', () => {
    /** Invented Thai notes of a ferry crew; phrases separated by spaces, no full stops. */
    const THAI = ['เรือออกจากท่าตอนเก้าโมง', 'ผู้โดยสารรอที่ท่าเรือทางเหนือ', 'ลูกเรือตรวจเครื่องยนต์ทุกเช้า', 'ตารางเวลาจะเปลี่ยนในเดือนพฤษภาคม'];
    const thaiDigits = (n: number) => String(n).replace(/\d/g, (d) => String.fromCharCode(0x0e50 + Number(d)));
    const thai = Array.from({ length: 40 }, (_, i) => `${THAI[i % 4]}${thaiDigits(i)}`).join(' ');

    for (const format of ['markdown', 'plaintext'] as const) {
      it(`Thai (${format}) is split at its phrase spaces and summarized within the ratio budget`, () => {
        const summary = run(thai, { format, budget: '15%' });
        assert.equal(summary.document.sentences.length, 40);
        assert.ok(summary.sentences.length >= 1 && summary.stats.compression <= 0.16, String(summary.stats.compression));
      });

      it(`3,000 words without any punctuation (${format}) become pieces of a long sentence's length, summarized within budget`, () => {
        const words = ['dock', 'crew', 'moves', 'bikes', 'between', 'the', 'river', 'vans', 'at', 'night'];
        const text = Array.from({ length: 3_000 }, (_, i) => words[(i * 3 + (i >> 4)) % words.length]).join(' ');
        const summary = run(text, { format, budget: '15%' });
        assert.ok(summary.document.sentences.length >= text.length / FALLBACK_PIECE_CHARS);
        assert.ok(summary.document.sentences.every((s) => s.text.length <= FALLBACK_PIECE_CHARS));
        assert.ok(summary.sentences.length >= 1 && summary.stats.compression <= 0.16, String(summary.stats.compression));
      });
    }

    it('a plain-text list of 300 short lines without markers gives one unit per line', () => {
      const items = ['apples', 'bread for the week', 'milk from the corner shop', 'olive oil', 'rice and beans', 'tea'];
      const text = ['Shopping for the depot kitchen', '', ...Array.from({ length: 300 }, (_, i) => `${items[i % items.length]} ${i}`)].join('\n');
      const summary = run(text, { format: 'plaintext', budget: '15%' });
      // Only the breaks after the longest lines ("milk from the corner shop 1nn") look like wrapping.
      assert.ok(summary.document.sentences.length >= 250, String(summary.document.sentences.length));
      assert.ok(summary.stats.compression <= 0.16);
    });

    it('an HTML page pasted into a .txt file is cut at its block ends', () => {
      const page = `<html><body>${Array.from({ length: 100 }, (_, i) => `<p>${sentence(i).replace('.', '')}</p>`).join('')}</body></html>`;
      const summary = run(page, { format: 'plaintext', budget: '15%' });
      assert.equal(summary.document.sentences.length, 100);
      assert.ok(summary.stats.compression <= 0.16);
    });

    it('a word budget smaller than every sentence gives an empty summary and says why', () => {
      const summary = run([0, 1, 2, 3].map(sentence).join(' '), { budget: { unit: 'words', value: 3 } });
      assertMessageOnly(summary, /^No sentence fits in 3 words \(the shortest has 12\), so the summary is empty/);
    });
  });

  it('lone surrogates never reach the returned texts; a notice says they were replaced', () => {
    const text = `# Dock \uDC00report\n\n${[0, 1, 2].map((i) => sentence(i).replace(' ', ' \uD800')).join(' ')}`;
    const summary = run(text, { budget: { unit: 'sentences', value: 3 } });
    const wellFormed = (s: string) => !/[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/.test(s);
    const texts = [summary.document.title ?? '', ...summary.document.sections.map((s) => s.heading), ...summary.document.sentences.map((s) => s.text), ...summary.sentences.map((s) => s.text), ...summary.sentences.flatMap((s) => s.sectionPath)];
    assert.ok(texts.every(wellFormed), JSON.stringify(texts));
    assert.ok(summary.sentences.every((s) => s.text.includes(' \uFFFD')));
    assert.deepEqual(summary.notices, ['The text holds 4 lone surrogate code units (broken UTF-16); quoted text shows each as U+FFFD (�).']);
    // Offsets still index the caller's text: each picked span holds the sentence, surrogate and all.
    for (const picked of summary.sentences) assert.equal(text.slice(picked.span.start, picked.span.end).replace(/\uD800/g, '\uFFFD'), picked.text);
  });

  it('a byte-order mark given to the engine is counted in the offsets', () => {
    const text = `\uFEFF${sentence(0)} ${sentence(1)}`;
    const summary = run(text, { format: 'plaintext', budget: { unit: 'sentences', value: 1 } });
    const picked = summary.sentences[0]!;
    assert.equal(text.slice(picked.span.start, picked.span.end), picked.text);
    assert.ok(picked.span.start >= 1);
  });

  it('escape sequences in the text come back exactly (terminal safety is the front end\'s job, see cli-output.test.ts)', () => {
    // Enough prose that four control characters stay below the binary threshold (1% of the text).
    const prose = Array.from({ length: 10 }, (_, i) => sentence(i)).join(' ');
    const text = `${prose} The van \u001b]0;owned\u0007waits at the \u001b[2Jdock. ${prose}`;
    const summary = run(text, { budget: { unit: 'sentences', value: 21 } });
    assert.ok(summary.sentences.some((s) => s.text.includes('\u001b]0;owned\u0007')));
  });

  it('a model with counts of 1e308 is refused as an option, not scored as NaN', () => {
    const model = JSON.parse(JSON.stringify(defaultModelJson)) as { classes: { positive: number } };
    model.classes.positive = 1e308;
    assert.throws(() => summarize(sentence(0), { model }), OptionsError);
  });

  it('controls short of binary (form feeds, a vertical tab, a bell) still give a summary', () => {
    const text = `${sentence(0)}\f${sentence(1)}\v ${sentence(2)}\u0007 ${sentence(3)}`;
    const summary = run(text, { format: 'plaintext' });
    assert.ok(summary.refused === undefined && summary.sentences.length > 0);
  });
});
