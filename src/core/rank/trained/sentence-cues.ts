/**
 * Sentence-level signals for the maximum-entropy ranker that the naive Bayes features do not
 * carry: proposal-intent cue phrases, placeholder answers, link-only sentences, and the first
 * section that holds real content. The word lists are general English (ours, common practice, no
 * source); none names a particular document collection.
 */
import { countPhrases, phraseIndex } from '../edmundson';
import { headingClassesOf, type HeadingClass } from '../../text/headings';
import { isPointerSentence } from '../../text/pointers';
import { withoutWebAddresses } from '../../text/web-addresses';
import type { AnalyzedDocument } from '../../types';

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const TWO_LETTERS = /\p{L}{2,}/u;

/**
 * Phrases with which authors state what their document proposes or does ("This proposal adds…",
 * "We propose…"); matched on lower-cased word tokens.
 */
export const INTENT_PHRASES: readonly string[] = [
  'this proposal', 'this document', 'this change', 'this design', 'this spec', 'this specification', 'this rfc', 'this feature',
  'this work', 'this patch', 'this plan', 'we propose', 'i propose', 'proposes', 'propose to', 'proposed to', 'we want to',
  'we would like to', 'the goal of', 'the aim of', 'the purpose of', 'aims to', 'this adds', 'this introduces', 'introduces',
  'this allows', 'this would', 'this will', 'will allow', 'would allow', 'in order to', 'add support', 'adds support',
];

const INTENT_INDEX = phraseIndex(INTENT_PHRASES);

/** 0 no intent phrase, 1 one within the first five words, 2 one later in the sentence. */
export function intentCue(words: readonly string[]): number {
  if (countPhrases(words, INTENT_INDEX) === 0) return 0;
  return countPhrases(words.slice(0, 6), INTENT_INDEX) > 0 ? 1 : 2;
}

/** Answers a template leaves when a section does not apply ("None.", "N/A", "TBD", "Etc."). */
const PLACEHOLDER = /^(?:none|n\/?a|no|yes|tbd|tba|todo|etc|nothing|not applicable|none so far|none yet|none known|unknown|same as above|see above|see below|others)\b[\s\p{P}]*$/iu;

export function isPlaceholder(text: string): boolean {
  return PLACEHOLDER.test(text.trim());
}

/**
 * A sentence that only points elsewhere: a bare URL, or a pointer ("See …", "For more
 * information, see …"; text/pointers.ts). Links in the source keep their visible text, so a
 * pointer is judged by its shape.
 */
export function isLinkOnly(text: string, words: readonly string[]): boolean {
  const withoutUrls = withoutWebAddresses(text);
  if (withoutUrls.length < text.length && !TWO_LETTERS.test(withoutUrls.replace(/\b(?:see|at|here|link)\b/giu, ''))) return true;
  return isPointerSentence(text, words.length);
}

/** Classes that mark a section as something other than the document's own content. */
const NOT_CONTENT: ReadonlySet<HeadingClass> = new Set(['discussion', 'aside', 'backMatter']);

/** Sentences of at least this many words count as content when finding the first content section (ours). */
const CONTENT_SENTENCE_WORDS = 8;

/**
 * The first section, in document order, whose heading is not of a non-content class and which
 * holds at least two sentences of CONTENT_SENTENCE_WORDS words or more that are not placeholders:
 * it skips sign-off checklists, status notices and definitions at the top. −1 when there is none.
 */
export function firstContentSection(a: AnalyzedDocument): number {
  const { doc } = a;
  const counts = new Map<number, number>();
  for (const sentence of doc.sentences) {
    if (a.words[sentence.index]!.length < CONTENT_SENTENCE_WORDS || isPlaceholder(sentence.text)) continue;
    counts.set(sentence.section, (counts.get(sentence.section) ?? 0) + 1);
  }
  for (const section of doc.sections) {
    if ((counts.get(section.index) ?? 0) < 2) continue;
    if (headingClassesOf(section.heading).some((c) => NOT_CONTENT.has(c))) continue;
    return section.index;
  }
  return -1;
}
