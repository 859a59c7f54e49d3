/**
 * Source positions for markdown-it tokens.
 *
 * markdown-it gives block tokens line ranges (`map`) and inline tokens nothing, while this reader
 * needs offsets. So the two tokenizer loops are replaced by copies of markdown-it 15's own
 * (`ParserBlock.tokenize`, `ParserInline.tokenize`) that note where each rule started and ended:
 *
 * - Block: right after a rule returns, each token it pushed gets the offset where its first line's
 *   content starts inside the enclosing containers (`bMarks + tShift`, read while the containers'
 *   markers are still stripped): the '#' of a heading, the '>' of a quote, a list item's marker.
 *   Offsets index markdown-it's normalized source (CRLF read as LF); the tree builder maps them back.
 * - Inline: each token gets `[start, end)` in its inline content, stored in its `map` (markdown-it
 *   never sets `map` on inline tokens). Text collected in `pending` gets the range from where the
 *   pending text began to where it was flushed.
 *
 * The loops are otherwise markdown-it's, so the token stream is the same (a test pins this).
 */
import type { MarkdownIt, ParserBlock, ParserInline, StateBlock, StateInline, Token } from 'markdown-it';

/** What the position-recording block loop writes into the parse environment. */
export interface PositionEnv {
  /** Per block token index: normalized offset where the token's block starts. */
  blockStarts: number[];
  /**
   * Per block token index, where its block does not end with its last line: indented code
   * followed by blank lines indented four columns or more ends with the last of those (their
   * indentation belongs to the code in the mdast reader). Normalized offsets.
   */
  blockEnds: number[];
}

/** Installs the position-recording loops on a markdown-it instance. */
export function recordPositions(md: MarkdownIt): void {
  md.block.tokenize = tokenizeBlocks;
  md.inline.tokenize = tokenizeInline;
  md.inline.State = positionedInlineState(md.inline.State);
}

function tokenizeBlocks(this: ParserBlock, state: StateBlock, startLine: number, endLine: number): void {
  const rules = this.ruler.getRules('');
  const maxNesting = state.md.options.maxNesting;
  const env = state.env as unknown as PositionEnv;
  let line = startLine;
  let hasEmptyLines = false;
  while (line < endLine) {
    state.line = line = state.skipEmptyLines(line);
    if (line >= endLine) break;
    if (state.sCount[line]! < state.blkIndent) break;
    if (state.level >= maxNesting) {
      state.line = endLine;
      break;
    }
    const prevLine = state.line;
    const firstToken = state.tokens.length;
    const entryStart = state.bMarks[line]! + state.tShift[line]!;
    let ok = false;
    for (let i = 0; i < rules.length; i++) {
      ok = rules[i]!(state, line, endLine, false);
      if (ok) {
        if (prevLine >= state.line) throw new Error("block rule didn't increment state.line");
        break;
      }
    }
    if (!ok) throw new Error('none of the block rules matched');
    noteBlockStarts(state, firstToken, entryStart, endLine, env);
    state.tight = !hasEmptyLines;
    if (state.isEmpty(state.line - 1)) hasEmptyLines = true;
    line = state.line;
    if (line < endLine && state.isEmpty(line)) {
      hasEmptyLines = true;
      line++;
      state.line = line;
    }
  }
}

/**
 * Start offsets for the tokens one rule call pushed (nested calls have set theirs already). A
 * token without a line map (a footnote definition's opener) starts where the rule did.
 */
function noteBlockStarts(state: StateBlock, firstToken: number, entryStart: number, endLine: number, env: PositionEnv): void {
  for (let k = firstToken; k < state.tokens.length; k++) {
    if (env.blockStarts[k] !== undefined) continue;
    const token = state.tokens[k]!;
    const line = token.map?.[0];
    if (line === undefined) {
      env.blockStarts[k] = entryStart;
    } else if (token.type === 'code_block' || token.type === 'html_block') {
      // Both keep their own indentation in the mdast reader.
      env.blockStarts[k] = afterContainerIndent(state, line);
      if (token.type === 'code_block') noteIndentedBlankLines(state, k, token.map![1], endLine, env);
    } else {
      env.blockStarts[k] = state.bMarks[line]! + state.tShift[line]!;
    }
  }
}

