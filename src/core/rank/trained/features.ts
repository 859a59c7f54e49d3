/**
 * Discrete sentence features for the trainable ranker.
 *
 * The first five follow J. Kupiec, J. Pedersen and F. Chen, "A Trainable Document Summarizer",
 * SIGIR 1995: sentence length cut-off, fixed phrases (cue), paragraph position, thematic words and
 * upper-case (proper-noun) words. Kupiec et al. used binary or three-valued features; we bin a
 * little finer where the value is a count. The rest are ours: the heading prior, where the sentence
 * sits in the document and its section, what kind of block it came from, title overlap, how it
 * ends, and its rank under the centroid and LexRank rankers.
 *
 * Every feature takes values 0..arity-1. A model stores the arity it was trained with; a model
 * whose arities differ from these definitions is refused on load.
 */
// Rankers are imported one by one, not through rank/index, so the blend may use this model without an import cycle.
import { centroidRank } from '../centroid';
import { lexRank } from '../lexrank';
import { countPhrases, DEFAULT_CUE_WORDS, phraseIndex } from '../edmundson';
import { sectionPriors } from '../heading-prior';
import { withDefaultsOnce } from '../memo';
import { termIndexOf } from '../../vectors';
import type { AnalyzedDocument, BlockKind } from '../../types';

export interface FeatureDefinition {
  readonly name: string;
  readonly arity: number;
  /** What each value means, for people reading a model file. */
  readonly values: readonly string[];
}

export const FEATURES = [
  { name: 'length', arity: 5, values: ['1-5 words', '6-12', '13-25', '26-40', 'over 40'] },
  { name: 'cue', arity: 3, values: ['none', 'indicator phrase', 'hedge'] },
  { name: 'paragraphPosition', arity: 4, values: ['alone', 'first', 'middle', 'last'] },
  { name: 'documentZone', arity: 4, values: ['first 3 paragraphs', 'paragraphs 4-10', 'middle', 'last 5 paragraphs'] },
  { name: 'sectionPosition', arity: 3, values: ['first in section', '2nd-3rd', 'later'] },
  { name: 'thematic', arity: 4, values: ['0 thematic words', '1', '2', '3 or more'] },
  { name: 'properNoun', arity: 2, values: ['no', 'capitalised word inside the sentence'] },
  { name: 'headingPrior', arity: 5, values: ['< 0.7', '0.7-0.95', 'neutral', '1.05-1.35', '> 1.35'] },
  { name: 'blockKind', arity: 4, values: ['paragraph', 'list item', 'quote', 'table cell'] },
  { name: 'sectionDepth', arity: 3, values: ['before any heading', 'top-level section', 'sub-section'] },
  { name: 'titleOverlap', arity: 3, values: ['0 title terms', '1', '2 or more'] },
  { name: 'ending', arity: 4, values: ['full stop', 'colon', 'question mark', 'other'] },
  { name: 'centroidRank', arity: 4, values: ['top 10%', '10-25%', '25-50%', 'lower half'] },
  { name: 'lexrankRank', arity: 4, values: ['top 10%', '10-25%', '25-50%', 'lower half'] },
] as const satisfies readonly FeatureDefinition[];

export type FeatureName = (typeof FEATURES)[number]['name'];

/** Feature values of every sentence: one Uint8Array per feature, indexed by sentence. */
export type FeatureMatrix = Readonly<Record<FeatureName, Uint8Array>>;

/**
 * Kupiec's fixed phrases were indicator phrases of scientific abstracts ("in conclusion", "this
 * paper"); these are general English phrases that announce what a document proposes or is about
 * (ours), plus the Edmundson ranker's bonus words.
 */
