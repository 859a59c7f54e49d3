/**
 * Front matter: a YAML (`---`) or TOML (`+++`) block at the very start of the document, read the
 * way the mdast reader's micromark-extension-frontmatter reads it: the opening fence is the first
 * line (three fence characters, then only spaces or tabs), the closing fence is the first later
 * line that is the same three characters plus spaces or tabs, and without a closing fence there is
 * no front matter at all. Found before parsing; a block rule then hands markdown-it's tokenizer the
 * lines it covers.
 */
import type { MarkdownIt, StateBlock } from 'markdown-it';

export type FrontMatterKind = 'yaml' | 'toml';

export interface FrontMatter {
  readonly kind: FrontMatterKind;
  /** The text between the fences (without the line ending before the closing fence). */
  readonly value: string;
  /** Lines it covers, fences included (the closing fence is line `lineCount - 1`). */
  readonly lineCount: number;
}

/** What the front matter rule reads from the parse environment. */
export interface FrontMatterEnv {
  frontMatter: FrontMatter | null;
}

const FENCES: ReadonlyMap<string, FrontMatterKind> = new Map([
  ['---', 'yaml'],
  ['+++', 'toml'],
]);

const FENCE_LINE = /^(---|\+\+\+)[ \t]*$/;

export function findFrontMatter(text: string): FrontMatter | null {
  const fence = text.slice(0, 3);
  const kind = FENCES.get(fence);
  if (kind === undefined) return null;
  let lineStart = 0;
  let valueStart = -1;
  for (let line = 0; lineStart <= text.length; line++) {
    const { end, next } = lineEnd(text, lineStart);
    const match = FENCE_LINE.exec(text.slice(lineStart, end));
    if (line === 0) {
      // The opening fence must be followed by a line ending.
      if (match === null || next === end) return null;
      valueStart = next;
    } else if (match !== null && match[1] === fence) {
      return { kind, value: text.slice(valueStart, Math.max(valueStart, lineStart - lineEndingBefore(text, lineStart))), lineCount: line + 1 };
    }
    if (next === end) return null;
    lineStart = next;
  }
  return null;
}

/** The end of the line starting at `start` (before its line ending) and where the next line starts. */
function lineEnd(text: string, start: number): { end: number; next: number } {
  for (let p = start; p < text.length; p++) {
    const code = text.charCodeAt(p);
    if (code === 0x0a) return { end: p, next: p + 1 };
    if (code === 0x0d) return { end: p, next: text.charCodeAt(p + 1) === 0x0a ? p + 2 : p + 1 };
  }
  return { end: text.length, next: text.length };
}

function lineEndingBefore(text: string, lineStart: number): number {
  if (text.charCodeAt(lineStart - 1) !== 0x0a) return 1; // a lone CR
  return text.charCodeAt(lineStart - 2) === 0x0d ? 2 : 1;
}

/** A block rule that turns the front matter found before parsing into one `front_matter` token. */
export function frontMatterRule(md: MarkdownIt): void {
  md.block.ruler.before('table', 'front_matter', (state: StateBlock, startLine: number, _endLine: number, silent: boolean) => {
    const frontMatter = (state.env as unknown as FrontMatterEnv).frontMatter;
    // Only the document's first block: line 0 with nothing opened before it.
    if (frontMatter === null || startLine !== 0 || state.tokens.length > 0 || silent) return false;
    const token = state.push('front_matter', '', 0);
    token.info = frontMatter.kind;
    token.content = frontMatter.value;
    token.map = [0, frontMatter.lineCount];
    state.line = frontMatter.lineCount;
    return true;
  });
}
