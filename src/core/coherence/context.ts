/**
 * Which source sentence supplies the context a sentence leans on:
 * - a later sentence of a paragraph (or list item) leans on the sentence before it;
 * - the first sentence of a list item leans on the list's lead-in line;
 * - the first sentence of any other paragraph leans on the last sentence of the paragraph before
 *   it in the same section;
 * - the first sentence of a section leans on its heading. Summaries show the heading path of every
 *   sentence (`PickedSentence.sectionPath`), so a pronoun or demonstrative there ("This section
 *   ...", "It lets visitors ...") is not flagged. Connectives, back-references and "also" point
 *   past the heading to earlier text, so for them the previous sentence in document order counts.
 * A sentence with no text before it in the source lost nothing when it was extracted.
 */
import type { ParsedDocument, StandAloneTrigger } from '../types';

/** Triggers that a section heading can resolve. */
const HEADING_RESOLVES: ReadonlySet<StandAloneTrigger> = new Set(['pronoun', 'demonstrative']);

export type ContextSource =
  | { readonly kind: 'sentence'; readonly sentence: number }
  | { readonly kind: 'heading' }
  | { readonly kind: 'none' };

export function contextSource(doc: ParsedDocument, index: number, trigger: StandAloneTrigger): ContextSource {
  const sentence = doc.sentences[index]!;
  const paragraph = doc.paragraphs[sentence.paragraph];
  if (paragraph && sentence.positionInParagraph > 0) {
    const previous = paragraph.sentences[sentence.positionInParagraph - 1];
    if (previous !== undefined) return { kind: 'sentence', sentence: previous };
  }
  if (paragraph?.kind === 'listItem' && paragraph.leadIn !== null) {
    const last = lastSentenceOf(doc, paragraph.leadIn);
    if (last !== null) return { kind: 'sentence', sentence: last };
  }
  if (paragraph) {
    for (let p = paragraph.index - 1; p >= 0; p--) {
      const before = doc.paragraphs[p]!;
      if (before.section !== paragraph.section) break;
      const last = lastSentenceOf(doc, p);
      if (last !== null) return { kind: 'sentence', sentence: last };
    }
  }
  // First sentence of its section.
  const section = doc.sections[sentence.section];
  if (section?.headingSpan && HEADING_RESOLVES.has(trigger)) return { kind: 'heading' };
  return index > 0 ? { kind: 'sentence', sentence: index - 1 } : { kind: 'none' };
}

function lastSentenceOf(doc: ParsedDocument, paragraph: number): number | null {
  const sentences = doc.paragraphs[paragraph]?.sentences ?? [];
  return sentences.length > 0 ? sentences[sentences.length - 1]! : null;
}
