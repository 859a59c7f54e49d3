/**
 * An mdast tree → ParsedDocument, for every Markdown reader that produces mdast with offsets
 * (markdown.ts through mdast-util-from-markdown, ../markdown-it through markdown-it).
 *
 * Block structure comes from the syntax tree only; node positions give the offsets. Headings open
 * sections, prose blocks become paragraphs, everything else is reported as skipped with a reason.
 */

import type { Blockquote, Heading, List, Nodes, Paragraph, Root, RootContent, Table } from 'mdast';
import type { BlockKind, ParsedDocument, SkipReason } from '../../types';
import { imageParagraphKind, isMetadataRun, isTaskItem, listSkipReason } from '../../parse/boilerplate';
import { DocumentBuilder } from '../../parse/document-builder';
import { frontMatterTitle } from './front-matter';
import { InlineTextBuilder, singleLine } from '../../parse/inline-text';
import { appendPhrasing, nodeEnd, nodeStart, type InlineSource } from './markdown-inline';

export interface MarkdownOptions {
  readonly baseOffset: number;
  readonly includeTables: boolean;
}

/**
 * Reads `tree`, parsed from `source.text` without its first `source.shift` units (a byte order
 * mark), into a document whose spans index `source.text` plus `options.baseOffset`.
 */
export function readMarkdownTree(tree: Root, source: InlineSource, options: MarkdownOptions): ParsedDocument {
  return readMarkdownBlocks(tree.children, source, options);
}

/** Reads some top-level blocks of a tree (one piece of a document, see pieces.ts) the same way. */
export function readMarkdownBlocks(blocks: readonly RootContent[], source: InlineSource, options: MarkdownOptions): ParsedDocument {
  const walker = new MarkdownWalker(source, new DocumentBuilder(source.text, options.baseOffset, 'markdown'), options);
  walker.walkBlocks(blocks, ROOT_CONTEXT);
  return walker.finish();
}

/** Where a block sits: what kind its paragraphs get, list nesting, the list's lead-in. */
interface BlockContext {
  readonly kind: BlockKind;
  /** Depth of the innermost enclosing list item (0 = top-level item), -1 outside lists. */
  readonly listDepth: number;
  readonly leadIn: number | null;
  /** Directly under the root (metadata runs are only recognized there). */
  readonly topLevel: boolean;
}

const ROOT_CONTEXT: BlockContext = { kind: 'paragraph', listDepth: -1, leadIn: null, topLevel: true };

class MarkdownWalker {
  private frontMatterTitle: string | null = null;

  constructor(
    private readonly source: InlineSource,
    private readonly doc: DocumentBuilder,
    private readonly options: MarkdownOptions,
  ) {}

  finish(): ParsedDocument {
    if (!this.doc.hasTitle && this.frontMatterTitle !== null) this.doc.setTitle(this.frontMatterTitle);
    return this.doc.build();
  }

  walkBlocks(nodes: readonly RootContent[], context: BlockContext): void {
    let previousParagraph: number | null = null;
    for (const node of nodes) {
      previousParagraph = this.walkBlock(node, context, previousParagraph);
    }
  }

  /** Handles one block; returns the paragraph index it produced (for a following list's lead-in). */
  private walkBlock(node: RootContent, context: BlockContext, previousParagraph: number | null): number | null {
    // TOML front matter is not in mdast's node type map, so it is matched by name.
    if ((node.type as string) === 'toml') {
      this.frontMatter(node, (node as unknown as { value: string }).value, 'toml');
      return null;
    }
    switch (node.type) {
      case 'heading':
        this.heading(node);
        return null;
      case 'paragraph':
        return this.paragraph(node, context);
      case 'list':
        this.list(node, context, previousParagraph);
        return null;
      case 'blockquote':
        this.blockquote(node, context);
        return null;
      case 'table':
        this.table(node);
        return null;
      case 'code':
        this.skip('code', node);
        return null;
      case 'html':
        this.skip(node.value.trimStart().startsWith('<!--') ? 'comment' : 'html', node);
        return null;
      case 'yaml':
        this.frontMatter(node, node.value, 'yaml');
        return null;
      case 'definition':
      case 'footnoteDefinition':
        this.skip('definition', node);
        return null;
      case 'thematicBreak':
        this.skip('thematicBreak', node);
        return null;
      default:
        // Any other container (from future extensions): read its blocks, keep its context.
        if ('children' in node) this.walkBlocks(node.children as RootContent[], context);
        return null;
    }
  }

