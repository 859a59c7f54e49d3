/**
 * markdown-it block tokens → an mdast tree with offsets, shaped as mdast-util-from-markdown (with
 * GFM and front matter) shapes it, so the shared walker reads either reader's tree.
 *
 * Positions follow the mdast reader: a block starts at its first character inside its containers
 * and ends at the end of its last line (trailing blanks included, line ending excluded); a
 * container ends where its last child ends; an unclosed fence or HTML block that runs to the end
 * of the document ends there.
 */
import type { Token } from 'markdown-it';
import type { Code, FootnoteDefinition, Heading, List, ListItem, Nodes, Paragraph, Parent, Root, RootContent, Table, TableCell, TableRow } from 'mdast';
import type { Position } from 'unist';
import type { FrontMatterKind } from './front-matter-rule';
import { alignedContent, linesContent, rowCells, sliceContent, type ContentOffsets } from './inline-content';
import { phrasingOf } from './phrasing';
import type { SourceLines } from './source-lines';

/** A task list item's check: `[ ]`, `[x]` or `[X]` (a tab also counts as the blank), then whitespace. */
const TASK_CHECK = /^\[([ \txX])\][ \t\n]/;
/** The check's length: the paragraph's phrasing starts after it. */
const TASK_CHECK_LENGTH = 3;

interface OpenContainer {
  readonly node: Parent & Nodes;
  readonly token: number;
}

export interface TreeInput {
  readonly tokens: readonly Token[];
  /** Normalized start offset per token, and ends that differ from the last line's (positions.ts). */
  readonly blockStarts: readonly number[];
  readonly blockEnds: readonly number[];
  readonly lines: SourceLines;
}

export function buildTree(input: TreeInput): Root {
  return new TreeBuilder(input).build();
}

class TreeBuilder {
  private readonly root: Root = { type: 'root', children: [] };
  private readonly open: OpenContainer[] = [];
  private readonly text: string;

  constructor(private readonly input: TreeInput) {
    this.text = input.lines.text;
  }

  build(): Root {
    const { tokens } = this.input;
    for (let k = 0; k < tokens.length; k++) k = this.read(k);
    this.root.position = { start: this.input.lines.point(0, 0), end: this.input.lines.point(this.text.length) };
    return this.root;
  }

  /** Reads the block at token `k`; returns the index of its last token. */
  private read(k: number): number {
    const token = this.input.tokens[k]!;
    switch (token.type) {
      case 'paragraph_open':
        this.append(this.paragraph(k), k);
        return k + 2;
      case 'heading_open':
        this.append(this.heading(k), k);
        return k + 2;
      case 'bullet_list_open':
        this.openContainer({ type: 'list', ordered: false, start: null, spread: false, children: [] } satisfies List, k);
        return k;
      case 'ordered_list_open':
        this.openContainer({ type: 'list', ordered: true, start: Number(token.attrGet('start') ?? 1), spread: false, children: [] } satisfies List, k);
        return k;
      case 'list_item_open':
        this.openContainer({ type: 'listItem', checked: null, spread: false, children: [] } satisfies ListItem, k);
        return k;
      case 'blockquote_open':
        this.openContainer({ type: 'blockquote', children: [] }, k);
        return k;
      case 'footnote_reference_open': {
        const label = String(token.meta?.['label'] ?? '');
        this.openContainer({ type: 'footnoteDefinition', identifier: label.toLowerCase(), label, children: [] } satisfies FootnoteDefinition, k);
        return k;
      }
      case 'bullet_list_close':
      case 'ordered_list_close':
      case 'list_item_close':
      case 'blockquote_close':
      case 'footnote_reference_close':
        this.closeContainer();
        return k;
      case 'table_open':
        return this.table(k);
      case 'fence':
      case 'code_block':
        this.append(this.code(token), k, this.codeEnd(token, k));
        return k;
      case 'html_block':
        this.append({ type: 'html', value: token.content.replace(/\n$/, '') }, k, this.htmlEnd(token));
        return k;
      case 'hr':
        this.append({ type: 'thematicBreak' }, k);
        return k;
      case 'reference_definition': {
        const label = String(token.meta?.['label'] ?? '');
        this.append({ type: 'definition', identifier: label.toLowerCase(), label, url: '' }, k);
        return k;
      }
      case 'front_matter':
        this.append({ type: token.info as FrontMatterKind, value: token.content } as RootContent, k);
        return k;
      default:
        // Tokens of rules this reader does not enable (none are expected) carry no block.
        return k;
    }
  }

