/**
 * Refuses input that cannot be summarized sensibly, with a one-line reason instead of a hang or
 * a page of garbage, and keeps text that cannot be printed faithfully (lone surrogates) out of
 * what the engine hands back.
 */
import type { ParsedDocument } from './types';

/** Share of NUL or other C0 control characters above which text is treated as binary (common practice, no source). */
const BINARY_CONTROL_SHARE = 0.01;
const SAMPLE = 65_536;

export function inputProblem(text: string, maxChars: number): string | null {
  if (text.length > maxChars) {
    return `The text is ${formatCount(text.length)} characters long, above the ${formatCount(maxChars)}-character limit; summarize a selection or raise the limit.`;
  }
  if (looksBinary(text)) return 'The text looks like binary data (it contains NUL or control characters), so it was not summarized.';
  return null;
}

export function looksBinary(text: string): boolean {
  const sample = text.length > SAMPLE ? text.slice(0, SAMPLE) : text;
  if (sample.includes('\u0000')) return true;
  let control = 0;
  for (let i = 0; i < sample.length; i++) {
    const c = sample.charCodeAt(i);
    if (c < 32 && c !== 9 && c !== 10 && c !== 13 && c !== 12) control++;
  }
  return sample.length > 0 && control / sample.length > BINARY_CONTROL_SHARE;
}

function formatCount(n: number): string {
  return n.toLocaleString('en-US');
}

/** A UTF-16 code unit of a surrogate pair without its other half (text that was cut or badly converted). */
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;

export function loneSurrogates(text: string): number {
  LONE_SURROGATE.lastIndex = 0;
  let count = 0;
  while (LONE_SURROGATE.exec(text) !== null) count++;
  return count;
}

/** `text` with each lone surrogate replaced by U+FFFD: the same length, so offsets into it still hold. */
export function wellFormed(text: string): string {
  return text.replace(LONE_SURROGATE, '\ufffd');
}

/**
 * The document with well-formed sentence, heading and title texts, and a notice, when the input
 * holds lone surrogates; unchanged otherwise. Spans and `doc.text` stay as given: a caller slices
 * its own text with them.
 */
export function withWellFormedTexts(doc: ParsedDocument): { readonly doc: ParsedDocument; readonly notices: readonly string[] } {
  const count = loneSurrogates(doc.text);
  if (count === 0) return { doc, notices: [] };
  return {
    doc: {
      ...doc,
      title: doc.title === null ? null : wellFormed(doc.title),
      sections: doc.sections.map((section) => ({ ...section, heading: wellFormed(section.heading) })),
      sentences: doc.sentences.map((sentence) => ({ ...sentence, text: wellFormed(sentence.text) })),
    },
    notices: [`The text holds ${formatCount(count)} lone surrogate code unit${count === 1 ? '' : 's'} (broken UTF-16); quoted text shows each as U+FFFD (�).`],
  };
}
