import assert from 'node:assert/strict';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

// The engine must run in a browser and in the editor's worker alike (project rule): no editor API,
// no Node built-ins.
const FORBIDDEN = /from\s+['"](vscode|node:[^'"]+|fs|path|os|child_process|worker_threads|crypto|util|stream|url|buffer)['"]/;
const GLOBALS = /\b(process|Buffer|require|__dirname)\s*[.(]/;

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? files(path) : path.endsWith('.ts') ? [path] : [];
  });
}

describe('engine boundary', () => {
  const sources = files('src/core');

  it('finds the engine sources', () => {
    assert.ok(sources.length > 20, `only ${sources.length} files under src/core`);
  });

  for (const file of sources) {
    it(`${file} imports neither the editor API nor Node-only modules`, () => {
      const text = readFileSync(file, 'utf8');
      assert.doesNotMatch(text, FORBIDDEN);
      assert.doesNotMatch(text.replace(/\/\/.*|\/\*[\s\S]*?\*\//g, ''), GLOBALS);
    });
  }
});

describe('engine face', () => {
  // Everything outside the engine reaches it through src/core/index.ts only (tests of single
  // modules excepted), so the engine's inside can change without touching its callers.
  const callers = ['src/cli', 'src/extension', 'src/webview', 'bench'].flatMap(files);
  const CORE_IMPORT = /from\s+['"]((?:\.\.\/)+(?:src\/)?core(?:\/[^'"]*)?)['"]/g;

  it('finds the callers', () => {
    assert.ok(callers.length > 20);
  });

  for (const file of callers) {
    it(`${file} imports the engine only through core/index`, () => {
      const text = readFileSync(file, 'utf8');
      const deep = [...text.matchAll(CORE_IMPORT)].map((m) => m[1]!).filter((path) => !/\/core\/index$/.test(path));
      assert.deepEqual(deep, []);
    });
  }
});
