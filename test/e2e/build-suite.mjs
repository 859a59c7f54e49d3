// Bundles the in-editor suite to CommonJS (the editor loads it with require). `vscode` comes from
// the editor; mocha from the project's node_modules.
import { build } from 'esbuild';

await build({
  entryPoints: { index: 'test/e2e/suite/index.ts', 'commands.test': 'test/e2e/suite/commands.test.ts', 'digest.test': 'test/e2e/suite/digest.test.ts' },
  outdir: 'out/e2e-suite',
  outExtension: { '.js': '.cjs' },
  bundle: true,
  platform: 'node',
  format: 'cjs',
  target: 'node20',
  external: ['vscode', 'mocha'],
  sourcemap: 'inline',
  logLevel: 'warning',
});
