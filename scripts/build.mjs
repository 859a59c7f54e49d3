// One build for every entry point (listed in build-entries.mjs). The engine is bundled into each
// consumer so the command line, both extension hosts, their engine workers and the webview never
// resolve packages at run time.
import { build } from 'esbuild';
import { existsSync, mkdirSync } from 'node:fs';
import { buildOptions, ENTRIES } from './build-entries.mjs';

const production = process.argv.includes('--production');
mkdirSync('dist', { recursive: true });
await Promise.all(ENTRIES.filter((entry) => existsSync(entry.in)).map((entry) => build(buildOptions(entry, { production }))));
