/** markdown-it's tokens as an mdast tree with offsets into the text (no byte order mark in it). */
import type { Root } from 'mdast';
import { parseTokens } from './parser';
import { SourceLines } from './source-lines';
import { buildTree } from './tree';

export function markdownTree(text: string): Root {
  return buildTree({ ...parseTokens(text), lines: new SourceLines(text) });
}
