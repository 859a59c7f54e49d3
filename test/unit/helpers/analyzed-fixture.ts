/**
 * Hand-built AnalyzedDocument fixtures for ranker tests: the document text, spans and structure
 * are derived from lists of sentence terms, so a test states only what the ranker looks at.
 */
import type { AnalyzedDocument, BlockKind, Paragraph, Section, Sentence } from '../../../src/core/types';

/** A sentence as its stemmed terms, or with its full word list (stop words included) too. */
export type FixtureSentence = readonly string[] | { readonly terms: readonly string[]; readonly words: readonly string[] };

export interface FixtureSection {
  /** Omit for the root section (only allowed first). */
  readonly heading?: string;
  /** Defaults to the heading's lower-cased words. */
  readonly headingTerms?: readonly string[];
  readonly depth?: number;
  readonly paragraphs: readonly (readonly FixtureSentence[])[];
  /** Block kind per paragraph (default 'paragraph'). */
  readonly kinds?: readonly BlockKind[];
}

export interface FixtureDocument {
  readonly title?: string;
  readonly titleTerms?: readonly string[];
  readonly sections: readonly FixtureSection[];
}

function wordsOf(sentence: FixtureSentence): readonly string[] {
  return 'words' in sentence ? sentence.words : (sentence as readonly string[]);
}

function termsOf(sentence: FixtureSentence): readonly string[] {
  return 'terms' in sentence ? sentence.terms : (sentence as readonly string[]);
}

/** One paragraph in the root section, one sentence per term list. */
export function analyzedFromTerms(sentences: readonly FixtureSentence[]): AnalyzedDocument {
  return analyzedDocument({ sections: [{ paragraphs: sentences.length > 0 ? [sentences] : [] }] });
}

export function analyzedDocument(fixture: FixtureDocument): AnalyzedDocument {
  const given = fixture.sections[0]?.heading === undefined ? fixture.sections : [{ paragraphs: [] }, ...fixture.sections];
  let text = fixture.title ? `# ${fixture.title}\n\n` : '';
  const sections: Section[] = [];
  const paragraphs: Paragraph[] = [];
  const sentences: Sentence[] = [];
  const words: (readonly string[])[] = [];
  const terms: (readonly string[])[] = [];
  const headingTerms: (readonly string[])[] = [];

  given.forEach((section, s) => {
    if (s > 0 && section.heading === undefined) throw new Error('only the first fixture section may omit its heading');
    const heading = section.heading ?? '';
    const headingStart = text.length;
    if (s > 0) text += `## ${heading}\n\n`;
    const headingEnd = text.length;
    const contentSentences = section.paragraphs.flat();
    let positionInSection = 0;
    for (const [p, paragraphSentences] of section.paragraphs.entries()) {
      const paragraphIndex = paragraphs.length;
      const paragraphStart = text.length;
      const indices: number[] = [];
      paragraphSentences.forEach((sentence, k) => {
        const sentenceText = `${wordsOf(sentence).join(' ')}.`;
        const start = text.length;
        text += sentenceText + (k < paragraphSentences.length - 1 ? ' ' : '');
        const index = sentences.length;
        indices.push(index);
        sentences.push({
          index,
          text: sentenceText,
          span: { start, end: start + sentenceText.length },
          section: s,
          paragraph: paragraphIndex,
          positionInParagraph: k,
          paragraphLength: paragraphSentences.length,
          positionInSection: positionInSection++,
          sectionLength: contentSentences.length,
        });
        words.push(wordsOf(sentence));
        terms.push(termsOf(sentence));
      });
      paragraphs.push({ index: paragraphIndex, kind: section.kinds?.[p] ?? 'paragraph', span: { start: paragraphStart, end: text.length }, section: s, listDepth: 0, leadIn: null, sentences: indices });
      text += '\n\n';
    }
    sections.push({
      index: s,
      heading,
      depth: s === 0 ? 0 : (section.depth ?? 2),
      headingSpan: s === 0 ? null : { start: headingStart, end: headingEnd },
      span: { start: headingStart, end: text.length },
      parent: s === 0 ? null : 0,
    });
    headingTerms.push(section.headingTerms ?? (heading ? heading.toLowerCase().split(/\s+/) : []));
  });

  return {
    doc: { text, baseOffset: 0, format: 'markdown', title: fixture.title ?? null, sections, paragraphs, sentences, skipped: [] },
    language: 'en',
    words,
    terms,
    titleTerms: fixture.titleTerms ?? (fixture.title ? fixture.title.toLowerCase().split(/\s+/) : []),
    headingTerms,
  };
}
