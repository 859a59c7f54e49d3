import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const BIN = join(process.cwd(), 'src', 'cli', 'bin.ts');

function tersely(args: string[], input?: string) {
  const result = spawnSync(process.execPath, ['--import', 'tsx', BIN, ...args], { input, encoding: 'utf8', env: { ...process.env, NO_COLOR: '1' } });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

describe('command line', function () {
  this.timeout(120_000);
  const dir = mkdtempSync(join(tmpdir(), 'tersely-cli-'));
  const binary = join(dir, 'blob.md');
  writeFileSync(binary, Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x00, 0x01, 0x02]));
  const empty = join(dir, 'empty.txt');
  writeFileSync(empty, '  \n\n');

  it('prints one JSON object per file, with offsets that point at the quoted text', () => {
    const file = join('media', 'demo', 'bike-share-rebalancing.md');
    const run = tersely(['summarize', file, join('media', 'demo', 'field-report.txt'), '--format', 'json', '--sentences', '4']);
    assert.equal(run.code, 0, run.stderr);
    const lines = run.stdout.trim().split('\n');
    assert.equal(lines.length, 2);
    const first = JSON.parse(lines[0]!) as { file: string; sentences: { text: string; start: number; end: number; section: string; score: number }[]; stats: { sentencesOut: number } };
    assert.equal(first.file, file);
    assert.equal(first.sentences.length, 4);
    assert.equal(first.stats.sentencesOut, 4);
    for (const s of first.sentences) {
      assert.equal(typeof s.section, 'string');
      assert.ok(s.end > s.start);
    }
  });

  it('keeps going after a bad file and reports each problem on one line', () => {
    const run = tersely(['summarize', join(dir, 'missing.md'), binary, empty, join('media', 'demo', 'pull-request.md')]);
    assert.equal(run.code, 1);
    const errors = run.stderr.trim().split('\n');
    assert.equal(errors.length, 3, run.stderr);
    assert.match(errors[0]!, /missing\.md: cannot read the file/);
    assert.match(errors[1]!, /blob\.md: looks like a binary file/);
    assert.match(errors[2]!, /empty\.txt: is empty/);
    assert.match(run.stdout, /Extractive summary/);
  });

  it('reads standard input for "-" and renders Markdown', () => {
    const run = tersely(['summarize', '-', '--format', 'markdown', '--sentences', '1'], '# Plan\n\nThe ferry timetable changes in May. Riders should check the new times.\n');
    assert.equal(run.code, 0, run.stderr);
    assert.match(run.stdout, /^\*\*Summary\*\*/);
    assert.match(run.stdout, /^- /m);
  });

  it('rejects unknown options and bad values with a usage message', () => {
    const unknown = tersely(['summarize', 'x.md', '--shorter']);
    assert.equal(unknown.code, 2);
    assert.match(unknown.stderr, /unknown option --shorter/);
    const bad = tersely(['summarize', 'x.md', '--ratio', '3']);
    assert.equal(bad.code, 2);
    assert.match(bad.stderr, /--ratio takes a number from 0.01 to 1/);
    const both = tersely(['summarize', 'x.md', '--ratio', '0.2', '--words', '50']);
    assert.match(both.stderr, /choose one of/);
    assert.equal(tersely(['frobnicate']).code, 2);
  });

  it('lists every option in --help', () => {
    const run = tersely(['--help']);
    assert.equal(run.code, 0);
    for (const flag of ['--sentences', '--words', '--ratio', '--method', '--no-balance', '--format', '--lang', '--abstract-heading', '--abstract', '--reference-heading', '--out']) {
      assert.ok(run.stdout.includes(flag), flag);
    }
  });
});
