/**
 * What the command line agrees to read, checked on the built CLI: regular files and standard input
 * only, a byte limit while reading, invalid UTF-8 and byte-order marks said out loud, and a closed
 * output pipe ending the run quietly.
 */
import assert from 'node:assert/strict';
import { spawn, spawnSync } from 'node:child_process';
import { closeSync, mkdtempSync, openSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { builtCli, tersely } from './helpers/built-cli';

const DEMO = join('media', 'demo', 'pull-request.md');
const PROSE = '# Ferry\n\nThe ferry timetable changes in May for the summer season. Riders should check the new times before they travel.\n';

describe('command line: what it reads', function () {
  this.timeout(60_000);
  const dir = mkdtempSync(join(tmpdir(), 'tersely-cli-input-'));
  before(() => builtCli());

  it('refuses a named pipe with one line and still summarizes the other files (no hang)', function () {
    const fifo = join(dir, 'pipe.md');
    if (spawnSync('mkfifo', [fifo]).status !== 0) this.skip();
    const run = tersely(['summarize', fifo, DEMO]);
    assert.equal(run.timedOut, false, 'the run hung on the named pipe');
    assert.equal(run.code, 1);
    assert.deepEqual(run.stderr.trim().split('\n'), [`tersely: ${fifo}: is a named pipe (FIFO), not a regular file; to read it, redirect it: tersely summarize - < FILE`]);
    assert.match(run.stdout, /Add per-queue retry budgets/);
  });

  it('refuses a device and a folder, and still summarizes the other files', () => {
    const run = tersely(['summarize', '/dev/zero', 'media', DEMO]);
    assert.equal(run.timedOut, false, 'the run hung on /dev/zero');
    assert.equal(run.code, 1);
    assert.deepEqual(run.stderr.trim().split('\n'), ['tersely: /dev/zero: is a device, not a regular file', 'tersely: media: is a folder, not a file']);
    assert.match(run.stdout, /Add per-queue retry budgets/);
  });

  it('stops reading standard input at the byte limit (here /dev/zero as standard input)', () => {
    const zero = openSync('/dev/zero', 'r');
    try {
      const run = tersely(['summarize', '-', '--max-size', '1000'], { stdin: zero });
      assert.equal(run.timedOut, false);
      assert.equal(run.code, 1);
      assert.match(run.stderr, /^tersely: -: is larger than the 1,000-character limit \(more than [\d,]+ bytes\); raise it with --max-size \(at most 20,000,000\)\n$/);
    } finally {
      closeSync(zero);
    }
  });

  it('refuses a file of more than 3 bytes per allowed character unread, and leaves the rest to the exact character count', () => {
    // 3 × 1,000 + 3 bytes may still decode to at most 1,000 characters (3-byte characters plus a
    // byte-order mark); one byte more cannot.
    const over = join(dir, 'over.txt');
    writeFileSync(over, 'a'.repeat(3 * 1000 + 4));
    const unread = tersely(['summarize', over, '--max-size', '1000']);
    assert.equal(unread.code, 1);
    assert.equal(unread.stderr, `tersely: ${over}: is larger than the 1,000-character limit (3,004 bytes); raise it with --max-size (at most 20,000,000)\n`);

    const atLimit = join(dir, 'at-limit.txt');
    writeFileSync(atLimit, 'a'.repeat(3 * 1000 + 3));
    const counted = tersely(['summarize', atLimit, '--max-size', '1000']);
    assert.equal(counted.code, 1);
    assert.match(counted.stderr, /The text is 3,003 characters long, above the 1,000-character limit/);

    // The bound is tight: a byte-order mark and 1,000 characters of 3 bytes each (Japanese) are
    // 3,003 bytes and exactly 1,000 characters, which the limit allows.
    const tight = join(dir, 'tight.txt');
    const japanese = '夜間の再配置は毎晩二十三時に始まります。'.repeat(50);
    assert.equal(japanese.length, 1000);
    writeFileSync(tight, Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(japanese)]));
    assert.equal(readFileSync(tight).length, 3 * 1000 + 3);
    const fits = tersely(['summarize', tight, '--max-size', '1000', '--format', 'json']);
    assert.equal(fits.code, 0, fits.stderr);
  });

  it('refuses --max-size above the schema bound (20,000,000 characters)', () => {
    const run = tersely(['summarize', DEMO, '--max-size', '20000001']);
    assert.equal(run.code, 2);
    assert.match(run.stderr, /--max-size takes a whole number from 1,000 to 20,000,000: 20000001 is outside 1000\.\.20000000/);
  });

  it('names how many bytes were not valid UTF-8 (text and JSON), and still summarizes', () => {
    const file = join(dir, 'latin1.md');
    // "café" and "naïve" written in Latin-1 (one byte each, invalid in UTF-8), and a truncated 3-byte sequence.
    writeFileSync(file, Buffer.concat([Buffer.from('# Menu\n\nThe caf'), Buffer.from([0xe9]), Buffer.from(' opens at nine every day. A na'), Buffer.from([0xef]), Buffer.from('ve guest asked why. The end '), Buffer.from([0xe2, 0x82]), Buffer.from(' came late.\n')]));
    const json = tersely(['summarize', file, '--format', 'json', '--length', '3s']);
    assert.equal(json.code, 0, json.stderr);
    const parsed = JSON.parse(json.stdout) as { notices: string[]; sentences: { text: string }[] };
    assert.equal(parsed.notices[0], '4 bytes are not valid UTF-8 and read as U+FFFD (�); the file itself is unchanged.');
    assert.ok(parsed.sentences.some((s) => s.text.includes('caf\ufffd')));
    const text = tersely(['summarize', file, '--length', '3s']);
    assert.match(text.stdout, /^note: 4 bytes are not valid UTF-8/m);
  });

  it('states the offset convention in JSON: UTF-16 units after the byte-order mark, and whether there was one', () => {
    const withBom = join(dir, 'bom.md');
    const withoutBom = join(dir, 'no-bom.md');
    writeFileSync(withBom, `\ufeff${PROSE}`);
    writeFileSync(withoutBom, PROSE);
    const parse = (path: string) => {
      const run = tersely(['summarize', path, '--format', 'json', '--length', '1s']);
      assert.equal(run.code, 0, run.stderr);
      return JSON.parse(run.stdout) as { offsets: string; byteOrderMark: boolean; sentences: { text: string; start: number; end: number }[] };
    };
    const bom = parse(withBom);
    const plain = parse(withoutBom);
    assert.equal(bom.offsets, 'UTF-16 code units into the input decoded as UTF-8, after its byte-order mark if it has one');
    assert.equal(bom.byteOrderMark, true);
    assert.equal(plain.byteOrderMark, false);
    assert.deepEqual(bom.sentences, plain.sentences);
    const sentence = bom.sentences[0]!;
    // Node's readFileSync(…, 'utf8') keeps the mark as U+FEFF: a tool slicing that string skips it first.
    const kept = readFileSync(withBom, 'utf8');
    assert.equal(kept.charCodeAt(0), 0xfeff);
    assert.equal(kept.slice(1).slice(sentence.start, sentence.end), sentence.text);
    assert.equal(new TextDecoder().decode(readFileSync(withBom)).slice(sentence.start, sentence.end), sentence.text);
  });

  it('ends quietly with status 0 when the reader closes the pipe (tersely summarize … | head -1)', async () => {
    const child = spawn(process.execPath, [builtCli(), 'summarize', ...Array<string>(8).fill(DEMO)], { stdio: ['ignore', 'pipe', 'pipe'], env: { ...process.env, NO_COLOR: '1' } });
    let stderr = '';
    child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
    // Read the first chunk, then close our end, as `head -1` does.
    await new Promise<void>((resolve) => child.stdout.once('data', () => resolve()));
    child.stdout.destroy();
    const code = await new Promise<number | null>((resolve) => child.on('close', (status) => resolve(status)));
    assert.equal(stderr, '');
    assert.equal(code, 0);
  });
});
