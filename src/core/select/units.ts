/**
 * Balance units: the sections the budget is shared across. Sub-sections deeper than the balance
 * depth roll up into their ancestor; text before the first section heading (and directly under a
 * lone title) forms the root unit.
 */
import { normalizeHeading } from '../text/headings';
import type { ParsedDocument, Section } from '../types';

export interface BalanceUnits {
  /** For each section index, the section index of its balance unit (0 = the root unit). */
  readonly unitOfSection: Int32Array;
  /** Depth of the document's top section level (after a lone H1 title). */
  readonly topDepth: number;
}

/** The shallowest heading depth that structures the body; a single H1 used as a title does not count. */
export function topSectionDepth(doc: ParsedDocument): number {
  const depths = doc.sections.filter((s) => s.depth > 0).map((s) => s.depth);
  if (depths.length === 0) return 1;
  const shallowest = Math.min(...depths);
  const atShallowest = depths.filter((d) => d === shallowest).length;
  const deeper = depths.filter((d) => d > shallowest);
  if (atShallowest === 1 && deeper.length > 0) return Math.min(...deeper);
  return shallowest;
}

export function balanceUnits(doc: ParsedDocument, balanceDepth: number): BalanceUnits {
  const topDepth = topSectionDepth(doc);
  const deepestUnitDepth = topDepth + balanceDepth - 1;
  const unitOfSection = new Int32Array(doc.sections.length);
  for (const section of doc.sections) {
    unitOfSection[section.index] = unitFor(doc.sections, section, topDepth, deepestUnitDepth);
  }
  return { unitOfSection, topDepth };
}

function unitFor(sections: readonly Section[], section: Section, topDepth: number, deepest: number): number {
  let current: Section | undefined = section;
  while (current && current.depth > 0) {
    if (current.depth >= topDepth && current.depth <= deepest) return current.index;
    current = current.parent === null ? undefined : sections[current.parent];
  }
  return 0;
}

/**
 * Sections whose own heading, or an ancestor's, is in the exclusion list (whole heading, numbering,
 * case and punctuation ignored). The document's title is never excluded: a document titled
 * "Changelog" is a change log to summarize, not a section to leave out.
 */
export function excludedSections(doc: ParsedDocument, excludeHeadings: readonly string[]): Uint8Array {
  const excluded = new Uint8Array(doc.sections.length);
  if (excludeHeadings.length === 0) return excluded;
  const names = new Set(excludeHeadings.map(normalizeHeading));
  const topDepth = topSectionDepth(doc);
  for (const section of doc.sections) {
    const parentExcluded = section.parent !== null && excluded[section.parent] === 1;
    const isTitle = section.depth > 0 && section.depth < topDepth;
    if (parentExcluded || (section.depth > 0 && !isTitle && names.has(normalizeHeading(section.heading)))) excluded[section.index] = 1;
  }
  return excluded;
}

export interface Candidates {
  /** Balance unit of each sentence, or -1 when it is not a candidate (excluded section, no words, barred). */
  readonly unitOf: Int32Array;
  /** Content words of each balance unit: the weight it gets in apportionment. */
  readonly unitWeights: Map<number, number>;
}

/**
 * Which sentences may be picked, and the balance unit and weight each belongs to. `barred` marks
 * sentences that are never summary lines (sentence-kinds.ts: placeholders, boilerplate, template text).
 */
export function candidateUnits(
  doc: ParsedDocument,
  wordCounts: readonly number[],
  options: { readonly balanceDepth: number; readonly excludeHeadings: readonly string[] },
  barred?: readonly unknown[],
): Candidates {
  const units = balanceUnits(doc, options.balanceDepth);
  const excluded = excludedSections(doc, options.excludeHeadings);
  const unitOf = new Int32Array(doc.sentences.length);
  const unitWeights = new Map<number, number>();
  doc.sentences.forEach((sentence, i) => {
    if (excluded[sentence.section] === 1 || wordCounts[i] === 0 || (barred?.[i] ?? null) !== null) {
      unitOf[i] = -1;
      return;
    }
    const unit = units.unitOfSection[sentence.section]!;
    unitOf[i] = unit;
    unitWeights.set(unit, (unitWeights.get(unit) ?? 0) + wordCounts[i]!);
  });
  return { unitOf, unitWeights };
}
