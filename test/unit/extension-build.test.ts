/** The build's browser rule: no Node built-in may reach a bundle that runs in a browser or a web worker. */
import assert from 'node:assert/strict';
import { build, type BuildOptions, type Plugin } from 'esbuild';

interface BuildEntries {
  ENTRIES: { in: string; out: string; platform: string }[];
  buildOptions(entry: { in: string }): BuildOptions;
}

const load = async (): Promise<BuildEntries> => (await import('../../scripts/build-entries.mjs' as string)) as BuildEntries;
const guard = async (): Promise<Plugin> => ((await import('../../scripts/browser-guard.mjs' as string)) as { noNodeBuiltins: Plugin }).noNodeBuiltins;

async function buildSnippet(contents: string): Promise<void> {
  await build({ stdin: { contents, resolveDir: process.cwd(), loader: 'ts' }, bundle: true, write: false, platform: 'browser', logLevel: 'silent', plugins: [await guard()] });
}

describe('extension build', function () {
  this.timeout(60_000);

  it('fails a browser bundle that imports a Node built-in, naming it', async () => {
    for (const name of ['node:crypto', 'fs', 'fs/promises', 'worker_threads', 'node:worker_threads', 'path']) {
      await assert.rejects(buildSnippet(`import * as m from '${name}'; console.log(m);`), (error: Error) => error.message.includes(`"${name}" is a Node built-in`), name);
    }
    await assert.rejects(buildSnippet(`const c = require('crypto'); console.log(c);`), /"crypto" is a Node built-in/);
  });

  it('lets a browser bundle without Node built-ins through', async () => {
    await buildSnippet(`export const nonce = btoa(String.fromCharCode(...globalThis.crypto.getRandomValues(new Uint8Array(16))));`);
  });

  it('builds every browser bundle under that rule; the web extension leaves the Node host adapter out', async () => {
    const { ENTRIES, buildOptions } = await load();
    const browser = ENTRIES.filter((entry) => entry.platform === 'browser');
    assert.deepEqual(
      browser.map((entry) => entry.out),
      ['dist/extension-web.js', 'dist/engine-worker-web.js', 'dist/webview/panel.js'],
    );
    for (const entry of browser) {
      const options = buildOptions(entry);
      assert.ok(options.plugins?.some((plugin) => plugin.name === 'no-node-builtins'), `${entry.out} is guarded`);
      const result = await build({ ...options, write: false, metafile: true, sourcemap: false });
      // Files whose code is in the bundle (a file the bundler read but tree-shook away contributes 0 bytes).
      const output = Object.values(result.metafile!.outputs)[0]!;
      const inputs = Object.entries(output.inputs).filter(([, input]) => input.bytesInOutput > 0).map(([path]) => path);
      if (entry.out === 'dist/extension-web.js') {
        assert.ok(inputs.includes('src/extension/engine-host-web.ts'));
        assert.ok(!inputs.some((input) => input.endsWith('engine-host-node.ts') || input.endsWith('engine-worker.ts')), 'no Node adapter in the web bundle');
        assert.ok(!inputs.includes('src/core/summarize.ts'), 'the engine runs in its worker, not in the extension bundle');
      }
    }
  });
});
