/**
 * Luhn (1958), "The automatic creation of literature abstracts", IBM Journal of Research and
 * Development 2(2).
 *
 * Significant words are content terms whose frequency in the document lies in a band:
 *  - lower cutoff: at least max(2, ⌈log10(number of content-term tokens)⌉) occurrences, so a
 *    longer document needs a word to recur more often (2 up to 100 tokens, 5 at 100,000);
 *  - upper cutoff: the `dropTopShare` most frequent distinct terms are dropped (only terms strictly
 *    more frequent than the first kept one, so ties never split) — Luhn's upper cutoff removes
 *    words too common to tell sentences apart; stop words are already gone.
 * In each sentence, significant words are grouped into clusters: a cluster starts and ends with a
 * significant word and breaks where more than `gapLimit` (4, Luhn's value) insignificant words
 * separate two significant ones; stop words count as insignificant positions (see termPositions).
 * A cluster scores (significant words)² / (words from its first to its last significant word);
 * the sentence scores its best cluster, 0 without significant words.
 *
 * The band values are ours (common practice, no source); Luhn chose his cutoffs by inspection.
 */
import { wordTerms } from '../text/tokens';
import { termIndexOf } from '../vectors';
import type { AnalyzedDocument, RankResult } from '../types';

// Hoisted: the bundler turns a \p{…} literal into `new RegExp(…)`, which inside a function runs at every call.
const MARKS = /\p{M}/gu;

export interface LuhnSettings {
  /** Most insignificant words allowed between two significant words of one cluster. */
  readonly gapLimit: number;
  /** Floor of the lower frequency cutoff. */
  readonly minCountFloor: number;
  /** Share of the distinct terms, most frequent first, that is dropped as too common. */
  readonly dropTopShare: number;
}

export const LUHN_DEFAULTS: LuhnSettings = {
  gapLimit: 4,
  minCountFloor: 2,
  dropTopShare: 0.01,
};

export interface LuhnOptions {
  readonly luhn?: Partial<LuhnSettings>;
}

/** The set of significant terms and the cutoffs that produced it. */
export function significantTerms(a: AnalyzedDocument, settings: LuhnSettings = LUHN_DEFAULTS): { terms: Set<string>; minCount: number; maxCount: number } {
  // The shared term index already counts every term (vocabulary in order of first appearance).
  const { vocabulary, totalCount } = termIndexOf(a);
  let tokens = 0;
  for (const terms of a.terms) tokens += terms.length;
  const minCount = Math.max(settings.minCountFloor, Math.ceil(Math.log10(Math.max(tokens, 1))));
  const descending = Float64Array.from(totalCount).sort().reverse();
  const dropped = Math.floor(descending.length * settings.dropTopShare);
  const maxCount = dropped > 0 && dropped < descending.length ? descending[dropped]! : Infinity;
  const terms = new Set<string>();
  for (const [term, id] of vocabulary) {
    const count = totalCount[id]!;
    if (count >= minCount && count <= maxCount) terms.add(term);
  }
  return { terms, minCount, maxCount };
}

/**
 * Position of each term in the sentence, counted in word slots (stop words included). A word the
 * analyzer split into several terms ("rate-limit" → rate, limit) takes one slot per term.
 *
 * Exact path: `termsOfWord` re-runs the analyzer on each word alone; when the pieces add up to the
 * sentence's `terms`, every term's source word is known. Otherwise (a hand-made or foreign
 * analysis) the terms are aligned to the words' hyphen-split parts by `alignTermsToWords`.
 * A term that cannot be placed gets -1.
 */
export function termPositions(words: readonly string[], terms: readonly string[], termsOfWord?: (word: string) => readonly string[]): Int32Array {
  if (termsOfWord) {
    const positions = new Int32Array(terms.length);
    let slot = 0;
    let t = 0;
    let consistent = true;
    for (const word of words) {
      const produced = termsOfWord(word);
      for (let m = 0; m < produced.length && consistent; m++) {
        consistent = t < terms.length && terms[t] === produced[m];
        positions[t++] = slot + m;
      }
      if (!consistent) break;
      slot += Math.max(1, produced.length);
    }
    if (consistent && t === terms.length) return positions;
  }
  const slots: number[] = [];
  const parts: string[] = [];
  let slot = 0;
  for (const word of words) {
    const pieces = word.includes('-') ? word.split('-').filter((piece) => piece.length > 0) : [word];
    for (const piece of pieces) {
      parts.push(piece);
      slots.push(slot++);
    }
    if (pieces.length === 0) slot++;
  }
  return alignTermsToWords(parts, terms).map((k) => (k >= 0 ? slots[k]! : -1));
}

