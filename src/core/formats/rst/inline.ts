/**
 * Inline markup → the visible text, as pieces of the source.
 *
 * Follows the specification's inline markup recognition rules: a start-string must sit at the
 * start of the text or after whitespace, an opener or a delimiter, must be followed by
 * non-whitespace and must not be "quoted" by a matching pair of punctuation; an end-string must
 * follow non-whitespace and be followed by whitespace, a closer, a delimiter or the end. Inline
 * markup does not nest. Backslash escapes are handled as the reference parser does: each
 * backslash becomes a placeholder of the same length, so every index still names a source unit.
 *
 * The result is a list of pieces (index ranges of the paragraph text) in document order; markup
 * characters, URLs of embedded links and footnote references are simply not in any piece.
 */
import { EndStrings, type EndKind } from './end-strings';
import { DELIMITER, END_SUFFIX, ESCAPE, matchingPair, OPENERS, SIMPLE_NAME } from './patterns';
import { roleText } from './roles';

export type PieceKind = 'text' | 'emphasis' | 'strong' | 'literal' | 'interpreted' | 'reference' | 'target' | 'substitution' | 'problematic';

export interface Piece {
  /** Range of units of the paragraph text [from, to). */
  readonly from: number;
  readonly to: number;
  /** Literal pieces keep backslashes; other pieces drop escape backslashes (and escaped whitespace). */
  readonly literal: boolean;
  readonly kind: PieceKind;
  /** Write one space before the piece (e.g. between a role's name and its number: `:rfc:` 2822). */
  readonly spaceBefore?: boolean;
}

const START = String.raw`(?:^|(?<=\s|[${OPENERS}]|${DELIMITER}))`;
const END = END_SUFFIX;

const INITIAL = new RegExp(
  START +
    '(?:' +
    String.raw`(?<start>\*\*|\*(?!\*)|\x60\x60|_\x60|\|(?!\|))(?!\s)` +
    '|' +
    String.raw`(?<whole>(?<refname>${SIMPLE_NAME})(?<refend>__?)|\[(?<footnotelabel>[0-9]+|#(?:${SIMPLE_NAME})?|\*|(?<citationlabel>${SIMPLE_NAME}))(?<fnend>\]_))${END}` +
    '|' +
    String.raw`(?<role>(?::${SIMPLE_NAME}:)?)(?<backquote>\x60(?!\x60))(?!\s)` +
    ')',
  'u',
);

/** `text <target>` at the end of a phrase reference: the embedded URI or alias. */
const EMBEDDED_LINK = /(?:[ \n]+|^)<(?!\s)((?:[^<>]|\x00[<>])+)(?<![\s\x00])>$/;

/** Replaces each escaping backslash by the placeholder; the escaped unit is kept as it is. */
export function escapeToPlaceholder(text: string): string {
  let out = '';
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (c === '\\') {
      out += ESCAPE;
      if (i + 1 < text.length) out += text[++i];
    } else {
      // A NUL in the input would read as an escape; it is no markup, so it becomes a plain symbol.
      out += c === ESCAPE ? '\ufffd' : c;
    }
  }
  return out;
}

interface Step {
  /** Where the plain text before the construct ends (absolute index). */
  readonly before: number;
  /** Visible pieces of the construct; null when the start-string was not markup after all. */
  readonly pieces: readonly Piece[] | null;
  /** Where parsing resumes (absolute index). */
  readonly next: number;
  /** Drop the whitespace before the construct too (footnote references). */
  readonly trimBefore?: boolean;
}

/** The visible pieces of one paragraph (or title, term, cell) text. */
export function inlinePieces(text: string): Piece[] {
  const w = escapeToPlaceholder(text);
  const scan: Scan = { w, ends: new EndStrings(w) };
  const out: Piece[] = [];
  let textStart = 0;
  let pos = 0;
  while (pos < w.length) {
    const match = INITIAL.exec(w.slice(pos));
    if (match === null) break;
    const step = dispatch(scan, pos, match);
    if (step.pieces !== null) {
      let before = step.before;
      if (step.trimBefore) while (before > textStart && /\s/.test(w[before - 1]!)) before--;
      if (before > textStart) out.push({ from: textStart, to: before, literal: false, kind: 'text' });
      out.push(...step.pieces);
      textStart = step.next;
    }
    pos = step.next;
  }
  if (w.length > textStart) out.push({ from: textStart, to: w.length, literal: false, kind: 'text' });
  return out;
}

