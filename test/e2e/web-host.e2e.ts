/**
 * The browser bundle in the real editor's web worker extension host (code-server in Chromium,
 * with `remote.extensionKind` set to web for Tersely): summarize the demo from the palette, check
 * the panel and the highlights against the engine run here in Node, show stage progress on a
 * large document, read a model file through the editor's file system, and confirm where it ran —
 * from outside (the browser's list of workers: the extension host worker and, inside it, the
 * engine's worker, neither with `process`) and from inside (the extension's own log line).
 * Timings go to test-artifacts/editor-timings.json.
 *
 * Usage: tsx test/e2e/web-host.e2e.ts <baseUrl> <workspaceFolder> <artifactsDir> <userSettings.json>
 */
import assert from 'node:assert/strict';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { SUMMARY_OPTIONS } from '../../src/core/options/schema';
import { summarize } from '../../src/core/summarize';
import { UNTITLED_SECTION } from '../../src/extension/panel-model';
import { parseSettings, toEngineOptions } from '../../src/extension/settings';
import { openSession, timer } from './browser';
import { firstSummaryBreakdown, joinWrappedEntries, parseTerselyLog, recordTimings } from './timings';
import { countDecorations, openFile, outputChannelText, panelLocator, poll, runCommand, waitForWorkbench } from './workbench';

const [base, workspace, artifacts, settingsFile] = process.argv.slice(2) as [string, string, string, string];
const DEMO = 'bike-share-rebalancing.md';
const LARGE = 'large-report.md';
const MODEL = 'model-variant.json';
const mark = timer();
const checks: Record<string, unknown> = {};

function userSettings(): Record<string, unknown> {
  return JSON.parse(readFileSync(settingsFile, 'utf8')) as Record<string, unknown>;
}

function engineOptions(user = userSettings()) {
  const { settings } = parseSettings((key) => user[`tersely.${key}`]);
  return toEngineOptions(settings, 'markdown', 0);
}

/** The engine here in Node, with the editor's settings: what the panel must show. */
function expectedGroups(file: string, model?: unknown): [string, number][] {
  const text = readFileSync(join(workspace, file), 'utf8');
  const summary = summarize(text, { ...engineOptions(), ...(model !== undefined ? { model } : {}) });
  assert.ok(summary.sentences.length > 0, `the engine picks sentences from ${file}`);
  return summary.shares.filter((share) => share.picked > 0).map((share) => [share.heading || UNTITLED_SECTION, share.picked]);
}

function expectedSentences(file: string, model?: unknown, user = userSettings()): string[] {
  const text = readFileSync(join(workspace, file), 'utf8');
  return summarize(text, { ...engineOptions(user), ...(model !== undefined ? { model } : {}) }).sentences.map((pick) => pick.text);
}

async function panelGroups(page: Page): Promise<[string, number][]> {
  return panelLocator(page)
    .locator('.summary-list li.group')
    .evaluateAll((nodes) => nodes.map((node) => [node.getAttribute('data-heading') ?? '', node.querySelectorAll('li.pick').length] as [string, number]));
}

async function panelSentences(page: Page): Promise<string[]> {
  return panelLocator(page).locator('.summary-list li.pick .pick-text').allInnerTexts();
}