export const INDICATOR_PHRASES: readonly string[] = [
  'in summary', 'in short', 'in conclusion', 'to summarize', 'this document', 'this proposal', 'this change',
  'this design', 'we propose', 'proposes', 'introduces', 'the goal', 'the aim', 'the purpose', 'the main',
  ...DEFAULT_CUE_WORDS.bonus,
];
export const HEDGE_PHRASES: readonly string[] = DEFAULT_CUE_WORDS.stigma;

/** Kupiec et al.: the thematic words are the document's most frequent content words (they used a small fixed number). */
const THEMATIC_WORDS = 10;

const BLOCK_KINDS: readonly BlockKind[] = ['paragraph', 'listItem', 'quote', 'tableCell'];

function lengthBin(words: number): number {
  if (words <= 5) return 0; // Kupiec et al.'s cut-off: sentences of five words or fewer.
  if (words <= 12) return 1;
  if (words <= 25) return 2;
  if (words <= 40) return 3;
  return 4;
}

function priorBin(prior: number): number {
  if (prior < 0.7) return 0;
  if (prior < 0.95) return 1;
  if (prior <= 1.05) return 2;
  if (prior <= 1.35) return 3;
  return 4;
}

/** Rank-percentile bins of scores within one document (ties share the better rank). */
export function rankBins(scores: Float64Array): Uint8Array {
  const n = scores.length;
  if (!scores.some(Number.isNaN)) return rankBinsBySearch(scores);
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => scores[b]! - scores[a]! || a - b);
  const bins = new Uint8Array(n);
  let rank = 0;
  order.forEach((sentence, position) => {
    if (position > 0 && scores[sentence] !== scores[order[position - 1]!]) rank = position;
    const share = n <= 1 ? 0 : rank / n;
    bins[sentence] = share < 0.1 ? 0 : share < 0.25 ? 1 : share < 0.5 ? 2 : 3;
  });
  return bins;
}

/**
 * rankBins without a comparator sort: a sentence's rank (ties sharing the better one) is the number
 * of scores above its own, read from a numeric sort by binary search. Same bins; NaN-free scores only.
 */
function rankBinsBySearch(scores: Float64Array): Uint8Array {
  const n = scores.length;
  const ascending = Float64Array.from(scores).sort();
  const bins = new Uint8Array(n);
  for (let s = 0; s < n; s++) {
    // First position holding a score above scores[s]; everything from there on is higher.
    let low = 0;
    let high = n;
    while (low < high) {
      const mid = (low + high) >> 1;
      if (ascending[mid]! <= scores[s]!) low = mid + 1;
      else high = mid;
    }
    const rank = n - low;
    const share = n <= 1 ? 0 : rank / n;
    bins[s] = share < 0.1 ? 0 : share < 0.25 ? 1 : share < 0.5 ? 2 : 3;
  }
  return bins;
}

function thematicTerms(a: AnalyzedDocument): Set<string> {
  // The shared term index already counts every term (vocabulary in order of first appearance).
  const { vocabulary, totalCount } = termIndexOf(a);
  const frequent: [string, number][] = [];
  for (const [term, id] of vocabulary) if (totalCount[id]! >= 2) frequent.push([term, totalCount[id]!]);
  frequent.sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1));
  return new Set(frequent.slice(0, THEMATIC_WORDS).map(([term]) => term));
}

