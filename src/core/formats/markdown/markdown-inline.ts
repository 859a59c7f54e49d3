/**
 * Phrasing content (mdast inline nodes) → normalized text with offsets.
 *
 * Kept: text, the text of links and autolinks, inline code (as plain text), emphasis, strong and
 * deleted text. Dropped: images, footnote references, inline HTML, URLs.
 */

import type { Nodes, PhrasingContent } from 'mdast';
import type { SkipReason } from '../../types';
import type { InlineTextBuilder } from '../../parse/inline-text';
import { alignInto, type Alignment } from './source-align';

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
  const alignment = alignmentFor(value.length);
  alignInto(value, source.text, start, end, lineEndingAsSpace, alignment);
  const { starts, ends } = alignment;
  for (let i = 0; i < value.length; i++) {
    const unit = value.charCodeAt(i);
    if (unit === LINE_FEED) out.softBreak(starts[i]!);
    else out.pushCode(unit, starts[i]!, ends[i]!);
  }
}

const LINE_FEED = 0x0a;

/**
 * Alignment arrays reused by every text node (each is read before the next node is aligned):
 * allocating two small typed arrays per node was the costliest line of the alignment in a profile
 * of a 20 KB summary. A longer node (rare: text nodes end at every inline mark) gets its own.
 */
const SCRATCH_UNITS = 4096;
const scratch: Alignment = { starts: new Int32Array(SCRATCH_UNITS), ends: new Int32Array(SCRATCH_UNITS) };

function alignmentFor(length: number): Alignment {
  return length <= SCRATCH_UNITS ? scratch : { starts: new Int32Array(length), ends: new Int32Array(length) };
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
