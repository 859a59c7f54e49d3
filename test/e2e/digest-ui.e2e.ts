/**
 * The digest as a person uses it, in the real editor (code-server in Chromium): open three invented
 * files (test/e2e/fixtures/digest/), Digest Open Documents from the palette, read the panel at the
 * side bar's default width, see the highlights, click a line of the second file, dismiss.
 * Expected lines come from the engine run here in Node on the same files.
 *
 * Usage: tsx test/e2e/digest-ui.e2e.ts <baseUrl> <workspaceFolder> <artifactsDir>
 */
import assert from 'node:assert/strict';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { digestDocuments, formatForFileName } from '../../src/core/index';
import { isPanelResource, openSession, timer } from './browser';
import { countDecorations, cursorStatus, openFile, panelFrame, panelLocator, poll, runCommand, waitForWorkbench } from './workbench';

const [base, workspace, artifacts] = process.argv.slice(2) as [string, string, string];
const FILES = [
  ['keeping.md', 'Lighthouse keeping'],
  ['supplies.rst', 'Lighthouse supplies'],
  ['visitors.txt', 'VISITOR HOURS'],
] as const;
const mark = timer();
const checks: Record<string, unknown> = {};

async function main(): Promise<void> {
  mkdirSync(artifacts, { recursive: true });
  const session = await openSession(base);
  const { page, blocked } = session;
  const pageErrors: string[] = [];
  page.on('pageerror', (error) => pageErrors.push(error.message));
  try {
    await page.goto(`${base}/?folder=${encodeURIComponent(workspace)}`, { waitUntil: 'domcontentloaded' });
    await waitForWorkbench(page, 'digest');
    mark('workbench up');
    for (const [name, firstLine] of FILES) await openFile(page, name, firstLine);
    await runCommand(page, 'Tersely: Digest Open Documents');
    const panel = panelLocator(page);
    await panel.locator('.digest .digest-line').first().waitFor({ timeout: 60_000 });
    mark('digest shown');

    // What the panel shows, against the engine's digest of the same files (the extension's default digest length).
    const expected = digestDocuments(
      FILES.map(([name]) => ({ file: `digest/${name}`, text: readFileSync(join(workspace, 'digest', name), 'utf8'), format: formatForFileName(name)!.id })),
      {},
    );
    const shown = await (await panelFrame(page)).evaluate(() => ({
      files: Array.from(document.querySelectorAll('.digest-document .digest-file > span:first-child')).map((n) => n.textContent),
      lines: Array.from(document.querySelectorAll('.digest-line .digest-text')).map((n) => n.textContent),
      note: document.querySelector('.digest .note')?.textContent ?? '',
      notes: document.querySelectorAll('.note').length,
      emptyState: document.querySelector('.empty') !== null,
      width: document.documentElement.clientWidth,
      overflow: document.documentElement.scrollWidth - document.documentElement.clientWidth,
    }));
    checks['panel'] = shown;
    assert.deepEqual(shown.files, FILES.map(([name]) => `digest/${name}`));
    assert.deepEqual(shown.lines, expected.sentences.map((s) => s.text));
    assert.match(shown.note, /^Extractive summary/);
    assert.equal(shown.notes, 1, 'the caution once: the empty state gives way to the digest');
    assert.equal(shown.emptyState, false);
    assert.ok(shown.overflow <= 1, `nothing overflows the panel at its default width (${shown.width} px)`);
    await page.locator('iframe.webview.ready').first().screenshot({ path: join(artifacts, '09-digest-panel.png') });
    await page.screenshot({ path: join(artifacts, '09-digest.png') });

    // The active editor (the last file opened) shows the digest's picks of that file.
    const highlighted = await poll(() => countDecorations(page), (n) => n > 0, 10_000, 'highlights in the open digested file');
    checks['decorationsInThirdFile'] = highlighted;

    // Click the first line of the second file: that file opens with the sentence selected.
    const target = expected.sentences.find((s) => s.file === 'digest/supplies.rst')!;
    await panel.locator('.digest-document').nth(1).locator('.digest-line .digest-text').first().click();
    await page.locator('.tabs-container .tab.active', { hasText: 'supplies.rst' }).waitFor({ timeout: 15_000 });
    const cursor = await poll(() => cursorStatus(page), (c) => c !== null && c.selected > 0, 10_000, 'the selection in supplies.rst');
    checks['cursorAfterClick'] = cursor;
    assert.equal(cursor!.selected, target.span.end - target.span.start);
    assert.equal(cursor!.line, target.line);
    await poll(() => countDecorations(page), (n) => n > 0, 10_000, 'highlights in supplies.rst');
    await page.screenshot({ path: join(artifacts, '10-digest-line-revealed.png') });

    // Dismiss: the digest leaves the panel and its highlights leave the editor.
    await panel.getByRole('button', { name: 'Dismiss: Digest' }).click();
    await panel.locator('.digest').waitFor({ state: 'detached', timeout: 10_000 });
    await poll(() => countDecorations(page), (n) => n === 0, 10_000, 'no highlights after dismissing');
    mark('revealed and dismissed');

    checks['blockedRequests'] = blocked;
    assert.deepEqual(blocked.filter((request) => !isPanelResource(request.url)), [], 'no request but the panel’s own resources was attempted off the machine');
    checks['pageErrors'] = pageErrors;
    checks['ok'] = true;
  } catch (error) {
    checks['ok'] = false;
    checks['error'] = error instanceof Error ? error.stack : String(error);
    await page.screenshot({ path: join(artifacts, 'zz-digest-failure.png') }).catch(() => undefined);
  } finally {
    writeFileSync(join(artifacts, 'digest-ui-result.json'), JSON.stringify(checks, null, 2));
    await session.close();
  }
  if (!checks['ok']) {
    console.error(checks['error']);
    process.exit(1);
  }
  mark('digest UI checks passed');
  process.exit(0);
}

void main();
