/**
 * Entry point the editor loads through `extensionTestsPath` (code-server or @vscode/test-electron
 * alike): runs the bundled in-editor tests with mocha and resolves only when all pass.
 */
import Mocha from 'mocha';
import { join } from 'node:path';

const FILES = ['commands.test.cjs'];

export function run(): Promise<void> {
  const mocha = new Mocha({ ui: 'bdd', timeout: 30_000, color: false, reporter: 'spec' });
  for (const file of FILES) mocha.addFile(join(__dirname, file));
  return new Promise((resolve, reject) => {
    mocha.run((failures) => (failures > 0 ? reject(new Error(`${failures} in-editor test(s) failed`)) : resolve()));
  });
}
