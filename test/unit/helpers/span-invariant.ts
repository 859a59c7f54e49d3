/**
 * The span invariant, shared by the range-invariant tests and the property tests: every sentence's
 * span points at source text that holds the sentence's words in order; spans lie inside the
 * document, increase and never overlap.
 */
import type { ParsedDocument, Span } from '../../../src/core/types';

const WORD = /[\p{L}\p{N}]+/gu;

/** Letter/number runs of `text`, the unit the invariant compares. */
export const words = (text: string): string[] => text.match(WORD) ?? [];

/**
 * True when the sentence's words appear, in order, in the source's words. One sentence word may be
 * built from several source words in order, because the parser joins text across inline markup
 * it drops (`` `AttrId`s ``, a link's URL between link text and the following text).
 *
 * A first-fit scan settles almost every sentence; when it fails, a search that also tries later
 * matches decides (first fit can be fooled: "42" built from the "4" and "2" of an image path,
 * skipping the real "42").
 */
export function inOrder(sentenceWords: readonly string[], sourceWords: readonly string[]): boolean {
  return firstFit(sentenceWords, sourceWords) || anyFit(sentenceWords, sourceWords);
}

/** Where a word built from source words starting at `first` ends (exclusive), or -1. */
function compositeEnd(word: string, sourceWords: readonly string[], first: number): number {
  if (!word.startsWith(sourceWords[first]!)) return -1;
  let rest = word.slice(sourceWords[first]!.length);
  let k = first + 1;
  for (; rest.length > 0 && k < sourceWords.length; k++) {
    if (rest.startsWith(sourceWords[k]!)) rest = rest.slice(sourceWords[k]!.length);
  }
  return rest.length === 0 ? k : -1;
}

function firstFit(sentenceWords: readonly string[], sourceWords: readonly string[]): boolean {
  let next = 0;
  for (const word of sentenceWords) {
    let found = -1;
    for (let first = next; first < sourceWords.length && found < 0; first++) found = compositeEnd(word, sourceWords, first);
    if (found < 0) return false;
    next = found;
  }
  return true;
}

/** Depth-first search over every match of every word, remembering states that failed. */
function anyFit(sentenceWords: readonly string[], sourceWords: readonly string[]): boolean {
  const failed = new Set<number>();
  const width = sourceWords.length + 1;
  const fits = (i: number, from: number): boolean => {
    if (i === sentenceWords.length) return true;
    if (failed.has(i * width + from)) return false;
    for (let first = from; first < sourceWords.length; first++) {
      const end = compositeEnd(sentenceWords[i]!, sourceWords, first);
      if (end >= 0 && fits(i + 1, end)) return true;
    }
    failed.add(i * width + from);
    return false;
  };
  return fits(0, 0);
}

export function within(span: Span, outer: Span): boolean {
  return outer.start <= span.start && span.end <= outer.end;
}

/** Every broken rule, described; empty when the document keeps the invariant. */
export function invariantFailures(doc: ParsedDocument): string[] {
  const failures: string[] = [];
  const whole: Span = { start: doc.baseOffset, end: doc.baseOffset + doc.text.length };
  let previousEnd = whole.start;
  for (const sentence of doc.sentences) {
    const { span } = sentence;
    const label = `sentence ${sentence.index} ${JSON.stringify(sentence.text.slice(0, 60))}`;
    if (!(span.start < span.end) || !within(span, whole)) failures.push(`${label}: span ${span.start}-${span.end} outside the document`);
    if (span.start < previousEnd) failures.push(`${label}: overlaps or precedes the previous sentence`);
    previousEnd = span.end;
    const source = doc.text.slice(span.start - doc.baseOffset, span.end - doc.baseOffset);
    if (!inOrder(words(sentence.text), words(source))) {
      failures.push(`${label}: words not in source slice ${JSON.stringify(source.slice(0, 80))}`);
    }
    const paragraph = doc.paragraphs[sentence.paragraph];
    if (paragraph === undefined || !paragraph.sentences.includes(sentence.index) || !within(span, paragraph.span)) {
      failures.push(`${label}: not inside its paragraph`);
    }
  }
  for (const skipped of doc.skipped) {
    if (!within(skipped.span, whole)) failures.push(`skipped ${skipped.reason}: outside the document`);
  }
  for (const section of doc.sections) {
    if (!within(section.span, whole)) failures.push(`section ${section.index}: outside the document`);
    if (section.headingSpan !== null && !within(section.headingSpan, section.span)) {
      failures.push(`section ${section.index}: heading outside its section`);
    }
  }
  return failures;
}
