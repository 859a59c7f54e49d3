/**
 * Runs the in-editor mocha suite (out/e2e-suite/index.cjs) in a real editor. The runner is the
 * only thing that differs between machines, so it is chosen here and nowhere else:
 *   E2E_RUNNER=code-server (default): the browser build of the editor from the npm registry,
 *     already started by scripts/e2e.sh, opened in Chromium with the test payload in the URL;
 *   E2E_RUNNER=electron: @vscode/test-electron downloads the desktop editor and runs the same suite.
 *
 * Usage: tsx test/e2e/run-in-editor.ts <extensionPath> <workspaceFolder> [baseUrl]
 */
import { resolve } from 'node:path';
import { format } from 'node:util';
import { openSession, timer } from './browser';

const [extensionPath, workspace, base] = process.argv.slice(2) as [string, string, string | undefined];
const testsPath = resolve(extensionPath, 'out/e2e-suite/index.cjs');
const mark = timer();

async function withCodeServer(): Promise<number> {
  if (!base) throw new Error('code-server runner needs the server URL');
  const session = await openSession(base, { width: 1280, height: 800 });
  const { page } = session;
  let finish: (code: unknown) => void = () => undefined;
  const finished = new Promise<unknown>((done) => (finish = done));
  // The workbench calls this when the suite's run() settles (0 = passed).
  await page.exposeFunction('codeAutomationExit', (code: unknown) => finish(code));
  // In development mode the extension host's console (mocha's reporter) reaches the page
  // console as console.log('%c LEVEL', style, message...).
  page.on('console', async (message) => {
    let args: unknown[];
    try {
      args = await Promise.all(message.args().map((arg) => arg.jsonValue()));
    } catch {
      args = [message.text()];
    }
    const first = args[0];
    if (typeof first === 'string' && first.startsWith('%c') && /INFO|ERR|WARN/.test(first) && args.length > 2) console.log(format(...args.slice(2)));
  });
  const payload = JSON.stringify([
    ['extensionDevelopmentPath', `vscode-remote://remote${resolve(extensionPath)}`],
    ['extensionTestsPath', `vscode-remote://remote${testsPath}`],
  ]);
  await page.goto(`${base}/?folder=${encodeURIComponent(workspace)}&payload=${encodeURIComponent(payload)}`);
  mark('editor opened with the test payload');
  const code = await Promise.race([finished, new Promise((done) => setTimeout(() => done('timeout'), 240_000))]);
  mark(`suite finished: exit code ${JSON.stringify(code)}`);
  await session.close();
  return code === 0 ? 0 : 1;
}

async function withElectron(): Promise<number> {
  const { runTests } = await import('@vscode/test-electron');
  return runTests({ extensionDevelopmentPath: resolve(extensionPath), extensionTestsPath: testsPath, launchArgs: [workspace, '--disable-extensions'] });
}

const runner = process.env['E2E_RUNNER'] ?? 'code-server';
(runner === 'electron' ? withElectron() : withCodeServer()).then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error);
    process.exit(2);
  },
);
