// One build for every entry point (listed in build-entries.mjs). The engine is bundled into each
// consumer so the command line, both extension hosts, their engine workers and the webview never
// resolve packages at run time.
//   --production           minify, no source maps (vscode:prepublish)
//   --only NAME --outdir D one entry (NAME = its file name without extension, e.g. "cli") into
//                          another folder; the command-line tests build the CLI this way
import { build } from 'esbuild';
import { existsSync, mkdirSync } from 'node:fs';
import { basename, join } from 'node:path';
import { buildOptions, ENTRIES } from './build-entries.mjs';

const option = (name) => {
  const at = process.argv.indexOf(name);
  return at >= 0 ? process.argv[at + 1] : undefined;
};
const production = process.argv.includes('--production');
const only = option('--only');
const outdir = option('--outdir') ?? 'dist';
const nameOf = (entry) => basename(entry.out).replace(/\.(c?js)$/, '');

if (only !== undefined && !ENTRIES.some((entry) => nameOf(entry) === only)) {
  console.error(`build: no entry "${only}" (entries: ${ENTRIES.map(nameOf).join(', ')})`);
  process.exit(2);
}
mkdirSync(outdir, { recursive: true });
await Promise.all(
  ENTRIES.filter((entry) => existsSync(entry.in) && (only === undefined || nameOf(entry) === only)).map((entry) =>
    build({ ...buildOptions(entry, { production }), outfile: join(outdir, entry.out.replace(/^dist\//, '')) }),
  ),
);
