/**
 * Entry point the editor loads through `extensionTestsPath` (code-server or @vscode/test-electron
 * alike): runs the bundled in-editor tests with mocha and resolves only when all pass.
 */
import * as mochaModule from 'mocha';
import type MochaType from 'mocha';
import { join } from 'node:path';

const FILES = ['commands.test.cjs', 'digest.test.cjs'];

// However mocha's CommonJS exports reach this bundle (namespace, default or named), take the constructor.
const candidates = mochaModule as unknown as { Mocha?: unknown; default?: { Mocha?: unknown } | unknown };
const Mocha = [candidates.Mocha, (candidates.default as { Mocha?: unknown } | undefined)?.Mocha, candidates.default].find(
  (candidate) => typeof candidate === 'function',
) as typeof MochaType;

export function run(): Promise<void> {
  // E2E_GREP (scripts/e2e.sh passes it through the editor server) runs only the tests whose titles match.
  const grep = process.env['E2E_GREP'];
  const mocha = new Mocha({ ui: 'bdd', timeout: 30_000, color: false, reporter: 'spec', ...(grep ? { grep } : {}) });
  for (const file of FILES) mocha.addFile(join(__dirname, file));
  return new Promise((resolve, reject) => {
    mocha.run((failures) => (failures > 0 ? reject(new Error(`${failures} in-editor test(s) failed`)) : resolve()));
  });
}
