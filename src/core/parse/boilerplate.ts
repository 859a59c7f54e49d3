/**
 * Structure-based recognition of blocks that are not prose: metadata runs, checklists, link lists,
 * tables of contents and badge lines. Decisions rest on the shape of a block (what kinds of nodes it
 * holds, how its lines are built), never on the words of a particular document collection.
 */

import type { List, ListItem, Paragraph, PhrasingContent } from 'mdast';
import type { SkipReason } from '../types';

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const STARTS_LOWER = /^\p{Ll}/u;
const LETTER_OR_DIGIT = /[\p{L}\p{N}]/u;
const ONLY_MARKS = /^[\s\p{P}\p{S}]*$/u;

/**
 * `Key: value`, the key being 1-4 short words starting with a letter (`Start Date`, `RFC PR #`);
 * a `::` path separator is not a key's colon.
 */
const METADATA_LINE = /^\p{L}[\p{L}\p{N}'’&/._()#+-]*(?:[ \t]+[\p{L}\p{N}'’&/._()#+-]+){0,3}[ \t]*:(?!:)[ \t]*(.*)$/u;
const MAX_KEY_LENGTH = 40;
/** Values longer than this read as prose, not as a field (common practice, no source). */
const MAX_VALUE_WORDS = 12;
/** A lone `Key: value` line needs a shorter value to count as a field. */
const MAX_LONE_VALUE_WORDS = 6;

/**
 * True when every line is a `Key: value` field and the values read like field values, not
 * sentences (a long run may hold one sentence-like value, e.g. `Issue: N/A. Self-executing.`).
 * At least one key must be capitalized: runs of lower-case keys (`input: a token tree`) are
 * definitions inside prose. Used only for runs at the start of a document or section.
 */
export function isMetadataRun(lines: readonly string[]): boolean {
  if (lines.length === 0) return false;
  let withValue = 0;
  let proseLike = 0;
  let capitalized = 0;
  for (const raw of lines) {
    const line = raw.trim();
    const match = METADATA_LINE.exec(line);
    if (match === null) return false;
    if (line.indexOf(':') > MAX_KEY_LENGTH) return false;
    if (!STARTS_LOWER.test(line)) capitalized++;
    const value = match[1]!.trim();
    if (value.length === 0) continue;
    if (value.startsWith('//')) return false; // `https://…`: a URL, not a key
    if (!LETTER_OR_DIGIT.test(value)) return false; // `Example::` introduces a literal block
    withValue++;
    const words = value.split(/\s+/).length;
    const lone = lines.length === 1;
    const sentenceEnd = /[.!?]["')\]]*$/.test(value) && (lone || words >= 4);
    if (words > (lone ? MAX_LONE_VALUE_WORDS : MAX_VALUE_WORDS) || sentenceEnd) proseLike++;
  }
  return withValue > 0 && capitalized > 0 && proseLike * 2 < withValue;
}

/** Text between links that is only separators (spaces, punctuation, symbols). */
function isSeparator(node: PhrasingContent): boolean {
  return (node.type === 'text' && ONLY_MARKS.test(node.value)) || node.type === 'break';
}

function isImage(node: PhrasingContent): boolean {
  return node.type === 'image' || node.type === 'imageReference';
}

/**
 * 'badge' for a paragraph made only of images and links wrapping images (status badges, logo
 * rows); 'image' for a paragraph that is a single bare image; null otherwise.
 */
export function imageParagraphKind(paragraph: Paragraph): 'badge' | 'image' | null {
  let images = 0;
  let wrapped = 0;
  for (const child of paragraph.children) {
    if (isImage(child)) {
      images++;
    } else if (child.type === 'link' || child.type === 'linkReference') {
      const inner = child.children.filter((c) => !isSeparator(c));
      if (inner.length === 0 || !inner.every(isImage)) return null;
      images += inner.length;
      wrapped++;
    } else if (!isSeparator(child)) {
      return null;
    }
  }
  if (images === 0) return null;
  return images === 1 && wrapped === 0 ? 'image' : 'badge';
}

type LinkShape = 'anchors' | 'links';

/** Whether a paragraph holds only links (plus separators); 'anchors' if all point inside the page. */
function paragraphLinkShape(paragraph: Paragraph): LinkShape | null {
  let links = 0;
  let anchors = true;
  for (const child of paragraph.children) {
    if (child.type === 'link') {
      links++;
      if (!child.url.startsWith('#')) anchors = false;
    } else if (child.type === 'linkReference') {
      links++;
      anchors = false;
    } else if (!isSeparator(child)) {
      return null;
    }
  }
  if (links === 0) return null;
  return anchors ? 'anchors' : 'links';
}

function listLinkShape(list: List): LinkShape | null {
  let anchors = true;
  let any = false;
  for (const item of list.children) {
    for (const child of item.children) {
      let shape: LinkShape | null;
      if (child.type === 'paragraph') shape = paragraphLinkShape(child);
      else if (child.type === 'list') shape = listLinkShape(child);
      else return null;
      if (shape === null) return null;
      any = true;
      if (shape === 'links') anchors = false;
    }
  }
  if (!any) return null;
  return anchors ? 'anchors' : 'links';
}

export function isTaskItem(item: ListItem): boolean {
  return item.checked === true || item.checked === false;
}

/** Why a whole list is not prose, or null when its items are content. */
export function listSkipReason(list: List): SkipReason | null {
  if (list.children.length > 0 && list.children.every(isTaskItem)) return 'checklist';
  const shape = listLinkShape(list);
  if (shape === 'anchors') return 'tableOfContents';
  if (shape === 'links') return 'linkList';
  return null;
}
