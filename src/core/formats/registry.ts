/** Binds every format of catalog.ts to its reader. */
import type { DocumentFormat, ParsedDocument } from '../types';
import { parseMarkdown } from './markdown/markdown';
import { parsePlainText } from './plaintext/plaintext';
import { parseRestructuredText } from './rst/index';

export interface ReadOptions {
  /** Offset of the text in the whole document (for a selection); every span includes it. */
  readonly baseOffset: number;
  /** Read table cells as paragraphs instead of skipping tables. */
  readonly includeTables: boolean;
  /** Read footnote and citation bodies as prose (reStructuredText) instead of skipping them. */
  readonly includeFootnotes: boolean;
}

export type Reader = (text: string, options: ReadOptions) => ParsedDocument;

const READERS: Readonly<Record<DocumentFormat, Reader>> = {
  markdown: parseMarkdown,
  restructuredtext: parseRestructuredText,
  plaintext: (text, options) => parsePlainText(text, { baseOffset: options.baseOffset }),
};

export interface ParseOptions {
  readonly format: DocumentFormat;
  readonly baseOffset?: number;
  readonly includeTables?: boolean;
  readonly includeFootnotes?: boolean;
}

export function parseDocument(text: string, options: ParseOptions): ParsedDocument {
  const read = READERS[options.format];
  if (!read) throw new Error(`unknown document format "${String(options.format)}"`);
  return read(text, { baseOffset: options.baseOffset ?? 0, includeTables: options.includeTables ?? false, includeFootnotes: options.includeFootnotes ?? false });
}
