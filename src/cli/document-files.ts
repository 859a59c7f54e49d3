/**
 * The document files under a folder, for `tersely digest` and `tersely train`: every file whose
 * name a format claims (Markdown, reStructuredText, text), in name order, sub-folders included,
 * hidden entries and node_modules skipped. Symbolic links are followed, to files and to folders
 * (a folder of links to the documents to read is a common way to pick them); each real folder is
 * read once, so a link back up the tree does not loop. A link whose target is missing is listed
 * when its name is a document's, so that reading it says what is wrong instead of leaving it out.
 */
import type { Dirent } from 'node:fs';
import { readdir, realpath, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { formatForFileName } from '../core/index';

type EntryKind = 'file' | 'folder' | 'other' | 'missing';

async function kindOf(entry: Dirent, path: string): Promise<EntryKind> {
  if (entry.isDirectory()) return 'folder';
  if (entry.isFile()) return 'file';
  if (!entry.isSymbolicLink()) return 'other';
  try {
    const target = await stat(path);
    return target.isDirectory() ? 'folder' : target.isFile() ? 'file' : 'other';
  } catch {
    return 'missing';
  }
}

const byName = (a: Dirent, b: Dirent) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0);

/** Yields the document files under `root` (see the module comment); reading a folder may throw. */
export async function* documentFilesUnder(root: string): AsyncGenerator<string> {
  const seen = new Set<string>();
  async function* walk(folder: string): AsyncGenerator<string> {
    const real = await realpath(folder);
    if (seen.has(real)) return;
    seen.add(real);
    for (const entry of (await readdir(folder, { withFileTypes: true })).sort(byName)) {
      if (entry.name.startsWith('.') || entry.name === 'node_modules') continue;
      const path = join(folder, entry.name);
      const kind = await kindOf(entry, path);
      if (kind === 'folder') yield* walk(path);
      else if ((kind === 'file' || kind === 'missing') && formatForFileName(entry.name)) yield path;
    }
  }
  yield* walk(root);
}
