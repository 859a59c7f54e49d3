/** `tersely summarize --template` and the conventional template locations, through the built CLI. */
import assert from 'node:assert/strict';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { builtCli, tersely } from './helpers/built-cli';

describe('command line: templates', function () {
  this.timeout(120_000);
  before(() => builtCli());
  const dir = mkdtempSync(join(tmpdir(), 'tersely-templates-'));
  const doc = join(dir, 'change.md');
  writeFileSync(doc, '# Dock change\n\n## Why\n\nDescribe why this change is needed and who asked for it.\n\nThe north dock floods at spring tide, so boats must tie up at the south pier for two weeks.\n\n## How\n\nThe crew walked the new mooring plan twice at low tide with the harbour master.\n');
  const template = join(dir, 'template.md');
  writeFileSync(template, '# Title\n\n## Why\n\nDescribe why this change is needed and who asked for it.\n');

  it('never picks a sentence of a template named with --template', () => {
    const plain = tersely(['summarize', doc, '--length', '100%', '--format', 'json']);
    assert.equal(plain.code, 0, plain.stderr);
    assert.match(plain.stdout, /Describe why/);
    const run = tersely(['summarize', doc, '--length', '100%', '--format', 'json', '--template', template]);
    assert.equal(run.code, 0, run.stderr);
    const json = JSON.parse(run.stdout) as { sentences: { text: string }[]; barred: { kind: string }[] };
    assert.ok(!json.sentences.some((s) => s.text.startsWith('Describe why')));
    assert.deepEqual(json.barred.map((b) => b.kind), ['template']);
  });

  it('reads the conventional pull-request template location of the current folder', () => {
    mkdirSync(join(dir, '.github'), { recursive: true });
    writeFileSync(join(dir, '.github', 'pull_request_template.md'), '## Why\n\nDescribe why this change is needed and who asked for it.\n');
    const run = tersely(['summarize', 'change.md', '--length', '100%'], { cwd: dir });
    assert.equal(run.code, 0, run.stderr);
    assert.doesNotMatch(run.stdout, /Describe why/);
  });

  it('says so when a named template is missing, and summarizes nothing', () => {
    const run = tersely(['summarize', doc, '--template', join(dir, 'nope.md')]);
    assert.notEqual(run.code, 0);
    assert.match(run.stderr, /template .*nope\.md does not exist/);
    assert.equal(run.stdout, '');
  });
});
