/**
 * Hand-built ParsedDocument fixtures for the coherence tests, so they do not depend on the parser.
 * The document text is Markdown-like ("## Heading", "- item"); each sentence's text equals its
 * source slice unless a different `source` is given (to imitate stripped markup).
 */
import type { Paragraph, ParsedDocument, Section, Sentence } from '../../../src/core/types';

export type SentenceSpec = string | { readonly text: string; readonly source: string };

export type DocBlock =
  | { readonly heading: string; readonly depth?: number }
  | { readonly paragraph: readonly SentenceSpec[] }
  /** A list item; its lead-in is the paragraph just before the list (null after a heading). */
  | { readonly item: readonly SentenceSpec[]; readonly listDepth?: number };

interface MutableSection {
  index: number;
  heading: string;
  depth: number;
  headingSpan: { start: number; end: number } | null;
  span: { start: number; end: number };
  parent: number | null;
}

export function buildDoc(blocks: readonly DocBlock[], baseOffset = 0): ParsedDocument {
  let text = '';
  const sections: MutableSection[] = [{ index: 0, heading: '', depth: 0, headingSpan: null, span: { start: baseOffset, end: 0 }, parent: null }];
  const paragraphs: Paragraph[] = [];
  const sentences: (Omit<Sentence, 'positionInSection' | 'sectionLength'>)[] = [];
  let section = 0;
  let leadIn: number | null = null;
  let previousBlock: DocBlock | null = null;

  const write = (chunk: string): number => {
    if (text.length > 0) text += chunk.startsWith('- ') && previousBlock && 'item' in previousBlock ? '\n' : '\n\n';
    const at = text.length;
    text += chunk;
    return at;
  };

  for (const block of blocks) {
    if ('heading' in block) {
      const depth = block.depth ?? 2;
      const at = write(`${'#'.repeat(depth)} ${block.heading}`);
      let parent = section;
      while (parent !== 0 && sections[parent]!.depth >= depth) parent = sections[parent]!.parent ?? 0;
      section = sections.length;
      sections.push({
        index: section,
        heading: block.heading,
        depth,
        headingSpan: { start: baseOffset + at, end: baseOffset + text.length },
        span: { start: baseOffset + at, end: 0 },
        parent,
      });
      leadIn = null;
    } else {
      const specs = 'paragraph' in block ? block.paragraph : block.item;
      const isItem = 'item' in block;
      const prefix = isItem ? '- ' : '';
      const sources = specs.map((s) => (typeof s === 'string' ? s : s.source));
      const start = write(prefix + sources.join(' '));
      const index = paragraphs.length;
      if (!isItem) leadIn = index;
      const ids: number[] = [];
      let offset = start + prefix.length;
      specs.forEach((spec, position) => {
        const source = sources[position]!;
        const id = sentences.length;
        ids.push(id);
        sentences.push({
          index: id,
          text: typeof spec === 'string' ? spec : spec.text,
          span: { start: baseOffset + offset, end: baseOffset + offset + source.length },
          section,
          paragraph: index,
          positionInParagraph: position,
          paragraphLength: specs.length,
        });
        offset += source.length + 1;
      });
      paragraphs.push({
        index,
        kind: isItem ? 'listItem' : 'paragraph',
        span: { start: baseOffset + start, end: baseOffset + text.length },
        section,
        listDepth: 'item' in block ? block.listDepth ?? 0 : 0,
        leadIn: isItem ? leadIn : null,
        sentences: ids,
      });
    }
    previousBlock = block;
  }

  // Section spans run to the next heading of the same or lower depth.
  const end = baseOffset + text.length;
  sections[0]!.span.end = end;
  for (let i = 1; i < sections.length; i++) {
    const next = sections.slice(i + 1).find((s) => s.depth <= sections[i]!.depth);
    sections[i]!.span.end = next ? next.span.start : end;
  }

  const perSection = new Map<number, number>();
  const positions = sentences.map((s) => {
    const position = perSection.get(s.section) ?? 0;
    perSection.set(s.section, position + 1);
    return position;
  });
  const finished: Sentence[] = sentences.map((s, i) => ({
    ...s,
    positionInSection: positions[i]!,
    sectionLength: perSection.get(s.section)!,
  }));

  return {
    text,
    baseOffset,
    format: 'markdown',
    title: null,
    sections: sections as Section[],
    paragraphs,
    sentences: finished,
    skipped: [],
  };
}

export interface StandAlonePair {
  readonly id: string;
  readonly case: string;
  readonly set: 'development' | 'heldOut';
  readonly context: 'sentence' | 'leadIn' | 'heading';
  readonly previous: string;
  readonly sentence: string;
  readonly dangles: boolean;
  readonly trigger?: string;
}

/** A document holding one pair; the pair's sentence is always sentence 1. */
export function pairDoc(pair: StandAlonePair): ParsedDocument {
  switch (pair.context) {
    case 'sentence':
      return buildDoc([{ paragraph: [pair.previous, pair.sentence] }]);
    case 'leadIn':
      return buildDoc([{ paragraph: [pair.previous] }, { item: [pair.sentence] }]);
    case 'heading':
      return buildDoc([
        { heading: 'Overview' },
        { paragraph: ['The handbook covers daily work at the site.'] },
        { heading: pair.previous },
        { paragraph: [pair.sentence] },
      ]);
  }
}

/** Word count the way the tests budget summaries: whitespace-separated tokens with a letter or digit. */
export function wordCount(text: string): number {
  return text.split(/\s+/).filter((w) => /[\p{L}\d]/u.test(w)).length;
}
