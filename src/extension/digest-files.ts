/**
 * Which files a digest reads: the files and folders picked (the explorer's selection or a folder
 * dialog), folders walked in name order for the files a format claims, skipping hidden entries and
 * node_modules (as the CLI's `digest` does). The file system is passed in (the editor's
 * `workspace.fs` in the extension, a fake in tests), so this module has no editor API.
 *
 * Symbolic links are followed, to files and to folders. The editor's file system gives no real
 * path to tell a link back up the tree (or to a folder already read) from a new folder, so a
 * folder reached through a link is compared with the folders read before by what shows of it, its
 * times and its entries: the same as one of them, it is that folder again and is not read a second
 * time, so a link loop ends at once. Folders reached without a link are never compared: two real
 * folders may well look alike.
 */
import { formatForFileName, formatForLanguageId, GENERIC_FORMAT, type DocumentFormat } from '../core/index';

export interface DigestEntry<U> {
  readonly uri: U;
  readonly name: string;
  /** What it is, or what it links to. */
  readonly kind: 'file' | 'folder' | 'other';
  /** A symbolic link. */
  readonly link?: boolean;
}

export interface DigestStat<U> {
  readonly kind: DigestEntry<U>['kind'];
  readonly size: number;
  /** Creation and modification times (ms), when the file system gives them. */
  readonly ctime?: number;
  readonly mtime?: number;
}

export interface DigestFileSystem<U> {
  /** What `uri` is (a link: what it links to) and its size in bytes; throws when it is not there. */
  stat(uri: U): Promise<DigestStat<U>>;
  /** A folder's entries, in any order. */
  list(uri: U): Promise<readonly DigestEntry<U>[]>;
  name(uri: U): string;
}

export interface DigestTarget<U> {
  readonly uri: U;
  readonly format: DocumentFormat;
}

export interface Skipped<U> {
  readonly uri: U;
  /** notFound: a picked path that is not there; unreadable: a folder or file inside one that could not be listed or read. */
  readonly reason: 'tooLarge' | 'notFound' | 'unreadable' | 'unknownFormat';
  readonly size?: number;
}

export interface Collected<U> {
  readonly files: readonly DigestTarget<U>[];
  readonly skipped: readonly Skipped<U>[];
  /** More files than `maxFiles` were found; the rest were not listed. */
  readonly truncated: boolean;
}

/** More files than this in one digest from the editor is almost certainly a wrong folder (ours). */
export const MAX_EDITOR_DIGEST_FILES = 500;

const byName = <U>(a: DigestEntry<U>, b: DigestEntry<U>): number => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0);

/** What shows of a folder: its times and its entries (sorted). Two folders that show the same are taken for one. */
function folderLook<U>(stat: DigestStat<U>, sortedEntries: readonly DigestEntry<U>[]): string {
  return JSON.stringify([stat.ctime ?? null, stat.mtime ?? null, sortedEntries.map((e) => [e.name, e.kind, e.link === true])]);
}

/**
 * The files to digest, in order, each once. A file picked by name is read whatever its extension
 * (as plain text when no format claims it); inside folders only the files a format claims.
 * Files larger than `maxBytes` are skipped and reported, never read.
 */
export async function collectDigestFiles<U>(fs: DigestFileSystem<U>, picked: readonly U[], maxBytes: number, maxFiles = MAX_EDITOR_DIGEST_FILES, key: (uri: U) => string = String): Promise<Collected<U>> {
  const files: DigestTarget<U>[] = [];
  const skipped: Skipped<U>[] = [];
  const seen = new Set<string>();
  let truncated = false;
  const addFile = (uri: U, size: number, format: DocumentFormat): void => {
    if (seen.has(key(uri))) return;
    seen.add(key(uri));
    if (size > maxBytes) skipped.push({ uri, reason: 'tooLarge', size });
    else if (files.length >= maxFiles) truncated = true;
    else files.push({ uri, format });
  };
  // How each folder read so far shows (folderLook), for folders reached through a link.
  const looks = new Set<string>();
  // One folder that cannot be listed (permissions, a file removed meanwhile) is reported, not fatal.
  const walk = async (folder: U, viaLink = false): Promise<void> => {
    let entries: DigestEntry<U>[];
    let look: string;
    try {
      entries = [...(await fs.list(folder))].sort(byName);
      look = folderLook(await fs.stat(folder), entries);
    } catch {
      skipped.push({ uri: folder, reason: 'unreadable' });
      return;
    }
    if (viaLink && looks.has(look)) return;
    looks.add(look);
    for (const entry of entries) {
      if (truncated) return;
      if (entry.name.startsWith('.') || entry.name === 'node_modules') continue;
      if (entry.kind === 'folder') await walk(entry.uri, entry.link === true);
      else if (entry.kind === 'file') {
        const format = formatForFileName(entry.name);
        if (!format) continue;
        let size: number;
        try {
          size = (await fs.stat(entry.uri)).size;
        } catch {
          skipped.push({ uri: entry.uri, reason: 'unreadable' });
          continue;
        }
        addFile(entry.uri, size, format.id);
      }
    }
  };
  for (const uri of picked) {
    if (truncated) break;
    let stat: { kind: DigestEntry<U>['kind']; size: number };
    try {
      stat = await fs.stat(uri);
    } catch {
      skipped.push({ uri, reason: 'notFound' });
      continue;
    }
    if (stat.kind === 'folder') await walk(uri);
    else if (stat.kind === 'file') addFile(uri, stat.size, formatForFileName(fs.name(uri))?.id ?? GENERIC_FORMAT);
    else skipped.push({ uri, reason: 'unknownFormat' });
  }
  return { files, skipped, truncated };
}

/** Whether an open editor document is one a digest of open documents takes (by language id, from the catalog). */
export function isDigestLanguage(languageId: string): boolean {
  return formatForLanguageId(languageId) !== undefined;
}
