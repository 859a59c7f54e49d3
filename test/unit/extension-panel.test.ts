import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { fromMarkdown } from 'mdast-util-from-markdown';
import type { Heading, List, Paragraph, RootContent } from 'mdast';
import { buildPanelSummary, previousPicksFor, UNTITLED_SECTION } from '../../src/extension/panel-model';
import { applyRepair, countWords, escapeMarkdown, METHOD_INFO, summarize } from '../../src/core/index';
import { FEATURE_LABELS, whyNumbers } from '../../src/extension/why-text';
import { planInsertion, summaryForClipboard } from '../../src/extension/summary-text';
import { convergenceOf, describePick, HOVER_FEATURES } from '../../src/extension/hover-text';
import { contentSecurityPolicy, makeNonce, panelHtml } from '../../src/extension/panel-html';
import { FERRY_TEXT, ferrySummary } from './extension-fixture';
import { wordingFor } from '../../src/extension/wording';

describe('extension panel model', () => {
  it('groups sentences by balance unit, in document order, with sub-section paths and warnings', () => {
    const panel = buildPanelSummary(ferrySummary(), 7, 'ferry.md', 'document');
    assert.equal(panel.id, 7);
    assert.deepEqual(
      panel.groups.map((g) => [g.heading, g.sentences.map((s) => s.sentence), g.share]),
      [
        ['Night Ferry Timetable', [0], '25% of the summary'],
        ['Fares', [3, 4], '50% of the summary'],
        ['Safety', [5], '25% of the summary'],
      ],
    );
    const discounts = panel.groups[1]!.sentences[1]!;
    assert.deepEqual(discounts.subPath, ['Discounts']);
    const flagged = panel.groups[1]!.sentences[0]!;
    assert.equal(flagged.warnings.length, 1);
    assert.equal(flagged.warnings[0]!.index, 0);
    assert.deepEqual(
      flagged.warnings[0]!.repairs.map((r) => r.label),
      ['Add the context sentence', 'Swap for the next best sentence', 'Show without “However,”'],
    );
    const { stats } = ferrySummary();
    assert.deepEqual(panel.figures, {
      words: `${stats.wordsOut} of ${stats.wordsIn} words`,
      reading: 'reads in about 1 min (document about 1 min)',
      sections: `covers ${stats.sectionsCovered} of ${stats.sectionsWithContent} sections`,
      sentences: `${stats.sentencesOut} of ${stats.sentencesIn} sentences`,
    });
    assert.equal(panel.changed, 0, 'a first summary marks nothing as new');
    assert.ok(panel.groups.every((g) => g.sentences.every((s) => !s.isNew)));
  });

  it('words the figures for the display language, with thousands separators', () => {
    const summary = ferrySummary();
    const big = { ...summary, stats: { ...summary.stats, wordsIn: 2444, wordsOut: 151, minutesToRead: 0.66, documentMinutesToRead: 39.6 } };
    assert.equal(buildPanelSummary(big, 1, 'x', 'document').figures.words, '151 of 2,444 words');
    assert.equal(buildPanelSummary(big, 1, 'x', 'document').figures.reading, 'reads in about 1 min (document about 40 min)');
    assert.equal(buildPanelSummary(big, 1, 'x', 'document', { wording: wordingFor('de') }).figures.words, '151 of 2.444 words');
  });

  it('marks picks that were not in the previous summary of the document as new', () => {
    const summary = ferrySummary();
    const previous = new Set(summary.sentences.slice(1).map((p) => p.text));
    const panel = buildPanelSummary(summary, 2, 'ferry.md', 'document', { previousPicks: previous });
    assert.equal(panel.changed, 1);
    assert.deepEqual(
      panel.groups.flatMap((g) => g.sentences.filter((s) => s.isNew).map((s) => s.sentence)),
      [summary.sentences[0]!.sentence],
    );
  });

  it('compares with the previous picks only after a live edit with the same focus, never after a command or a settings change', () => {
    const summary = ferrySummary();
    const before = { scope: 'document' as const, version: 3, summary };
    const focused = { ...summary, focus: { text: 'night fares', terms: 2, termsFound: 2, matchingSentences: 2 } };
    const picks = previousPicksFor(before, { scope: 'document', version: 4, summary }, true);
    assert.deepEqual([...(picks ?? [])], summary.sentences.map((p) => p.text), 'an edit: compare');
    assert.equal(previousPicksFor(before, { scope: 'document', version: 4, summary: focused }, true), undefined, 'a new focus');
    assert.equal(previousPicksFor(before, { scope: 'document', version: 3, summary }, true), undefined, 'no edit');
    assert.equal(previousPicksFor(before, { scope: 'document', version: 4, summary }, false), undefined, 'a command or a settings change after an edit (a revert, then a new length)');
    assert.equal(previousPicksFor(before, { scope: 'selection', version: 4, summary }, true), undefined, 'another scope');
    assert.equal(previousPicksFor(undefined, { scope: 'document', version: 4, summary }, true), undefined, 'a first summary');
  });

  it('says why a sentence was picked in words, with the numbers apart', () => {
    const panel = buildPanelSummary(ferrySummary(), 1, 'ferry.md', 'document');
    const first = panel.groups[0]!.sentences[0]!;
    assert.match(first.why, /^Opening sentence of “Night Ferry Timetable”; shares the key terms “ferry” with the title; ranked 1st of 6 sentences\.$/);
    assert.match(first.whyNumbers[0]!, /^rank 1 of 6, score 1\.000 \(blend\)$/);
    assert.ok(first.whyNumbers.some((line) => line.startsWith('position: ')), 'a feature name without a label is shown as it is');
    assert.equal(first.whyNumbers[1], 'Each line below: a score or count the method works from (higher counts more).', 'the numbers say what they are');
  });

  it('names every number of every method in words (no raw feature identifiers)', () => {
    const demo = readFileSync(new URL('../../media/demo/bike-share-rebalancing.md', import.meta.url), 'utf8');
    const wording = wordingFor('en');
    for (const method of METHOD_INFO) {
      const summary = summarize(demo, { method: method.name });
      const pick = summary.sentences.find((p) => p.rank > 0)!;
      const names = Object.keys(pick.features);
      assert.ok(names.length > 0, method.name);
      for (const name of names) assert.ok(FEATURE_LABELS[name], `${method.name}: no label for ${name}`);
      const lines = whyNumbers(pick, summary, wording).slice(2);
      assert.equal(lines.length, names.filter((n) => Number.isFinite(pick.features[n])).length, method.name);
      for (const line of lines) {
        assert.match(line, /^[A-Z][^:]*: -?\d/u, `${method.name}: ${line}`);
        assert.doesNotMatch(line.split(':')[0]!, /\b[a-z]+[A-Z]\w*/u, `${method.name}: no camelCase identifier in ${line}`);
      }
    }
    const maxent = whyNumbers(summarize(demo, { method: 'maxent' }).sentences[0]!, summarize(demo, { method: 'maxent' }), wording);
    // A discrete feature's number is the weight of the sentence's value, so the value is named.
    assert.ok(maxent.some((line) => /^Placeholder answer \(None, N\/A, TBD…\) — no: -?\d/u.test(line)), maxent.join(' | '));
    assert.ok(maxent.some((line) => /^Sentence length — (?:1-5 words|6-12|13-25|26-40|over 40): -?\d/u.test(line)), maxent.join(' | '));
  });

  it('labels text before the first heading and puts a refusal first among the notices', () => {
    const summary = ferrySummary();
    const untitled = { ...summary, shares: summary.shares.map((s) => (s.section === 1 ? { ...s, heading: '' } : s)), refused: 'Too long.', notices: ['Too long.', 'Other.'] };
    const panel = buildPanelSummary(untitled, 1, 'x', 'document');
    assert.equal(panel.shares[0]!.heading, UNTITLED_SECTION);
    assert.deepEqual(panel.notices, ['Too long.', 'Other.']);
  });
});