/**
 * Where a line's content starts after the enclosing containers' indentation (columns counted as
 * markdown-it's `StateBlock.getLines` counts them), before the block's own.
 */
function afterContainerIndent(state: StateBlock, line: number): number {
  const lineStart = state.bMarks[line]!;
  let column = 0;
  let pos = lineStart;
  while (pos < state.eMarks[line]! && column < state.blkIndent) {
    const code = state.src.charCodeAt(pos);
    if (code === 0x09) column += 4 - ((column + state.bsCount[line]!) % 4);
    else if (code === 0x20 || pos - lineStart < state.tShift[line]!) column++;
    else break;
    pos++;
  }
  return pos;
}

function noteIndentedBlankLines(state: StateBlock, k: number, after: number, endLine: number, env: PositionEnv): void {
  let line = after;
  while (line < endLine && state.isEmpty(line) && state.sCount[line]! - state.blkIndent >= 4) line++;
  if (line > after) env.blockEnds[k] = state.eMarks[line - 1]!;
}

/** The inline state, with the bookkeeping that gives pending text its range. */
interface PositionedInlineState extends StateInline {
  /** Where the text now collected in `pending` began. */
  pendingStart: number;
  /** Where the rule now running began (pending text flushed by it ends there). */
  ruleStart: number;
}

function positionedInlineState(Base: typeof StateInline): typeof StateInline {
  return class extends Base implements PositionedInlineState {
    pendingStart = 0;
    ruleStart = 0;

    override pushPending(): Token {
      const token = super.pushPending();
      token.map = [this.pendingStart, this.ruleStart];
      return token;
    }
  };
}

function tokenizeInline(this: ParserInline, state: StateInline): void {
  const positioned = state as PositionedInlineState;
  const rules = this.ruler.getRules('');
  const end = state.posMax;
  const maxNesting = state.md.options.maxNesting;
  while (state.pos < end) {
    const prevPos = state.pos;
    const firstToken = state.tokens.length;
    const hadPending = state.pending.length > 0;
    positioned.ruleStart = prevPos;
    let ok = false;
    if (state.level < maxNesting) {
      for (let i = 0; i < rules.length; i++) {
        ok = rules[i]!(state, false);
        if (ok) {
          if (prevPos >= state.pos) throw new Error("inline rule didn't increment state.pos");
          break;
        }
      }
    }
    if (ok) {
      // No rule both flushes pending text and starts new pending text, so this is where it began.
      if (!hadPending && state.pending.length > 0) positioned.pendingStart = prevPos;
      placeInlineTokens(state, firstToken, prevPos, state.pos);
      if (state.pos >= end) break;
      continue;
    }
    if (state.pending.length === 0) positioned.pendingStart = state.pos;
    state.pending += state.src[state.pos++];
  }
  positioned.ruleStart = state.pos;
  if (state.pending) state.pushPending();
}

/**
 * Ranges for the tokens one inline rule pushed, within `[start, end)` it consumed. Delimiter runs
 * (`**`, `~~`) are pushed as one text token per marker: when the tokens spell out the consumed
 * source exactly, each gets its own characters; otherwise each gets the whole range.
 */
function placeInlineTokens(state: StateInline, firstToken: number, start: number, end: number): void {
  const { tokens } = state;
  let at = start;
  let literal = true;
  for (let k = firstToken; k < tokens.length && literal; k++) {
    const token = tokens[k]!;
    if (token.map !== null) continue;
    literal = token.type === 'text' && state.src.startsWith(token.content, at);
    at += token.content.length;
  }
  literal &&= at === end;
  at = start;
  for (let k = firstToken; k < tokens.length; k++) {
    const token = tokens[k]!;
    if (token.map !== null) continue;
    if (literal) {
      token.map = [at, at + token.content.length];
      at += token.content.length;
    } else {
      token.map = [start, end];
    }
  }
}
