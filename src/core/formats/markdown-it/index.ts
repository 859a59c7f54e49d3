/**
 * Markdown → ParsedDocument through markdown-it: the same output contract as the mdast reader
 * (../markdown/markdown.ts), read by the same walker, several times faster.
 *
 * markdown-it's tokens become an mdast tree with offsets (tree.ts), which the shared walker turns
 * into sections, paragraphs and sentences with exact source spans.
 */
import type { Root } from 'mdast';
import { readMarkdownTree, type MarkdownOptions } from '../markdown/markdown-walker';
import type { ParsedDocument } from '../../types';
import { parseTokens } from './parser';
import { SourceLines } from './source-lines';
import { buildTree } from './tree';

export function parseMarkdownFast(text: string, options: MarkdownOptions): ParsedDocument {
  // Like the mdast reader: a leading byte order mark is not Markdown; offsets count it.
  const shift = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const body = shift === 0 ? text : text.slice(shift);
  return readMarkdownTree(markdownItTree(body), { text, shift }, options);
}

/** The mdast tree of `text` (without a byte order mark), offsets into `text`. */
export function markdownItTree(text: string): Root {
  return buildTree({ ...parseTokens(text), lines: new SourceLines(text) });
}
