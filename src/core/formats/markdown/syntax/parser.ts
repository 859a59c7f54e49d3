/**
 * The markdown-it instance the reader parses with: CommonMark with raw HTML, GFM tables,
 * strikethrough (one or two tildes), footnotes (markdown-it-footnote) and front matter, plus the
 * position records of positions.ts. Task list items are recognized by the tree builder.
 */
import markdownIt, { type MarkdownIt, type Token } from 'markdown-it';
import footnote from 'markdown-it-footnote';
import { findFrontMatter, frontMatterRule, type FrontMatterEnv } from './front-matter-rule';
import { recordPositions, type PositionEnv } from './positions';
import { gfmStrikethrough } from './strikethrough';

/**
 * How deep containers and inline markup may nest. markdown-it's default (100) drops what lies
 * deeper, and a list nesting level costs two; the mdast reader has no limit. The parser recurses
 * once per level, so the limit stays far below what the call stack holds.
 */
const MAX_NESTING = 1000;

/** A parser configured as the reader needs it; `withPositions` false leaves markdown-it's loops (for tests). */
export function createParser(withPositions = true): MarkdownIt {
  const md = markdownIt('default', { html: true, linkify: false, typographer: false, maxNesting: MAX_NESTING });
  md.use(footnote);
  md.use(gfmStrikethrough);
  md.use(frontMatterRule);
  // GFM has no inline footnotes (`^[…]`).
  md.inline.ruler.disable('footnote_inline');
  md.core.ruler.disable([
    // Footnote definitions and link reference definitions stay where they are: they are skipped
    // blocks with a position.
    'footnote_tail',
    'strip_references',
    // Escapes and character references stay separate tokens, each with its own range.
    'text_join',
  ]);
  md.inline.ruler2.disable('fragments_join');
  if (withPositions) recordPositions(md);
  return md;
}

const parser = createParser();

export interface ParsedTokens {
  readonly tokens: Token[];
  /** Normalized start offset of each block token's block, and ends that differ from the last line's (positions.ts). */
  readonly blockStarts: number[];
  readonly blockEnds: number[];
}

/**
 * Link reference and footnote labels defined outside the text being parsed (the rest of the
 * document, when one piece of it is read again): references to them resolve as they would in the
 * whole document. Link labels as markdown-it normalizes them, footnote labels as written.
 */
export interface KnownLabels {
  readonly links: Iterable<string>;
  readonly footnotes: Iterable<string>;
}

/** Block tokens of `text` (without a byte order mark), inline tokens as their children. */
export function parseTokens(text: string, md: MarkdownIt = parser, known?: KnownLabels, frontMatter = true): ParsedTokens {
  const refs = caseInsensitiveLabels();
  const references: Record<string, { href: string; title: string }> = {};
  if (known !== undefined) {
    // A definition met while parsing sets nothing over these (the first definition wins), as in
    // the whole document, where they come first or their duplicates would not count.
    for (const label of known.links) references[label] = { href: '', title: '' };
    // markdown-it-footnote's own marker for "defined, not yet referenced".
    for (const label of known.footnotes) refs[`:${label}`] = -1;
  }
  const env: PositionEnv & FrontMatterEnv & FootnoteEnv & { references: typeof references } = {
    blockStarts: [],
    blockEnds: [],
    frontMatter: frontMatter ? findFrontMatter(text) : null,
    footnotes: { refs },
    references,
  };
  const tokens = md.parse(text, env as unknown as Record<string, unknown>);
  return { tokens, blockStarts: env.blockStarts, blockEnds: env.blockEnds };
}

/** markdown-it-footnote keeps its definitions here, keyed by `:` + label. */
interface FootnoteEnv {
  footnotes: { refs: Record<string, number> };
}

/**
 * Footnote labels match like link labels (case-insensitively, blanks collapsed), as the mdast
 * reader matches them; markdown-it-footnote compares them exactly, so its table of definitions
 * normalizes every key it is given.
 */
function caseInsensitiveLabels(): Record<string, number> {
  const normalize = (key: string | symbol) => (typeof key === 'string' ? key.replace(/\s+/g, ' ').toLowerCase().toUpperCase() : key);
  return new Proxy({} as Record<string, number>, {
    get: (target, key) => Reflect.get(target, normalize(key)),
    set: (target, key, value) => Reflect.set(target, normalize(key), value),
    has: (target, key) => Reflect.has(target, normalize(key)),
  });
}
