/** Which files `tersely digest` and `tersely train` read under a folder (src/cli/document-files.ts), on a real temporary folder. */
import assert from 'node:assert/strict';
import { mkdir, mkdtemp, rm, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { documentFilesUnder } from '../../src/cli/document-files';

async function listed(root: string): Promise<string[]> {
  const files: string[] = [];
  for await (const path of documentFilesUnder(root)) files.push(path.slice(root.length + 1));
  return files;
}

describe('document files under a folder', () => {
  let root = '';
  let elsewhere = '';
  before(async () => {
    root = await mkdtemp(join(tmpdir(), 'tersely-files-'));
    elsewhere = await mkdtemp(join(tmpdir(), 'tersely-files-target-'));
    await writeFile(join(elsewhere, 'ferry.md'), '# Ferry\n\nThe ferry leaves at ten.\n');
    await mkdir(join(elsewhere, 'specs'));
    await writeFile(join(elsewhere, 'specs', 'pier.rst'), 'Pier\n====\n\nThe pier opens at six.\n');
    await writeFile(join(root, 'b-notes.txt'), 'Notes on the timetable.\n');
    await writeFile(join(root, 'photo.png'), 'not a document');
    await mkdir(join(root, '.hidden'));
    await writeFile(join(root, '.hidden', 'skip.md'), '# Hidden\n');
    await symlink(join(elsewhere, 'ferry.md'), join(root, 'a-ferry.md'));
    await symlink(join(elsewhere, 'specs'), join(root, 'c-specs'));
    await symlink(join(elsewhere, 'gone.md'), join(root, 'd-gone.md'));
    await symlink(root, join(root, 'e-loop'));
  });
  after(async () => {
    await rm(root, { recursive: true, force: true });
    await rm(elsewhere, { recursive: true, force: true });
  });

  it('follows links to files and folders, reads each folder once, and lists a dangling link so that reading it can say so', async () => {
    assert.deepEqual(await listed(root), ['a-ferry.md', 'b-notes.txt', join('c-specs', 'pier.rst'), 'd-gone.md']);
  });

  it('digests a folder of links to documents', async () => {
    const { tersely, builtCli } = await import('./helpers/built-cli');
    builtCli();
    const run = tersely(['digest', root, '--format', 'json', '--quiet']);
    // The dangling link is reported (exit code 1: a file could not be read), the rest is digested.
    assert.equal(run.code, 1, run.stderr);
    assert.match(run.stderr, /d-gone\.md: cannot read the file/);
    const digest = JSON.parse(run.stdout) as { documents: { file: string }[] };
    assert.deepEqual(digest.documents.map((d) => d.file.slice(root.length + 1)), ['a-ferry.md', 'b-notes.txt', join('c-specs', 'pier.rst')]);
  });
});
