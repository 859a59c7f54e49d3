/**
 * Where a sentence sits, as summaries show it: the heading path of its section, and the balance
 * unit it was counted under. One implementation for the engine's report, repairs and the panel.
 */
import { topSectionDepth } from '../select/units';
import type { ParsedDocument, Summary } from '../types';

/** Headings from the top section level down; a lone title heading is left out (it is the same for every line). */
export function sectionPath(doc: ParsedDocument, section: number, topDepth = topSectionDepth(doc)): string[] {
  const path: string[] = [];
  let current: number | null = section;
  // Bounded walk: a malformed parent chain (from a message) must not loop forever.
  for (let steps = 0; current !== null && current > 0 && steps <= doc.sections.length; steps++) {
    const s: ParsedDocument['sections'][number] | undefined = doc.sections[current];
    if (!s) break;
    if (s.heading && s.depth >= topDepth) path.unshift(s.heading);
    current = s.parent;
  }
  return path;
}

/** The balance unit (a section index listed in `summary.shares`) that contains a section, or -1. */
export function unitOfSection(summary: Summary, section: number): number {
  const units = new Set(summary.shares.map((share) => share.section));
  const sections = summary.document.sections;
  let current: number | null = section;
  for (let steps = 0; current !== null && steps <= sections.length; steps++) {
    if (units.has(current)) return current;
    current = sections[current]?.parent ?? null;
  }
  return -1;
}
