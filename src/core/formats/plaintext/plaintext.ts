/**
 * Plain text → ParsedDocument. Blocks come from `plainBlocks`; this file gives headings their
 * depths, recognizes metadata runs, links list items to their lead-in and builds normalized text.
 */

import type { ParsedDocument } from '../../types';
import { isMetadataRun } from '../../parse/boilerplate';
import { DocumentBuilder } from '../../parse/document-builder';
import { InlineTextBuilder } from '../../parse/inline-text';
import { plainBlocks, type PlainBlock, type TextRange } from './plaintext-blocks';
import { splitLines } from './plaintext-lines';

export interface PlainTextOptions {
  readonly baseOffset: number;
}

type ParagraphBlock = Extract<PlainBlock, { type: 'paragraph' }>;
type HeadingBlock = Extract<PlainBlock, { type: 'heading' }>;

export function parsePlainText(text: string, options: PlainTextOptions): ParsedDocument {
  const from = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const blocks = plainBlocks(splitLines(text, from));
  const doc = new DocumentBuilder(text, options.baseOffset, 'plaintext');
  const depths = new HeadingDepths();
  let previousParagraph: number | null = null;
  let i = 0;
  while (i < blocks.length) {
    const block = blocks[i]!;
    if (block.type === 'heading') {
      const depth = depths.depthOf(block);
      doc.addHeading(block.text, depth, block.start, block.end);
      // Only a heading drawn with '=' makes a document title (the plain-text form of an H1).
      if (/=$/.test(block.style) && depth === 1) doc.setTitle(block.text);
      previousParagraph = null;
      i++;
    } else if (block.type === 'skip') {
      doc.skip(block.reason, block.start, block.end);
      previousParagraph = null;
      i++;
    } else if (block.kind === 'paragraph') {
      previousParagraph = addParagraph(doc, text, block, 0, null);
      i++;
    } else {
      let end = i;
      while (end < blocks.length && isListItem(blocks[end]!)) end++;
      addList(doc, text, blocks.slice(i, end) as ParagraphBlock[], previousParagraph);
      previousParagraph = null;
      i = end;
    }
  }
  return doc.build();
}

function isListItem(block: PlainBlock): boolean {
  return block.type === 'paragraph' && block.kind === 'listItem';
}

function addParagraph(
  doc: DocumentBuilder,
  text: string,
  block: ParagraphBlock,
  listDepth: number,
  leadIn: number | null,
): number | null {
  const first = block.ranges[0]!;
  const last = block.ranges[block.ranges.length - 1]!;
  if (block.kind === 'paragraph' && doc.atSectionStart && isMetadataRun(block.ranges.map((r) => text.slice(r.start, r.end)))) {
    doc.skip('metadata', first.start, last.end);
    return null;
  }
  return doc.addParagraph({
    kind: block.kind,
    start: first.start,
    end: last.end,
    listDepth,
    leadIn,
    text: normalizedText(text, block.ranges).finish(),
  });
}

/** A run of list items: a metadata run, or items nested by marker indentation. */
function addList(doc: DocumentBuilder, text: string, items: ParagraphBlock[], previousParagraph: number | null): void {
  // An item's wrapped lines continue its value.
  const fields = items.map((item) => item.ranges.map((r) => text.slice(r.start, r.end).trim()).join(' '));
  if (doc.atSectionStart && isMetadataRun(fields)) {
    const last = items[items.length - 1]!.ranges;
    doc.skip('metadata', items[0]!.ranges[0]!.start, last[last.length - 1]!.end);
    return;
  }
  const indents: number[] = [];
  // Last paragraph seen at each depth: a nested item's lead-in is its parent item.
  const lastAtDepth: (number | null)[] = [];
  for (const item of items) {
    while (indents.length > 0 && indents[indents.length - 1]! > item.indent) indents.pop();
    if (indents.length === 0 || indents[indents.length - 1]! < item.indent) indents.push(item.indent);
    const depth = indents.length - 1;
    const leadIn = depth === 0 ? previousParagraph : (lastAtDepth[depth - 1] ?? null);
    const index = addParagraph(doc, text, item, depth, leadIn);
    lastAtDepth[depth] = index;
    lastAtDepth.length = depth + 1;
  }
}

/**
 * Lines joined with single spaces; a trailing reStructuredText `::` reads as ':'. A line that ends
 * early (one item per line) may end a sentence: plain text has no other way to say so.
 */
function normalizedText(text: string, ranges: readonly TextRange[]): InlineTextBuilder {
  const out = new InlineTextBuilder({ deliberateLines: true });
  ranges.forEach((range, n) => {
    if (n > 0) out.softBreak(ranges[n - 1]!.end);
    let end = range.end;
    if (n === ranges.length - 1) {
      const literalMarker = /[ \t]*::[ \t]*$/.exec(text.slice(range.start, range.end));
      if (literalMarker !== null) {
        // `Example::` → `Example:`; a detached ` ::` disappears.
        end = range.start + literalMarker.index + (/^[ \t]/.test(literalMarker[0]) ? 0 : 1);
      }
    }
    out.pushSource(text, range.start, end);
  });
  return out;
}

/**
 * Heading depths for plain text. Drawn headings (underlined, overlined, capitals) get depths in
 * the order their styles first appear, as reStructuredText does. A numbered heading takes the
 * depth of the latest heading with as many number levels, or sits one below the latest with one
 * level fewer (`2.1` under `2.`).
 */
class HeadingDepths {
  private readonly styleDepths = new Map<string, number>();
  /** Depth of the latest heading with a given count of number levels. */
  private readonly numberedDepths = new Map<number, number>();

  depthOf(block: HeadingBlock): number {
    let depth: number;
    if (block.style === 'numbered') {
      const sibling = this.numberedDepths.get(block.numberLevels);
      const parent = this.numberedDepths.get(block.numberLevels - 1);
      if (sibling !== undefined) depth = sibling;
      else if (parent !== undefined) depth = parent + 1;
      else depth = block.numberLevels + this.styleDepths.size;
    } else {
      if (!this.styleDepths.has(block.style)) this.styleDepths.set(block.style, this.styleDepths.size + 1);
      depth = this.styleDepths.get(block.style)!;
    }
    depth = Math.min(6, depth);
    if (block.numberLevels > 0) {
      this.numberedDepths.set(block.numberLevels, depth);
      for (const levels of [...this.numberedDepths.keys()]) {
        if (levels > block.numberLevels) this.numberedDepths.delete(levels);
      }
    }
    return depth;
  }
}
