/**
 * Markdown → ParsedDocument, through mdast-util-from-markdown with GFM and front matter
 * (parsed in pieces by markdown-tree.ts, read by markdown-walker.ts).
 */

import type { ParsedDocument } from '../../types';
import { parseMarkdownTree } from './markdown-tree';
import { readMarkdownTree, type MarkdownOptions } from './markdown-walker';

export type { MarkdownOptions } from './markdown-walker';

export function parseMarkdown(text: string, options: MarkdownOptions): ParsedDocument {
  // micromark drops a leading byte order mark and counts offsets without it.
  const shift = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const body = shift === 0 ? text : text.slice(shift);
  return readMarkdownTree(parseMarkdownTree(body), { text, shift }, options);
}
