import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const BIN = join(process.cwd(), 'src', 'cli', 'bin.ts');
const DEMO = join('media', 'demo', 'abstract-check.md');

function tersely(args: string[]) {
  const result = spawnSync(process.execPath, ['--import', 'tsx', BIN, ...args], { encoding: 'utf8', env: { ...process.env, NO_COLOR: '1' } });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

describe('command line: tersely check', function () {
  this.timeout(120_000);

  it('exits 0 without --strict whatever it finds, and 1 with --strict when something is flagged', () => {
    assert.equal(tersely(['check', DEMO]).code, 0);
    const strict = tersely(['check', DEMO, '--strict']);
    assert.equal(strict.code, 1, strict.stderr);
    assert.match(strict.stdout, /2 sentences contradicted, 1 sentence unsupported, 2 sections not covered\./);
  });

  it('exits 0 with --strict when every section is covered and every sentence supported', () => {
    const dir = mkdtempSync(join(tmpdir(), 'tersely-check-'));
    const file = join(dir, 'ferry.md');
    writeFileSync(file, [
      '# Harbour ferry', '', '## Summary', '', 'From May the harbour ferry adds a late crossing at eleven on Fridays and Saturdays.', '',
      '## Timetable', '', 'From May the harbour ferry adds a late crossing at eleven on Fridays and Saturdays, and the early crossing moves from half past six to six.', '',
    ].join('\n'));
    const run = tersely(['check', file, '--strict']);
    assert.equal(run.code, 0, run.stdout + run.stderr);
    assert.match(run.stdout, /Every section is covered and every abstract sentence is supported by the body\./);
  });

  it('exits 2 on a usage error', () => {
    assert.equal(tersely(['check', DEMO, '--strict', '--format', 'yaml']).code, 2);
    assert.equal(tersely(['check']).code, 2);
    const both = tersely(['check', DEMO, '--abstract-opening', '--abstract-heading', 'Summary']);
    assert.equal(both.code, 2);
    assert.match(both.stderr, /choose one of --abstract-heading, --abstract-opening and --abstract/);
  });

  it('checks the opening text with --abstract-opening, and names that way when no abstract section is found', () => {
    const rst = join('media', 'demo', 'ferry-timetable-planner.rst');
    const none = tersely(['check', rst]);
    assert.notEqual(none.code, 0);
    assert.match(none.stderr, /--abstract-opening/);
    const opening = tersely(['check', rst, '--abstract-opening']);
    assert.equal(opening.code, 0, opening.stderr);
    assert.match(opening.stdout, /Checking the opening text before the first heading \(\d+ words, \d+ sentences\)/);
    assert.match(opening.stdout, /1\. The Skerra ferry runs a fixed timetable/);
  });

  it('names the changed number and the flipped negation with both sides and the body line, and explains ROUGE in one sentence', () => {
    const { stdout } = tersely(['check', DEMO]);
    assert.match(stdout, /abstract: 301 appointments — the body never gives 301; nearest, line 50: 310 cancellations/);
    assert.match(stdout, /abstract: do not reduce missed — body, line 84: reduce missed appointments/);
    const rouge = stdout.split('\n').filter((line) => line.includes('ROUGE counts'));
    assert.equal(rouge.length, 1);
    assert.equal(rouge[0]!.trim().split(/(?<=[.:])\s+(?=[A-Z])/u).length, 1);
    // One rule: no section is called "not covered" while a sentence cites it as support.
    const notCovered = [...stdout.matchAll(/✗ (.+?) \(line \d+\): not covered/gu)].map((m) => m[1]!);
    for (const heading of notCovered) assert.doesNotMatch(stdout, new RegExp(`supported \\(line \\d+\\): [^\\n]*\\(${heading}\\)`));
  });

  it('applies the size cap while reading (--max-size), naming the file', () => {
    const run = tersely(['check', DEMO, '--max-size', '1000']);
    assert.equal(run.code, 1);
    assert.equal(run.stdout, '');
    assert.match(run.stderr, /^tersely check: media\/demo\/abstract-check\.md: is larger than the 1,000-character limit/);
  });

  it('shows control characters from the document instead of obeying them; JSON keeps the text exact with C1 escaped', () => {
    const dir = mkdtempSync(join(tmpdir(), 'tersely-check-'));
    const file = join(dir, 'ferry.md');
    const hostile = 'From May the harbour ferry \u001b]0;owned\u0007adds a late crossing \u009b31m at eleven on Fridays.';
    writeFileSync(file, ['# Harbour ferry', '', '## Summary', '', hostile, '', '## Timetable', '', 'From May the harbour ferry adds a late crossing at eleven on Fridays and Saturdays.', ''].join('\n'));
    const text = tersely(['check', file]);
    assert.equal(text.code, 0, text.stderr);
    assert.ok(!/[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/u.test(text.stdout), 'no raw control character reaches the terminal');
    assert.ok(text.stdout.includes('\u241b]0;owned\u2407'), 'ESC and BEL are shown as control pictures');
    const json = tersely(['check', file, '--format', 'json']);
    assert.equal(json.code, 0, json.stderr);
    assert.ok(!/[\u007f-\u009f]/u.test(json.stdout), 'C1 controls are escaped in JSON');
    const parsed = JSON.parse(json.stdout) as { abstract: { sentences: { text: string }[] } };
    assert.ok(parsed.abstract.sentences.some((s) => s.text.includes('\u001b]0;owned\u0007') && s.text.includes('\u009b31m')), 'the text itself is unchanged');
  });
});