  private frontMatter(node: Nodes, value: string, kind: 'yaml' | 'toml'): void {
    this.skip('frontMatter', node);
    this.frontMatterTitle ??= frontMatterTitle(value, kind);
  }

  private heading(node: Heading): void {
    const start = nodeStart(node, this.source);
    const end = nodeEnd(node, this.source);
    if (start === null || end === null) return;
    const inline = new InlineTextBuilder();
    appendPhrasing(node.children, inline, this.source, this.skipSink);
    const heading = singleLine(inline.finish());
    this.doc.addHeading(heading, node.depth, start, end);
    if (node.depth === 1) this.doc.setTitle(heading);
  }

  private paragraph(node: Paragraph, context: BlockContext): number | null {
    const start = nodeStart(node, this.source);
    const end = nodeEnd(node, this.source);
    if (start === null || end === null) return null;
    const imageKind = imageParagraphKind(node);
    if (imageKind !== null) {
      this.doc.skip(imageKind, start, end);
      return null;
    }
    const inline = new InlineTextBuilder();
    appendPhrasing(node.children, inline, this.source, this.skipSink);
    if (context.topLevel && this.doc.atSectionStart && isMetadataRun(inline.lines())) {
      this.doc.skip('metadata', start, end);
      return null;
    }
    const text = inline.finish();
    const index = this.doc.addParagraph({
      kind: context.kind,
      start,
      end,
      listDepth: context.kind === 'listItem' ? Math.max(0, context.listDepth) : 0,
      leadIn: context.leadIn,
      text,
    });
    if (index === null && node.children.some((c) => c.type === 'html')) this.doc.skip('html', start, end);
    return index;
  }

  private list(node: List, context: BlockContext, previousParagraph: number | null): void {
    const reason = listSkipReason(node);
    if (reason !== null) {
      this.skip(reason, node);
      return;
    }
    if (context.topLevel && this.doc.atSectionStart && this.isMetadataList(node)) {
      this.skip('metadata', node);
      return;
    }
    const leadIn =
      previousParagraph !== null && this.doc.sectionOf(previousParagraph) === this.doc.currentSection
        ? previousParagraph
        : null;
    const itemContext: BlockContext = { kind: 'listItem', listDepth: context.listDepth + 1, leadIn, topLevel: false };
    for (const item of node.children) {
      if (isTaskItem(item)) this.skip('checklist', item);
      else this.walkBlocks(item.children, itemContext);
    }
  }

  /**
   * A list whose every item is one `Key: value` field: a paragraph (whose wrapped lines continue the
   * value), optionally followed by a nested list holding the value's parts.
   */
  private isMetadataList(node: List): boolean {
    const lines: string[] = [];
    for (const item of node.children) {
      const [first, ...rest] = item.children;
      if (first?.type !== 'paragraph' || !rest.every((child) => child.type === 'list')) return false;
      const inline = new InlineTextBuilder();
      appendPhrasing(first.children, inline, this.source, () => {});
      lines.push(inline.lines().join(' '));
    }
    return isMetadataRun(lines);
  }

  private blockquote(node: Blockquote, context: BlockContext): void {
    this.walkBlocks(node.children, { ...context, kind: 'quote', leadIn: null, topLevel: false });
  }

  private table(node: Table): void {
    if (!this.options.includeTables) {
      this.skip('table', node);
      return;
    }
    node.children.forEach((row, rowIndex) => {
      // The header row holds labels, not statements.
      if (rowIndex === 0) {
        this.skip('table', row);
        return;
      }
      for (const cell of row.children) {
        const start = nodeStart(cell, this.source);
        const end = nodeEnd(cell, this.source);
        if (start === null || end === null) continue;
        const inline = new InlineTextBuilder();
        appendPhrasing(cell.children, inline, this.source, this.skipSink);
        this.doc.addParagraph({ kind: 'tableCell', start, end, listDepth: 0, leadIn: null, text: inline.finish() });
      }
    });
  }

  private skip(reason: SkipReason, node: Nodes): void {
    const start = nodeStart(node, this.source);
    const end = nodeEnd(node, this.source);
    if (start !== null && end !== null) this.doc.skip(reason, start, end);
  }

  private readonly skipSink = (reason: SkipReason, start: number, end: number): void => {
    this.doc.skip(reason, start, end);
  };
}
