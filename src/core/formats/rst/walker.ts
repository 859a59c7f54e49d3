/**
 * Blocks → the shared DocumentBuilder: titles open sections, prose becomes paragraphs (with the
 * kind of block they sit in), and everything else is reported as skipped with its reason.
 * Link-only paragraphs and lists, and `Key: value` runs at the start of a section, are skipped the
 * way the Markdown reader skips them.
 */
import { isMetadataRun } from '../../parse/boilerplate';
import type { DocumentBuilder } from '../../parse/document-builder';
import { singleLine, type NormalizedText } from '../../parse/inline-text';
import type { BlockKind } from '../../types';
import type { Block, DefinitionListBlock, ListBlock, ParagraphBlock, TableBlock, TitleBlock } from './blocks';
import type { TitlePlan } from './titles';
import { isLinkOnly, visibleText, withoutClassifiers, writePieces, type VisibleText } from './visible-text';

interface Context {
  readonly kind: BlockKind;
  /** Depth of the innermost enclosing list item (0 = top-level item), -1 outside lists. */
  readonly listDepth: number;
  readonly leadIn: number | null;
  /** Directly in a section (metadata runs are only recognized there). */
  readonly topLevel: boolean;
}

export const ROOT_CONTEXT: Context = { kind: 'paragraph', listDepth: -1, leadIn: null, topLevel: true };

export class RstWalker {
  constructor(
    private readonly doc: DocumentBuilder,
    private readonly titles: TitlePlan,
  ) {}

  walk(blocks: readonly Block[], context: Context): void {
    let previous: number | null = null;
    for (const block of blocks) previous = this.block(block, context, previous);
  }

  /** Handles one block; returns the paragraph it produced (a following list's lead-in), if any. */
  private block(block: Block, context: Context, previous: number | null): number | null {
    switch (block.kind) {
      case 'title':
        this.title(block);
        return null;
      case 'paragraph':
        return this.paragraph(block, context);
      case 'list':
        this.list(block, context, previous);
        return null;
      case 'definitionList':
        this.definitionList(block, context, previous);
        return null;
      case 'container':
        for (const part of block.skipped) this.doc.skip(part.reason, part.start, part.end);
        this.walk(block.body, block.role === 'quote' ? { ...context, kind: 'quote', leadIn: null, topLevel: false } : { ...context, topLevel: false });
        return null;
      case 'table':
        this.table(block);
        return null;
      case 'skip':
        this.doc.skip(block.reason, block.start, block.end);
        return null;
    }
  }

  private title(block: TitleBlock): void {
    if (block === this.titles.subtitle) {
      this.doc.skip('subtitle', block.start, block.end);
      return;
    }
    const depth = this.titles.depthOf.get(block) ?? null;
    if (depth === null) {
      this.doc.skip('malformed', block.start, block.end);
      return;
    }
    const heading = singleLine(writePieces(visibleText(block.text)).finish());
    this.doc.addHeading(heading, depth, block.start, block.end);
    if (depth === 1) this.doc.setTitle(heading);
  }

  private paragraph(block: ParagraphBlock, context: Context): number | null {
    const visible = visibleText(block.text);
    if (isLinkOnly(visible)) {
      this.doc.skip('linkList', block.start, block.end);
      return null;
    }
    const inline = writePieces(visible);
    if (context.topLevel && this.doc.atSectionStart && isMetadataRun(inline.lines())) {
      this.doc.skip('metadata', block.start, block.end);
      return null;
    }
    return this.addText(inline.finish(), block.start, block.end, context);
  }

  private addText(text: NormalizedText, start: number, end: number, context: Context): number | null {
    return this.doc.addParagraph({
      kind: context.kind,
      start,
      end,
      listDepth: context.kind === 'listItem' ? Math.max(0, context.listDepth) : 0,
      leadIn: context.leadIn,
      text,
    });
  }

  private leadInFor(previous: number | null): number | null {
    return previous !== null && this.doc.sectionOf(previous) === this.doc.currentSection ? previous : null;
  }

  private list(block: ListBlock, context: Context, previous: number | null): void {
    if (isLinkList(block)) {
      this.doc.skip('linkList', block.start, block.end);
      return;
    }
    const itemContext: Context = { kind: 'listItem', listDepth: context.listDepth + 1, leadIn: this.leadInFor(previous), topLevel: false };
    for (const item of block.items) this.walk(item, itemContext);
  }

  /** Terms are list items of their own and introduce their definitions. */
  private definitionList(block: DefinitionListBlock, context: Context, previous: number | null): void {
    const terms = block.items.map((item) => withoutClassifiers(visibleText(item.term)));
    if (context.topLevel && this.doc.atSectionStart && isFieldLike(block, terms)) {
      this.doc.skip('metadata', block.start, block.end);
      return;
    }
    const listDepth = context.listDepth + 1;
    const leadIn = this.leadInFor(previous);
    block.items.forEach((item, k) => {
      const termContext: Context = { kind: 'listItem', listDepth, leadIn, topLevel: false };
      const term = this.addText(writePieces(terms[k]!).finish(), item.termSpan.start, item.termSpan.end, termContext);
      this.walk(item.body, { ...termContext, leadIn: term ?? leadIn });
    });
  }

  private table(block: TableBlock): void {
    if (block.header !== null) this.doc.skip('table', block.header.start, block.header.end);
    if (block.cells.length === 0) this.doc.skip('table', block.start, block.end);
    const cellContext: Context = { kind: 'tableCell', listDepth: -1, leadIn: null, topLevel: false };
    for (const cell of block.cells) this.walk(cell, cellContext);
  }
}

/** Every item holds only link-only paragraphs (or lists of them). */
function isLinkList(list: ListBlock): boolean {
  let any = false;
  for (const item of list.items) {
    for (const block of item) {
      if (block.kind === 'paragraph' && isLinkOnly(visibleText(block.text))) any = true;
      else if (block.kind === 'list' && isLinkList(block)) any = true;
      else return false;
    }
  }
  return any;
}

/** A definition list of `Term: value` fields (e.g. assignees), each value one short line. */
function isFieldLike(block: DefinitionListBlock, terms: readonly VisibleText[]): boolean {
  const lines: string[] = [];
  for (const [k, item] of block.items.entries()) {
    const [only, ...rest] = item.body;
    if (only?.kind !== 'paragraph' || rest.length > 0 || only.text.region.length !== 1) return false;
    const term = writePieces(terms[k]!).finish().text;
    const value = writePieces(visibleText(only.text)).finish().text;
    lines.push(`${term}${term.endsWith(':') ? '' : ':'} ${value}`);
  }
  return isMetadataRun(lines);
}
