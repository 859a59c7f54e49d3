/**
 * The build's markdown-it transform (scripts/markdown-it-fields.mjs): class fields set through
 * Babel's helper become plain assignments, and markdown-it built that way parses exactly as the
 * published package does (the reference here is the package itself, as installed from npm).
 */
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { build, type Plugin } from 'esbuild';
import markdownIt from 'markdown-it';

interface FieldsModule {
  fieldsAsAssignments(source: string, file?: string): string;
  markdownItFields: Plugin;
}
const load = async (): Promise<FieldsModule> => (await import('../../scripts/markdown-it-fields.mjs' as string)) as FieldsModule;

const CLASS = [
  'var Token = class {',
  '\tconstructor(type) {',
  '\t\t_defineProperty(this, "map", null);',
  '\t\t_defineProperty(',
  '\t\t\tthis,',
  '\t\t\t/**',
  '\t\t\t* nesting level',
  '\t\t\t*/',
  '\t\t\t"level",',
  '\t\t\t0',
  '\t\t);',
  '\t\tthis.type = type;',
  '\t}',
  '\tattrGet(name) {',
  '\t\treturn null;',
  '\t}',
  '};',
].join('\n');

describe('build: markdown-it class fields as assignments', function () {
  this.timeout(60_000);

  it('turns each _defineProperty(this, "name", value) into this.name = (value), comments and all', async () => {
    const { fieldsAsAssignments } = await load();
    const out = fieldsAsAssignments(CLASS);
    assert.match(out, /this\.map = \(null\);/);
    assert.match(out, /this\.level = \(0\n\t\t\);/);
    assert.doesNotMatch(out, /_defineProperty/);
    const Token = new Function(`${out}; return Token;`)() as new (type: string) => Record<string, unknown>;
    assert.deepEqual({ ...new Token('text') }, { map: null, level: 0, type: 'text' });
  });

  it('refuses a source it cannot turn safely: an accessor, a field named like a method, nothing to turn', async () => {
    const { fieldsAsAssignments } = await load();
    assert.throws(() => fieldsAsAssignments(CLASS.replace('\tattrGet(name) {', '\tget attrGet() {')), /getter or setter/);
    assert.throws(() => fieldsAsAssignments(CLASS.replace('"map"', '"attrGet"')), /fields named like methods \(attrGet\)/);
    assert.throws(() => fieldsAsAssignments('var x = 1;'), /no field set through/);
  });

  it('builds a markdown-it that parses the demo, the README and the changelog to the same tokens and HTML as the published package', async () => {
    const { markdownItFields } = await load();
    const result = await build({
      stdin: { contents: "export { default } from 'markdown-it';", resolveDir: process.cwd(), loader: 'js' },
      bundle: true, write: false, platform: 'node', format: 'cjs', logLevel: 'silent', plugins: [markdownItFields],
    });
    const code = result.outputFiles[0]!.text;
    assert.doesNotMatch(code, /_defineProperty\(\s*this\b/);
    const module = { exports: {} as { default: typeof markdownIt } };
    new Function('module', 'exports', 'require', code)(module, module.exports, createRequire(join(process.cwd(), 'package.json')));
    const patched = module.exports.default;
    const texts = [readFileSync('media/demo/bike-share-rebalancing.md', 'utf8'), readFileSync('README.md', 'utf8'), readFileSync('CHANGELOG.md', 'utf8')];
    for (const text of texts) {
      const published = markdownIt('default', { html: true }).parse(text, {});
      const built = patched('default', { html: true }).parse(text, {});
      assert.equal(JSON.stringify(built), JSON.stringify(published));
      assert.equal(patched().render(text), markdownIt().render(text));
    }
  });
});