  private paragraph(k: number): Paragraph {
    const inline = this.input.tokens[k + 1]!;
    const offsets = linesContent(inline.content, this.input.lines, inline.map![0]);
    const parent = this.open[this.open.length - 1]?.node;
    // A task item's check opens its first paragraph (GFM spec 0.29, Task list items (extension)).
    const check = parent?.type === 'listItem' && parent.children.length === 0 ? TASK_CHECK.exec(inline.content) : null;
    const from = check === null ? 0 : TASK_CHECK_LENGTH;
    const children = phrasingOf({ content: inline.content, tokens: inline.children ?? [], offsets, lines: this.input.lines, from });
    const paragraph: Paragraph = { type: 'paragraph', children };
    if (check !== null && parent?.type === 'listItem') {
      parent.checked = check[1] === 'x' || check[1] === 'X';
      this.dropBlankAfterCheck(paragraph, inline.map![1] - 1);
    }
    return paragraph;
  }

  /**
   * Like the mdast reader: the blank after the check goes with it when text follows; the paragraph
   * then starts after it. (A hard break right after the check stays, and the paragraph keeps its start.)
   */
  private dropBlankAfterCheck(paragraph: Paragraph, lastLine: number): void {
    const head = paragraph.children[0];
    if (head?.type !== 'text') return;
    head.value = head.value.slice(1);
    const start = head.position!.start.offset! + 1;
    head.position = this.span(start, head.position!.end.offset!);
    if (head.value.length === 0) paragraph.children.shift();
    paragraph.position = this.span(start, this.lineEnd(lastLine));
  }

  private heading(k: number): Heading {
    const open = this.input.tokens[k]!;
    const inline = this.input.tokens[k + 1]!;
    const line = open.map![0];
    let offsets: ContentOffsets;
    if (open.markup.startsWith('#')) {
      // ATX: the text is a slice of the line, after the opening sequence and its blanks.
      const from = this.blockStart(k) + open.markup.length;
      const start = this.text.indexOf(inline.content, from);
      offsets =
        start >= 0 && start + inline.content.length <= this.lineEnd(line)
          ? sliceContent(inline.content, this.text, start)
          : alignedContent(inline.content, this.text, from, this.lineEnd(line));
    } else {
      offsets = linesContent(inline.content, this.input.lines, line);
    }
    const children = phrasingOf({ content: inline.content, tokens: inline.children ?? [], offsets, lines: this.input.lines });
    return { type: 'heading', depth: Number(open.tag.slice(1)) as Heading['depth'], children };
  }

  private code(token: Token): Code {
    return token.type === 'fence'
      ? { type: 'code', lang: token.info.trim().split(/\s/)[0] || null, meta: null, value: token.content.replace(/\n$/, '') }
      : { type: 'code', lang: null, meta: null, value: token.content.replace(/\n$/, '') };
  }

  /** A fence without its closing line that runs to the end of the document ends there. */
  private codeEnd(token: Token, k: number): number | undefined {
    const end = this.input.blockEnds[k];
    if (end !== undefined) return this.input.lines.fromNormalized(end, this.input.lines.lineOfNormalized(end));
    if (token.type !== 'fence') return undefined;
    const [first, last] = token.map!;
    const contentLines = token.content.split('\n').length - 1;
    const closed = last - first - 1 > contentLines;
    return closed ? undefined : this.openBlockEnd(first, last);
  }

  /** HTML that waits for an end marker (`-->`, `</pre>` …) and never finds it runs to the end. */
  private htmlEnd(token: Token): number | undefined {
    const [first, last] = token.map!;
    return this.openBlockEnd(first, last);
  }

