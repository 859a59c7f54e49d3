/**
 * Finds the section that holds a document's own abstract.
 */
import { analyze } from '../analyze';
import { parseDocument } from '../formats/registry';
import { balanceUnits, topSectionDepth } from '../select/units';
import { FALLBACK_ABSTRACT_HEADINGS, HEADING_CLASSES, normalizeHeading } from '../text/headings';
import type { AnalyzedDocument, ParsedDocument, Span } from '../types';
import type { AbstractSource } from './abstract-report';

/** Headings that name an abstract outright (the heading vocabulary's abstract class). */
export const ABSTRACT_HEADINGS: readonly string[] = HEADING_CLASSES.abstract.phrases;

/** Said the same way in the editor and on the command line; each adds how to name the abstract there. */
export const NO_ABSTRACT_MESSAGE = 'No section headed Summary, Abstract or TL;DR was found, so there is no abstract to check.';

/**
 * Index of the abstract section, or null. With `heading` the first section with that heading
 * (case, numbering and punctuation ignored) is taken; without it the first section named like an
 * abstract. A lone title heading that encloses the whole document is never taken: its "abstract"
 * would leave no body to check against.
 */
export function findAbstractSection(doc: ParsedDocument, heading?: string): number | null {
  const topDepth = topSectionDepth(doc);
  const candidates = doc.sections.filter((section) => section.depth >= topDepth);
  const firstNamed = (names: readonly string[]): number | null => {
    const wanted = new Set(names.map(normalizeHeading));
    return candidates.find((section) => wanted.has(normalizeHeading(section.heading)))?.index ?? null;
  };
  if (heading !== undefined) return firstNamed([heading]);
  return firstNamed(ABSTRACT_HEADINGS) ?? firstNamed(FALLBACK_ABSTRACT_HEADINGS);
}

/** The section and every section nested in it, as a membership array indexed by section. */
export function sectionWithDescendants(doc: ParsedDocument, root: number): Uint8Array {
  const inside = new Uint8Array(doc.sections.length);
  inside[root] = 1;
  // Sections are in document order and a parent always precedes its children.
  for (const section of doc.sections) {
    if (section.parent !== null && inside[section.parent] === 1) inside[section.index] = 1;
  }
  return inside;
}

export const NO_OPENING_MESSAGE = 'The document has no text before its first section heading to check as the abstract.';
export const NO_HEADINGS_MESSAGE = 'The document has no section headings, so its opening text cannot be told from its body.';

/**
 * The sections of the opening text: the root and a lone title that encloses the document, i.e.
 * what comes before the first heading at the document's top section level (select/units.ts).
 */
export function openingSections(doc: ParsedDocument): Uint8Array {
  const units = balanceUnits(doc, 1).unitOfSection;
  const inside = new Uint8Array(doc.sections.length);
  for (const section of doc.sections) if (units[section.index] === 0) inside[section.index] = 1;
  return inside;
}

export function missingHeadingMessage(heading: string): string {
  return `No section headed "${heading}" was found.`;
}

export interface AbstractSentence {
  /** Index into the checked document's sentences; null for an abstract given as separate text. */
  readonly sentence: number | null;
  readonly text: string;
  readonly span: Span | null;
  /** The sentence as written, markup kept (code spans stay visible to the identifier check). */
  readonly source: string;
  readonly terms: readonly string[];
  /** Word tokens (stop words kept). */
  readonly wordList: readonly string[];
  readonly words: number;
}

export interface LocatedAbstract {
  readonly origin: 'section' | 'opening' | 'text';
  readonly heading: string | null;
  readonly section: number | null;
  readonly span: Span | null;
  /** Sections of the checked document that belong to the abstract (all zero for separate text). */
  readonly sections: Uint8Array;
  readonly sentences: readonly AbstractSentence[];
}

export interface LocateFailure {
  readonly reason: 'noAbstract' | 'missingHeading' | 'emptyAbstract';
  readonly error: string;
}

/** The abstract's sentences, or why there are none (with a message for people). */
export function locateAbstract(analyzed: AnalyzedDocument, source: AbstractSource | undefined, language: string): LocatedAbstract | LocateFailure {
  const { doc } = analyzed;
  if (source?.kind === 'text') {
    const parsed = analyze(parseDocument(source.text, { format: source.format ?? 'plaintext' }), language);
    const sentences = parsed.doc.sentences.map((s, i) => ({
      sentence: null,
      text: s.text,
      span: null,
      source: source.text.slice(s.span.start, s.span.end),
      terms: parsed.terms[i]!,
      wordList: parsed.words[i]!,
      words: parsed.words[i]!.length,
    }));
    if (sentences.length === 0) return { reason: 'emptyAbstract', error: 'The abstract text has no sentences to check.' };
    return { origin: 'text', heading: null, section: null, span: null, sections: new Uint8Array(doc.sections.length), sentences };
  }

  if (source?.kind === 'opening') {
    if (!doc.sections.some((section) => section.depth > 0)) return { reason: 'noAbstract', error: NO_HEADINGS_MESSAGE };
    const sections = openingSections(doc);
    const sentences = doc.sentences.filter((s) => sections[s.section] === 1).map((s) => abstractSentenceOf(analyzed, s.index));
    if (sentences.length === 0) return { reason: 'emptyAbstract', error: NO_OPENING_MESSAGE };
    const span = { start: sentences[0]!.span!.start, end: sentences[sentences.length - 1]!.span!.end };
    return { origin: 'opening', heading: null, section: null, span, sections, sentences };
  }

  const wanted = source?.kind === 'heading' ? source.heading : undefined;
  const index = findAbstractSection(doc, wanted);
  if (index === null) return wanted === undefined ? { reason: 'noAbstract', error: NO_ABSTRACT_MESSAGE } : { reason: 'missingHeading', error: missingHeadingMessage(wanted) };
  const section = doc.sections[index]!;
  const sections = sectionWithDescendants(doc, index);
  const sentences = doc.sentences.filter((s) => sections[s.section] === 1).map((s) => abstractSentenceOf(analyzed, s.index));
  if (sentences.length === 0) return { reason: 'emptyAbstract', error: `The section "${section.heading}" has no sentences to check.` };
  return { origin: 'section', heading: section.heading, section: index, span: section.span, sections, sentences };
}

/** A sentence of the checked document as an abstract sentence. */
function abstractSentenceOf(analyzed: AnalyzedDocument, index: number): AbstractSentence {
  const { doc } = analyzed;
  const s = doc.sentences[index]!;
  return {
    sentence: s.index,
    text: s.text,
    span: s.span,
    source: doc.text.slice(s.span.start - doc.baseOffset, s.span.end - doc.baseOffset),
    terms: analyzed.terms[s.index]!,
    wordList: analyzed.words[s.index]!,
    words: analyzed.words[s.index]!.length,
  };
}
