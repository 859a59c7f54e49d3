/**
 * Which files `tersely train` reads: the documents under each folder given, and/or the paths
 * listed in a --files list (one path a line, relative to the list's own folder; blank lines and
 * lines starting with # are skipped), filtered by --match.
 */
import { readFile } from 'node:fs/promises';
import { dirname, join, relative, resolve } from 'node:path';
import { formatForFileName } from '../core/index';
import { documentFilesUnder } from './document-files';
import { InputError } from './read-input';

/** Document files under `root`, sorted (document-files.ts says which). */
export async function documentFiles(root: string): Promise<string[]> {
  const found: string[] = [];
  try {
    for await (const path of documentFilesUnder(root)) found.push(path);
  } catch {
    throw new InputError(`folder ${root} cannot be read`);
  }
  return found;
}

export interface ListedFile {
  readonly path: string;
  /** The path below its folder or list, which --match is tried on. */
  readonly relative: string;
}

/** Paths listed in a --files list, in list order. */
export async function listedFiles(list: string): Promise<ListedFile[]> {
  let text: string;
  try {
    text = await readFile(list, 'utf8');
  } catch {
    throw new InputError(`file list ${list} cannot be read`);
  }
  const base = dirname(list);
  const files: ListedFile[] = [];
  for (const [index, raw] of text.split(/\r?\n/).entries()) {
    const line = raw.trim();
    if (line === '' || line.startsWith('#')) continue;
    if (!formatForFileName(line)) throw new InputError(`file list ${list}, line ${index + 1}: ${line} is not a document type tersely reads`);
    files.push({ path: join(base, line), relative: line });
  }
  if (files.length === 0) throw new InputError(`file list ${list} names no files`);
  return files;
}

/** Every file to train on: the folders' documents, then the list's, filtered by `match`, without repeats. */
export async function trainingFiles(folders: readonly string[], list: string | undefined, match: RegExp | null): Promise<ListedFile[]> {
  const all: ListedFile[] = [];
  for (const folder of folders) all.push(...(await documentFiles(folder)).map((path) => ({ path, relative: relative(folder, path) })));
  if (list !== undefined) all.push(...(await listedFiles(list)));
  const seen = new Set<string>();
  return all.filter((file) => {
    const key = resolve(file.path);
    if (seen.has(key) || (match !== null && !match.test(file.relative))) return false;
    seen.add(key);
    return true;
  });
}

/** How many of the files sit in each folder (shown relative to the current folder), for the model's record of its data. */
export function filesPerFolder(files: readonly ListedFile[], cwd: string): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const file of files) {
    const folder = relative(cwd, dirname(resolve(file.path))) || '.';
    counts[folder] = (counts[folder] ?? 0) + 1;
  }
  return counts;
}
