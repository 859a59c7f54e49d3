/**
 * What the command line prints and how it ends, checked on the built CLI: nothing from a document
 * can drive the terminal, a hard word limit stays hard, an empty summary is an error with its
 * reason, bad values say what is wrong with them, and --version / --help tell the truth.
 */
import assert from 'node:assert/strict';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { builtCli, tersely } from './helpers/built-cli';

const DEMO = join('media', 'demo', 'pull-request.md');
/**
 * Control characters a terminal obeys: C0 (U+0000-U+001F) other than tab and line feed, DEL and
 * C1 (U+0080-U+009F), as ECMA-48 defines the two control sets (5th edition, 1991; from memory).
 */
const TERMINAL_CONTROLS = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/;

describe('command line: what it prints and how it ends', function () {
  this.timeout(60_000);
  const dir = mkdtempSync(join(tmpdir(), 'tersely-cli-output-'));
  before(() => builtCli());

  it('prints the version in package.json', () => {
    const run = tersely(['--version']);
    assert.equal(run.code, 0);
    assert.equal(run.stdout, `${(JSON.parse(readFileSync('package.json', 'utf8')) as { version: string }).version}\n`);
  });

  it('--help documents the hard word limit, the input rules, JSON offsets and the exit status', () => {
    const run = tersely(['--help']);
    assert.equal(run.code, 0);
    const prose = run.stdout.replace(/\s+/g, ' ');
    assert.match(prose, /120w, a hard limit: when no sentence fits, the summary is empty and says why/);
    assert.match(prose, /folders, devices and named pipes are refused/);
    assert.match(prose, /JSON offsets \(start, end\) are UTF-16 code units into the input decoded as UTF-8, after its byte-order mark/);
    assert.match(run.stdout, /Exit status\n {2}0 {2}every file was summarized\n {2}1 {2}a file could not be read, or gave no summary/);
    // train reads files with the same size check, so it takes the same flag.
    assert.match(run.stdout.slice(run.stdout.indexOf('train options')), /--max-size CHARS/);
  });

  it('neutralizes escape sequences and control characters from the document in text and Markdown output', () => {
    const file = join(dir, 'escapes.md');
    // A title-setting OSC sequence, a clear-screen CSI, a C1 CSI, a bell and a backspace.
    const hostile = 'The ferry \u001b]0;owned\u0007leaves at nine.\u001b[2J Riders wait \u009b31m on the pier\b.';
    // Enough ordinary prose around it that the share of control characters stays below the binary threshold.
    const docks = 'The north dock opens at six every morning and closes when the last boat is tied up. '.repeat(12);
    writeFileSync(file, `# Timetable \u001b[31mred\u001b[0m\n\n${hostile}\n\n## Docks\n\n${docks}\n`);
    for (const format of ['text', 'markdown']) {
      const run = tersely(['summarize', file, '--format', format, '--length', '5s']);
      assert.equal(run.code, 0, run.stderr);
      assert.ok(run.stdout.includes('ferry'), run.stdout);
      assert.ok(!TERMINAL_CONTROLS.test(run.stdout), `${format}: ${JSON.stringify(run.stdout)}`);
      assert.ok(run.stdout.includes('\u241b'), `${format}: ESC is shown as ␛`);
    }
    const json = tersely(['summarize', file, '--format', 'json', '--length', '5s']);
    assert.ok(!TERMINAL_CONTROLS.test(json.stdout), 'JSON escapes C0 and C1 controls');
    assert.ok(json.stdout.includes('\\u009b'));
    const parsed = JSON.parse(json.stdout) as { sentences: { text: string }[] };
    assert.ok(parsed.sentences.some((s) => s.text.includes('\u001b]0;owned\u0007')), 'JSON keeps the text exact');
  });

  it('neutralizes control characters in file names written to standard error', () => {
    const run = tersely(['summarize', 'missing-\u001b[2J.md']);
    assert.equal(run.code, 1);
    assert.ok(!TERMINAL_CONTROLS.test(run.stderr), JSON.stringify(run.stderr));
    assert.match(run.stderr, /missing-␛\[2J\.md: cannot read the file/);
  });

  it('keeps a word limit hard: nothing fits → empty summary, the reason, status 1 (--length 5w and --words 5)', () => {
    const file = join(dir, 'long-sentences.md');
    writeFileSync(file, '# Ferry\n\nThe ferry timetable changes in May for the summer season.\n\nRiders should check the new times before they travel to the pier.\n');
    const reason = 'No sentence fits in 5 words (the shortest has 10), so the summary is empty; allow more words or ask for a number of sentences.';
    for (const flags of [['--length', '5w'], ['--words', '5']]) {
      const run = tersely(['summarize', file, ...flags]);
      assert.equal(run.code, 1, flags.join(' '));
      assert.equal(run.stdout, '');
      assert.ok(run.stderr.includes(`tersely: ${file}: no summary: ${reason}`), run.stderr);
    }
    const json = tersely(['summarize', file, '--length', '5w', '--format', 'json']);
    assert.equal(json.code, 1);
    const parsed = JSON.parse(json.stdout) as { sentences: unknown[]; notices: string[] };
    assert.deepEqual(parsed.sentences, []);
    assert.deepEqual(parsed.notices, [reason]);
    const enough = tersely(['summarize', file, '--length', '10w', '--format', 'json']);
    assert.equal(enough.code, 0);
    assert.equal((JSON.parse(enough.stdout) as { stats: { wordsOut: number } }).stats.wordsOut, 10);
  });

  it('a document titled Changelog or License is summarized (the title is never an excluded section)', () => {
    for (const title of ['Changelog', 'License']) {
      const file = join(dir, `${title}.md`);
      writeFileSync(file, `# ${title}\n\n## 1.2\n\nThe ferry app now shows delays. Riders get a warning when boats are late.\n\n## 1.1\n\nWe fixed the login screen for older phones. Crashes on start are gone.\n`);
      const run = tersely(['summarize', file, '--format', 'json']);
      assert.equal(run.code, 0, run.stderr);
      const parsed = JSON.parse(run.stdout) as { sentences: { section: string }[] };
      assert.ok(parsed.sentences.length >= 2);
      assert.deepEqual([...new Set(parsed.sentences.map((s) => s.section))].sort(), ['1.1', '1.2']);
    }
  });

  it('a document whose only prose is inside code: no summary, the reason, status 1', () => {
    const file = join(dir, 'code-only.md');
    writeFileSync(file, '# Setup\n\n```\nThe daemon starts when the box boots. It reads the config file first.\n```\n\n    An indented sentence. Another one.\n');
    const run = tersely(['summarize', file]);
    assert.equal(run.code, 1);
    assert.equal(run.stdout, '');
    assert.match(run.stderr, /code-only\.md: no summary: No prose sentences were found \(headings, code, tables and lists of links are not summarized\)\./);
  });

  it('says a negative value is out of range instead of "needs a value", and refuses 0x5 and 1e2', () => {
    for (const [args, pattern] of [
      [['--length', '-3s'], /--length takes .*: -3s is outside 1s\.\.1,000s/],
      [['--length', '-3'], /--length takes .*: -3 is out of range: a length is at least 1%, 1w or 1s/],
      [['--sentences', '-3'], /--sentences \(now --length -3s\): -3s is outside 1s\.\.1,000s/],
      [['--min-sentences', '-3'], /--min-sentences takes a whole number from 0 to 100: -3 is outside 0\.\.100/],
      [['--length', '0x5'], /--length takes .*: got "0x5"/],
      [['--length', '1e2w'], /--length takes .*: got "1e2w"/],
      [['--min-per-section', '0x5'], /--min-per-section takes a whole number from 0 to 20: got "0x5"/],
      [['--balance-depth', '1e2'], /--balance-depth takes a whole number from 1 to 6: got "1e2"/],
      [['--lang', 'xx'], /--lang takes auto, or one of en, .*: got "xx"/],
      [['--length', '3s', '--length', '4s'], /--length was given 2 times; give it once/],
    ] as const) {
      const run = tersely(['summarize', DEMO, ...args]);
      assert.equal(run.code, 2, args.join(' '));
      assert.doesNotMatch(run.stderr, /needs a value/);
      assert.match(run.stderr, pattern);
      assert.equal(run.stdout, '');
    }
  });
});
