/**
 * Features of the maximum-entropy ranker (maxent.ts). M. Osborne, "Using maximum entropy for
 * sentence extraction", ACL 2002 Workshop on Automatic Summarization: unlike naive Bayes, a
 * maximum-entropy model does not assume the features independent, so overlapping ones (position
 * in the document and the first content section; the cue phrases and the ranker scores) can all
 * be given without counting the same evidence twice.
 *
 * Every naive Bayes feature (features.ts) is reused, and the ones below are added; each takes
 * values 0..arity-1 and becomes one indicator per value (one-hot), as Osborne's features were
 * binary. A model stores the arity it was trained with and is refused when it no longer matches.
 * Today's rankers also enter as scores (CONTINUOUS_FEATURES): each scaled to [0, 1] within the
 * document, one weight each, so the model can lean on them more finely than their rank bins allow.
 */
import { centroidRank } from '../centroid';
import { edmundsonRank } from '../edmundson';
import { lexRank } from '../lexrank';
import { luhnRank } from '../luhn';
import { withDefaultsOnce } from '../memo';
import { textRank } from '../textrank';
import { headingClassesOf, type HeadingClass } from '../../text/headings';
import { minMax } from '../../scale';
import type { AnalyzedDocument } from '../../types';
import { defaultModel, rankBayes } from './model';
import { FEATURES, rankBins, sentenceFeatures, type FeatureDefinition } from './features';
import { firstContentSection, intentCue, isLinkOnly, isPlaceholder } from './sentence-cues';

const SECTION_CLASSES: readonly HeadingClass[] = ['abstract', 'introduction', 'proposal', 'detail', 'discussion', 'aside', 'backMatter'];

const EXTRA_FEATURES = [
  { name: 'sectionClass', arity: 8, values: ['no known heading', ...SECTION_CLASSES.map((c) => (c === 'backMatter' ? 'back matter' : c))] },
  { name: 'intentCue', arity: 3, values: ['none', 'in the first words', 'later in the sentence'] },
  { name: 'headingOverlap', arity: 3, values: ['0 terms of its heading', '1', '2 or more'] },
  { name: 'titleShare', arity: 4, values: ['no title terms', 'under a quarter of its terms', 'a quarter to a half', 'over a half'] },
  { name: 'documentShare', arity: 5, values: ['first 5% of sentences', '5-15%', '15-35%', '35-65%', 'last 35%'] },
  { name: 'firstContentSection', arity: 3, values: ['before it', 'in it', 'after it'] },
  { name: 'placeholder', arity: 2, values: ['no', 'placeholder answer (None, N/A, TBD…)'] },
  { name: 'linkOnly', arity: 2, values: ['no', 'only a link or a pointer'] },
  { name: 'fragment', arity: 3, values: ['7 words or more', '4-6 words', '3 words or fewer'] },
  { name: 'textrankRank', arity: 4, values: ['top 10%', '10-25%', '25-50%', 'lower half'] },
  { name: 'luhnRank', arity: 4, values: ['top 10%', '10-25%', '25-50%', 'lower half'] },
  { name: 'edmundsonRank', arity: 4, values: ['top 10%', '10-25%', '25-50%', 'lower half'] },
] as const satisfies readonly FeatureDefinition[];

/** Ranker scores as inputs: min-max scaled within the document (scale.ts), weight × value. */
const CONTINUOUS_FEATURES = [
  { name: 'lexrankScore', arity: 1, values: ['LexRank score, scaled to 0..1 in the document'] },
  { name: 'centroidScore', arity: 1, values: ['centroid score, scaled to 0..1 in the document'] },
  { name: 'textrankScore', arity: 1, values: ['TextRank score, scaled to 0..1 in the document'] },
  { name: 'bayesScore', arity: 1, values: ['the shipped naive Bayes model’s log-odds, scaled to 0..1 in the document'] },
] as const satisfies readonly FeatureDefinition[];

export const MAXENT_FEATURES: readonly FeatureDefinition[] = [...FEATURES, ...EXTRA_FEATURES, ...CONTINUOUS_FEATURES];

/** Names of the features that hold a scaled score rather than a value index. */
export const CONTINUOUS_NAMES: ReadonlySet<string> = new Set(CONTINUOUS_FEATURES.map((f) => f.name));

