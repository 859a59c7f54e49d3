/**
 * Edmundson (1969), "New methods in automatic extracting", Journal of the ACM 16(2).
 *
 * A sentence's score is a weighted sum of four components:
 *  - cue:      bonus words count +1 each, stigma words −1 each (single words or phrases);
 *  - key:      for each of the sentence's frequent content terms, its count in the document, summed;
 *  - title:    sentence terms that occur in the title, and (with less weight) in the heading of
 *              the sentence's own section;
 *  - location: the section heading names a summarising part (Introduction, Conclusions…), the
 *              sentence sits in the first or last paragraph of the document, or starts or ends
 *              its (prose) paragraph.
 * Edmundson summed raw word weights tuned on his corpus; we divide each component by its largest
 * absolute value in the document so the default weights mean the same for short and long texts.
 * He found cue + title + location best and key weakest (from memory); key is kept with a lower
 * weight because Markdown documents rarely carry enough cue words to rank on their own.
 */
import { headingClassesOf, type HeadingClass } from '../text/headings';
import type { AnalyzedDocument, CueWords, RankResult } from '../types';
import { isProseBlock } from './position';
import { termIndexOf } from '../vectors';

export interface EdmundsonWeights {
  readonly cue: number;
  readonly key: number;
  readonly title: number;
  readonly location: number;
}

export interface EdmundsonSettings {
  readonly weights: EdmundsonWeights;
  /** A content term is a key term when it occurs at least this often in the document. */
  readonly keyMinCount: number;
  /** Weight of a title word; Edmundson weighted title words above heading words (from memory). */
  readonly titleWordWeight: number;
  readonly headingWordWeight: number;
  /** Kinds of heading (text/headings.ts) that mark a section stating the problem or the proposal. */
  readonly locationClasses: readonly HeadingClass[];
  /** When false, only the caller's cue words are used. */
  readonly useDefaultCueWords: boolean;
}

/** Small English defaults (ours); callers add their own through `cueWords`. */
export const DEFAULT_CUE_WORDS: CueWords = {
  bonus: ['important', 'significant', 'significantly', 'essential', 'crucial', 'main', 'key', 'conclude', 'concluded', 'in summary', 'in short', 'overall', 'recommend', 'propose', 'proposed', 'must'],
  stigma: ['perhaps', 'maybe', 'possibly', 'hardly', 'impossible', 'incidentally', 'for example', 'for instance', 'by the way', 'aside'],
};

export const EDMUNDSON_DEFAULTS: EdmundsonSettings = {
  weights: { cue: 1, key: 0.5, title: 1, location: 1 },
  keyMinCount: 2,
  titleWordWeight: 2,
  headingWordWeight: 1,
  locationClasses: ['abstract', 'introduction', 'proposal'],
  useDefaultCueWords: true,
};

export interface EdmundsonOptions {
  /** Added to the default lists; a word the caller puts on one list is taken off the other. */
  readonly cueWords?: CueWords;
  readonly edmundson?: Partial<Omit<EdmundsonSettings, 'weights'>> & { readonly weights?: Partial<EdmundsonWeights> };
}

/** The cue lists in effect: defaults plus the caller's words, the caller winning on conflicts. */
export function effectiveCueWords(extra: CueWords | undefined, useDefaults: boolean): CueWords {
  const clean = (list: readonly string[] | undefined) => (list ?? []).map((w) => w.trim().toLowerCase()).filter((w) => w.length > 0);
  const userBonus = clean(extra?.bonus);
  const userStigma = clean(extra?.stigma);
  const base = useDefaults ? DEFAULT_CUE_WORDS : { bonus: [], stigma: [] };
  return {
    bonus: [...new Set([...base.bonus.filter((w) => !userStigma.includes(w)), ...userBonus])],
    stigma: [...new Set([...base.stigma.filter((w) => !userBonus.includes(w)), ...userStigma.filter((w) => !userBonus.includes(w))])],
  };
}

/** Phrases split into words and grouped by their first word. */
export type PhraseIndex = ReadonlyMap<string, readonly (readonly string[])[]>;

/** Builds a PhraseIndex, so matching costs one lookup per sentence word instead of one scan per phrase. */
export function phraseIndex(phrases: readonly string[]): PhraseIndex {
  const byFirstWord = new Map<string, string[][]>();
  for (const phrase of phrases) {
    const parts = phrase.split(/\s+/).filter((part) => part.length > 0);
    if (parts.length === 0) continue;
    const list = byFirstWord.get(parts[0]!) ?? [];
    list.push(parts);
    byFirstWord.set(parts[0]!, list);
  }
  return byFirstWord;
}

