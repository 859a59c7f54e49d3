import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import MarkdownIt from 'markdown-it';
import { summarize } from '../../src/core/index';
import { escapeInline, summaryMarkdown } from '../../src/extension/summary-markdown';
import { planInsertion } from '../../src/extension/summary-text';
import { shiftSpans } from '../../src/extension/span-shift';

// External reference: markdown-it (a CommonMark parser, npm) reads the output back.
const md = new MarkdownIt('commonmark');

interface Token {
  type: string;
  content: string;
  children: Token[] | null;
}

/** Plain text of each list item (text and code spans as written, soft breaks as spaces), and the token types seen. */
function readBack(markdown: string): { items: string[]; types: Set<string>; codeSpans: string[]; headings: string[] } {
  const tokens = md.parse(markdown, {}) as Token[];
  const items: string[] = [];
  const headings: string[] = [];
  const types = new Set<string>();
  const codeSpans: string[] = [];
  let inItem = 0;
  let inHeading = false;
  for (const token of tokens) {
    types.add(token.type);
    if (token.type === 'list_item_open') inItem++;
    if (token.type === 'list_item_close') inItem--;
    if (token.type === 'heading_open') inHeading = true;
    if (token.type === 'heading_close') inHeading = false;
    if (token.type !== 'inline') continue;
    const text = (token.children ?? [])
      .map((child) => {
        types.add(child.type);
        if (child.type === 'code_inline') codeSpans.push(child.content);
        return child.type === 'text' || child.type === 'code_inline' ? child.content : child.type === 'softbreak' ? ' ' : '';
      })
      .join('');
    if (inItem > 0) items.push(text);
    else if (inHeading) headings.push(text);
  }
  return { items, types, codeSpans, headings };
}

const flat = (text: string): string => text.replace(/\s+/g, ' ').trim();

describe('Copy and Insert Markdown: clean CommonMark that round-trips', () => {
  const demo = readFileSync(new URL('../../media/demo/bike-share-rebalancing.md', import.meta.url), 'utf8');
  const summary = summarize(demo, { budget: '12s', format: 'markdown' });

  it('parses back to the summary’s sentences, one list item each, with headings as blocks of their own', () => {
    const markdown = summaryMarkdown(summary, demo, 'markdown', { grouped: true, documentName: 'bike-share-rebalancing.md' });
    const back = readBack(markdown);
    assert.deepEqual(back.items.map(flat), summary.sentences.map((p) => flat(p.text)));
    assert.ok(back.types.has('heading_open'), 'group headings are headings, not text glued under a bullet');
    assert.ok(!back.types.has('html_inline') && !back.types.has('html_block'));
    assert.match(markdown, /^Summary of bike-share-rebalancing\.md — extractive:/);
    assert.ok(!/\n\n\n/.test(markdown), 'no runs of blank lines');
    // Every heading line has a blank line before and after it.
    for (const line of markdown.split('\n').map((l, i, all) => [l, i, all] as const).filter(([l]) => l.startsWith('#'))) {
      const [, i, all] = line;
      assert.equal(all[i - 1], '');
      assert.equal(all[i + 1], '');
    }
  });

  it('keeps inline code as code and does not over-escape (#2231, thumbs_state)', () => {
    const text = '# Notes\n\nThe flag `thumbs_state` fixes issue #2231 for 3 * 4 riders.\n\nAnother line here for balance.\n';
    const small = summarize(text, { budget: '2s', format: 'markdown' });
    const markdown = summaryMarkdown(small, text, 'markdown', { grouped: false });
    assert.ok(markdown.includes('`thumbs_state`'), markdown);
    assert.ok(markdown.includes('#2231') && !markdown.includes('\\#2231'));
    assert.deepEqual(readBack(markdown).codeSpans, ['thumbs_state']);
    // Plain text escapes only what would start markup.
    assert.equal(escapeInline('issue #2231 in thumbs_state costs 3 * 4'), 'issue #2231 in thumbs_state costs 3 * 4');
    assert.equal(escapeInline('*bold* and _it_ and `x` and [a](b) and <b>'), '\\*bold\\* and \\_it\\_ and \\`x\\` and \\[a](b) and \\<b>');
    assert.equal(escapeInline('# not a heading'), '\\# not a heading');
    assert.equal(escapeInline('1. not a list'), '1\\. not a list');
  });

  it('escaped text reads back as the same words (property over tricky strings)', () => {
    for (const raw of ['a*b*c', '_x_ y_z', 'back\\slash \\*', '[x] [y](z)', '<div> & &amp;', '+ plus', '> quote', '10) ten', '`a` `` b', '!\\[img]']) {
      const back = readBack(`- ${escapeInline(raw)}\n`);
      assert.equal(back.items[0], raw, raw);
    }
  });

  it('inserts under a heading the user picks, and the summary’s places move with the inserted text', () => {
    const background = summary.document.sections.find((s) => s.heading === 'Background')!;
    const plan = planInsertion(summary, demo, 'markdown', { kind: 'heading', section: background.index });
    const after = demo.slice(0, plan.offset) + plan.text + demo.slice(plan.offset);
    assert.equal(after.slice(0, plan.offset), demo.slice(0, plan.offset));
    assert.equal(after.slice(plan.offset + plan.text.length), demo.slice(plan.offset));
    const tokens = md.parse(after, {}) as Token[];
    const headingAt = tokens.findIndex((t) => t.type === 'inline' && t.content === 'Background');
    assert.equal(tokens[headingAt + 2]!.type, 'paragraph_open', 'the caption follows the heading');
    const moved = shiftSpans(summary, plan.offset, plan.text.length);
    for (const [i, pick] of moved.sentences.entries()) {
      assert.equal(after.slice(pick.span.start, pick.span.end), demo.slice(summary.sentences[i]!.span.start, summary.sentences[i]!.span.end));
    }
  });
});
