/**
 * GFM strikethrough for markdown-it: a matching pair of one or two tildes (GFM spec 0.29,
 * Strikethrough (extension), example 491: `~~Hi~~ Hello, ~there~ world!`). markdown-it's own rule
 * reads only pairs of two and splits longer runs into pairs; GFM reads a run of three or more
 * tildes as plain text, and pairs a run only with one of the same length.
 */
import type { MarkdownIt, StateInline } from 'markdown-it';

const TILDE = 0x7e;
/**
 * Delimiter markers: markdown-it's `balance_pairs` pairs only delimiters with the same marker, so
 * runs of one and of two tildes get different ones (neither is a character code it knows).
 */
const ONE_TILDE = -1;
const TWO_TILDES = -2;

export function gfmStrikethrough(md: MarkdownIt): void {
  md.inline.ruler.at('strikethrough', tokenizeTildes);
  md.inline.ruler2.at('strikethrough', pairTildes);
}

function tokenizeTildes(state: StateInline, silent: boolean): boolean {
  if (silent) return false;
  const start = state.pos;
  if (state.src.charCodeAt(start) !== TILDE) return false;
  const scanned = state.scanDelims(start, true);
  const run = state.src.slice(start, start + scanned.length);
  state.pos += scanned.length;
  if (scanned.length > 2) {
    state.pending += run;
    return true;
  }
  const token = state.push('text', '', 0);
  token.content = run;
  state.delimiters.push({
    marker: scanned.length === 1 ? ONE_TILDE : TWO_TILDES,
    // Length 0 keeps the emphasis "multiple of 3" rule out of tilde pairing.
    length: 0,
    token: state.tokens.length - 1,
    end: -1,
    open: scanned.can_open,
    close: scanned.can_close,
  });
  return true;
}

function pairTildes(state: StateInline): void {
  convertPairs(state, state.delimiters);
  for (const meta of state.tokens_meta) {
    if (meta?.delimiters) convertPairs(state, meta.delimiters);
  }
}

function convertPairs(state: StateInline, delimiters: readonly { marker: number; token: number; end: number }[]): void {
  for (const opener of delimiters) {
    if ((opener.marker !== ONE_TILDE && opener.marker !== TWO_TILDES) || opener.end === -1) continue;
    const open = state.tokens[opener.token]!;
    const close = state.tokens[delimiters[opener.end]!.token]!;
    const markup = open.content;
    Object.assign(open, { type: 's_open', tag: 's', nesting: 1, markup, content: '' });
    Object.assign(close, { type: 's_close', tag: 's', nesting: -1, markup, content: '' });
  }
}
