/**
 * Parsing: a Markdown or plain-text document (or a selection of one) → sections, paragraphs,
 * sentences with exact source spans, and the stretches that were left out.
 */

import { parseRestructuredText } from '../formats/rst/index';
import type { DocumentFormat, ParsedDocument } from '../types';
import { parseMarkdown } from './markdown';
import { parsePlainText } from './plaintext';

export interface ParseOptions {
  format: DocumentFormat;
  /** Offset of `text` in the whole document (for a selection); every span includes it. Default 0. */
  baseOffset?: number;
  /** Read table cells as paragraphs instead of skipping tables. Default false. */
  includeTables?: boolean;
}

export function parseDocument(text: string, options: ParseOptions): ParsedDocument {
  const baseOffset = options.baseOffset ?? 0;
  if (options.format === 'markdown') {
    return parseMarkdown(text, { baseOffset, includeTables: options.includeTables ?? false });
  }
  if (options.format === 'restructuredtext') {
    return parseRestructuredText(text, { baseOffset, includeTables: options.includeTables ?? false });
  }
  return parsePlainText(text, { baseOffset });
}

const MARKDOWN_EXTENSIONS = /\.(?:md|markdown|mdx|mdown|mkd)$/i;
const MARKDOWN_LANGUAGE_IDS = new Set(['markdown', 'mdx']);

/** The format for a file name or an editor language id: Markdown for .md/.markdown/.mdx, else plain text. */
export function formatForFile(fileNameOrLanguageId: string): DocumentFormat {
  const name = fileNameOrLanguageId.trim();
  if (MARKDOWN_LANGUAGE_IDS.has(name.toLowerCase()) || MARKDOWN_EXTENSIONS.test(name)) return 'markdown';
  return 'plaintext';
}
