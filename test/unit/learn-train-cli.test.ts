import assert from 'node:assert/strict';
import { mkdtemp, mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { documentFiles, runTrain, shellWord } from '../../src/cli/train';
import { validateModel } from '../../src/core/rank/trained/model';
import { validateMaxentModel } from '../../src/core/rank/trained/maxent-model';
import { UsageError } from '../../src/cli/args';
import { InputError } from '../../src/cli/read-input';

// Invented notes of a village choir, each with its own "Summary" section.
const NOTE = (topic: string, detail: string) => `# ${topic}

## Summary

The choir will ${detail} so that new singers can join without reading music.

## Motivation

New singers often cannot read music and stop coming after two rehearsals.
The choir could ${detail} and keep those singers.
Other choirs in the valley already do this.

## Alternatives

Nothing could change at all.
`;

describe('tersely train (file walking around the core trainer)', () => {
  let folder = '';
  before(async () => {
    folder = await mkdtemp(join(tmpdir(), 'tersely-train-'));
    await mkdir(join(folder, 'sub'));
    await mkdir(join(folder, '.hidden'));
    await writeFile(join(folder, '01-parts.md'), NOTE('Learning parts by ear', 'teach parts by ear'));
    await writeFile(join(folder, 'sub', '02-recordings.md'), NOTE('Practice recordings', 'share practice recordings of each part'));
    await writeFile(join(folder, '.hidden', '03-skip.md'), NOTE('Hidden', 'be ignored'));
    await writeFile(join(folder, 'notes.txt'), 'A note without any summary section at all.');
  });
  after(async () => {
    await rm(folder, { recursive: true, force: true });
  });

  it('finds documents recursively, sorted, skipping hidden folders', async () => {
    const files = (await documentFiles(folder)).map((f) => f.slice(folder.length + 1));
    assert.deepEqual(files, ['01-parts.md', 'notes.txt', join('sub', '02-recordings.md')]);
  });

  it('writes a naive Bayes model that validates, and records the command', async () => {
    const out = join(folder, 'model.json');
    assert.equal(await runTrain([folder, '--kind', 'naive-bayes', '--reference-heading', 'Summary', '--out', out, '--quiet']), 0);
    const model = validateModel(JSON.parse(await readFile(out, 'utf8')));
    assert.equal(model.trainedOn?.documents, 2);
    assert.equal(model.classes.positive, 2);
    assert.deepEqual(model.trainedOn?.skipped, { 'no "Summary" section': 1 });
    assert.match(String(model.trainedOn?.command), /^tersely train .* --reference-heading Summary/);
  });

  it('filters file names with --match', async () => {
    const out = join(folder, 'model-match.json');
    assert.equal(await runTrain([folder, '--kind', 'naive-bayes', '--reference-heading', 'Summary', '--out', out, '--match', '^01-', '--quiet']), 0);
    assert.equal(validateModel(JSON.parse(await readFile(out, 'utf8'))).trainedOn?.documents, 1);
  });

  it('writes a maximum-entropy model from folders and a file list, and records its data', async () => {
    const elsewhere = await mkdtemp(join(tmpdir(), 'tersely-train-list-'));
    const out = join(elsewhere, 'maxent.json');
    // The list's paths are relative to the list's own folder.
    await writeFile(join(folder, 'list.lst'), '# two notes\n01-parts.md\n\nsub/02-recordings.md\n');
    const spec = `Shed\n====\n\nThe choir will build a shed for its music stands so that rehearsals start on time.\n\nProblem\n-------\n\nThe stands are kept in the vestry.\nCarrying them takes twenty minutes.\n\nPlan\n----\n\nA shed by the hall keeps the stands dry.\n`;
    await mkdir(join(elsewhere, 'specs'));
    await writeFile(join(elsewhere, 'specs', 'shed.rst'), spec);
    const args = ['--files', join(folder, 'list.lst'), join(elsewhere, 'specs'), '--kind', 'maximum-entropy', '--reference-heading', 'Summary', '--reference-introduction', '--out', out, '--quiet'];
    assert.equal(await runTrain(args), 0);
    const model = validateMaxentModel(JSON.parse(await readFile(out, 'utf8')));
    assert.equal(model.kind, 'maximum-entropy');
    // Two Markdown notes by their Summary section, the rst spec by its introduction.
    assert.equal(model.trainedOn?.documents, 3);
    const data = model.trainedOn?.data as { filesPerFolder: Record<string, number>; fileListFingerprint: string };
    assert.equal(Object.values(data.filesPerFolder).reduce((a, b) => a + b, 0), 3);
    assert.match(data.fileListFingerprint, /^fnv1a:[0-9a-f]{8}$/);
    assert.equal(model.regularization, 1);
    await assert.rejects(runTrain(args.map((a) => (a === 'maximum-entropy' ? 'forest' : a))), /--kind takes naive-bayes or maximum-entropy/);
    await assert.rejects(runTrain([...args, '--regularization', '-1']), /--regularization takes a number of at least 0/);
    await rm(elsewhere, { recursive: true, force: true });
  });

  it('records the command so it can be pasted back into a shell', () => {
    assert.equal(shellWord('--out'), '--out');
    assert.equal(shellWord('^\\d*[02468]-'), "'^\\d*[02468]-'");
    assert.equal(shellWord("it's"), "'it'\\''s'");
  });

  it('explains missing flags and unusable folders', async () => {
    await assert.rejects(runTrain([folder, '--out', 'x.json']), UsageError);
    await assert.rejects(runTrain(['--reference-heading', 'Summary', '--out', 'x.json']), /one or more folders of documents, or --files LIST/);
    await assert.rejects(runTrain(['--files', join(folder, 'no-list.txt'), '--reference-heading', 'Summary', '--out', 'x.json']), /file list .* cannot be read/);
    await assert.rejects(runTrain([folder, '--reference-heading', 'Summary']), UsageError);
    await assert.rejects(runTrain([folder, '--reference-heading', 'Summary', '--out', 'x.json', '--match', '(']), UsageError);
    await assert.rejects(runTrain([join(folder, 'missing'), '--reference-heading', 'Summary', '--out', 'x.json']), InputError);
    await assert.rejects(runTrain([folder, '--reference-heading', 'Abstract', '--out', join(folder, 'none.json'), '--quiet']), /none of the 3 files has a "Abstract" section/);
  });
});
