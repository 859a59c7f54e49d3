/**
 * Token views of a parsed document, built once and shared by every ranker, the selector,
 * the coherence checker and the evaluators.
 */
import { contentTerms, detectLanguage, wordTokens } from './text/tokens';
import type { AnalyzedDocument, ParsedDocument } from './types';

/** Picks the language: an explicit code wins; 'auto' looks at the document's own sentences. */
export function resolveLanguage(doc: ParsedDocument, requested: string): string {
  if (requested !== 'auto') return requested;
  return detectLanguage(languageSample(doc));
}

/** The text language detection reads: the first sentences, about 20,000 characters of them. */
export function languageSample(doc: ParsedDocument): string {
  // Detection only needs a sample; joining every sentence of a 10 MB document would double memory.
  let sample = '';
  for (const sentence of doc.sentences) {
    if (sample.length > 20_000) break;
    sample += sentence.text + ' ';
  }
  return sample;
}

export function analyze(doc: ParsedDocument, language: string): AnalyzedDocument {
  const words = doc.sentences.map((sentence) => wordTokens(sentence.text));
  const terms = words.map((sentenceWords) => contentTerms(sentenceWords, language));
  const termsOf = (text: string) => contentTerms(wordTokens(text), language);
  return {
    doc,
    language,
    words,
    terms,
    titleTerms: doc.title ? termsOf(doc.title) : [],
    headingTerms: doc.sections.map((section) => termsOf(section.heading)),
  };
}
