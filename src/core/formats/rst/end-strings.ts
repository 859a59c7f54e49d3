/**
 * Where inline markup end-strings are, found once per text.
 *
 * The specification's parser looks for the end-string of each start-string in the rest of the
 * text; done naively, a paragraph full of unmatched start-strings costs a scan of the rest of the
 * paragraph per start-string (quadratic). Whether an end-string is valid at a position depends
 * only on the characters around it, so every position is tested once and each search becomes a
 * table look-up: `find(kind, from)` gives the same first match as searching `text.slice(from)`.
 */
import { END_SUFFIX, SIMPLE_NAME } from './patterns';

export type EndKind = 'emphasis' | 'strong' | 'literal' | 'target' | 'substitution' | 'interpreted';

const END = END_SUFFIX;

/** Each end-string pattern (sticky: tested at one position) and the character it starts with. */
const PATTERNS: Readonly<Record<EndKind, { readonly first: string; readonly pattern: RegExp }>> = {
  emphasis: { first: '*', pattern: new RegExp(String.raw`(?<![\s\x00])(\*)${END}`, 'uy') },
  strong: { first: '*', pattern: new RegExp(String.raw`(?<![\s\x00])(\*\*)${END}`, 'uy') },
  literal: { first: '`', pattern: new RegExp(String.raw`(?<!\s)(\x60\x60)${END}`, 'uy') },
  target: { first: '`', pattern: new RegExp(String.raw`(?<![\s\x00])(\x60)${END}`, 'uy') },
  substitution: { first: '|', pattern: new RegExp(String.raw`(?<![\s\x00])(\|_{0,2})${END}`, 'uy') },
  interpreted: {
    first: '`',
    pattern: new RegExp(String.raw`(?<!(?<!\x00)[\s\x00])(\x60(?<suffix>(?<role>:${SIMPLE_NAME}:)?(?<refend>__?)?))${END}`, 'uy'),
  },
};

export class EndStrings {
  private readonly tables = new Map<EndKind, Int32Array>();

  constructor(private readonly text: string) {}

  /** The first end-string of this kind starting at or after `from` (match.index is absolute), or null. */
  find(kind: EndKind, from: number): RegExpExecArray | null {
    const at = this.table(kind)[from] ?? -1;
    if (at < 0) return null;
    const { pattern } = PATTERNS[kind];
    pattern.lastIndex = at;
    return pattern.exec(this.text);
  }

  /** For each position, the first valid end-string position at or after it (-1: none). */
  private table(kind: EndKind): Int32Array {
    let table = this.tables.get(kind);
    if (table !== undefined) return table;
    const { first, pattern } = PATTERNS[kind];
    table = new Int32Array(this.text.length + 1).fill(-1);
    let upcoming = -1;
    for (let q = this.text.length - 1; q >= 0; q--) {
      if (this.text[q] === first) {
        pattern.lastIndex = q;
        if (pattern.test(this.text)) upcoming = q;
      }
      table[q] = upcoming;
    }
    this.tables.set(kind, table);
    return table;
  }
}
