/**
 * "Why this sentence", in words from the features behind the pick ("opening sentence of
 * Motivation; shares the key terms lifetime, borrow with the title; among the most central
 * sentences"), with the numbers kept apart for a toggle. Pure.
 */
import { METHOD_INFO, wordTokens } from '../core/index';
import type { PickedSentence, Summary } from '../core/index';
import { ordinal, type Wording } from './wording';

/** Feature values (scaled 0-1 by the engine) at or above this read as "high" (common practice, no source). */
const HIGH = 0.75;
const MAX_TERMS = 3;
/** Short words and these common ones are not "key terms" worth naming (common practice, no source). */
const MIN_TERM_LENGTH = 4;
const COMMON = new Set(['this', 'that', 'with', 'from', 'have', 'will', 'when', 'what', 'which', 'their', 'there', 'they', 'them', 'then', 'than', 'into', 'about', 'also', 'been', 'were', 'more', 'most', 'some', 'such', 'only', 'over', 'each', 'other', 'should', 'would', 'could']);

/** Feature names the engine reports, worded as what a high value means. */
export const FEATURE_WORDS: Readonly<Record<string, string>> = {
  lexrank: 'among the most central sentences (many others say something similar)',
  textrank: 'shares words with many other sentences',
  centroid: 'close to the document’s main topic',
  bayes: 'looks like the sentences people put in summaries (trained model)',
  luhn: 'dense with the document’s key terms',
  position: 'sits early in its section',
  edmundson: 'carries signal phrases, title or heading words',
};

/**
 * What each number behind a pick measures, for "Show the numbers": every feature any method
 * reports (the method's published name stays in the method line above them).
 */
export const FEATURE_LABELS: Readonly<Record<string, string>> = {
  length: 'sentence length',
  cue: 'cue phrase',
  paragraphPosition: 'place in its paragraph',
  documentZone: 'place in the document (paragraphs)',
  sectionPosition: 'place in its section',
  thematic: 'thematic words',
  properNoun: 'capitalised words inside it',
  headingPrior: 'how summary-worthy its heading is',
  blockKind: 'kind of block (paragraph, list, quote, table)',
  sectionDepth: 'heading level',
  titleOverlap: 'title words',
  ending: 'how it ends (full stop, colon, question mark)',
  centroidRank: 'rank by the centroid method',
  lexrankRank: 'rank by LexRank',
  sectionClass: 'kind of section (from its heading)',
  intentCue: 'says what is proposed',
  headingOverlap: 'words of its heading',
  titleShare: 'share of its words from the title',
  documentShare: 'place in the document (sentences)',
  firstContentSection: 'first section with content',
  placeholder: 'placeholder answer (None, N/A, TBD…)',
  linkOnly: 'only a link or a pointer',
  fragment: 'fragment (few words)',
  textrankRank: 'rank by TextRank',
  luhnRank: 'rank by Luhn’s method',
  edmundsonRank: 'rank by Edmundson’s method',
  lexrankScore: 'LexRank score',
  centroidScore: 'centroid score',
  textrankScore: 'TextRank score',
  bayesScore: 'naive Bayes score',
  bayes: 'naive Bayes model',
  lexrank: 'LexRank centrality',
  centroid: 'closeness to the centroid',
  paragraphStart: 'opens a paragraph',
  paragraphEnd: 'closes a paragraph',
  sectionStart: 'opens a section',
  sectionEnd: 'closes a section',
  documentLead: 'in the document’s opening',
  luhn: 'Luhn significance',
  significantWords: 'significant words',
  key: 'key words (Edmundson)',
  title: 'title and heading words (Edmundson)',
  location: 'location (Edmundson)',
  links: 'similar sentences linked',
  textrank: 'TextRank score',
};

function terms(text: string): Set<string> {
  return new Set(wordTokens(text).filter((w) => w.length >= MIN_TERM_LENGTH && !COMMON.has(w)));
}

export function whyInWords(pick: PickedSentence, summary: Summary, wording: Wording): string {
  if (pick.rank === 0) return wording.t('Added by a repair, so the sentence before it reads in context.');
  const parts: string[] = [];
  const sentence = summary.document.sentences[pick.sentence];
  const section = pick.sectionPath.at(-1);
  if (sentence && section) {
    parts.push(
      sentence.positionInSection === 0
        ? wording.t('opening sentence of “{0}”', section)
        : wording.t('{0} of {1} sentences in “{2}”', ordinal(wording, sentence.positionInSection + 1), wording.count(sentence.sectionLength), section),
    );
  } else if (sentence && sentence.positionInParagraph === 0) {
    parts.push(wording.t('opening sentence of its paragraph'));
  }
  const title = summary.document.title;
  if (title) {
    const own = terms(pick.text);
    const shared = [...terms(title)].filter((w) => own.has(w)).slice(0, MAX_TERMS);
    if (shared.length > 0) parts.push(wording.t('shares the key terms {0} with the title', shared.map((w) => `“${w}”`).join(', ')));
  }
  const strong = Object.entries(pick.features)
    .filter(([name, value]) => Number.isFinite(value) && value >= HIGH && FEATURE_WORDS[name])
    .sort((a, b) => b[1] - a[1])
    .slice(0, 2)
    .map(([name]) => wording.t(FEATURE_WORDS[name]!));
  parts.push(...strong);
  parts.push(wording.t('ranked {0} of {1} sentences', ordinal(wording, pick.rank), wording.count(summary.stats.sentencesIn)));
  return capitalized(parts.join('; ')) + '.';
}

const capitalized = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return Math.abs(value) >= 100 ? value.toFixed(0) : value.toFixed(3);
}

/** The numbers behind the words: rank, score, and each feature (the method's published name kept here). */
export function whyNumbers(pick: PickedSentence, summary: Summary, wording: Wording): string[] {
  if (pick.rank === 0) return [];
  const lines = [wording.t('rank {0} of {1}, score {2} ({3})', wording.count(pick.rank), wording.count(summary.stats.sentencesIn), formatNumber(pick.score), summary.method)];
  const meaning = METHOD_INFO.find((m) => m.name === summary.method)?.numbers;
  if (meaning) lines.push(wording.t(meaning));
  for (const [name, value] of Object.entries(pick.features).filter(([, v]) => Number.isFinite(v)).sort((a, b) => Math.abs(b[1]) - Math.abs(a[1]))) {
    const label = FEATURE_LABELS[name];
    // A name without a label (none today; extension-panel.test.ts tries every method) is shown as it is.
    const shown = label ? capitalized(wording.t(label)) : name;
    // A trained model's discrete feature: the sentence's value, since the number is that value's weight.
    const of = pick.featureValues?.[name];
    lines.push(of === undefined ? `${shown}: ${formatNumber(value)}` : `${shown} — ${wording.t(of)}: ${formatNumber(value)}`);
  }
  return lines;
}
