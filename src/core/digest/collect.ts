/**
 * One document's contribution to a digest, built while the document is read and kept after it is
 * dropped: its best sentences by its own ranking (at most `keepPerDocument`), each with its terms,
 * words, line and section path. Holding only these bounds a digest's memory by the number of
 * documents, not by their size.
 */
import { prepareDocument, rankPrepared, type SummarizeRequest } from '../summarize';
import { prepareSelection } from '../select/selection-input';
import { sectionPath } from '../summary/sections';
import { LineIndex } from '../text/lines';
import type { Span } from '../types';

export interface PoolSentence {
  /** Index of the document in the digest (order of `add`). */
  readonly document: number;
  readonly text: string;
  readonly span: Span;
  /** 1-based line in its document. */
  readonly line: number;
  readonly sectionPath: readonly string[];
  /** Stemmed content terms (the engine's analysis of its document). */
  readonly terms: readonly string[];
  readonly words: number;
  /** Its document's own relevance, in [0, 1] (the single-document selection's: scaled scores × fitness). */
  readonly own: number;
  /** Position among its document's sentences (document order). */
  readonly order: number;
}

export interface CollectedDocument {
  readonly name: string;
  readonly title: string | null;
  readonly sentencesIn: number;
  readonly wordsIn: number;
  /** Words of the sentences a summary could pick: the document's weight in the digest. */
  readonly candidateWords: number;
  readonly kept: readonly PoolSentence[];
  readonly notices: readonly string[];
  /** Set when the document was not read (too large, binary); the reason, for people. */
  readonly refused?: string;
}

export function collectDocument(index: number, name: string, text: string, request: SummarizeRequest, keepPerDocument: number): CollectedDocument {
  const preparation = prepareDocument(text, request);
  if (!preparation.ok) {
    const refused = preparation.refused.refused ?? 'not read';
    return { name, title: null, sentencesIn: 0, wordsIn: 0, candidateWords: 0, kept: [], notices: [refused], refused };
  }
  const { prepared } = preparation;
  const { analyzed } = prepared;
  const { doc } = analyzed;
  const ranked = rankPrepared(prepared);
  // The single-document selection's view: barred kinds out, relevance = scaled scores × fitness.
  const { input, candidateList: candidates, kinds } = prepareSelection(analyzed, ranked, prepared.options);
  const { relevance } = input;
  // Fragments (lead-ins, labels, bare references) never stand for a document in a digest.
  const best = candidates
    .filter((i) => kinds.fragment[i] !== 1).sort((x, y) => relevance[y]! - relevance[x]! || x - y).slice(0, keepPerDocument).sort((x, y) => x - y);
  const lines = new LineIndex(doc.text);
  const kept = best.map((i): PoolSentence => {
    const sentence = doc.sentences[i]!;
    return {
      document: index,
      text: sentence.text,
      span: sentence.span,
      line: lines.lineNumber(sentence.span.start - doc.baseOffset),
      sectionPath: sectionPath(doc, sentence.section),
      terms: analyzed.terms[i]!,
      words: analyzed.words[i]!.length,
      own: relevance[i]!,
      order: i,
    };
  });
  let wordsIn = 0;
  for (const words of analyzed.words) wordsIn += words.length;
  let candidateWords = 0;
  for (const i of candidates) candidateWords += analyzed.words[i]!.length;
  return { name, title: doc.title, sentencesIn: doc.sentences.length, wordsIn, candidateWords, kept, notices: [...(prepared.notices ?? [])] };
}