/** The text being scanned (escapes as placeholders) and its end-string table. */
interface Scan {
  readonly w: string;
  readonly ends: EndStrings;
}

function dispatch(scan: Scan, pos: number, match: RegExpExecArray): Step {
  const g = match.groups!;
  const at = pos + match.index;
  if (g.start !== undefined) {
    const start = g.start;
    if (start === '**') return inlineObject(scan, pos, match, 'strong', false);
    if (start === '*') return inlineObject(scan, pos, match, 'emphasis', false);
    if (start === '``') return inlineObject(scan, pos, match, 'literal', true);
    if (start === '_`') return inlineObject(scan, pos, match, 'target', false);
    return inlineObject(scan, pos, match, 'substitution', false);
  }
  if (g.backquote !== undefined) return interpreted(scan, pos, match);
  const end = at + match[0].length;
  if (g.fnend !== undefined) {
    // Footnote and citation references are dropped, with the space before them.
    return { before: at, pieces: [], next: end, trimBefore: true };
  }
  // `name_` / `name__`: the name is the visible text.
  return { before: at, pieces: [{ from: at, to: at + g.refname!.length, literal: false, kind: 'reference' }], next: end };
}

/** A start-string enclosed by a matching pair, like `'*'` or `(*)`, is not markup. */
function quotedStart(w: string, start: number, end: number, pos: number): boolean {
  if (start === pos) return false;
  if (end >= w.length) return true;
  return matchingPair(w[start - 1]!, w[end]!);
}

function inlineObject(scan: Scan, pos: number, match: RegExpExecArray, kind: PieceKind & EndKind, literal: boolean): Step {
  const start = pos + match.index;
  const afterStart = start + match.groups!.start!.length;
  if (quotedStart(scan.w, start, afterStart, pos)) return { before: afterStart, pieces: null, next: afterStart };
  // The first end-string counts; right after the start-string it leaves nothing inside, so no markup.
  const end = scan.ends.find(kind, afterStart);
  if (end !== null && end.index > afterStart) {
    const textEnd = end.index;
    return { before: start, pieces: [{ from: afterStart, to: textEnd, literal, kind }], next: textEnd + end[1]!.length };
  }
  return problematic(start, afterStart);
}

/** An unmatched start-string stays visible as it is. */
function problematic(start: number, end: number): Step {
  return { before: start, pieces: [{ from: start, to: end, literal: true, kind: 'problematic' }], next: end };
}

function interpreted(scan: Scan, pos: number, match: RegExpExecArray): Step {
  const { w } = scan;
  const roleStart = pos + match.index;
  const prefix = match.groups!.role ?? '';
  const quoteStart = roleStart + prefix.length;
  const contentStart = quoteStart + 1;
  let role = prefix.length > 0 ? prefix.slice(1, -1) : null;
  let roleAt = prefix.length > 0 ? roleStart + 1 : -1;
  if (role === null && quotedStart(w, quoteStart, contentStart, pos)) return { before: contentStart, pieces: null, next: contentStart };
  const end = scan.ends.find('interpreted', contentStart);
  if (end === null || end.index === contentStart) return problematic(quoteStart, contentStart);
  const contentEnd = end.index;
  const next = contentEnd + end[1]!.length;
  const suffixRole = end.groups!.role;
  if (suffixRole !== undefined) {
    if (role !== null) return problematic(roleStart, next);
    role = suffixRole.slice(1, -1);
    roleAt = contentEnd + 2;
  }
  if (end.groups!.refend !== undefined) {
    if (role !== null) return problematic(roleStart, next);
    return { before: quoteStart, pieces: [phraseReference(w, contentStart, contentEnd)], next };
  }
  return { before: roleStart, pieces: roleText(role ?? '', roleAt, w, contentStart, contentEnd), next };
}

/** `` `text <url>`_ ``: the text; `` `<url>`_ `` alone: the URL; `` `name`_ ``: the name. */
function phraseReference(w: string, from: number, to: number): Piece {
  const escaped = w.slice(from, to);
  const link = EMBEDDED_LINK.exec(escaped);
  if (link === null) return { from, to, literal: false, kind: 'reference' };
  if (link.index > 0) return { from, to: from + link.index, literal: false, kind: 'reference' };
  const inner = from + escaped.indexOf('<', link.index) + 1;
  return { from: inner, to: inner + link[1]!.length, literal: false, kind: 'reference' };
}
