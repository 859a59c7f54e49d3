import assert from 'node:assert/strict';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { COLOR_IDS, COMMAND_IDS, VIEW_CONTAINER_ID, VIEW_ID } from '../../src/extension/ids';
import { settingsManifest } from '../../scripts/settings-manifest';

const root = new URL('../../', import.meta.url);
const read = (path: string): string => readFileSync(new URL(path, root), 'utf8');
const manifest = JSON.parse(read('package.json'));
const contributes = manifest.contributes;

const WORKBENCH_COLORS = ['focusBorder', 'contrastActiveBorder', 'contrastBorder', 'editorInfo.foreground', 'editorWarning.foreground'];

describe('extension manifest (package.json contributes)', () => {
  it('contributes every command of the command table, each with a title and the Tersely category, and no others', () => {
    const contributed = contributes.commands.map((c: { command: string }) => c.command).sort();
    assert.deepEqual(contributed, [...COMMAND_IDS].sort());
    for (const command of contributes.commands) {
      assert.equal(command.category, 'Tersely', command.command);
      assert.ok(command.title.length > 3, command.command);
    }
  });

  it('menus only name contributed commands; Summarize Selection needs a selection; the repair command stays out of the palette', () => {
    const known = new Set(COMMAND_IDS);
    for (const [menu, items] of Object.entries(contributes.menus as Record<string, { command: string; when?: string }[]>)) {
      for (const item of items) assert.ok(known.has(item.command as never), `${menu}: ${item.command}`);
    }
    const palette = contributes.menus.commandPalette as { command: string; when?: string }[];
    assert.equal(palette.find((i) => i.command === 'tersely.summarizeSelection')?.when, 'editorHasSelection');
    assert.equal(palette.find((i) => i.command === 'tersely.applyRepair')?.when, 'false');
    const context = contributes.menus['editor/context'] as { command: string; when?: string }[];
    assert.ok(context.some((i) => i.command === 'tersely.summarizeDocument'));
  });

  it('puts the webview view in its own activity-bar container with an icon from media/', () => {
    const container = contributes.viewsContainers.activitybar.find((c: { id: string }) => c.id === VIEW_CONTAINER_ID);
    assert.ok(container);
    assert.match(container.icon, /^media\//);
    assert.ok(existsSync(new URL(container.icon, root)));
    const view = contributes.views[VIEW_CONTAINER_ID].find((v: { id: string }) => v.id === VIEW_ID);
    assert.equal(view.type, 'webview');
  });

  it('contributes exactly the settings the option schema generates (npm run sync-manifest)', () => {
    const generated = settingsManifest();
    assert.deepEqual(contributes.configuration, generated.configuration);
    assert.deepEqual(manifest.capabilities.untrustedWorkspaces.restrictedConfigurations, generated.restrictedConfigurations);
    assert.ok(Object.keys(generated.configuration.properties).length >= 15);
  });

  it('contributes every colour the code uses, with light, dark and both high-contrast defaults', () => {
    const colors = new Map(contributes.colors.map((c: { id: string; defaults: Record<string, string> }) => [c.id, c]));
    assert.deepEqual([...colors.keys()].sort(), Object.values(COLOR_IDS).sort());
    for (const color of colors.values() as Iterable<{ id: string; description: string; defaults: Record<string, string> }>) {
      assert.ok(color.description.length > 10);
      for (const theme of ['light', 'dark', 'highContrast', 'highContrastLight']) {
        // A hex colour, or a theme colour the workbench defines (the accent follows the theme). The ids are
        // the editor's own (from memory: VS Code theme colour reference).
        const value = color.defaults[theme]!;
        assert.ok(/^#([0-9a-f]{3}|[0-9a-f]{6}|[0-9a-f]{8})$/i.test(value) || WORKBENCH_COLORS.includes(value), `${color.id} ${theme}: ${value}`);
      }
    }
  });

  it('panel CSS variables for Tersely colours exist as contributed colours', () => {
    // The editor exposes each theme colour to webviews as --vscode-<id with dots as dashes>
    // (from memory: VS Code webview guide, "Theming webview content").
    const css = read('media/panel.css');
    const used = [...css.matchAll(/--vscode-(tersely-[A-Za-z]+)/g)].map((m) => m[1]!.replace('-', '.'));
    assert.ok(used.length >= 2);
    for (const id of used) assert.ok(Object.values(COLOR_IDS).includes(id as never), id);
  });

  it('loads the bundles the build writes (desktop and browser), declares Workspace Trust limits and the editor version', () => {
    assert.equal(manifest.main, './dist/extension.cjs');
    assert.equal(manifest.browser, './dist/extension-web.js');
    const entries = read('scripts/build-entries.mjs');
    assert.match(entries, /src\/extension\/extension\.ts', out: 'dist\/extension\.cjs', platform: 'node'/);
    assert.match(entries, /src\/extension\/extension-web\.ts', out: 'dist\/extension-web\.js', platform: 'browser', format: 'cjs', external: \['vscode'\]/);
    const ignore = read('.vscodeignore');
    for (const bundle of ['dist/extension.cjs', 'dist/engine-worker.cjs', 'dist/extension-web.js', 'dist/engine-worker-web.js', 'dist/webview/panel.js']) {
      assert.ok(ignore.includes(`!${bundle}`), `${bundle} goes into the VSIX`);
    }
    assert.equal(manifest.capabilities.untrustedWorkspaces.supported, 'limited');
    assert.deepEqual(manifest.capabilities.untrustedWorkspaces.restrictedConfigurations, ['tersely.maxDocumentSize', 'tersely.modelFile', 'tersely.templateFiles']);
    assert.match(manifest.engines.vscode, /^\^1\.\d+\.\d+$/);
    assert.ok(existsSync(new URL(manifest.icon, root)), 'the marketplace icon exists');
  });

  it('the webview script builds DOM with text only: no HTML parsing or code evaluation APIs', () => {
    const files = readdirSync(new URL('src/webview/', root)).filter((name) => name.endsWith('.ts'));
    assert.ok(files.includes('panel.ts') && files.length >= 3, files.join(', '));
    for (const file of files) {
      const source = read(`src/webview/${file}`);
      for (const api of ['innerHTML', 'outerHTML', 'insertAdjacentHTML', 'document.write', 'eval(', 'new Function', 'srcdoc']) {
        assert.ok(!source.includes(api), `${file}: ${api}`);
      }
    }
  });

  it('the VSIX keeps only the bundle, media, manifest and documents', () => {
    const ignore = read('.vscodeignore').split('\n').filter((line) => line && !line.startsWith('#'));
    assert.equal(ignore[0], '**');
    const kept = ignore.filter((line) => line.startsWith('!')).map((line) => line.slice(1));
    for (const path of kept) assert.match(path, /^(dist\/|media\/|l10n\/\*\.json$|package\.json$|package\.nls(\.\*)?\.json$|README|CHANGELOG|LICENSE)/, path);
  });
});
