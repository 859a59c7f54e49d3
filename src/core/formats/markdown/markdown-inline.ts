/**
 * Phrasing content (mdast inline nodes) → normalized text with offsets.
 *
 * Kept: text, the text of links and autolinks, inline code (as plain text), emphasis, strong and
 * deleted text. Dropped: images, footnote references, inline HTML, URLs.
 */

import type { Nodes, PhrasingContent } from 'mdast';
import type { SkipReason } from '../../types';
import type { InlineTextBuilder } from '../../parse/inline-text';
import { alignValue } from './source-align';

/** Reports a dropped inline node (local offsets). */
export type InlineSkipSink = (reason: SkipReason, start: number, end: number) => void;

export interface InlineSource {
  /** The whole parsed string (local offsets index into it). */
  readonly text: string;
  /** Added to mdast offsets (1 when a byte order mark was removed before parsing). */
  readonly shift: number;
}

export function nodeStart(node: Nodes, source: InlineSource): number | null {
  const offset = node.position?.start.offset;
  return offset === undefined ? null : offset + source.shift;
}

export function nodeEnd(node: Nodes, source: InlineSource): number | null {
  const offset = node.position?.end.offset;
  return offset === undefined ? null : offset + source.shift;
}

const HTML_LINE_BREAK = /^<br\s*\/?>$/i;

export function appendPhrasing(
  nodes: readonly PhrasingContent[],
  out: InlineTextBuilder,
  source: InlineSource,
  onSkip: InlineSkipSink,
): void {
  for (const node of nodes) appendNode(node, out, source, onSkip);
}

function appendNode(node: PhrasingContent, out: InlineTextBuilder, source: InlineSource, onSkip: InlineSkipSink): void {
  const start = nodeStart(node, source);
  const end = nodeEnd(node, source);
  switch (node.type) {
    case 'text':
      if (start !== null && end !== null) appendAligned(node.value, start, end, false, out, source);
      return;
    case 'inlineCode':
      if (start !== null && end !== null) appendInlineCode(node.value, start, end, out, source);
      return;
    case 'break':
      if (start !== null) out.hardBreak(start);
      return;
    case 'image':
    case 'imageReference':
      if (start !== null && end !== null) onSkip('image', start, end);
      return;
    case 'html':
      if (start === null || end === null) return;
      if (node.value.startsWith('<!--')) onSkip('comment', start, end);
      else if (HTML_LINE_BREAK.test(node.value)) out.hardBreak(start);
      return;
    case 'footnoteReference':
      return;
    default:
      if ('children' in node) appendPhrasing(node.children, out, source, onSkip);
  }
}

function appendAligned(
  value: string,
  start: number,
  end: number,
  lineEndingAsSpace: boolean,
  out: InlineTextBuilder,
  source: InlineSource,
): void {
  const { starts, ends } = alignValue(value, source.text, start, end, lineEndingAsSpace);
  for (let i = 0; i < value.length; i++) {
    const c = value[i]!;
    if (c === '\n') out.softBreak(starts[i]!);
    else out.push(c, starts[i]!, ends[i]!);
  }
}

/** Inline code: align inside the backtick fences so a backtick in the code maps to itself. */
function appendInlineCode(value: string, start: number, end: number, out: InlineTextBuilder, source: InlineSource): void {
  let from = start;
  let to = end;
  while (from < to && source.text[from] === '`') from++;
  while (to > from && source.text[to - 1] === '`') to--;
  out.beginCode();
  appendAligned(value, from, to, true, out, source);
  out.endCode();
}