/** Writes the test inputs into the workspace: a large document (for visible progress) and a model that differs from the built-in one. */
function prepareWorkspace(): { model: unknown } {
  const demo = readFileSync(join(workspace, DEMO), 'utf8');
  const body = demo.replace(/^# .*\n/, '');
  const parts = Array.from({ length: 60 }, (_, i) => body.replace(/^## (.*)$/gm, `## Part ${i + 1}: $1`));
  writeFileSync(join(workspace, LARGE), `# Quillhaven Mobility: Collected Design Notes\n${parts.join('\n')}`);
  const shipped = JSON.parse(readFileSync(new URL('../../media/models/default-model.json', import.meta.url), 'utf8')) as { features: Record<string, { positive: number[] }> };
  // One feature's counts reversed: a valid model whose picks differ from the built-in one on the demo.
  shipped.features['paragraphPosition']!.positive.reverse();
  writeFileSync(join(workspace, MODEL), JSON.stringify(shipped));
  return { model: shipped };
}

async function workersSeen(page: Page): Promise<{ name: string; process: string; importScripts: string }[]> {
  return Promise.all(
    page.workers().map((worker) =>
      worker
        .evaluate(() => ({ name: String((self as unknown as { name?: string }).name ?? ''), process: typeof process, importScripts: typeof (globalThis as { importScripts?: unknown }).importScripts }))
        .catch((error: unknown) => ({ name: `unreadable: ${String(error).slice(0, 80)}`, process: '?', importScripts: '?' })),
    ),
  );
}

/**
 * Replaces the workspace settings through the editor (Open Workspace Settings (JSON), then save),
 * as a person would. The workspace, not the user settings: a `machine-overridable` setting such as
 * tersely.modelFile is not read from the user settings in a remote window like code-server's.
 */
async function setWorkspaceSettings(page: Page, settings: Record<string, unknown>): Promise<void> {
  await runCommand(page, 'Preferences: Open Workspace Settings (JSON)');
  await page.locator('.tabs-container .tab.active', { hasText: 'settings.json' }).waitFor({ timeout: 15_000 });
  await page.locator('.editor-instance .monaco-editor .view-lines').first().click();
  await page.keyboard.press('Control+A');
  // One line (no auto-indent); whatever bracket completion adds after the cursor is deleted.
  await page.keyboard.insertText(JSON.stringify(settings));
  await page.keyboard.press('Control+Shift+End');
  await page.keyboard.press('Delete');
  await page.keyboard.press('Control+S');
  const file = join(workspace, '.vscode', 'settings.json');
  await poll(async () => (existsSync(file) ? readFileSync(file, 'utf8') : ''), (text) => text === JSON.stringify(settings), 10_000, 'the settings file to be saved');
  const tab = page.locator('.tabs-container .tab', { hasText: 'settings.json' });
  await page.locator('.tabs-container .tab:not(.dirty)', { hasText: 'settings.json' }).waitFor({ timeout: 10_000 });
  await tab.locator('.tab-actions .action-label').click();
  await tab.waitFor({ state: 'detached', timeout: 10_000 });
}

async function summarizeAgain(page: Page): Promise<number> {
  const panel = panelLocator(page);
  const previous = await panel.locator('[data-summary-id]').getAttribute('data-summary-id');
  await page.locator('.editor-instance .monaco-editor .view-lines').first().click();
  const entered = await runCommand(page, 'Tersely: Summarize Document');
  await panel.locator(`[data-summary-id]:not([data-summary-id="${previous}"])`).waitFor({ timeout: 30_000 });
  return Date.now() - entered;
}

async function main(): Promise<void> {
  mkdirSync(artifacts, { recursive: true });
  const { model } = prepareWorkspace();
  const session = await openSession(base);
  const { page } = session;
  const pageErrors: string[] = [];
  page.on('pageerror', (error) => pageErrors.push(error.message));
  try {
    await page.goto(`${base}/?folder=${encodeURIComponent(workspace)}`, { waitUntil: 'domcontentloaded' });
    await waitForWorkbench(page, DEMO);
    mark('workbench up');

    // ---- first summary: the command activates the extension in the web worker ----
    await openFile(page, DEMO, 'Quillhaven Bike Share');
    const entered = await runCommand(page, 'Tersely: Summarize Document');
    const panel = panelLocator(page);
    await panel.locator('.note').waitFor({ timeout: 60_000 });
    const panelShownAt = Date.now();
    await panel.locator('.summary-list li.pick').first().waitFor({ timeout: 60_000 });
    const panelFilledAt = Date.now();
    const firstSummaryMs = panelFilledAt - entered;
    mark(`panel filled ${firstSummaryMs} ms after the command`);

    const groups = await panelGroups(page);
    const expected = expectedGroups(DEMO);
    checks['groups'] = groups;
    assert.deepEqual([...groups].sort(), [...expected].sort(), 'the panel groups the engine’s picks by the same sections');
    assert.deepEqual(await panelSentences(page), expectedSentences(DEMO), 'the same sentences, in document order');
    assert.match(await panel.locator('.note').innerText(), /extractive/i);
    const decorations = await poll(() => countDecorations(page), (n) => n > 0, 15_000, 'highlights in the editor');
    const status = page.locator('.statusbar-item', { hasText: 'sections' }).first();
    await status.waitFor({ timeout: 10_000 });
    checks['decorations'] = decorations;
    checks['statusBar'] = await status.innerText();
    mark(`${decorations} highlight elements; status bar "${checks['statusBar']}"`);

    // The hover on a highlighted sentence comes from the web extension too.
    // Two decorations per sentence: the thin underline over its text and the left-edge bar of its lines; hover the underline.
    const overlays = page.locator('.editor-instance .monaco-editor .view-overlays [class*="ced-"]');
    const underlineAt = await overlays.evaluateAll((nodes) => nodes.findIndex((node) => getComputedStyle(node).borderBottomWidth === '1px'));
    assert.ok(underlineAt >= 0, 'an underlined sentence is on screen');
    const highlight = overlays.nth(underlineAt);
    const box = await highlight.boundingBox();
    assert.ok(box, 'a highlight is on screen');
    await page.mouse.move(box.x + Math.min(40, box.width / 2), box.y + box.height / 2);
    const hover = page.locator('.monaco-hover', { hasText: 'Tersely' }).first();
    await hover.waitFor({ state: 'visible', timeout: 10_000 });
    await page.waitForTimeout(500); // the hover fades in
    checks['hover'] = (await hover.innerText()).split('\n').filter(Boolean).slice(0, 2).join(' | ');
    assert.match(String(checks['hover']), /Why Tersely picked this sentence/);
    assert.match(String(checks['hover']), /ranked \d+(st|nd|rd|th) of \d+ sentences/);
    await page.screenshot({ path: join(artifacts, 'web-01-summary-in-web-worker.png') });
    await page.mouse.move(5, 500);

    // ---- where it ran, seen from outside: the browser's workers ----
    const workers = await workersSeen(page);
    checks['workers'] = workers;
    const extensionHost = workers.find((w) => w.name === 'ExtensionHostWorker');
    const engine = workers.find((w) => /ExtensionHostWorker -> Tersely engine$/.test(w.name));
    assert.ok(extensionHost, 'the web worker extension host is running');
    assert.equal(extensionHost.process, 'undefined', 'no process in the extension host worker');
    assert.equal(extensionHost.importScripts, 'function');
    assert.ok(engine, 'the engine runs in a Web Worker started by the extension host worker');
    assert.equal(engine.process, 'undefined', 'no process in the engine worker');
    mark(`workers: ${workers.map((w) => w.name).join(', ')}`);

    // ---- later summaries (warm engine host) ----
    const laterSummaryMs: number[] = [];
    for (let i = 0; i < 5; i++) laterSummaryMs.push(await summarizeAgain(page));
    mark(`later summaries: ${laterSummaryMs.join(', ')} ms`);

    // ---- a model file, read through the editor's file system from the web worker ----
    // The trained method with a model that differs from the built-in one; the panel's method
    // control follows the setting, which shows the extension has seen the change.
    const modelSettings = { 'tersely.method': 'bayes', 'tersely.modelFile': MODEL };
    const withModel = expectedSentences(DEMO, model, { ...userSettings(), ...modelSettings });
    assert.notDeepEqual(withModel, expectedSentences(DEMO, undefined, { ...userSettings(), ...modelSettings }), 'the variant model picks differently from the built-in one (so this check can fail)');
    await setWorkspaceSettings(page, modelSettings);
    await poll(() => panel.locator('#method').inputValue(), (value) => value === 'bayes', 15_000, 'the extension to see the new settings');
    await page.locator('.tabs-container .tab.active', { hasText: DEMO }).waitFor({ timeout: 10_000 });
    await summarizeAgain(page);
    assert.deepEqual(await panelSentences(page), withModel, 'the summary was made with the model file');
    checks['modelFile'] = { method: 'bayes', sentences: withModel.length, differsFromBuiltIn: true };
    mark('the model file was read and used in the web worker');
    await setWorkspaceSettings(page, {});
    await poll(() => panel.locator('#method').inputValue(), (value) => value === SUMMARY_OPTIONS.method.default, 15_000, 'the settings to be restored');

    // ---- a large document: progress names its stage ----
    await openFile(page, LARGE, 'Quillhaven Mobility');
    await runCommand(page, 'Tersely: Summarize Document');
    await panel.locator('.progress:not([hidden])').waitFor({ state: 'visible', timeout: 30_000 });
    const readProgress = () =>
      panel.locator('.progress').evaluate((node: HTMLElement) => ({ hidden: node.hidden, stage: node.dataset['stage'] ?? '', title: node.querySelector('.progress-title')?.textContent ?? '' }));
    const stages = new Set<string>();
    const progressTitles = new Set<string>();
    let screenshot = false;
    for (let seen = await readProgress(); !seen.hidden; seen = await readProgress()) {
      if (seen.stage) stages.add(seen.stage);
      if (seen.title) progressTitles.add(seen.title);
      if (!screenshot && seen.stage === 'ranking') {
        await page.screenshot({ path: join(artifacts, 'web-02-progress-stage.png') });
        screenshot = true;
      }
      await page.waitForTimeout(50);
    }
    await panel.locator('.document-name', { hasText: LARGE }).waitFor({ timeout: 60_000 });
    // Stages shown between two samples are kept by the panel itself.
    for (const stage of ((await panel.locator('.progress').getAttribute('data-seen')) ?? '').split(' ').filter(Boolean)) stages.add(stage);
    checks['progress'] = { stages: [...stages], titles: [...progressTitles] };
    mark(`progress showed stages ${[...stages].join(' → ')}`);
    assert.ok(stages.has('ranking'), 'the ranking stage was shown by name');
    assert.ok([...progressTitles].some((title) => /^Summarizing: ranking sentences \(step 2 of 3\)/.test(title)));
    assert.deepEqual([...(await panelGroups(page))].sort(), [...expectedGroups(LARGE)].sort(), 'the large document’s summary matches the engine’s');

    // ---- where it ran, seen from inside: the extension's log ----
    const log = await outputChannelText(page, 'Tersely');
    writeFileSync(join(artifacts, 'web-output-channel.txt'), log);
    await page.screenshot({ path: join(artifacts, 'web-03-output-channel.png') });
    const parsed = parseTerselyLog(log);
    checks['log'] = parsed;
    assert.equal(parsed.runtime, 'the web worker extension host (no process); engine in a web worker', 'the extension reports the web worker host');
    assert.match(joinWrappedEntries(log), /Loaded the sentence model from vscode-remote:\/\/.*model-variant\.json/);
    assert.ok(parsed.summaries.length >= 8, 'each summary was logged');

    recordTimings(artifacts, 'web worker extension host (browser bundle)', {
      activationMs: parsed.activationMs,
      firstSummaryMs,
      firstSummaryBreakdown: firstSummaryBreakdown(parsed, entered, panelShownAt, panelFilledAt),
      laterSummaryMs,
      laterSummaryEngineMs: parsed.summaries.slice(1, 1 + laterSummaryMs.length).map((s) => s.engineMs),
      note: 'firstSummaryMs and laterSummaryMs: palette Enter to panel filled, measured by the test in Chromium; the rest from the extension log.',
    });
    checks['pageErrors'] = pageErrors.slice(0, 20);
    checks['ok'] = true;
  } catch (error) {
    checks['ok'] = false;
    checks['error'] = error instanceof Error ? error.stack : String(error);
    await page.screenshot({ path: join(artifacts, 'zz-web-failure.png') }).catch(() => undefined);
    const log = await outputChannelText(page, 'Tersely').catch((e: unknown) => `could not read the output channel: ${String(e)}`);
    writeFileSync(join(artifacts, 'web-output-channel.txt'), log);
  } finally {
    writeFileSync(join(artifacts, 'web-result.json'), JSON.stringify(checks, null, 2));
    await session.close();
  }
  if (!checks['ok']) {
    console.error(checks['error']);
    process.exit(1);
  }
  mark('web worker host checks passed');
  process.exit(0);
}

void main();
