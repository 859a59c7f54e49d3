/**
 * The Markdown syntax tree, parsed in pieces when the document is long.
 *
 * micromark's cost grows faster than the document (it rebuilds its event list at the end of every
 * list and block quote), so a 1 MB file parsed whole takes several times longer than its parts
 * parsed one by one. A line that opens an ATX heading at column 0, outside fenced code and
 * multi-line HTML, always starts a new top-level block in CommonMark, so cutting there gives the
 * same blocks. Link reference definitions are the one thing that crosses the cut: every piece is
 * parsed with the document's definition lines appended, and whatever those produce is dropped.
 * A piece whose last block runs past its end is joined to the next piece and parsed again.
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
  // A blank line between definitions: a line that only looks like one would otherwise swallow the rest as a paragraph.
  const appendix = definitions.length > 0 ? '\n\n' + definitions.join('\n\n') + '\n' : '';
  const children: RootContent[] = [];
  const bounds = [0, ...cuts, text.length];
  let k = 0;
  while (k + 1 < bounds.length) {
    const start = bounds[k]!;
    // A block that runs past its piece's end (an unclosed fence, say) joins the piece to the next one.
    let next = k + 1;
    let kept: RootContent[] | null = null;
    while (kept === null) {
      const piece = text.slice(start, bounds[next]!);
      kept = pieceBlocks(piece, appendix);
      if (kept !== null) break;
      // The document's last block ran into the appended definitions: it is open to the end anyway.
      if (next === bounds.length - 1) kept = parseWhole(piece).children;
      else next++;
    }
    for (const node of kept) {
      shiftPositions(node, start, new Set());
      children.push(node);
    }
    k = next;
  }
  return { type: 'root', children, position: { start: { line: 1, column: 1, offset: 0 }, end: { line: 1, column: 1, offset: text.length } } };
}

/** The blocks of one piece, or null when one of them runs past the piece's end. */
function pieceBlocks(piece: string, appendix: string): RootContent[] | null {
  const tree = parseWhole(piece + appendix);
  const kept: RootContent[] = [];
  for (const node of tree.children) {
    const nodeStart = node.position?.start.offset ?? 0;
    const nodeEnd = node.position?.end.offset ?? 0;
    if (nodeStart >= piece.length) continue; // produced by the appended definitions
    if (nodeEnd > piece.length) return null;
    kept.push(node);
  }
  return kept;
}

/** Offsets where pieces may start, and the definition lines every piece needs. */
function scanLines(text: string, pieceLength: number): { cuts: number[]; definitions: string[] } {
  const cuts: number[] = [];
  const definitions: string[] = [];
  let fenceEnd: RegExp | null = null;
  let htmlEnd: RegExp | null = null;
  let lastCut = 0;
  let lineStart = 0;
  while (lineStart < text.length) {
    let lineEnd = text.indexOf('\n', lineStart);
    if (lineEnd < 0) lineEnd = text.length;
    const line = text.slice(lineStart, lineEnd).replace(/\r$/, '');
    if (fenceEnd !== null) {
      if (fenceEnd.test(line)) fenceEnd = null;
    } else if (htmlEnd !== null) {
      if (htmlEnd.test(line)) htmlEnd = null;
    } else {
      const open = /^\s*(`{3,}|~{3,})/.exec(line);
      if (open) {
        // Inside a list item the closing fence is indented like the item's content, so any indent counts.
        const fence = open[1]!;
        fenceEnd = new RegExp(`^\\s*${fence[0] === '`' ? '`' : '~'}{${fence.length},}\\s*$`);
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
