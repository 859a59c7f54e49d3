/** Which files an editor digest reads (src/extension/digest-files.ts), over a fake file system. */
import assert from 'node:assert/strict';
import { collectDigestFiles, isDigestLanguage, type DigestEntry, type DigestFileSystem } from '../../src/extension/digest-files';

/** A file system from a list of paths ('/w/a.md' → size); folders are implied by the paths. */
function fakeFs(files: Record<string, number>, broken: ReadonlySet<string> = new Set()): DigestFileSystem<string> & { listed: string[] } {
  const folders = new Set<string>();
  for (const path of Object.keys(files)) {
    const parts = path.split('/');
    for (let k = 2; k < parts.length; k++) folders.add(parts.slice(0, k).join('/'));
  }
  const listed: string[] = [];
  return {
    listed,
    async stat(uri) {
      if (broken.has(uri) && uri in files) throw new Error(`EACCES ${uri}`);
      if (uri in files) return { kind: 'file', size: files[uri]! };
      if (folders.has(uri)) return { kind: 'folder', size: 0 };
      throw new Error(`ENOENT ${uri}`);
    },
    async list(uri) {
      if (broken.has(uri)) throw new Error(`EACCES ${uri}`);
      listed.push(uri);
      const children = new Map<string, DigestEntry<string>>();
      for (const path of [...Object.keys(files), ...folders]) {
        if (!path.startsWith(`${uri}/`)) continue;
        const name = path.slice(uri.length + 1).split('/')[0]!;
        const child = `${uri}/${name}`;
        children.set(name, { uri: child, name, kind: child in files ? 'file' : 'folder' });
      }
      // Deliberately not in name order: the walk must sort.
      return [...children.values()].reverse();
    },
    name: (uri) => uri.slice(uri.lastIndexOf('/') + 1),
  };
}

const MAX = 10_000;

/**
 * A file system with symbolic links: `links` maps a link's path to its target; paths below a link
 * resolve through it, as a real file system does, and a link's stat is its target's.
 */
function linkedFs(files: Record<string, number>, links: Record<string, string>): DigestFileSystem<string> {
  const real = (path: string): string => {
    for (const [link, target] of Object.entries(links)) {
      if (path === link || path.startsWith(`${link}/`)) return real(target + path.slice(link.length));
    }
    return path;
  };
  const base = fakeFs(files);
  // Times per real folder: a folder reached through a link shows the same ones.
  const times = (path: string) => ({ ctime: path.length * 7, mtime: path.length * 11 });
  return {
    async stat(uri) {
      const found = await base.stat(real(uri));
      return found.kind === 'folder' ? { ...found, ...times(real(uri)) } : found;
    },
    async list(uri) {
      const entries = [...(await base.list(real(uri)))].map((e) => ({ ...e, uri: `${uri}/${e.name}` }));
      for (const link of Object.keys(links)) {
        const parent = link.slice(0, link.lastIndexOf('/'));
        if (real(parent) !== real(uri)) continue;
        const name = link.slice(parent.length + 1);
        const target = await base.stat(real(link));
        entries.push({ uri: `${uri}/${name}`, name, kind: target.kind, link: true });
      }
      return entries;
    },
    name: (uri) => uri.slice(uri.lastIndexOf('/') + 1),
  };
}