/** Module-level, not in the function: the bundler turns a \p{…} literal into `new RegExp(…)` at every call. */
const WORD_FOR_CAPITALS = /[\p{L}][\p{L}\p{N}'’-]*/gu;

/** A capitalised word after the first word (proper nouns, names of things); acronyms count too. */
function hasInnerCapital(text: string): boolean {
  // Word by word, stopping at the first capital (matching every word of every sentence cost more).
  const word = WORD_FOR_CAPITALS;
  word.lastIndex = 0;
  if (word.exec(text) === null) return false;
  for (let match = word.exec(text); match !== null; match = word.exec(text)) {
    const first = match[0][0]!;
    if (first !== first.toLowerCase() && match[0] !== 'I') return true;
  }
  return false;
}

function endingBin(text: string): number {
  const end = text.trimEnd().slice(-1);
  if (end === '.' || end === '!') return 0;
  if (end === ':') return 1;
  if (end === '?') return 2;
  return 3;
}

export function sentenceFeatures(a: AnalyzedDocument): FeatureMatrix {
  const { doc } = a;
  const n = doc.sentences.length;
  const make = () => new Uint8Array(n);
  const m = {
    length: make(), cue: make(), paragraphPosition: make(), documentZone: make(), sectionPosition: make(),
    thematic: make(), properNoun: make(), headingPrior: make(), blockKind: make(), sectionDepth: make(),
    titleOverlap: make(), ending: make(), centroidRank: make(), lexrankRank: make(),
  } satisfies Record<FeatureName, Uint8Array>;
  if (n === 0) return m;

  // Indexed once per document, not once per sentence.
  const indicatorIndex = phraseIndex(INDICATOR_PHRASES);
  const hedgeIndex = phraseIndex(HEDGE_PHRASES);
  const priors = sectionPriors(doc.sections);
  const thematic = thematicTerms(a);
  const title = new Set(a.titleTerms);
  const headedDepths = doc.sections.filter((s) => s.depth > 0).map((s) => s.depth);
  const topDepth = headedDepths.length > 0 ? Math.min(...headedDepths) : 1;
  // Zones count content paragraphs (those holding sentences), as Kupiec et al. counted paragraphs.
  const contentParagraphs = doc.paragraphs.filter((p) => p.sentences.length > 0).map((p) => p.index);
  const paragraphOrdinal = new Map(contentParagraphs.map((index, ordinal) => [index, ordinal]));

  doc.sentences.forEach((sentence, i) => {
    const words = a.words[i]!;
    m.length[i] = lengthBin(words.length);
    const bonus = countPhrases(words, indicatorIndex);
    const hedge = countPhrases(words, hedgeIndex);
    m.cue[i] = bonus > hedge ? 1 : hedge > bonus ? 2 : 0;
    m.paragraphPosition[i] =
      sentence.paragraphLength <= 1 ? 0 : sentence.positionInParagraph === 0 ? 1 : sentence.positionInParagraph === sentence.paragraphLength - 1 ? 3 : 2;
    const ordinal = paragraphOrdinal.get(sentence.paragraph) ?? 0;
    const fromEnd = contentParagraphs.length - 1 - ordinal;
    m.documentZone[i] = ordinal < 3 ? 0 : ordinal < 10 ? 1 : fromEnd < 5 ? 3 : 2;
    m.sectionPosition[i] = sentence.positionInSection === 0 ? 0 : sentence.positionInSection < 3 ? 1 : 2;
    const distinct = new Set(a.terms[i]);
    let themes = 0;
    for (const term of distinct) if (thematic.has(term)) themes++;
    m.thematic[i] = Math.min(3, themes);
    m.properNoun[i] = hasInnerCapital(sentence.text) ? 1 : 0;
    m.headingPrior[i] = priorBin(priors[sentence.section] ?? 1);
    const kind = doc.paragraphs[sentence.paragraph]?.kind ?? 'paragraph';
    m.blockKind[i] = Math.max(0, BLOCK_KINDS.indexOf(kind));
    const depth = doc.sections[sentence.section]?.depth ?? 0;
    m.sectionDepth[i] = depth === 0 ? 0 : depth <= topDepth ? 1 : 2;
    let shared = 0;
    for (const term of distinct) if (title.has(term)) shared++;
    m.titleOverlap[i] = Math.min(2, shared);
    m.ending[i] = endingBin(sentence.text);
  });
  m.centroidRank.set(rankBins(withDefaultsOnce(a, 'centroid', () => centroidRank(a)).scores));
  m.lexrankRank.set(rankBins(withDefaultsOnce(a, 'lexrank', () => lexRank(a)).scores));
  return m;
}