describe('extension repairs (applied to the summary, never the document)', () => {
  it('adds the context sentence in document order and updates figures, shares and warnings', () => {
    const before = ferrySummary();
    const outcome = applyRepair(before, 0, 0);
    assert.ok(outcome.ok);
    const after = outcome.summary;
    assert.deepEqual(after.sentences.map((p) => p.sentence), [0, 2, 3, 4, 5]);
    assert.equal(after.sentences[1]!.rank, 0);
    assert.equal(after.stats.sentencesOut, 5);
    assert.equal(after.stats.wordsOut, before.stats.wordsOut + 4);
    assert.equal(after.shares.find((s) => s.section === 2)!.picked, 3);
    assert.equal(after.warnings.length, 0);
    assert.equal(after.document.text, FERRY_TEXT, 'the document is untouched');
  });

  it('swaps the flagged sentence for the replacement', () => {
    const outcome = applyRepair(ferrySummary(), 0, 1);
    assert.ok(outcome.ok);
    assert.deepEqual(outcome.summary.sentences.map((p) => p.sentence), [0, 2, 4, 5]);
    assert.equal(outcome.summary.stats.sentencesOut, 4);
  });

  it('shows the sentence without its connective, marked as edited', () => {
    const outcome = applyRepair(ferrySummary(), 0, 2);
    assert.ok(outcome.ok);
    const pick = outcome.summary.sentences.find((p) => p.sentence === 3)!;
    assert.equal(pick.text, 'Children ride free.');
    assert.match(pick.edited!.reason, /However/);
    assert.equal(outcome.summary.stats.wordsOut, ferrySummary().stats.wordsOut - 1);
  });

  it('refuses repairs that are not offered', () => {
    assert.equal(applyRepair(ferrySummary(), 5, 0).ok, false);
    assert.equal(applyRepair(ferrySummary(), 0, 9).ok, false);
  });

  it('counts words as runs of letters and digits, keeping contractions and hyphenated words whole', () => {
    assert.equal(countWords("It's a well-known 3-step plan — twice."), 6);
    assert.equal(countWords('   '), 0);
  });
});