  /** The end of a block on lines `[first, last)` that may have run on to the end of the document. */
  private openBlockEnd(first: number, last: number): number | undefined {
    if (last < this.input.lines.count) return this.lastNonBlankEnd(first, last);
    return this.lastNonBlankEnd(first, last) === this.lineEnd(last - 1) ? undefined : this.text.length;
  }

  private lastNonBlankEnd(first: number, last: number): number {
    const { starts, ends } = this.input.lines;
    for (let line = last - 1; line > first; line--) {
      if (/\S/.test(this.text.slice(starts[line]!, ends[line]!))) return ends[line]!;
    }
    return ends[first]!;
  }

  /** A table: rows of cells, each cell's phrasing mapped through the row's source line. */
  private table(k: number): number {
    const { tokens } = this.input;
    const table: Table = { type: 'table', align: [], children: [] };
    let row: TableRow | null = null;
    let cellContents: Token[] = [];
    let rowToken = k;
    let j = k + 1;
    for (; j < tokens.length && tokens[j]!.type !== 'table_close'; j++) {
      const token = tokens[j]!;
      if (token.type === 'tr_open') {
        row = { type: 'tableRow', children: [] };
        cellContents = [];
        rowToken = j;
      } else if (token.type === 'inline') {
        cellContents.push(token);
      } else if (token.type === 'tr_close' && row !== null) {
        this.fillRow(row, rowToken, cellContents);
        table.children.push(row);
      }
    }
    this.append(table, k);
    return j;
  }

  private fillRow(row: TableRow, rowToken: number, inlines: readonly Token[]): void {
    const line = this.input.tokens[rowToken]!.map![0];
    const rowStart = this.blockStart(rowToken);
    const rowEnd = this.lineEnd(line);
    const cells = rowCells(this.text, rowStart, rowEnd, inlines.map((inline) => inline.content));
    cells.forEach((cell, i) => {
      const inline = inlines[i]!;
      const children = phrasingOf({ content: inline.content, tokens: inline.children ?? [], offsets: cell.content, lines: this.input.lines });
      const node: TableCell = { type: 'tableCell', children, position: this.span(cell.start, cell.end) };
      row.children.push(node);
    });
    row.position = this.span(rowStart, rowEnd);
  }

  private openContainer(node: Parent & Nodes, k: number): void {
    this.append(node as RootContent, k, -1);
    this.open.push({ node, token: k });
  }

  private closeContainer(): void {
    const open = this.open.pop();
    if (open === undefined) return;
    const last = open.node.children[open.node.children.length - 1];
    const start = open.node.position!.start.offset!;
    // An empty container (`-`, `>`) ends with its line.
    const end = last?.position?.end.offset ?? this.lineEnd(this.input.tokens[open.token]!.map?.[0] ?? this.input.lines.lineOf(start));
    open.node.position = this.span(start, end);
  }

  /**
   * Adds a block under the innermost open container. It starts where positions.ts says and, unless
   * `end` is given, ends with its last line; -1 leaves the end for closeContainer.
   */
  private append(node: RootContent, k: number, end?: number): void {
    const token = this.input.tokens[k]!;
    if (node.position === undefined) {
      const start = this.blockStart(k);
      const blockEnd = end === -1 ? start : (end ?? this.lineEnd(token.map![1] - 1));
      node.position = this.span(start, blockEnd);
    }
    const parent = this.open[this.open.length - 1]?.node ?? this.root;
    (parent.children as RootContent[]).push(node);
  }

  /** Original offset where token `k`'s block starts. */
  private blockStart(k: number): number {
    const normalized = this.input.blockStarts[k] ?? 0;
    const line = this.input.tokens[k]!.map?.[0] ?? this.input.lines.lineOfNormalized(normalized);
    return this.input.lines.fromNormalized(normalized, line);
  }

  private lineEnd(line: number): number {
    return this.input.lines.ends[Math.max(0, Math.min(line, this.input.lines.count - 1))] ?? this.text.length;
  }

  private span(start: number, end: number): Position {
    const { lines } = this.input;
    return { start: lines.point(start), end: lines.point(Math.max(start, end)) };
  }
}
