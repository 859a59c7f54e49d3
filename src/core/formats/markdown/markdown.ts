/**
 * Markdown → ParsedDocument. markdown-it (the parser family the editor's own Markdown preview
 * uses, so structure agrees with what people see) tokenizes; its tokens become an mdast-shaped
 * tree with offsets (syntax/), which the walker turns into sections, paragraphs and sentences with
 * exact source spans (markdown-walker.ts).
 */
import type { ParsedDocument } from '../../types';
import { readMarkdownTree, type MarkdownOptions } from './markdown-walker';
import { markdownTree } from './syntax/index';

export type { MarkdownOptions } from './markdown-walker';

export function parseMarkdown(text: string, options: MarkdownOptions): ParsedDocument {
  // A leading byte order mark is not Markdown; offsets still count it.
  const shift = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const body = shift === 0 ? text : text.slice(shift);
  return readMarkdownTree(markdownTree(body), { text, shift }, options);
}
