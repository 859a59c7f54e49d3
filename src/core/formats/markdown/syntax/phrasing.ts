/**
 * markdown-it inline tokens (with the ranges positions.ts records) → mdast phrasing content with
 * offsets, shaped as mdast-util-from-markdown shapes it: adjacent text, escapes, character
 * references and soft line breaks form one text node whose value has '\n' for each line break;
 * an autolink's text is its literal source.
 */
import type { Token } from 'markdown-it';
import type { Parent, PhrasingContent, Text } from 'mdast';
import type { Position } from 'unist';
import { alignValue } from '../source-align';
import { findAutolinkLiterals, type LiteralLink } from './autolink-literals';
import { endOffset, type ContentOffsets } from './inline-content';
import type { SourceLines } from './source-lines';

type PhrasingParent = Extract<PhrasingContent, Parent>;

interface OpenNode {
  readonly node: PhrasingParent;
  /** Content offset where the node starts (its opening token's start). */
  readonly start: number;
  /** An autolink: its text comes from the source, so its tokens' text is ignored. */
  readonly literal: boolean;
}

type Reference = 'collapsed' | 'full' | 'shortcut';

export interface InlineInput {
  /** markdown-it's inline content (the string the token ranges index). */
  readonly content: string;
  readonly tokens: readonly Token[];
  readonly offsets: ContentOffsets;
  readonly lines: SourceLines;
  /** Content units before this offset are left out (a task item's `[x] `). */
  readonly from?: number;
}

export function phrasingOf(input: InlineInput): PhrasingContent[] {
  return new PhrasingBuilder(input).build();
}

class PhrasingBuilder {
  private readonly root: PhrasingContent[] = [];
  private readonly open: OpenNode[] = [];
  /** Text tokens waiting to become one text node: value pieces and their content range. */
  private textValue = '';
  private textStart = -1;
  private textEnd = -1;
  /** Content offset where the last token read so far ends. */
  private lastEnd = 0;

  constructor(private readonly input: InlineInput) {}

  build(): PhrasingContent[] {
    const from = this.input.from ?? 0;
    for (const token of this.input.tokens) {
      const [start, end] = token.map ?? [0, 0];
      if (end <= from) continue;
      if (start < from && token.type !== 'text') continue; // markup cut through by the left-out units
      this.add(token, Math.max(start, from), end);
      this.lastEnd = end;
    }
    this.flushText();
    return this.root;
  }

  private add(token: Token, start: number, end: number): void {
    const literal = this.open.length > 0 && this.open[this.open.length - 1]!.literal;
    switch (token.type) {
      case 'text':
      case 'text_special':
        if (!literal) {
          const cut = start - token.map![0];
          const value = cut > 0 ? token.content.slice(cut) : token.content;
          if (value.length > 0) this.addText(value, start, end);
        }
        return;
      case 'softbreak':
        this.addText(this.lineEnding(start), start, end);
        return;
      case 'hardbreak':
        this.addHardBreak(start, end);
        return;
    }
    this.flushText();
    switch (token.type) {
      case 'em_open':
        this.openNode({ type: 'emphasis', children: [] }, start);
        return;
      case 'strong_open':
        this.openNode({ type: 'strong', children: [] }, start);
        return;
      case 's_open':
        this.openNode({ type: 'delete', children: [] }, start);
        return;
      case 'link_open':
        this.openLink(token, start, end);
        return;
      case 'em_close':
      case 'strong_close':
      case 's_close':
      case 'link_close':
        this.closeNode(end);
        return;
      case 'code_inline':
        this.append({ type: 'inlineCode', value: token.content, position: this.position(start, end) });
        return;
      case 'html_inline':
        this.append({ type: 'html', value: token.content, position: this.position(start, end) });
        return;
      case 'image':
        this.append(this.image(token, start, end));
        return;
      case 'footnote_ref': {
        const label = String(token.meta?.['label'] ?? '');
        this.append({ type: 'footnoteReference', identifier: label.toLowerCase(), label, position: this.position(start, end) });
        return;
      }
      default:
      // Tokens of rules this reader does not enable carry nothing to read.
    }
  }

  private addText(value: string, start: number, end: number): void {
    if (this.textStart < 0) this.textStart = start;
    this.textValue += value;
    this.textEnd = end;
  }

  /** A soft line break reads as the line ending it is in the source ('\n', '\r\n' or '\r'). */
  private lineEnding(start: number): string {
    const { text } = this.input.offsets;
    const at = this.input.offsets.offsets[start]!;
    if (text.charCodeAt(at) !== 0x0d) return '\n';
    return text.charCodeAt(at + 1) === 0x0a ? '\r\n' : '\r';
  }

  /** A hard break made of trailing blanks starts at the first blank; the text before ends there. */
  private addHardBreak(start: number, end: number): void {
    const { content } = this.input;
    let from = start;
    if (content[start] === '\n') {
      while (from > 0 && content[from - 1] === ' ') from--;
    }
    if (this.textStart >= 0 && this.textEnd > from) this.textEnd = Math.max(this.textStart, from);
    this.flushText();
    this.append({ type: 'break', position: this.position(from, end) });
  }