/** Per feature and sentence: a value index (0..arity-1), or for continuous features a number in [0, 1]. */
export type MaxentFeatureMatrix = Readonly<Record<string, Uint8Array | Float64Array>>;

/** The class of the sentence's section: its own heading's first class, else its nearest classified ancestor's. */
function sectionClasses(a: AnalyzedDocument): Uint8Array {
  const { sections } = a.doc;
  const out = new Uint8Array(sections.length);
  sections.forEach((section, index) => {
    const own = headingClassesOf(section.heading)[0];
    // Parents come before their children, so the parent's class is ready.
    out[index] = own !== undefined ? 1 + SECTION_CLASSES.indexOf(own) : section.parent === null ? 0 : out[section.parent]!;
  });
  return out;
}

export function maxentFeatures(a: AnalyzedDocument): MaxentFeatureMatrix {
  const base = sentenceFeatures(a);
  const n = a.doc.sentences.length;
  const make = () => new Uint8Array(n);
  const extra: Record<(typeof EXTRA_FEATURES)[number]['name'], Uint8Array> = {
    sectionClass: make(), intentCue: make(), headingOverlap: make(), titleShare: make(), documentShare: make(),
    firstContentSection: make(), placeholder: make(), linkOnly: make(), fragment: make(),
    textrankRank: make(), luhnRank: make(), edmundsonRank: make(),
  };
  if (n === 0) return { ...base, ...extra, lexrankScore: new Float64Array(0), centroidScore: new Float64Array(0), textrankScore: new Float64Array(0), bayesScore: new Float64Array(0) };
  const classes = sectionClasses(a);
  const firstContent = firstContentSection(a);
  const title = new Set(a.titleTerms);
  const headings = a.headingTerms.map((terms) => new Set(terms));
  a.doc.sentences.forEach((sentence, i) => {
    const words = a.words[i]!;
    const terms = new Set(a.terms[i]);
    extra.sectionClass[i] = classes[sentence.section] ?? 0;
    extra.intentCue[i] = intentCue(words);
    const heading = headings[sentence.section] ?? new Set<string>();
    let inHeading = 0;
    let inTitle = 0;
    for (const term of terms) {
      if (heading.has(term)) inHeading++;
      if (title.has(term)) inTitle++;
    }
    extra.headingOverlap[i] = Math.min(2, inHeading);
    const share = terms.size === 0 ? 0 : inTitle / terms.size;
    extra.titleShare[i] = inTitle === 0 ? 0 : share < 0.25 ? 1 : share <= 0.5 ? 2 : 3;
    const position = n <= 1 ? 0 : i / n;
    extra.documentShare[i] = position < 0.05 ? 0 : position < 0.15 ? 1 : position < 0.35 ? 2 : position < 0.65 ? 3 : 4;
    extra.firstContentSection[i] = firstContent < 0 ? 2 : sentence.section < firstContent ? 0 : sentence.section === firstContent ? 1 : 2;
    extra.placeholder[i] = isPlaceholder(sentence.text) ? 1 : 0;
    extra.linkOnly[i] = isLinkOnly(sentence.text, words) ? 1 : 0;
    extra.fragment[i] = words.length >= 7 ? 0 : words.length >= 4 ? 1 : 2;
  });
  extra.textrankRank.set(rankBins(withDefaultsOnce(a, 'textrank', () => textRank(a)).scores));
  extra.luhnRank.set(rankBins(withDefaultsOnce(a, 'luhn', () => luhnRank(a)).scores));
  extra.edmundsonRank.set(rankBins(withDefaultsOnce(a, 'edmundson', () => edmundsonRank(a)).scores));
  const continuous = {
    lexrankScore: minMax(withDefaultsOnce(a, 'lexrank', () => lexRank(a)).scores),
    centroidScore: minMax(withDefaultsOnce(a, 'centroid', () => centroidRank(a)).scores),
    textrankScore: minMax(withDefaultsOnce(a, 'textrank', () => textRank(a)).scores),
    // The Bayes model reads the same base features; computing them again cost a tenth of a 20 KB summary.
    bayesScore: minMax(withDefaultsOnce(a, 'bayes', () => rankBayes(a, defaultModel(), base)).scores),
  } satisfies Record<(typeof CONTINUOUS_FEATURES)[number]['name'], Float64Array>;
  return { ...base, ...extra, ...continuous };
}
