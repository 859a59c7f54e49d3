/**
 * The panel's digest part (src/webview/panel-render.ts renderDigest) in a real DOM: the function is
 * bundled with esbuild and run in headless Chromium (Debian's, as the e2e tests use), with the
 * digest the extension would send for a real engine digest.
 */
import assert from 'node:assert/strict';
import { existsSync } from 'node:fs';
import { build } from 'esbuild';
import { chromium, type Browser, type Page } from 'playwright-core';
import { digestDocuments } from '../../src/core/index';
import { digestView } from '../../src/extension/digest-view';
import type { PanelDigest } from '../../src/extension/messages';
import { PANEL_TEXT } from '../../src/extension/panel-text';
import { CHROMIUM } from '../e2e/browser';

// Invented: a sentence that looks like markup must reach the panel as text; the second note repeats one sentence.
const HOSTILE = 'The gate code changed to <img src=x onerror=alert(1)> last week.';
const SHARED = 'Visitors sign the book in the hut before walking down to the pond.';
const NOTES = [
  { file: 'gate.md', format: 'markdown' as const, text: `# Gate\n\nThe gate is locked at sunset from October to March. ${SHARED}\n\n## Keys\n\nSpare keys hang on a hook in the tool shed.\n` },
  // Plain text keeps angle brackets in the sentence (Markdown would read them as inline HTML).
  { file: 'hut.txt', format: 'plaintext' as const, text: `HUT\n\n${SHARED} ${HOSTILE} The kettle in the hut is for everyone.\n` },
];

const ENTRY = `
import { renderDigest } from './src/webview/panel-render';
import { PANEL_TEXT } from './src/extension/panel-text';
const calls = [];
const actions = {
  reveal: () => calls.push(['reveal']),
  repair: () => calls.push(['repair']),
  revealCheck: () => calls.push(['revealCheck']),
  dismissCheck: () => calls.push(['dismissCheck']),
  revealDigest: (id, target) => calls.push(['revealDigest', id, target]),
  dismissDigest: () => calls.push(['dismissDigest']),
  toggled: () => undefined,
};
window.calls = calls;
window.show = (digest) => {
  const { element, items } = renderDigest(digest, PANEL_TEXT, actions);
  document.body.replaceChildren(element);
  return items.length;
};
`;

describe('panel: the digest part in a real DOM', function () {
  this.timeout(60_000);
  let browser: Browser | undefined;
  let page: Page;
  let digest: PanelDigest;

  before(async function () {
    if (!existsSync(CHROMIUM)) {
      // Chromium is the only real DOM here (scripts/e2e.sh installs it); say so rather than pass.
      console.warn(`  skipped: no Chromium at ${CHROMIUM} (set CHROMIUM_PATH)`);
      this.skip();
    }
    const bundled = await build({ stdin: { contents: ENTRY, resolveDir: process.cwd(), loader: 'ts' }, bundle: true, write: false, platform: 'browser', format: 'iife', logLevel: 'silent' });
    browser = await chromium.launch({ executablePath: CHROMIUM, headless: true, args: ['--no-sandbox', '--disable-gpu'] });
    page = await browser.newPage();
    await page.setContent('<!doctype html><html><body></body></html>');
    await page.addScriptTag({ content: bundled.outputFiles[0]!.text });
    digest = { id: 12, ...digestView(digestDocuments(NOTES, { budget: { unit: 'sentences', value: 6 } })).panel };
  });
  after(async () => browser?.close());
  beforeEach(async () => {
    if (browser) await page.evaluate((d) => ((window as unknown as { calls: unknown[] }).calls.length = 0, (window as unknown as { show(d: unknown): number }).show(d)), digest);
  });
  const calls = (): Promise<unknown[]> => page.evaluate(() => [...(window as unknown as { calls: unknown[] }).calls]);

  it('shows document text as text: markup in a sentence creates no element and runs nothing', async () => {
    const seen = await page.evaluate((hostile) => {
      const line = Array.from(document.querySelectorAll<HTMLElement>('.digest-line')).find((li) => li.textContent?.includes('gate code'));
      return { text: line?.querySelector('.digest-text')?.textContent, images: document.querySelectorAll('img').length, raw: document.body.innerHTML.includes(hostile) };
    }, HOSTILE);
    assert.equal(seen.text, HOSTILE);
    assert.equal(seen.images, 0);
    assert.equal(seen.raw, false, 'the angle brackets are escaped in the serialized DOM');
  });

  it('carries the single summary’s caution: extractive, can lose context (the one panel string)', async () => {
    const note = await page.locator('.digest .note').textContent();
    assert.equal(note, PANEL_TEXT.note);
    assert.match(note ?? '', /Extractive summary/);
    assert.match(note ?? '', /lose the context/);
  });

  it('shows each document with its figures, its sections and its lines, in the order sent', async () => {
    const shown = await page.evaluate(() =>
      Array.from(document.querySelectorAll('.digest-document')).map((section) => ({
        file: section.querySelector('.digest-file span')?.textContent,
        figures: section.querySelector('.digest-figures')?.textContent,
        headings: Array.from(section.querySelectorAll('.digest-heading')).map((h) => h.textContent),
        lines: Array.from(section.querySelectorAll('.digest-text')).map((t) => t.textContent),
      })),
    );
    assert.deepEqual(
      shown,
      digest.documents.map((d) => ({
        file: d.file,
        figures: d.figures,
        headings: d.sections.filter((s) => s.heading !== '').map((s) => s.heading),
        lines: d.sections.flatMap((s) => s.lines.map((l) => l.text)),
      })),
    );
    assert.equal(await page.locator('.check-headline').textContent(), digest.headline);
  });

  it('clicking a line asks to reveal that line’s place in this digest', async () => {
    const lines = digest.documents.flatMap((d) => d.sections.flatMap((s) => s.lines));
    const second = lines[1]!;
    await page.locator('.digest-line').nth(1).locator('.digest-text').click();
    assert.deepEqual(await calls(), [['revealDigest', 12, second.target]]);
  });

  it('clicking an "also in" link asks for the link’s place, not its line’s', async () => {
    const line = digest.documents.flatMap((d) => d.sections.flatMap((s) => s.lines)).find((l) => l.alsoIn.length > 0);
    assert.ok(line, 'the repeated sentence has a link');
    await page.getByRole('button', { name: line.alsoIn[0]!.label }).click();
    assert.deepEqual(await calls(), [['revealDigest', 12, line.alsoIn[0]!.target]]);
    assert.notEqual(line.alsoIn[0]!.target, line.target);
  });

  it('the dismiss button asks to dismiss the digest', async () => {
    await page.getByRole('button', { name: 'Dismiss: Digest' }).click();
    assert.deepEqual(await calls(), [['dismissDigest']]);
  });
});