  private flushText(): void {
    if (this.textStart < 0) return;
    const text: Text = { type: 'text', value: this.textValue, position: this.position(this.textStart, this.textEnd) };
    this.textValue = '';
    this.textStart = -1;
    if (this.insideLink()) {
      this.append(text);
      return;
    }
    const links = findAutolinkLiterals(text.value, this.atLinkBoundary());
    if (links.length === 0) this.append(text);
    else for (const node of this.splitLinks(text, links)) this.append(node);
  }

  private insideLink(): boolean {
    return this.open.some(({ node }) => node.type === 'link' || node.type === 'linkReference');
  }

  /** Whether a literal link may start at the next text's first unit (GFM: at a line start or after `*`, `_`, `~`). */
  private atLinkBoundary(): boolean {
    const parent = this.open[this.open.length - 1]?.node;
    const siblings = parent === undefined ? this.root : parent.children;
    const previous = siblings[siblings.length - 1];
    return previous === undefined || previous.type === 'break' || previous.type === 'emphasis' || previous.type === 'strong' || previous.type === 'delete';
  }

  /** The text node cut into text and link nodes around its literal links, each with its source range. */
  private splitLinks(text: Text, links: readonly LiteralLink[]): PhrasingContent[] {
    const source = this.input.offsets.text;
    const { start, end } = text.position!;
    const { starts, ends } = alignValue(text.value, source, start.offset!, end.offset!);
    const piece = (from: number, to: number): Text => ({
      type: 'text',
      value: text.value.slice(from, to),
      position: { start: this.input.lines.point(starts[from]!), end: this.input.lines.point(ends[to - 1]!) },
    });
    const nodes: PhrasingContent[] = [];
    let at = 0;
    for (const link of links) {
      if (link.start > at) nodes.push(piece(at, link.start));
      const inner = piece(link.start, link.end);
      nodes.push({ type: 'link', url: link.url, children: [inner], position: inner.position });
      at = link.end;
    }
    if (at < text.value.length) nodes.push(piece(at, text.value.length));
    if (nodes[0]?.position) nodes[0].position.start = start;
    const last = nodes[nodes.length - 1];
    if (last?.position) last.position.end = end;
    return nodes;
  }

  private openLink(token: Token, start: number, end: number): void {
    const url = String(token.attrGet('href') ?? '');
    const label = token.meta?.['label'];
    if (token.markup === 'autolink') {
      // `<https://example.org>`: the text between the angle brackets, as written.
      const value = this.input.content.slice(start + 1, end - 1);
      const text: Text = { type: 'text', value, position: this.position(start + 1, end - 1) };
      this.openNode({ type: 'link', url, children: [text] }, start, true);
    } else if (typeof label === 'string') {
      // The reference type is known once the link text has been read (see closeNode).
      this.openNode({ type: 'linkReference', identifier: label.toLowerCase(), label, referenceType: 'full', children: [] }, start);
    } else {
      this.openNode({ type: 'link', url, children: [] }, start);
    }
  }

  private image(token: Token, start: number, end: number): PhrasingContent {
    const label = token.meta?.['label'];
    const position = this.position(start, end);
    const alt = token.content;
    if (typeof label === 'string') {
      // `![alt]…`: the alt text is the image's first bracket group.
      const referenceType = this.referenceType(start + 2 + alt.length, end);
      return { type: 'imageReference', identifier: label.toLowerCase(), label, referenceType, alt, position };
    }
    return { type: 'image', url: String(token.attrGet('src') ?? ''), alt, position };
  }

  /** `[text]` is a shortcut, `[text][]` collapsed, `[text][label]` full; `textEnd` is the `]` after the text. */
  private referenceType(textEnd: number, end: number): Reference {
    if (textEnd + 1 >= end) return 'shortcut';
    return end - textEnd === 3 ? 'collapsed' : 'full';
  }

  private openNode(node: PhrasingParent, start: number, literal = false): void {
    this.append(node);
    this.open.push({ node, start, literal });
  }

  private closeNode(end: number): void {
    const open = this.open.pop();
    if (open === undefined) return;
    open.node.position = this.position(open.start, end);
    if (open.node.type === 'linkReference') {
      // The link text is read up to its closing bracket.
      const textEnd = open.node.children.length > 0 ? this.lastEnd : open.start + 1;
      open.node.referenceType = this.referenceType(textEnd, end);
    }
  }

  private append(node: PhrasingContent): void {
    const parent = this.open[this.open.length - 1];
    if (parent === undefined) this.root.push(node);
    else parent.node.children.push(node as never);
  }

  private position(start: number, end: number): Position {
    const { offsets, lines } = this.input;
    const from = offsets.offsets[start] ?? endOffset(offsets, start);
    return { start: lines.point(from), end: lines.point(Math.max(from, endOffset(offsets, end))) };
  }
}
