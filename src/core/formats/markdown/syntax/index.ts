/** markdown-it's tokens as an mdast tree with offsets into the text (no byte order mark in it). */
import type { Root } from 'mdast';
import { parseTokens, type KnownLabels } from './parser';
import { SourceLines } from './source-lines';
import { buildTree } from './tree';

export type { KnownLabels } from './parser';

/**
 * `known`: labels defined elsewhere in the document when `text` is one stretch of it;
 * `atDocumentStart`: front matter is only looked for at the document's start.
 */
export function markdownTree(text: string, known?: KnownLabels, atDocumentStart = true): Root {
  return buildTree({ ...parseTokens(text, undefined, known, atDocumentStart), lines: new SourceLines(text) });
}
