/** `tersely digest`: text, Markdown and JSON output, progress on standard error, folders, bad files. */
import assert from 'node:assert/strict';
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { alsoInLabel } from '../../src/cli/render-digest';
import { builtCli, tersely } from './helpers/built-cli';

describe('command line: digest', function () {
  this.timeout(120_000);
  before(() => builtCli());
  const dir = mkdtempSync(join(tmpdir(), 'tersely-digest-'));
  const shared = 'The night ferry leaves the harbour at ten every evening.';
  const a = join(dir, 'a.md');
  const b = join(dir, 'notes', 'b.md');
  mkdirSync(join(dir, 'notes'));
  writeFileSync(a, `# Ferry timetable\n\n${shared} Tickets are sold on board by the purser.\n\nBicycles ride free on the ferry in summer. The crossing takes forty minutes.\n`);
  writeFileSync(b, `# Revised timetable\n\nSome words first.\n\n${shared} Tickets are now sold at the pier kiosk.\n\nDogs on a lead may travel on the outer deck. Late arrivals lose their seat.\n`);
  writeFileSync(join(dir, 'notes', 'skip.png'), Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x00]));

  it('digests a folder: JSON with a file per sentence, a near-duplicate once with "also in", progress per document on stderr', () => {
    const run = tersely(['digest', dir, '--format', 'json', '--length', '20s']);
    assert.equal(run.code, 0, run.stderr);
    const digest = JSON.parse(run.stdout) as { sentences: { file: string; text: string; start: number; end: number; line: number; alsoIn: { file: string; line: number; start: number; end: number }[] }[]; documents: { file: string }[] };
    assert.deepEqual(digest.documents.map((d) => d.file), [a, b]);
    const copies = digest.sentences.filter((s) => s.text === shared);
    assert.equal(copies.length, 1);
    assert.equal(copies[0]!.alsoIn.length, 1);
    const other = copies[0]!.file === a ? { file: b, line: 5 } : { file: a, line: 3 };
    assert.deepEqual(copies[0]!.alsoIn[0], { ...other, start: copies[0]!.alsoIn[0]!.start, end: copies[0]!.alsoIn[0]!.end });
    for (const s of digest.sentences) assert.equal(readFileSync(s.file, 'utf8').slice(s.start, s.end), s.text);
    assert.match(run.stderr, /\[1\/2\] .*a\.md: \d+ sentences kept/);
    assert.match(run.stderr, /\[2\/2\] .*b\.md: \d+ sentences kept/);
  });

  it('prints text and Markdown views with the extractive caveat and the also-in label', () => {
    const text = tersely(['digest', a, b, '--length', '20s', '--quiet']);
    assert.equal(text.code, 0, text.stderr);
    assert.equal(text.stderr, '');
    assert.match(text.stdout, /Digest of 2 documents/);
    assert.match(text.stdout, /may lose the context/);
    assert.match(text.stdout, /also in: .*line \d+/);
    const markdown = tersely(['digest', a, b, '--length', '20s', '--format', 'markdown', '--quiet']);
    assert.equal(markdown.code, 0, markdown.stderr);
    assert.match(markdown.stdout, /^\*\*Digest\*\*/);
    assert.match(markdown.stdout, /### .*a\.md/);
  });

  it('names each other file once in the also-in label, with all its lines', () => {
    const at = (file: string, line: number) => ({ file, line, span: { start: 0, end: 1 } });
    assert.equal(alsoInLabel([at('b.md', 13), at('c.md', 4), at('b.md', 27)]), 'also in: b.md lines 13, 27; c.md line 4');
    assert.equal(alsoInLabel([at('b.md', 40)]), 'also in: b.md line 40');
  });

  it('never picks a sentence of a --template, and refuses a --model that cannot be read, as summarize does', () => {
    const template = join(dir, 'template.txt');
    writeFileSync(template, 'Tickets are sold on board by the purser.\n');
    const without = tersely(['digest', a, '--length', '20s', '--quiet']);
    assert.match(without.stdout, /sold on board by the purser/);
    const run = tersely(['digest', a, '--length', '20s', '--quiet', '--template', template]);
    assert.equal(run.code, 0, run.stderr);
    assert.doesNotMatch(run.stdout, /sold on board by the purser/);
    assert.match(run.stdout, /Bicycles ride free/);
    const model = tersely(['digest', a, '--quiet', '--model', join(dir, 'no-such-model.json')]);
    assert.notEqual(model.code, 0);
    assert.match(model.stderr, /model file .*no-such-model\.json cannot be read/);
    assert.equal(model.stdout, '');
  });

  it('reads on several threads with the same digest as one thread, progress in file order, a bad file reported', () => {
    const many = join(dir, 'many');
    mkdirSync(many);
    const files: string[] = [];
    for (let k = 0; k < 9; k++) {
      const file = join(many, `note-${k}.md`);
      writeFileSync(file, `# Harbour note ${k}\n\nThe ferry number ${k} leaves pier ${k + 2} at ${k + 6} in the evening. Its crew of ${k + 3} checks the ropes first.\n\nPassengers board from the ${k % 2 === 0 ? 'north' : 'south'} ramp.\n`);
      files.push(file);
    }
    writeFileSync(join(many, 'note-4.md'), Buffer.from([0x23, 0x20, 0x00, 0xff, 0xfe, 0x00]));
    const one = tersely(['digest', many, '--format', 'json', '--jobs', '1']);
    const threads = tersely(['digest', many, '--format', 'json', '--jobs', '3']);
    assert.equal(one.code, 1, one.stderr);
    assert.equal(threads.code, 1, threads.stderr);
    assert.equal(threads.stdout, one.stdout, 'the same digest');
    assert.equal(threads.stderr, one.stderr, 'the same progress lines and the same complaint, in file order');
    assert.match(threads.stderr, /\[5\/9\] .*note-4\.md: /);
    const counters = [...threads.stderr.matchAll(/^tersely: \[(\d+)\/9\]/gm)].map((m) => Number(m[1]));
    assert.deepEqual(counters, [1, 2, 3, 4, 5, 6, 7, 8, 9]);
    const bad = tersely(['digest', many, '--jobs', '0']);
    assert.equal(bad.code, 2);
    assert.match(bad.stderr, /--jobs takes a whole number from 1 to 16/);
  });

  it('keeps going after a missing file, says why, and exits 1; refuses standard input', () => {
    const run = tersely(['digest', a, join(dir, 'missing.md'), '--quiet']);
    assert.equal(run.code, 1);
    assert.match(run.stderr, /missing\.md: cannot read the file/);
    // The file that could be read is still digested.
    assert.match(run.stdout, /Digest of 1 document\n/);
    const stdin = tersely(['digest', '-']);
    assert.equal(stdin.code, 2);
    assert.match(stdin.stderr, /not standard input/);
  });
});