function blocks(markdown: string): RootContent[] {
  return fromMarkdown(markdown).children;
}

describe('extension summary text: copy and insert', () => {
  it('inserts a Markdown document’s summary as a block right under its title (checked with mdast)', () => {
    const summary = ferrySummary();
    const plan = planInsertion(summary, FERRY_TEXT, 'markdown', { kind: 'heading', section: 1 });
    assert.equal(plan.placement, 'underHeading');
    assert.equal(plan.offset, '# Night Ferry Timetable'.length);
    const result = FERRY_TEXT.slice(0, plan.offset) + plan.text + FERRY_TEXT.slice(plan.offset);
    // The rest of the document is unchanged, byte for byte.
    assert.equal(result.slice(plan.offset + plan.text.length), FERRY_TEXT.slice(plan.offset));
    // External reference: mdast-util-from-markdown parses the result; the title stays the first
    // block, the summary is the next blocks (a caption paragraph, then a list), then the old text.
    const tree = blocks(result);
    assert.equal(tree[0]!.type, 'heading');
    assert.equal((tree[0] as Heading).depth, 1);
    assert.equal(tree[1]!.type, 'paragraph');
    assert.match(JSON.stringify((tree[1] as Paragraph).children), /Summary/);
    assert.equal(tree[2]!.type, 'list');
    assert.equal((tree[2] as List).children.length, summary.sentences.length);
    assert.equal(tree[3]!.type, 'paragraph');
  });

  it('follows the document’s CRLF line endings', () => {
    const crlf = FERRY_TEXT.replace(/\n/g, '\r\n');
    const plan = planInsertion(ferrySummary(crlf), crlf, 'markdown', { kind: 'heading', section: 1 });
    assert.ok(plan.text.includes('\r\n'));
    assert.ok(!/[^\r]\n/.test(plan.text), 'no bare LF');
  });

  it('puts a selection’s summary, and plain text, at the cursor, on a line of its own', () => {
    const summary = ferrySummary();
    const cursor = FERRY_TEXT.indexOf('returns');
    const plan = planInsertion(summary, FERRY_TEXT, 'markdown', { kind: 'cursor', offset: cursor });
    assert.equal(plan.placement, 'atCursor');
    assert.equal(plan.offset, cursor);
    assert.ok(plan.text.startsWith('\n\n'));
    const plain = planInsertion(summary, FERRY_TEXT, 'plaintext', { kind: 'cursor', offset: 0 });
    assert.equal(plain.offset, 0);
    assert.match(plain.text, /^Summary \(extractive/);
    assert.equal(plain.text.split('\n').filter((line) => line.startsWith('- ')).length, summary.sentences.length);
  });

  it('copies Markdown whose sentence text cannot turn into markup (checked with mdast)', () => {
    const hostile = '<img src=x onerror=alert(1)> *not emphasis* [link](javascript:alert(1))';
    const summary = ferrySummary(FERRY_TEXT, { sentence: hostile });
    const markdown = summaryForClipboard(summary, null, 'markdown');
    // External reference: micromark/mdast must see no HTML, emphasis or link nodes in the list items.
    const types = new Set<string>();
    const visit = (node: { type: string; children?: unknown[] }): void => {
      types.add(node.type);
      for (const child of (node.children ?? []) as { type: string }[]) visit(child);
    };
    visit(fromMarkdown(markdown));
    for (const forbidden of ['html', 'emphasis', 'link', 'image']) assert.ok(!types.has(forbidden), `no ${forbidden} node`);
    assert.ok(markdown.includes('onerror=alert(1)'), 'the text itself is kept');
  });
});

describe('extension hover text', () => {
  it('says why in words first, then the numbers (rank, score, strongest feature first), escaped as Markdown', () => {
    const pick = ferrySummary().sentences[1]!;
    const text = describePick(pick, ferrySummary());
    assert.match(text, /ranked 2nd of 6 sentences/);
    assert.match(text, /rank 2 of 6, score 0\.500 \(blend\)/);
    assert.ok(text.indexOf('ranked 2nd') < text.indexOf('score 0.500'), 'words before numbers');
    assert.ok(text.indexOf('position:') < text.indexOf('heading'), 'largest feature first');
    assert.ok(text.includes('heading\\|overlap'), 'a pipe in a feature name is escaped');
  });

  it('names the strongest HOVER_FEATURES features of a trained model and points to the panel for the rest', () => {
    const demo = readFileSync(new URL('../../media/demo/bike-share-rebalancing.md', import.meta.url), 'utf8');
    const summary = summarize(demo, { method: 'maxent' });
    const pick = summary.sentences[0]!;
    const all = whyNumbers(pick, summary, wordingFor('en'));
    assert.ok(all.length > 2 + HOVER_FEATURES, `${all.length} lines`);
    const text = describePick(pick, summary);
    // The hover is Markdown: each line appears escaped, as describePick writes it.
    for (const line of all.slice(0, 2 + HOVER_FEATURES)) assert.ok(text.includes(escapeMarkdown(line)), line);
    for (const line of all.slice(2 + HOVER_FEATURES)) assert.ok(!text.includes(escapeMarkdown(line)), `left to the panel: ${line}`);
    assert.match(text, new RegExp(`${all.length - 2 - HOVER_FEATURES} more under “Show the numbers” in the panel`));
  });

  it('says when a sentence came from a repair instead of a ranking', () => {
    const pick = { ...ferrySummary().sentences[0]!, rank: 0 };
    assert.match(describePick(pick, ferrySummary()), /Added by a repair/);
  });

  it('reports whether the ranking converged, and in how many iterations, when the summary says', () => {
    const pick = ferrySummary().sentences[1]!;
    assert.match(describePick(pick, ferrySummary(), undefined, { converged: true, iterations: 23 }), /Ranking converged after 23 iterations\./);
    assert.match(describePick(pick, ferrySummary(), undefined, { converged: false, iterations: 100 }), /did not converge within 100 iterations: the scores are approximate/);
    assert.doesNotMatch(describePick(pick, ferrySummary()), /converge/, 'nothing is claimed without the figure');
    assert.equal(convergenceOf(ferrySummary()), undefined, 'a ranking without an iterative method reports nothing');
    assert.deepEqual(convergenceOf({ ...ferrySummary(), ranking: { converged: false, iterations: 7 } }), { converged: false, iterations: 7 });
  });
});

describe('extension panel HTML shell', () => {
  it('has a deny-by-default policy: scripts only by nonce, styles and fonts only from the extension', () => {
    const csp = contentSecurityPolicy('https://file+.vscode-resource.example', 'abc123==');
    const directives = new Map(csp.split(';').map((d) => d.trim().split(/\s+/)).map(([name, ...values]) => [name!, values]));
    assert.deepEqual(directives.get('default-src'), ["'none'"]);
    assert.deepEqual(directives.get('script-src'), ["'nonce-abc123=='"]);
    assert.deepEqual(directives.get('style-src'), ['https://file+.vscode-resource.example']);
    assert.deepEqual(directives.get('font-src'), ['https://file+.vscode-resource.example']);
    assert.ok(!csp.includes('unsafe-inline') && !csp.includes('unsafe-eval'));
  });

  it('makes 128-bit nonces from Web Crypto that differ each time', () => {
    const nonces = new Set(Array.from({ length: 50 }, () => makeNonce()));
    assert.equal(nonces.size, 50);
    for (const nonce of nonces) {
      assert.match(nonce, /^[A-Za-z0-9+/]{22}==$/, 'base64 of 16 bytes');
      assert.equal(Buffer.from(nonce, 'base64').length, 16);
    }
  });

  it('encodes the bytes the random source gives, as standard base64', () => {
    let asked = 0;
    const counting = {
      getRandomValues<T extends Uint8Array>(array: T): T {
        asked += array.length;
        array.forEach((_, i) => (array[i] = 250 - i * 13));
        return array;
      },
    };
    const nonce = makeNonce(counting);
    assert.equal(asked, 16, 'asks for exactly 128 bits');
    // Reference encoder: Node's Buffer (outside the module under test).
    assert.equal(nonce, Buffer.from(Array.from({ length: 16 }, (_, i) => 250 - i * 13)).toString('base64'));
  });

  it('draws on globalThis.crypto by default (Web Crypto, which Node and Web Workers both have)', () => {
    const original = Object.getOwnPropertyDescriptor(globalThis, 'crypto')!;
    let calls = 0;
    const standIn = { getRandomValues: <T extends Uint8Array>(array: T): T => (calls++, array.fill(7)) };
    Object.defineProperty(globalThis, 'crypto', { value: standIn, configurable: true });
    try {
      assert.equal(makeNonce(), Buffer.alloc(16, 7).toString('base64'));
    } finally {
      Object.defineProperty(globalThis, 'crypto', original);
    }
    assert.equal(calls, 1);
    const source = readFileSync(new URL('../../src/extension/panel-html.ts', import.meta.url), 'utf8');
    assert.doesNotMatch(source, /node:crypto|randomBytes|Math\.random/);
  });

  it('loads one script with the nonce and contains no inline handlers or inline script', () => {
    const html = panelHtml({ cspSource: 'vscode-resource:', nonce: 'N0nce', scriptUri: 'vscode-resource:/dist/webview.js', styleUri: 'vscode-resource:/media/panel.css' });
    assert.equal(html.match(/<script/g)?.length, 1);
    assert.match(html, /<script nonce="N0nce" src="vscode-resource:\/dist\/webview.js"><\/script>/);
    assert.ok(!/\son[a-z]+=/i.test(html));
    assert.ok(!/style="/.test(html));
  });

  it('escapes attribute values', () => {
    const html = panelHtml({ cspSource: 'x', nonce: 'n', scriptUri: '"><script>alert(1)</script>', styleUri: 's' });
    assert.equal(html.match(/<script/g)?.length, 1);
  });
});
