/**
 * Reads a file (or standard input for "-") as text, refusing what is not text with a one-line reason.
 */
import { readFile, stat } from 'node:fs/promises';
import { extname } from 'node:path';
import type { DocumentFormat } from '../core/types';

export interface InputText {
  readonly name: string;
  readonly text: string;
  readonly format: DocumentFormat;
}

export class InputError extends Error {}

const MARKDOWN_EXTENSIONS = new Set(['.md', '.markdown', '.mdown', '.mkd', '.mdx']);

const RESTRUCTUREDTEXT_EXTENSIONS = new Set(['.rst', '.rest']);

export function formatForPath(path: string): DocumentFormat {
  const extension = extname(path).toLowerCase();
  if (RESTRUCTUREDTEXT_EXTENSIONS.has(extension)) return 'restructuredtext';
  return MARKDOWN_EXTENSIONS.has(extension) ? 'markdown' : 'plaintext';
}

async function readStdin(): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

export async function readInput(path: string, stdinFormat: DocumentFormat = 'markdown'): Promise<InputText> {
  let bytes: Buffer;
  if (path === '-') {
    bytes = await readStdin();
  } else {
    let info;
    try {
      info = await stat(path);
    } catch {
      throw new InputError('cannot read the file (it does not exist or is not accessible)');
    }
    if (info.isDirectory()) throw new InputError('is a folder, not a file');
    try {
      bytes = await readFile(path);
    } catch (error) {
      throw new InputError(`cannot read the file (${(error as NodeJS.ErrnoException).code ?? 'read error'})`);
    }
  }
  if (bytes.subarray(0, 8192).includes(0)) throw new InputError('looks like a binary file (it contains NUL bytes), not text');
  const text = new TextDecoder('utf-8', { fatal: false, ignoreBOM: false }).decode(bytes);
  if (text.trim().length === 0) throw new InputError('is empty (no text to summarize)');
  return { name: path === '-' ? '<stdin>' : path, text, format: path === '-' ? stdinFormat : formatForPath(path) };
}
