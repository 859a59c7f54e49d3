/**
 * Pieces read on their own (pieces.ts) → one ParsedDocument, the same as reading the whole text.
 *
 * Each piece's spans are shifted to where the piece now starts; its sections, paragraphs and
 * sentences are renumbered after those of the pieces before it; the section tree is rebuilt from
 * all headings in order (a section's span and parent depend on the headings after and before it).
 * Sentence positions within a section stay as read: a section's own content always lies in the
 * piece its heading opens, because content belongs to the latest heading.
 */
import type { Paragraph, ParsedDocument, Section, Sentence, Skipped, Span } from '../../types';
import { SectionTreeBuilder } from '../../parse/sections';
import type { MarkdownPiece } from './pieces';

export interface PlacedPiece {
  readonly piece: MarkdownPiece;
  /** Where the piece starts now (local offset, without baseOffset). */
  readonly start: number;
}

export function assemblePieces(text: string, baseOffset: number, placed: readonly PlacedPiece[]): ParsedDocument {
  const tree = new SectionTreeBuilder({ start: baseOffset, end: baseOffset + text.length });
  const paragraphs: Paragraph[] = [];
  const sentences: Sentence[] = [];
  const skipped: Skipped[] = [];
  let title: string | null = null;

  for (const { piece, start } of placed) {
    const delta = start - piece.readAt;
    const move = (span: Span): Span => (delta === 0 ? span : { start: span.start + delta, end: span.end + delta });
    const { doc } = piece;
    // The piece's root section holds no content unless the piece opens the document.
    const sectionOf: number[] = [tree.current];
    for (let s = 1; s < doc.sections.length; s++) {
      const section = doc.sections[s]!;
      sectionOf.push(tree.addHeading(section.heading, section.depth, move(section.headingSpan!)));
    }
    const paragraphBase = paragraphs.length;
    const sentenceBase = sentences.length;
    for (const p of doc.paragraphs) {
      paragraphs.push({
        index: p.index + paragraphBase,
        kind: p.kind,
        span: move(p.span),
        section: sectionOf[p.section]!,
        listDepth: p.listDepth,
        leadIn: p.leadIn === null ? null : p.leadIn + paragraphBase,
        sentences: sentenceBase === 0 ? p.sentences : p.sentences.map((i) => i + sentenceBase),
      });
    }
    for (const s of doc.sentences) {
      sentences.push({
        index: s.index + sentenceBase,
        text: s.text,
        span: move(s.span),
        section: sectionOf[s.section]!,
        paragraph: s.paragraph + paragraphBase,
        positionInParagraph: s.positionInParagraph,
        paragraphLength: s.paragraphLength,
        positionInSection: s.positionInSection,
        sectionLength: s.sectionLength,
      });
    }
    for (const k of doc.skipped) skipped.push(delta === 0 ? k : { reason: k.reason, span: move(k.span) });
    // The first H1 names the document; front matter (first piece only) when no piece has one.
    if (title === null && hasTopHeading(doc.sections)) title = doc.title;
  }
  const first = placed[0]?.piece.doc;
  if (title === null && first !== undefined) title = first.title;
  return {
    text,
    baseOffset,
    format: 'markdown',
    title,
    sections: tree.build(),
    paragraphs,
    sentences,
    // Pieces do not overlap and each lists its own in order, so the concatenation is sorted.
    skipped,
  };
}

function hasTopHeading(sections: readonly Section[]): boolean {
  return sections.some((section) => section.depth === 1 && section.heading.length > 0);
}
