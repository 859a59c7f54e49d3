import assert from 'node:assert/strict';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { builtCli, tersely as run } from './helpers/built-cli';

/** The built CLI (helpers/built-cli.ts), which starts far faster than the sources under tsx. */
function tersely(args: string[], input?: string) {
  return run(args, input === undefined ? {} : { stdin: input });
}

describe('command line', function () {
  this.timeout(120_000);
  before(() => builtCli());
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
    const bad = tersely(['summarize', 'x.md', '--length', '300%']);
    assert.equal(bad.code, 2);
    assert.match(bad.stderr, /--length takes a length such as 15% .*: 300% is outside 1%\.\.100%/);
    const oldBad = tersely(['summarize', 'x.md', '--ratio', '3']);
    assert.equal(oldBad.code, 2);
    assert.match(oldBad.stderr, /--ratio \(now --length 300%\): 300% is outside 1%\.\.100%/);
    const both = tersely(['summarize', 'x.md', '--length', '20%', '--words', '50']);
    assert.equal(both.code, 2);
    assert.match(both.stderr, /choose one length \(got --length and --words\)/);
    assert.equal(tersely(['frobnicate']).code, 2);
  });

  it('takes counts in decimal digits only, each flag once, and languages it knows', () => {
    for (const [args, pattern] of [
      [['--balance-depth', '0x2'], /--balance-depth takes a whole number from 1 to 6/],
      [['--min-sentences', '1e2'], /--min-sentences takes a whole number/],
      [['--method', 'lexrank', '--method', 'luhn'], /--method was given 2 times; give it once/],
      [['--lang', 'xx'], /--lang takes auto, or one of en, de/],
    ] as const) {
      const run = tersely(['summarize', 'x.md', ...args]);
      assert.equal(run.code, 2, args.join(' '));
      assert.match(run.stderr, pattern);
    }
  });

  it('reads --length in the one grammar, and still reads the old length flags with a deprecation note', () => {
    const file = join('media', 'demo', 'bike-share-rebalancing.md');
    const grammar = tersely(['summarize', file, '--format', 'json', '--length', '4s']);
    assert.equal(grammar.code, 0, grammar.stderr);
    assert.equal((JSON.parse(grammar.stdout) as { sentences: unknown[] }).sentences.length, 4);
    assert.equal(grammar.stderr, '');
    const old = tersely(['summarize', file, '--format', 'json', '--sentences', '4']);
    assert.equal(old.code, 0, old.stderr);
    assert.deepEqual(JSON.parse(old.stdout), JSON.parse(grammar.stdout));
    assert.match(old.stderr, /--sentences is deprecated .* use --length 4s/);
  });

  it('refuses a model file that does not validate instead of using the built-in model', () => {
    const model = join(dir, 'bad-model.json');
    writeFileSync(model, JSON.stringify({ format: 'tersely-sentence-model', version: 7 }));
    const run = tersely(['summarize', join('media', 'demo', 'pull-request.md'), '--model', model, '--method', 'bayes']);
    assert.equal(run.code, 2);
    assert.match(run.stderr, /--model: invalid sentence model: model version 7 is not supported/);
    assert.equal(run.stdout, '');
  });

  it('lists every option in --help, from the option schema', () => {
    const run = tersely(['--help']);
    assert.equal(run.code, 0);
    for (const flag of ['--length', '--method', '--no-balance', '--exclude', '--prefer', '--avoid', '--format', '--input-format', '--lang', '--max-size', '--abstract-heading', '--abstract', '--reference-heading', '--out', '--model']) {
      assert.ok(run.stdout.includes(flag), flag);
    }
    assert.match(run.stdout, /--length LENGTH .*\(default: auto\)/s);
  });
});
