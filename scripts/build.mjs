// One build for every entry point. The engine is bundled into each consumer so the command line,
// the extension host, its worker and the webview never resolve packages at run time.
import { build } from 'esbuild';
import { existsSync, mkdirSync } from 'node:fs';
import { basename, join } from 'node:path';

const production = process.argv.includes('--production');
// `--only cli --outdir DIR`: one entry into another folder (the command-line tests build the CLI this way).
const option = (name) => {
  const at = process.argv.indexOf(name);
  return at >= 0 ? process.argv[at + 1] : undefined;
};
const only = option('--only');
const outdir = option('--outdir') ?? 'dist';
// natural's German stemmer pulls in a 300 KB stop-word table for a function we never call.
const alias = { 'stopwords-iso': './src/core/text/stopwords-iso-stub.ts' };
const common = { bundle: true, alias, sourcemap: !production, minify: production, logLevel: 'warning', legalComments: 'none' };

const entries = [
  // Node programs (CommonJS so the `bin` entry and the extension host load them without flags).
  { name: 'cli', in: 'src/cli/bin.ts', out: 'dist/cli.cjs', platform: 'node', format: 'cjs', banner: { js: '#!/usr/bin/env node' } },
  { name: 'bench', in: 'bench/main.ts', out: 'dist/bench.cjs', platform: 'node', format: 'cjs' },
  { name: 'extension', in: 'src/extension/extension.ts', out: 'dist/extension.cjs', platform: 'node', format: 'cjs', external: ['vscode'] },
  { name: 'engine-worker', in: 'src/extension/engine-worker.ts', out: 'dist/engine-worker.cjs', platform: 'node', format: 'cjs' },
  // The side panel's script runs in the webview, a browser.
  { name: 'webview', in: 'src/webview/panel.ts', out: 'dist/webview.js', platform: 'browser', format: 'iife' },
];

if (only !== undefined && !entries.some((entry) => entry.name === only)) {
  console.error(`build: no entry "${only}" (entries: ${entries.map((entry) => entry.name).join(', ')})`);
  process.exit(2);
}
mkdirSync(outdir, { recursive: true });
await Promise.all(
  entries
    .filter((entry) => existsSync(entry.in) && (only === undefined || entry.name === only))
    .map((entry) =>
      build({
        ...common,
        entryPoints: [entry.in],
        outfile: join(outdir, basename(entry.out)),
        platform: entry.platform,
        format: entry.format,
        target: entry.platform === 'node' ? 'node20' : 'es2022',
        external: entry.external ?? [],
        banner: entry.banner,
      }),
    ),
);
