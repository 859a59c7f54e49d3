/** Locates the shared corpus of real design documents; tests skip with a message when it is absent. */
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';

export const CORPUS_DIR = resolve(process.env.TERSELY_CORPUS ?? join(process.cwd(), '..', 'shared', 'corpus', 'rust-rfcs', 'docs'));

export function corpusFiles(dir = CORPUS_DIR): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir)
    .sort()
    .flatMap((name) => {
      const path = join(dir, name);
      return statSync(path).isDirectory() ? corpusFiles(path) : name.endsWith('.md') ? [path] : [];
    });
}

export const DEMO_DIR = join(process.cwd(), 'media', 'demo');
