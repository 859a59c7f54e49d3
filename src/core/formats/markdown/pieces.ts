/**
 * A Markdown document as pieces cut before top-level headings, each read on its own, so that after
 * an edit only the pieces it touched are read again (summary sessions, ../../session.ts).
 *
 * Why a piece can be read alone: a heading token at nesting level 0 means every block before its
 * line was closed there (an ATX or setext heading cannot be lazy paragraph text, and a heading line
 * inside a fence, an HTML block or a container would not be a level-0 heading). What comes after
 * it starts from a clean block state. Two things still reach across pieces, and both are checked:
 *  - the boundaries themselves: an edit can open a fence that swallows the next heading, turn the
 *    first line of a piece into plain text, or join a paragraph to a setext heading. A stretch read
 *    again is therefore read with the next piece's heading appended, and must show a level-0
 *    heading exactly where that piece starts (and, if it does not start the document, at its own
 *    start); otherwise the stretch grows by a piece and is read again.
 *  - link reference and footnote definitions, which are document-wide: a stretch is read with the
 *    labels the other pieces define, and when an edit changes the set of labels the caller reads
 *    the whole document again (pieceLabelsEqual).
 */
import type { FootnoteDefinition, Nodes, RootContent } from 'mdast';
import type { ParsedDocument } from '../../types';
import { nodeEnd, nodeStart, type InlineSource } from './markdown-inline';
import { readMarkdownBlocks, type MarkdownOptions } from './markdown-walker';
import { markdownTree, type KnownLabels } from './syntax/index';

export interface MarkdownPiece {
  /** Local offset (without baseOffset) of the piece in the text it was read from. */
  readonly readAt: number;
  readonly length: number;
  /** The piece read on its own; spans are as of `readAt` (shift them by start − readAt). */
  readonly doc: ParsedDocument;
  /** Units from the piece's start through the end of the line its opening heading ends on (0 without one). */
  readonly headingLength: number;
  /** Labels the piece defines: link references (normalized) and footnotes (as written). */
  readonly links: readonly string[];
  readonly footnotes: readonly string[];
}

export interface StretchRead {
  readonly pieces: MarkdownPiece[];
  /** False when the stretch does not start with a level-0 heading (and does not start the document). */
  readonly startHolds: boolean;
  /** False when the heading of the following piece is not a level-0 heading where it should start. */
  readonly endHolds: boolean;
}

/**
 * Reads `text[from, to)` as pieces. `nextHeadingEnd`: where the heading of the piece after `to`
 * ends (its line included), or null when `to` ends the document.
 */
export function readStretch(text: string, from: number, to: number, nextHeadingEnd: number | null, known: KnownLabels, options: MarkdownOptions): StretchRead {
  const raw = text.slice(from, nextHeadingEnd ?? to);
  const shift = from === 0 && raw.charCodeAt(0) === 0xfeff ? 1 : 0;
  const tree = markdownTree(shift === 0 ? raw : raw.slice(1), known, from === 0);
  const source: InlineSource = { text: raw, shift };
  const length = to - from;

  const segments: { start: number; headingLength: number; blocks: RootContent[] }[] = [];
  let endHolds = nextHeadingEnd === null;
  for (const node of tree.children) {
    const start = nodeStart(node, source) ?? 0;
    if (start >= length) {
      endHolds = node.type === 'heading' && lineStart(raw, start) === length;
      break;
    }
    if (node.type === 'heading') {
      const at = lineStart(raw, start);
      segments.push({ start: at, headingLength: lineEnd(raw, nodeEnd(node, source) ?? start) - at, blocks: [node] });
    } else {
      if (segments.length === 0) segments.push({ start: 0, headingLength: 0, blocks: [] });
      segments[segments.length - 1]!.blocks.push(node);
    }
  }
  const startHolds = from === 0 || (segments.length > 0 && segments[0]!.start === 0 && segments[0]!.headingLength > 0);
  if (from === 0 && (segments.length === 0 || segments[0]!.start > 0)) segments.unshift({ start: 0, headingLength: 0, blocks: [] });
  const pieces = segments.map((segment, i): MarkdownPiece => {
    const end = i + 1 < segments.length ? segments[i + 1]!.start : length;
    const labels = definitionsIn(segment.blocks);
    return {
      readAt: from + segment.start,
      length: end - segment.start,
      doc: readMarkdownBlocks(segment.blocks, source, { ...options, baseOffset: options.baseOffset + from }),
      headingLength: segment.headingLength,
      links: labels.links,
      footnotes: labels.footnotes,
    };
  });
  return { pieces, startHolds, endHolds };
}

/** The labels defined by every piece but those in `[skipFrom, skipTo)`. */
export function labelsOutside(pieces: readonly MarkdownPiece[], skipFrom: number, skipTo: number): KnownLabels {
  const links: string[] = [];
  const footnotes: string[] = [];
  pieces.forEach((piece, i) => {
    if (i >= skipFrom && i < skipTo) return;
    links.push(...piece.links);
    footnotes.push(...piece.footnotes);
  });
  return { links, footnotes };
}

/** True when both lists of pieces define the same labels (as sets). */
export function pieceLabelsEqual(a: readonly MarkdownPiece[], b: readonly MarkdownPiece[]): boolean {
  const all = (pieces: readonly MarkdownPiece[], key: 'links' | 'footnotes') => new Set(pieces.flatMap((p) => p[key].map(normalizeFootnote)));
  return sameSet(all(a, 'links'), all(b, 'links')) && sameSet(all(a, 'footnotes'), all(b, 'footnotes'));
}

/** Footnote labels match case-insensitively with blanks collapsed (syntax/parser.ts). */
const normalizeFootnote = (label: string) => label.replace(/\s+/g, ' ').toUpperCase();

function sameSet(a: ReadonlySet<string>, b: ReadonlySet<string>): boolean {
  if (a.size !== b.size) return false;
  for (const x of a) if (!b.has(x)) return false;
  return true;
}

function definitionsIn(blocks: readonly Nodes[]): { links: string[]; footnotes: string[] } {
  const links: string[] = [];
  const footnotes: string[] = [];
  const visit = (node: Nodes) => {
    if (node.type === 'definition') links.push(node.label ?? node.identifier);
    else if (node.type === 'footnoteDefinition') footnotes.push((node as FootnoteDefinition).label ?? node.identifier);
    if ('children' in node) for (const child of node.children as Nodes[]) visit(child);
  };
  blocks.forEach(visit);
  return { links, footnotes };
}

/** Start of the line holding `at`; CR, LF and CRLF all end lines (CommonMark 2.1). */
function lineStart(text: string, at: number): number {
  return Math.max(text.lastIndexOf('\n', at - 1), text.lastIndexOf('\r', at - 1)) + 1;
}

/** Just after the line ending of the line holding `at` (or the text's end). */
function lineEnd(text: string, at: number): number {
  for (let p = at; p < text.length; p++) {
    const c = text.charCodeAt(p);
    if (c === 0x0a) return p + 1;
    if (c === 0x0d) return text.charCodeAt(p + 1) === 0x0a ? p + 2 : p + 1;
  }
  return text.length;
}