/**
 * Which word each term came from, by a monotone alignment that rewards shared prefixes:
 * `terms` is `words` with stop words removed and the rest stemmed, in order, and stemmers mostly
 * cut suffixes. Returns -1 for a term that could not be placed (more terms than words).
 */
export function alignTermsToWords(words: readonly string[], terms: readonly string[]): Int32Array {
  const m = words.length;
  const k = terms.length;
  const foldedWords = words.map(fold);
  const foldedTerms = terms.map(fold);
  // A match earns 1 plus its prefix similarity, so the alignment first places as many terms as
  // possible, then picks the likeliest way to place them.
  const match = new Float64Array(m * k);
  for (let i = 0; i < m; i++) for (let j = 0; j < k; j++) match[i * k + j] = 1 + prefixSimilarity(foldedWords[i]!, foldedTerms[j]!);
  const matchScore = (i: number, j: number) => match[i * k + j]!;
  const width = k + 1;
  // best[i*width + j]: best score aligning words[0..i) with terms[0..j).
  const best = new Float64Array((m + 1) * width);
  for (let i = 0; i <= m; i++) {
    for (let j = 0; j <= k; j++) {
      if (i === 0 && j === 0) continue;
      let score = -Infinity;
      if (i > 0 && j > 0) score = best[(i - 1) * width + j - 1]! + matchScore(i - 1, j - 1);
      if (i > 0) score = Math.max(score, best[(i - 1) * width + j]!);
      if (j > 0) score = Math.max(score, best[i * width + j - 1]!);
      best[i * width + j] = score;
    }
  }
  const source = new Int32Array(k).fill(-1);
  let i = m;
  let j = k;
  while (i > 0 && j > 0) {
    const here = best[i * width + j]!;
    if (here === best[(i - 1) * width + j - 1]! + matchScore(i - 1, j - 1)) {
      source[j - 1] = i - 1;
      i--;
      j--;
    } else if (here === best[(i - 1) * width + j]!) i--;
    else j--;
  }
  return source;
}

/** Shared leading characters of two folded strings, as a share of the term's length. */
function prefixSimilarity(word: string, term: string): number {
  let shared = 0;
  while (shared < word.length && shared < term.length && word[shared] === term[shared]) shared++;
  return term.length > 0 ? shared / term.length : 0;
}

/** Case and accents folded, so a stemmer that strips diacritics still lines up with its word. */
function fold(text: string): string {
  return text.normalize('NFD').replace(MARKS, '').toLowerCase();
}

/**
 * Luhn's significance factor of one sentence from the positions of its significant words
 * (ascending indices into the sentence's words).
 */
export function significanceFactor(positions: readonly number[], gapLimit = LUHN_DEFAULTS.gapLimit): number {
  let best = 0;
  let start = 0;
  for (let p = 1; p <= positions.length; p++) {
    const clusterEnds = p === positions.length || positions[p]! - positions[p - 1]! - 1 > gapLimit;
    if (!clusterEnds) continue;
    const significant = p - start;
    const span = positions[p - 1]! - positions[start]! + 1;
    best = Math.max(best, (significant * significant) / span);
    start = p;
  }
  return best;
}

export function luhnRank(a: AnalyzedDocument, options: LuhnOptions = {}): RankResult {
  const settings: LuhnSettings = { ...LUHN_DEFAULTS, ...options.luhn };
  const { terms: significant } = significantTerms(a, settings);
  const n = a.terms.length;
  const scores = new Float64Array(n);
  const significantWords = new Float64Array(n);
  const termsOfWord = (word: string) => wordTerms(word, a.language);
  for (let s = 0; s < n; s++) {
    const terms = a.terms[s]!;
    const position = termPositions(a.words[s] ?? [], terms, termsOfWord);
    const positions: number[] = [];
    terms.forEach((term, k) => {
      if (significant.has(term) && position[k]! >= 0) positions.push(position[k]!);
    });
    positions.sort((x, y) => x - y);
    significantWords[s] = positions.length;
    scores[s] = significanceFactor(positions, settings.gapLimit);
  }
  return { scores, features: { luhn: scores, significantWords } };
}