describe('editor digest: which files are read', () => {
  it('follows links to folders and files, but not a link back into a folder it is walking', async () => {
    const fs = linkedFs({ '/w/a.md': 10, '/w/sub/c.md': 10, '/elsewhere/docs/b.md': 10, '/elsewhere/notes.md': 10 }, { '/w/docs': '/elsewhere/docs', '/w/loop': '/w', '/w/sub/up': '/w', '/w/note.md': '/elsewhere/notes.md' });
    const { files, skipped, truncated } = await collectDigestFiles(fs, ['/w'], MAX);
    assert.deepEqual(files.map((f) => f.uri), ['/w/a.md', '/w/docs/b.md', '/w/note.md', '/w/sub/c.md']);
    assert.deepEqual(skipped, []);
    assert.equal(truncated, false);
  });

  it('reads a folder reached through a link once, but two real folders that look the same both', async () => {
    // '/w/p' and '/w/q' hold the same entries and (in this fake) the same times, but neither is a link.
    const fs = linkedFs({ '/w/p/b.md': 10, '/w/q/b.md': 10, '/w/x/c.md': 10 }, { '/w/y': '/w/x' });
    const { files } = await collectDigestFiles(fs, ['/w'], MAX);
    assert.deepEqual(files.map((f) => f.uri), ['/w/p/b.md', '/w/q/b.md', '/w/x/c.md']);
  });

  it('walks a folder in name order, depth first, taking only the files a format claims, with their format', async () => {
    const fs = fakeFs({
      '/w/b.rst': 10,
      '/w/a.md': 10,
      '/w/c/z.txt': 10,
      '/w/c/a.markdown': 10,
      '/w/d.txt': 10,
      '/w/script.js': 10,
      '/w/image.png': 10,
      '/w/README': 10,
    });
    const { files, skipped, truncated } = await collectDigestFiles(fs, ['/w'], MAX);
    assert.deepEqual(
      files.map((f) => [f.uri, f.format]),
      [
        ['/w/a.md', 'markdown'],
        ['/w/b.rst', 'restructuredtext'],
        ['/w/c/a.markdown', 'markdown'],
        ['/w/c/z.txt', 'plaintext'],
        ['/w/d.txt', 'plaintext'],
      ],
    );
    assert.deepEqual(skipped, [], 'files no format claims inside a folder are passed over, not reported');
    assert.equal(truncated, false);
  });

  it('skips hidden entries and node_modules, files and folders alike, without listing them', async () => {
    const fs = fakeFs({ '/w/.hidden.md': 5, '/w/.git/notes.md': 5, '/w/node_modules/pkg/README.md': 5, '/w/docs/node_modules.md': 5, '/w/docs/guide.md': 5 });
    const { files } = await collectDigestFiles(fs, ['/w'], MAX);
    assert.deepEqual(files.map((f) => f.uri), ['/w/docs/guide.md', '/w/docs/node_modules.md']);
    assert.deepEqual(fs.listed.sort(), ['/w', '/w/docs']);
  });

  it('reads a file picked by name whatever its extension, as plain text when no format claims it', async () => {
    const fs = fakeFs({ '/w/NOTES': 5, '/w/log.cfg': 5, '/w/spec.rest': 5 });
    const { files } = await collectDigestFiles(fs, ['/w/log.cfg', '/w/NOTES', '/w/spec.rest'], MAX);
    assert.deepEqual(
      files.map((f) => [f.uri, f.format]),
      [
        ['/w/log.cfg', 'plaintext'],
        ['/w/NOTES', 'plaintext'],
        ['/w/spec.rest', 'restructuredtext'],
      ],
      'picked files keep the order they were picked in',
    );
  });

  it('skips and reports files larger than the bound with their size; one at the bound is read', async () => {
    const fs = fakeFs({ '/w/big.md': 101, '/w/edge.md': 100, '/w/small.md': 3 });
    const { files, skipped } = await collectDigestFiles(fs, ['/w', '/w/big.md'], 100);
    assert.deepEqual(files.map((f) => f.uri), ['/w/edge.md', '/w/small.md']);
    assert.deepEqual(skipped, [{ uri: '/w/big.md', reason: 'tooLarge', size: 101 }], 'reported once, though reached twice');
  });

  it('reports a picked path that is not there and goes on with the rest', async () => {
    const fs = fakeFs({ '/w/a.md': 5 });
    const { files, skipped } = await collectDigestFiles(fs, ['/w/gone.md', '/w/a.md'], MAX);
    assert.deepEqual(files.map((f) => f.uri), ['/w/a.md']);
    assert.deepEqual(skipped, [{ uri: '/w/gone.md', reason: 'notFound' }]);
  });

  it('reports a folder it cannot list and a file it cannot stat, and goes on with the rest', async () => {
    const fs = fakeFs({ '/w/a.md': 5, '/w/locked/b.md': 5, '/w/c.md': 5, '/w/d.md': 5 }, new Set(['/w/locked', '/w/c.md']));
    const { files, skipped } = await collectDigestFiles(fs, ['/w'], MAX);
    assert.deepEqual(files.map((f) => f.uri), ['/w/a.md', '/w/d.md']);
    assert.deepEqual(skipped, [
      { uri: '/w/c.md', reason: 'unreadable' },
      { uri: '/w/locked', reason: 'unreadable' },
    ]);
  });

  it('takes each file once: a file picked and also inside a picked folder, or picked twice', async () => {
    const fs = fakeFs({ '/w/a.md': 5, '/w/sub/b.md': 5 });
    const { files } = await collectDigestFiles(fs, ['/w/sub/b.md', '/w', '/w/a.md', '/w/sub'], MAX);
    assert.deepEqual(files.map((f) => f.uri), ['/w/sub/b.md', '/w/a.md']);
  });

  it('compares files by the key it is given (an editor URI by its string form)', async () => {
    const fs = fakeFs({ '/w/a.md': 5, '/W/A.md': 5 });
    const caseless = await collectDigestFiles(fs, ['/w/a.md', '/W/A.md'], MAX, 10, (uri) => uri.toLowerCase());
    assert.deepEqual(caseless.files.map((f) => f.uri), ['/w/a.md']);
    const exact = await collectDigestFiles(fs, ['/w/a.md', '/W/A.md'], MAX, 10);
    assert.deepEqual(exact.files.map((f) => f.uri), ['/w/a.md', '/W/A.md']);
  });

  it('stops at maxFiles and says so; exactly maxFiles is not truncated', async () => {
    const names = Object.fromEntries(Array.from({ length: 7 }, (_, k) => [`/w/doc-${k}.md`, 5]));
    const cut = await collectDigestFiles(fakeFs(names), ['/w'], MAX, 4);
    assert.deepEqual(cut.files.map((f) => f.uri), ['/w/doc-0.md', '/w/doc-1.md', '/w/doc-2.md', '/w/doc-3.md']);
    assert.equal(cut.truncated, true);
    const exact = await collectDigestFiles(fakeFs(names), ['/w'], MAX, 7);
    assert.equal(exact.files.length, 7);
    assert.equal(exact.truncated, false);
  });
});

describe('editor digest: which open editors are taken', () => {
  it('takes Markdown, reStructuredText and plain text documents by language id, nothing else', () => {
    for (const id of ['markdown', 'restructuredtext', 'plaintext', 'mdx']) assert.equal(isDigestLanguage(id), true, id);
    for (const id of ['javascript', 'typescript', 'json', 'log', 'Markdown', '']) assert.equal(isDigestLanguage(id), false, id);
  });
});
