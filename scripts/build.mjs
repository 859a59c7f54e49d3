// One build for every entry point. The engine is bundled into each consumer so the command line,
// the extension host, its worker and the webview never resolve packages at run time.
import { build } from 'esbuild';
import { existsSync, mkdirSync } from 'node:fs';

const production = process.argv.includes('--production');
// natural's German stemmer pulls in a 300 KB stop-word table for a function we never call.
const alias = { 'stopwords-iso': './src/core/text/stopwords-iso-stub.ts' };
const common = { bundle: true, alias, sourcemap: !production, minify: production, logLevel: 'warning', legalComments: 'none' };

const entries = [
  // Node programs (CommonJS so the `bin` entry and the extension host load them without flags).
  { in: 'src/cli/bin.ts', out: 'dist/cli.cjs', platform: 'node', format: 'cjs', banner: { js: '#!/usr/bin/env node' } },
  { in: 'bench/main.ts', out: 'dist/bench.cjs', platform: 'node', format: 'cjs' },
  { in: 'src/extension/extension.ts', out: 'dist/extension.cjs', platform: 'node', format: 'cjs', external: ['vscode'] },
  { in: 'src/extension/engine-worker.ts', out: 'dist/engine-worker.cjs', platform: 'node', format: 'cjs' },
  // The side panel's script runs in the webview, a browser.
  { in: 'src/webview/panel.ts', out: 'dist/webview.js', platform: 'browser', format: 'iife' },
];

mkdirSync('dist', { recursive: true });
await Promise.all(
  entries
    .filter((entry) => existsSync(entry.in))
    .map((entry) =>
      build({
        ...common,
        entryPoints: [entry.in],
        outfile: entry.out,
        platform: entry.platform,
        format: entry.format,
        target: entry.platform === 'node' ? 'node20' : 'es2022',
        external: entry.external ?? [],
        banner: entry.banner,
      }),
    ),
);
