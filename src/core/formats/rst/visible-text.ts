/**
 * From the lines of a paragraph (or title, term, cell) to the shared normalized text: the lines
 * are joined with line breaks, inline markup is parsed, and each visible unit is written with the
 * source offset it came from. Escape backslashes (and escaped whitespace) disappear, except in
 * inline literals, where backslashes are text.
 */
import { InlineTextBuilder } from '../../parse/inline-text';
import type { TextLines } from './blocks';
import { escapeToPlaceholder, inlinePieces, type Piece } from './inline';
import { ESCAPE } from './patterns';

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const LETTER_OR_DIGIT = /[\p{L}\p{N}]/u;

export interface InlineSource {
  /** The lines joined by '\n', minus the closing cut. */
  readonly text: string;
  /** Source offset of each unit of `text`. */
  readonly offsets: Int32Array;
}

export function inlineSource(lines: TextLines): InlineSource {
  const { region } = lines;
  let text = '';
  const offsets: number[] = [];
  for (let k = 0; k < region.length; k++) {
    const line = region.text(k);
    if (k > 0) {
      text += '\n';
      offsets.push(region.endOffset(k - 1));
    }
    text += line;
    for (let c = 0; c < line.length; c++) offsets.push(region.offset(k, c));
  }
  const length = Math.max(0, text.length - lines.cut);
  return { text: text.slice(0, length), offsets: Int32Array.from(offsets.slice(0, length)) };
}

export interface VisibleText {
  readonly source: InlineSource;
  readonly pieces: readonly Piece[];
}

export function visibleText(lines: TextLines): VisibleText {
  const source = inlineSource(lines);
  return { source, pieces: inlinePieces(source.text) };
}

/** Writes the visible pieces into a builder (soft line breaks as breaks). */
export function writePieces(visible: VisibleText, out = new InlineTextBuilder()): InlineTextBuilder {
  const { text, offsets } = visible.source;
  const escaped = escapeToPlaceholder(text);
  for (const piece of visible.pieces) {
    if (piece.spaceBefore && piece.from < offsets.length) out.push(' ', offsets[piece.from]!, offsets[piece.from]! + 1);
    // An inline literal (``a.b``) is code: no sentence ends inside it.
    const code = piece.kind === 'literal';
    if (code) out.beginCode();
    for (let k = piece.from; k < piece.to; k++) {
      if (!piece.literal && escaped[k] === ESCAPE) {
        k++; // the backslash goes; the escaped unit stays, unless it is whitespace
        if (k >= piece.to || text[k] === ' ' || text[k] === '\n') continue;
      }
      const offset = offsets[k]!;
      if (text[k] === '\n') out.softBreak(offset);
      else out.push(text[k]!, offset, offset + 1);
    }
    if (code) out.endCode();
  }
  return out;
}

/** What a piece shows, as a string (escapes resolved) — for shape checks. */
export function pieceText(visible: VisibleText, piece: Piece): string {
  const builder = writePieces({ source: visible.source, pieces: [piece] });
  return builder.finish().text;
}

const STANDALONE_LINK = /\b[a-zA-Z][a-zA-Z0-9.+-]*:\/\/[^\s<>]+|\bmailto:[^\s<>]+|[\w.+-]+@[\w-]+(?:\.[\w-]+)+/g;

/** A paragraph made only of links (references, URLs) and separators, like a bare blueprint URL line. */
export function isLinkOnly(visible: VisibleText): boolean {
  let links = 0;
  for (const piece of visible.pieces) {
    if (piece.kind === 'reference') {
      links++;
      continue;
    }
    // Without a backslash a piece shows its source text but for blanks, which the test below does
    // not see, so only pieces with escapes are built (building every one cost about a tenth of a
    // digest of the 795 Nova specs).
    const source = visible.source.text.slice(piece.from, piece.to);
    const shown = piece.literal || !source.includes('\\') ? source : pieceText(visible, piece);
    const rest = shown.replace(STANDALONE_LINK, () => {
      links++;
      return ' ';
    });
    if (LETTER_OR_DIGIT.test(rest)) return false;
  }
  return links > 0;
}

/** A definition list term without its classifiers (`term : classifier`): the text before ` : `. */
export function withoutClassifiers(visible: VisibleText): VisibleText {
  const pieces: Piece[] = [];
  for (const piece of visible.pieces) {
    if (piece.kind === 'text') {
      const delimiter = / +: +/.exec(visible.source.text.slice(piece.from, piece.to));
      if (delimiter !== null) {
        if (delimiter.index > 0) pieces.push({ ...piece, to: piece.from + delimiter.index });
        break;
      }
    }
    pieces.push(piece);
  }
  return { source: visible.source, pieces };
}