/** Occurrences of the phrases (each one or more words) in a word sequence; pass a PhraseIndex when matching many sentences. */
export function countPhrases(words: readonly string[], phrases: readonly string[] | PhraseIndex): number {
  const index = Array.isArray(phrases) ? phraseIndex(phrases) : (phrases as PhraseIndex);
  let count = 0;
  // Runs for every sentence under several phrase lists: plain loops, nothing allocated per word.
  for (let start = 0; start < words.length; start++) {
    const candidates = index.get(words[start]!);
    if (candidates === undefined) continue;
    for (const parts of candidates) {
      let k = 1;
      while (k < parts.length && words[start + k] === parts[k]) k++;
      if (k === parts.length) count++;
    }
  }
  return count;
}

export function cueComponent(a: AnalyzedDocument, cues: CueWords): Float64Array {
  const bonus = phraseIndex(cues.bonus);
  const stigma = phraseIndex(cues.stigma);
  return Float64Array.from(a.words, (words) => countPhrases(words, bonus) - countPhrases(words, stigma));
}

export function keyComponent(a: AnalyzedDocument, keyMinCount: number): Float64Array {
  // Document counts of every term, from the shared term index.
  const { vocabulary, totalCount } = termIndexOf(a);
  return Float64Array.from(a.terms, (terms) => {
    let sum = 0;
    for (const term of terms) {
      const count = totalCount[vocabulary.get(term)!]!;
      if (count >= keyMinCount) sum += count;
    }
    return sum;
  });
}

/**
 * Title and heading words in each sentence, per term occurrence. A section whose heading is the
 * document title gets no heading bonus: its words already count as title words.
 */
export function titleComponent(a: AnalyzedDocument, titleWordWeight = EDMUNDSON_DEFAULTS.titleWordWeight, headingWordWeight = EDMUNDSON_DEFAULTS.headingWordWeight): Float64Array {
  const title = new Set(a.titleTerms);
  const headings = a.headingTerms.map((terms, s) => (a.doc.sections[s]?.heading === a.doc.title ? new Set<string>() : new Set(terms)));
  return Float64Array.from(a.doc.sentences, (sentence) => {
    const heading = headings[sentence.section] ?? new Set<string>();
    let sum = 0;
    for (const term of a.terms[sentence.index] ?? []) {
      if (title.has(term)) sum += titleWordWeight;
      if (heading.has(term)) sum += headingWordWeight;
    }
    return sum;
  });
}

export function locationComponent(a: AnalyzedDocument, locationClasses: readonly HeadingClass[]): Float64Array {
  const { doc } = a;
  const summarising = doc.sections.map((section) => headingClassesOf(section.heading).some((c) => locationClasses.includes(c)));
  const withSentences = doc.paragraphs.filter((p) => p.sentences.length > 0);
  const firstParagraph = withSentences[0]?.index ?? -1;
  const lastParagraph = withSentences.length > 1 ? withSentences[withSentences.length - 1]!.index : -1;
  return Float64Array.from(doc.sentences, (sentence) => {
    let sum = 0;
    if (summarising[sentence.section]) sum += 1;
    if (sentence.paragraph === firstParagraph || sentence.paragraph === lastParagraph) sum += 1;
    if (!isProseBlock(doc.paragraphs[sentence.paragraph]?.kind ?? 'paragraph')) return sum;
    if (sentence.positionInParagraph === 0) sum += 1;
    else if (sentence.positionInParagraph === sentence.paragraphLength - 1) sum += 1;
    return sum;
  });
}

/** Divides by the largest absolute value so a component spans at most [−1, 1]; all-zero stays zero. */
export function scaleByMaxAbs(values: Float64Array): Float64Array {
  let max = 0;
  for (const v of values) max = Math.max(max, Math.abs(v));
  return max > 0 ? values.map((v) => v / max) : values.slice();
}

export function edmundsonRank(a: AnalyzedDocument, options: EdmundsonOptions = {}): RankResult {
  const given = options.edmundson ?? {};
  const settings: EdmundsonSettings = { ...EDMUNDSON_DEFAULTS, ...given, weights: { ...EDMUNDSON_DEFAULTS.weights, ...given.weights } };
  const cues = effectiveCueWords(options.cueWords, settings.useDefaultCueWords);
  const features = {
    cue: scaleByMaxAbs(cueComponent(a, cues)),
    key: scaleByMaxAbs(keyComponent(a, settings.keyMinCount)),
    title: scaleByMaxAbs(titleComponent(a, settings.titleWordWeight, settings.headingWordWeight)),
    location: scaleByMaxAbs(locationComponent(a, settings.locationClasses)),
  };
  const { weights } = settings;
  const scores = features.cue.map(
    (cue, i) => weights.cue * cue + weights.key * features.key[i]! + weights.title * features.title[i]! + weights.location * features.location[i]!,
  );
  return { scores, features };
}
