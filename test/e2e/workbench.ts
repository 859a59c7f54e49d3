/**
 * Steps in code-server's workbench (editor 1.100.3). The selectors are editor internals that
 * worked on that release (see shared/E2E.md); they live here only, so a new release means
 * touching one file.
 */
import type { FrameLocator, Frame, Page } from 'playwright-core';

export async function waitForWorkbench(page: Page, fileInExplorer: string): Promise<void> {
  await page.locator('.monaco-workbench').waitFor({ state: 'visible', timeout: 60_000 });
  await page.locator('.explorer-folders-view .monaco-list-row', { hasText: fileInExplorer }).first().waitFor({ timeout: 60_000 });
}

export async function openFile(page: Page, name: string, firstLineText: string): Promise<void> {
  await page.keyboard.press('Control+P');
  const input = page.locator('.quick-input-widget .quick-input-box input');
  await input.waitFor({ state: 'visible', timeout: 15_000 });
  await input.fill(name);
  await page.locator('.quick-input-widget .quick-input-list .monaco-list-row', { hasText: name }).first().waitFor({ timeout: 15_000 });
  await page.keyboard.press('Enter');
  await page.locator('.tabs-container .tab.active', { hasText: name }).waitFor({ timeout: 15_000 });
  await page.locator('.editor-instance .monaco-editor .view-lines', { hasText: firstLineText }).first().waitFor({ timeout: 15_000 });
}

/** Runs a palette command; returns when Enter was pressed (Date.now()), the moment the command starts. */
export async function runCommand(page: Page, title: string): Promise<number> {
  await page.keyboard.press('F1');
  const input = page.locator('.quick-input-widget .quick-input-box input');
  await input.waitFor({ state: 'visible', timeout: 15_000 });
  await input.fill(`>${title}`);
  await page.locator('.quick-input-widget .quick-input-list .monaco-list-row', { hasText: title }).first().waitFor({ state: 'visible', timeout: 15_000 });
  const entered = Date.now();
  await page.keyboard.press('Enter');
  await page.locator('.quick-input-widget').waitFor({ state: 'hidden', timeout: 15_000 });
  return entered;
}

/** The text of one output channel (Output: Show Output Channels…, then its name in the second picker). */
export async function outputChannelText(page: Page, channel: string): Promise<string> {
  await page.keyboard.press('F1');
  const input = page.locator('.quick-input-widget .quick-input-box input');
  await input.waitFor({ state: 'visible', timeout: 15_000 });
  await input.fill('>Output: Show Output Channels');
  await page.locator('.quick-input-widget .quick-input-list .monaco-list-row', { hasText: 'Show Output Channels' }).first().waitFor({ timeout: 15_000 });
  await page.keyboard.press('Enter');
  // The channel picker replaces the command palette; typing earlier would run a command instead.
  await poll(() => input.inputValue(), (value) => !value.startsWith('>'), 10_000, 'the output channel picker');
  await input.fill(channel);
  await page.locator('.quick-input-widget .quick-input-list .monaco-list-row', { hasText: channel }).first().waitFor({ timeout: 15_000 });
  await page.keyboard.press('Enter');
  await page.locator('.quick-input-widget').waitFor({ state: 'hidden', timeout: 15_000 });
  const lines = page.locator('.part.panel .monaco-editor .view-lines').first();
  await lines.waitFor({ timeout: 15_000 });
  // The view renders only the lines on screen and follows the end: make room, then go to the top.
  await runCommand(page, 'View: Toggle Maximized Panel');
  await lines.click();
  await page.keyboard.press('Control+Home');
  await page.waitForTimeout(300);
  // The view reuses line elements, so document order is their vertical position, not DOM order.
  const text = await lines.evaluate((node) =>
    Array.from(node.querySelectorAll<HTMLElement>('.view-line'))
      .map((line) => ({ top: Number.parseFloat(line.style.top) || 0, text: line.textContent ?? '' }))
      .sort((a, b) => a.top - b.top)
      .map((line) => line.text.replace(/\u00a0/g, ' '))
      .join('\n'),
  );
  await runCommand(page, 'View: Toggle Maximized Panel');
  return text;
}

/** The panel's document: webviews nest an outer iframe (workbench DOM) and an inner `active-frame`. */
export function panelLocator(page: Page): FrameLocator {
  return page.frameLocator('iframe.webview.ready').first().frameLocator('iframe#active-frame');
}

export async function panelFrame(page: Page): Promise<Frame> {
  const outer = await page.locator('iframe.webview.ready').first().elementHandle();
  const outerFrame = await outer?.contentFrame();
  const inner = await outerFrame?.locator('iframe#active-frame').elementHandle();
  const frame = await inner?.contentFrame();
  if (!frame) throw new Error('panel frame not found');
  return frame;
}

/** Decorations are rendered as elements whose class starts with `ced-` (editor-contributed decoration). */
export async function countDecorations(page: Page): Promise<number> {
  return page.evaluate(() => document.querySelectorAll('.editor-instance .monaco-editor [class*="ced-"]').length);
}

/** "Ln 12, Col 3 (40 selected)" from the status bar. */
export async function cursorStatus(page: Page): Promise<{ line: number; column: number; selected: number } | null> {
  const text = await page.locator('[id="status.editor.selection"]').innerText({ timeout: 5_000 });
  const match = /Ln (\d+), Col (\d+)(?: \((\d+) selected\))?/.exec(text);
  return match ? { line: Number(match[1]), column: Number(match[2]), selected: Number(match[3] ?? 0) } : null;
}

export async function poll<T>(read: () => Promise<T>, done: (value: T) => boolean, timeoutMs: number, what: string): Promise<T> {
  const until = Date.now() + timeoutMs;
  let last: T = await read();
  while (!done(last)) {
    if (Date.now() > until) throw new Error(`timed out waiting for ${what} (last: ${JSON.stringify(last)})`);
    await new Promise((resolve) => setTimeout(resolve, 200));
    last = await read();
  }
  return last;
}
