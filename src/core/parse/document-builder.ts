/**
 * Collects what the format-specific parsers find (headings, paragraphs, skipped blocks) and turns
 * it into a `ParsedDocument`. Parsers work in local offsets (into the parsed text); this is the
 * one place where `baseOffset` is added.
 */

import type { BlockKind, DocumentFormat, Paragraph, ParsedDocument, Sentence, SkipReason, Skipped, Span } from '../types';
import { sentencesOf, type NormalizedText } from './inline-text';
import { SectionTreeBuilder } from './sections';

interface PendingSentence {
  text: string;
  span: Span;
  section: number;
  paragraph: number;
  positionInParagraph: number;
  paragraphLength: number;
}

export interface ParagraphInput {
  readonly kind: BlockKind;
  /** Local span of the block the paragraph came from. */
  readonly start: number;
  readonly end: number;
  readonly listDepth: number;
  readonly leadIn: number | null;
  readonly text: NormalizedText;
}

export class DocumentBuilder {
  private readonly sectionTree: SectionTreeBuilder;
  private readonly paragraphs: Paragraph[] = [];
  private readonly sentences: PendingSentence[] = [];
  private readonly skipped: Skipped[] = [];
  private readonly contentSections = new Set<number>();
  private title: string | null = null;

  constructor(
    private readonly text: string,
    private readonly baseOffset: number,
    private readonly format: DocumentFormat,
  ) {
    this.sectionTree = new SectionTreeBuilder({ start: baseOffset, end: baseOffset + text.length });
  }

  get currentSection(): number {
    return this.sectionTree.current;
  }

  /** True until the current section has produced a content paragraph (metadata runs live there). */
  get atSectionStart(): boolean {
    return !this.contentSections.has(this.currentSection);
  }

  get hasTitle(): boolean {
    return this.title !== null;
  }

  setTitle(title: string): void {
    if (this.title === null && title.length > 0) this.title = title;
  }

  addHeading(heading: string, depth: number, start: number, end: number): number {
    return this.sectionTree.addHeading(heading, Math.min(6, Math.max(1, depth)), this.shift(start, end));
  }

  skip(reason: SkipReason, start: number, end: number): void {
    if (end > start) this.skipped.push({ reason, span: this.shift(start, end) });
  }

  /** Adds a paragraph with its sentences; returns its index, or null when it holds no sentence. */
  addParagraph(input: ParagraphInput): number | null {
    const found = sentencesOf(input.text);
    if (found.length === 0) return null;
    const index = this.paragraphs.length;
    const section = this.currentSection;
    const sentenceIndices: number[] = [];
    found.forEach((sentence, position) => {
      sentenceIndices.push(this.sentences.length);
      this.sentences.push({
        text: sentence.text,
        span: this.shift(sentence.start, sentence.end),
        section,
        paragraph: index,
        positionInParagraph: position,
        paragraphLength: found.length,
      });
    });
    this.paragraphs.push({
      index,
      kind: input.kind,
      span: this.shift(input.start, input.end),
      section,
      listDepth: input.listDepth,
      leadIn: input.leadIn,
      sentences: sentenceIndices,
    });
    this.contentSections.add(section);
    return index;
  }

  /** The section a paragraph belongs to (to check that a lead-in is in the same section). */
  sectionOf(paragraph: number): number {
    return this.paragraphs[paragraph]!.section;
  }

  build(): ParsedDocument {
    const sectionCounts = new Map<number, number>();
    for (const s of this.sentences) sectionCounts.set(s.section, (sectionCounts.get(s.section) ?? 0) + 1);
    const seen = new Map<number, number>();
    const sentences: Sentence[] = this.sentences.map((s, index) => {
      const positionInSection = seen.get(s.section) ?? 0;
      seen.set(s.section, positionInSection + 1);
      return { index, ...s, positionInSection, sectionLength: sectionCounts.get(s.section)! };
    });
    return {
      text: this.text,
      baseOffset: this.baseOffset,
      format: this.format,
      title: this.title,
      sections: this.sectionTree.build(),
      paragraphs: this.paragraphs,
      sentences,
      skipped: [...this.skipped].sort((a, b) => a.span.start - b.span.start || a.span.end - b.span.end),
    };
  }

  private shift(start: number, end: number): Span {
    return { start: start + this.baseOffset, end: end + this.baseOffset };
  }
}
