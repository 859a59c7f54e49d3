/**
 * Token views of a parsed document, built once and shared by every ranker, the selector,
 * the coherence checker and the evaluators.
 */
import { contentTerms, DETECTION_SAMPLE, detectLanguage, wordTokens } from './text/tokens';
import type { AnalyzedDocument, ParsedDocument } from './types';

/**
 * Picks the language: an explicit code wins; 'auto' looks at the document's own sentences.
 * `words` (each sentence's word tokens, as analyze makes them) spares tokenizing the sample again.
 */
export function resolveLanguage(doc: ParsedDocument, requested: string, words?: readonly (readonly string[])[]): string {
  if (requested !== 'auto') return requested;
  return detectLanguage(languageSample(doc), words ? () => sampleTokens(doc, words) : undefined);
}

/**
 * The word tokens of the detection sample (languageSample cut to DETECTION_SAMPLE characters) from
 * the sentences' own tokens: no word spans the space that joins two sentences, nor does lower-casing
 * depend on what lies beyond it, so the sample's tokens are its sentences' tokens in turn, the
 * sentence cut by the limit tokenized as cut.
 */
export function sampleTokens(doc: ParsedDocument, words: readonly (readonly string[])[]): string[] {
  const tokens: string[] = [];
  let at = 0; // where the sentence starts in the sample
  doc.sentences.forEach((sentence, i) => {
    if (at >= DETECTION_SAMPLE) return;
    const end = at + sentence.text.length;
    if (end <= DETECTION_SAMPLE) for (const word of words[i]!) tokens.push(word);
    else for (const word of wordTokens(sentence.text.slice(0, DETECTION_SAMPLE - at))) tokens.push(word);
    at = end + 1;
  });
  return tokens;
}

/** The text language detection reads: the first sentences, about 20,000 characters of them. */
export function languageSample(doc: ParsedDocument): string {
  // Detection only needs a sample; joining every sentence of a 10 MB document would double memory.
  let sample = '';
  for (const sentence of doc.sentences) {
    if (sample.length > DETECTION_SAMPLE) break;
    sample += sentence.text + ' ';
  }
  return sample;
}

/** `words`: each sentence's word tokens when the caller has them already (see resolveLanguage). */
export function analyze(doc: ParsedDocument, language: string, words: readonly (readonly string[])[] = sentenceWords(doc)): AnalyzedDocument {
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

/** Each sentence's word tokens. */
export function sentenceWords(doc: ParsedDocument): string[][] {
  return doc.sentences.map((sentence) => wordTokens(sentence.text));
}
