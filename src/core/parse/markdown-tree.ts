/**
 * The Markdown syntax tree, parsed in pieces when the document is long.
 *
 * micromark's cost grows faster than the document (it rebuilds its event list at the end of every
 * list and block quote), so a 1 MB file parsed whole takes several times longer than its parts
 * parsed one by one. A line that opens an ATX heading at column 0, outside fenced code and
 * multi-line HTML, always starts a new top-level block in CommonMark, so cutting there gives the
 * same blocks. Link reference definitions are the one thing that crosses the cut: every piece is
 * parsed with the document's definition lines appended, and whatever those produce is dropped.
 * If any block of a piece runs past its end, the document is parsed whole instead.
 */
import type { Root, RootContent } from 'mdast';
import { fromMarkdown } from 'mdast-util-from-markdown';
import { frontmatterFromMarkdown } from 'mdast-util-frontmatter';
import { gfmFromMarkdown } from 'mdast-util-gfm';
import { frontmatter } from 'micromark-extension-frontmatter';
import { gfm } from 'micromark-extension-gfm';
import { restoreMissingPositions } from './restore-positions';

const FRONT_MATTER_KINDS = ['yaml', 'toml'] as const;

/** Documents shorter than this are parsed whole; pieces aim to be about this long. */
export const PIECE_LENGTH = 64_000;

function parseWhole(text: string): Root {
  const tree = fromMarkdown(text, {
    extensions: [gfm(), frontmatter([...FRONT_MATTER_KINDS])],
    mdastExtensions: [gfmFromMarkdown(), frontmatterFromMarkdown([...FRONT_MATTER_KINDS])],
  });
  restoreMissingPositions(tree, text);
  return tree;
}

export function parseMarkdownTree(text: string, pieceLength = PIECE_LENGTH): Root {
  if (text.length <= pieceLength) return parseWhole(text);
  const { cuts, definitions } = scanLines(text, pieceLength);
  if (cuts.length === 0) return parseWhole(text);
  const appendix = definitions.length > 0 ? '\n\n' + definitions.join('\n') + '\n' : '';
  const children: RootContent[] = [];
  const bounds = [0, ...cuts, text.length];
  for (let k = 0; k + 1 < bounds.length; k++) {
    const start = bounds[k]!;
    const piece = text.slice(start, bounds[k + 1]!);
    const tree = parseWhole(piece + appendix);
    for (const node of tree.children) {
      const nodeStart = node.position?.start.offset ?? 0;
      const nodeEnd = node.position?.end.offset ?? 0;
      if (nodeStart >= piece.length) continue; // produced by the appended definitions
      if (nodeEnd > piece.length) return parseWhole(text); // a block crossed the cut: be exact instead
      shiftPositions(node, start, new Set());
      children.push(node);
    }
  }
  return { type: 'root', children, position: { start: { line: 1, column: 1, offset: 0 }, end: { line: 1, column: 1, offset: text.length } } };
}

/** Offsets where pieces may start, and the definition lines every piece needs. */
function scanLines(text: string, pieceLength: number): { cuts: number[]; definitions: string[] } {
  const cuts: number[] = [];
  const definitions: string[] = [];
  let fence: string | null = null;
  let htmlEnd: RegExp | null = null;
  let lastCut = 0;
  let lineStart = 0;
  while (lineStart < text.length) {
    let lineEnd = text.indexOf('\n', lineStart);
    if (lineEnd < 0) lineEnd = text.length;
    const line = text.slice(lineStart, lineEnd).replace(/\r$/, '');
    if (fence !== null) {
      if (new RegExp(`^ {0,3}${fence[0] === '`' ? '`' : '~'}{${fence.length},}\\s*$`).test(line)) fence = null;
    } else if (htmlEnd !== null) {
      if (htmlEnd.test(line)) htmlEnd = null;
    } else {
      const open = /^ {0,3}(`{3,}|~{3,})/.exec(line);
      if (open) {
        fence = open[1]!;
      } else if (/^ {0,3}<!--/.test(line) && !/-->/.test(line.slice(line.indexOf('<!--') + 4))) {
        htmlEnd = /-->/;
      } else if (/^ {0,3}<(pre|script|style|textarea)\b/i.test(line) && !/<\/(pre|script|style|textarea)>/i.test(line)) {
        htmlEnd = /<\/(pre|script|style|textarea)>/i;
      } else if (/^ {0,3}\[[^\]\n]+\]:\s*\S/.test(line)) {
        definitions.push(line);
      } else if (/^#{1,6}(\s|$)/.test(line) && lineStart - lastCut >= pieceLength) {
        cuts.push(lineStart);
        lastCut = lineStart;
      }
    }
    lineStart = lineEnd + 1;
  }
  return { cuts, definitions };
}

/** Moves every position in a subtree by `delta` (points are shifted once even if shared). */
function shiftPositions(node: { position?: { start: { offset?: number }; end: { offset?: number } }; children?: unknown[] }, delta: number, seen: Set<object>): void {
  const position = node.position;
  if (position) {
    for (const point of [position.start, position.end]) {
      if (seen.has(point) || point.offset === undefined) continue;
      seen.add(point);
      point.offset += delta;
    }
  }
  if (Array.isArray(node.children)) {
    for (const child of node.children) shiftPositions(child as typeof node, delta, seen);
  }
}
