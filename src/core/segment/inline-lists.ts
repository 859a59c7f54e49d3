/**
 * Lists written on one line: "1) mix the dough 2) let it rest", "a. first b. second".
 *
 * Only a paragraph that itself opens with an item marker is treated as such a list, and only the
 * markers that continue its sequence (2 after 1, b after a, same punctuation) start new items, so
 * an ordinary "2." inside prose is left alone.
 */

import { isBullet, isSpaceCode } from './characters';

const LEADING_MARKER = /^(\(?)(\d{1,3}|[a-z])(\.\)|\)|\.)[ \t]/;

/** Offsets where an inline item begins (each is the space just before its marker), in order. */
export function inlineListCuts(text: string): number[] {
  const start = skipSpaces(text, 0);
  // Bulleted items ("• 9. one • 10. two") are cut at each bullet instead.
  if (isBullet(text.charAt(start))) return [];
  // Anchored at `start` on a short slice, so the check costs the same for any text length.
  const match = LEADING_MARKER.exec(text.slice(start, start + 8));
  if (match === null) return [];
  const [, open = '', firstLabel = '', close = ''] = match;
  const cuts: number[] = [];
  let label = firstLabel;
  let from = start + match[0].length;
  for (;;) {
    const next = followingLabel(label);
    if (next === null) break;
    const at = text.indexOf(` ${open}${next}${close} `, from);
    if (at < 0) break;
    cuts.push(at);
    label = next;
    from = at + 1;
  }
  return cuts;
}

function followingLabel(label: string): string | null {
  if (/^\d+$/.test(label)) return String(Number(label) + 1);
  if (label === 'z') return null;
  return String.fromCharCode(label.charCodeAt(0) + 1);
}

function skipSpaces(text: string, index: number): number {
  let i = index;
  while (i < text.length && isSpaceCode(text.charCodeAt(i))) i++;
  return i;
}
