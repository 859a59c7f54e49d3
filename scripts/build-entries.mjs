// Every bundle the project ships, with its esbuild options (scripts/build.mjs builds them; the
// engine-host unit tests build the worker bundles from the same options in memory).
import { noNodeBuiltins } from './browser-guard.mjs';
import { markdownItFields } from './markdown-it-fields.mjs';

// natural's German stemmer pulls in a 300 KB stop-word table for a function we never call.
const alias = { 'stopwords-iso': './src/core/text/stopwords-iso-stub.ts' };

export const ENTRIES = [
  // Node programs (CommonJS so the `bin` entry and the extension host load them without flags).
  { in: 'src/cli/bin.ts', out: 'dist/cli.cjs', platform: 'node', format: 'cjs', banner: { js: '#!/usr/bin/env node' } },
  { in: 'bench/main.ts', out: 'dist/bench.cjs', platform: 'node', format: 'cjs' },
  // The desktop editor: package.json `main` and its engine worker thread.
  { in: 'src/extension/extension.ts', out: 'dist/extension.cjs', platform: 'node', format: 'cjs', external: ['vscode'] },
  { in: 'src/extension/engine-worker.ts', out: 'dist/engine-worker.cjs', platform: 'node', format: 'cjs' },
  // The browser editor: package.json `browser` (its web worker extension host loads CommonJS) and
  // the engine's Web Worker script, which the extension starts from a Blob URL.
  // Both run in web workers (no `document`), so packages' `worker` builds are preferred over their DOM ones.
  // `.js`, not `.cjs`: the web extension host appends `.js` to a `browser` path that lacks it.
  { in: 'src/extension/extension-web.ts', out: 'dist/extension-web.js', platform: 'browser', format: 'cjs', external: ['vscode'], conditions: ['worker'] },
  { in: 'src/extension/engine-worker-web.ts', out: 'dist/engine-worker-web.js', platform: 'browser', format: 'iife', conditions: ['worker'] },
  // The side panel's script runs in the webview, a browser.
  { in: 'src/webview/panel.ts', out: 'dist/webview/panel.js', platform: 'browser', format: 'iife' },
];

/** esbuild options for one entry. */
export function buildOptions(entry, { production = false } = {}) {
  return {
    bundle: true,
    alias,
    sourcemap: !production,
    minify: production,
    logLevel: 'warning',
    legalComments: 'none',
    entryPoints: [entry.in],
    outfile: entry.out,
    platform: entry.platform,
    format: entry.format,
    target: entry.platform === 'node' ? 'node20' : 'es2022',
    external: entry.external ?? [],
    banner: entry.banner,
    ...(entry.conditions ? { conditions: entry.conditions } : {}),
    // A Node built-in in a browser bundle fails the build instead of failing in the editor.
    plugins: [markdownItFields, ...(entry.platform === 'browser' ? [noNodeBuiltins] : [])],
  };
}
