/**
 * Model files and training input on the built CLI: a model that does not validate or is too
 * large is refused with a message and a non-zero status (never replaced by the built-in model);
 * `train` reads each document with the same checks as `summarize`.
 */
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { builtCli, tersely } from './helpers/built-cli';

const DEMO = join('media', 'demo', 'pull-request.md');
const shipped = () => JSON.parse(readFileSync('media/models/default-model.json', 'utf8')) as Record<string, unknown>;

// Invented notes of a village choir, each with its own "Summary" section.
const NOTE = (topic: string, detail: string) =>
  `# ${topic}\n\n## Summary\n\nThe choir will ${detail} so that new singers can join.\n\n## Motivation\n\nNew singers often stop coming after two rehearsals.\nThe choir could ${detail} and keep them.\nOther choirs in the valley already do this.\n`;

describe('command line: model files and training input', function () {
  this.timeout(60_000);
  const dir = mkdtempSync(join(tmpdir(), 'tersely-cli-model-'));
  before(() => builtCli());

  it('refuses a model with a __proto__ feature or counts of 1e308 (status 2, nothing printed)', () => {
    const proto = join(dir, 'proto.json');
    writeFileSync(proto, JSON.stringify(shipped()).replace('"features":{', '"features":{"__proto__":{"positive":[1],"negative":[1]},'));
    const huge = join(dir, 'huge.json');
    const model = shipped();
    (model.classes as Record<string, number>).positive = 1e308;
    writeFileSync(huge, JSON.stringify(model));
    for (const [file, pattern] of [
      [proto, /--model: invalid sentence model: unknown feature "__proto__"/],
      [huge, /--model: invalid sentence model: "classes\.positive" must be a whole number from 1 to 9007199254740991/],
    ] as const) {
      // Every method, not only the trained one: the file was named, so it must be right.
      for (const method of ['bayes', 'luhn']) {
        const run = tersely(['summarize', DEMO, '--model', file, '--method', method, '--format', 'json']);
        assert.equal(run.code, 2, `${file} ${method}`);
        assert.match(run.stderr, pattern);
        assert.equal(run.stdout, '');
      }
    }
  });

  it('refuses a model file over the size cap, a device and a named pipe before reading them', function () {
    const big = join(dir, 'big.json');
    writeFileSync(big, JSON.stringify({ ...shipped(), trainedOn: { note: 'x'.repeat(300_000) } }));
    const run = tersely(['summarize', DEMO, '--model', big]);
    assert.equal(run.code, 1);
    assert.match(run.stderr, /model file .*big\.json is [\d,]+ bytes, above the 262,144-byte limit for a model/);
    const device = tersely(['summarize', DEMO, '--model', '/dev/zero']);
    assert.equal(device.timedOut, false);
    assert.match(device.stderr, /model file \/dev\/zero is a device, not a regular file/);
    const fifo = join(dir, 'model-pipe.json');
    if (spawnSync('mkfifo', [fifo]).status !== 0) this.skip();
    const piped = tersely(['summarize', DEMO, '--model', fifo]);
    assert.equal(piped.timedOut, false, 'hung on a named pipe');
    assert.match(piped.stderr, /model file .*model-pipe\.json is a named pipe/);
  });

  it('train reads each file with the size, binary and empty checks, names the ones it skips, and still trains', () => {
    const folder = join(dir, 'notes');
    mkdirSync(folder);
    writeFileSync(join(folder, '01-parts.md'), NOTE('Learning parts by ear', 'teach parts by ear'));
    writeFileSync(join(folder, '02-recordings.md'), NOTE('Practice recordings', 'share practice recordings'));
    const huge = `${NOTE('Huge', 'sing more')}\n${'More words here. '.repeat(400)}`;
    writeFileSync(join(folder, '03-huge.md'), huge);
    writeFileSync(join(folder, '04-binary.md'), Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x00, 0x01]));
    writeFileSync(join(folder, '05-empty.txt'), ' \n');
    // Within 3 bytes per character, so read, then refused by the exact character count.
    const long = `${NOTE('Long', 'sing longer')}\n${'More words. '.repeat(80)}`;
    writeFileSync(join(folder, '06-long.md'), long);
    const out = join(dir, 'model.json');
    const run = tersely(['train', folder, '--reference-heading', 'Summary', '--out', out, '--max-size', '1000', '--quiet']);
    assert.equal(run.code, 0, run.stderr);
    assert.deepEqual(run.stderr.trim().split('\n'), [
      `tersely train: ${join(folder, '03-huge.md')}: is larger than the 1,000-character limit (${Buffer.byteLength(huge).toLocaleString('en-US')} bytes); raise it with --max-size (at most 20,000,000)`,
      `tersely train: ${join(folder, '04-binary.md')}: looks like a binary file (it contains NUL bytes), not text`,
      `tersely train: ${join(folder, '05-empty.txt')}: is empty (no text to summarize)`,
      `tersely train: ${join(folder, '06-long.md')}: The text is ${long.length.toLocaleString('en-US')} characters long, above the 1,000-character limit; summarize a selection or raise the limit.`,
    ]);
    const model = JSON.parse(readFileSync(out, 'utf8')) as { trainedOn: { documents: number; skipped: Record<string, number> } };
    assert.equal(model.trainedOn.documents, 2);
    assert.deepEqual(model.trainedOn.skipped, { 'not readable as text': 4 });
  });
});
