/**
 * ROUGE: recall-oriented overlap scores between a candidate summary and reference summaries.
 *
 * Source: C.-Y. Lin, "ROUGE: A Package for Automatic Evaluation of Summaries", ACL 2004 workshop
 * "Text Summarization Branches Out" (Lin 2004 below).
 *   - ROUGE-N (§2): clipped n-gram matches; recall over the reference's n-grams, precision over the
 *     candidate's. n-grams run across sentence boundaries (the whole summary is one token stream).
 *   - ROUGE-L (§3.1, §3.2): sentence-level LCS, and summary-level "union LCS": for each reference
 *     sentence, the union of its LCS word positions with every candidate sentence.
 *   - ROUGE-S (§5): skip-bigrams, optionally with a maximum gap.
 *
 * Tokens: lower-cased runs of letters and digits; everything else separates words (the way the
 * original Perl package normalises text — from memory). Punctuation is never a token.
 *
 * Several references (Lin 2004 §2.1): `aggregate: 'max'` (default) scores against each reference
 * and keeps the best by F1; `aggregate: 'jackknife'` takes, for each of the M leave-one-out sets
 * of M-1 references, the best by F1, and averages precision, recall and F1 over the M sets.
 */
import { stem as stemWord, stopWords } from '../text/tokens';

export interface RougeOptions {
  /** Porter stemming of every token (Lin's package calls it `-m`). */
  readonly stem?: boolean;
  /** Drop stop words before matching (Lin's `-s`). */
  readonly removeStopWords?: boolean;
  /** Language for stemming and stop words; default 'en'. */
  readonly language?: string;
  /** How several references combine; see the file header. Default 'max'. */
  readonly aggregate?: 'max' | 'jackknife';
}

export interface RougeScore {
  readonly precision: number;
  readonly recall: number;
  readonly f1: number;
}

/** A text as one string, or already split into sentences (ROUGE-L needs sentence boundaries). */
export type RougeText = string | readonly string[];

/** A single reference as a plain string, or a list of references (each a string or its sentences). */
export type RougeReferences = string | readonly RougeText[];

/** One text as token arrays, one per sentence. */
export type TokenizedText = readonly (readonly string[])[];

const ZERO: RougeScore = { precision: 0, recall: 0, f1: 0 };

export function score(matches: number, candidateCount: number, referenceCount: number): RougeScore {
  if (matches === 0 || candidateCount === 0 || referenceCount === 0) return ZERO;
  const precision = matches / candidateCount;
  const recall = matches / referenceCount;
  return { precision, recall, f1: (2 * precision * recall) / (precision + recall) };
}

// ---------------------------------------------------------------------------------------------
// Tokenizing

const WORD = /[\p{L}\p{N}]+/gu;
// A sentence ends at . ! ? followed by space, or at a line break; good enough for references that
// arrive as plain strings. Callers with a real parse pass sentence arrays instead.
const SENTENCE_END = /(?<=[.!?])\s+|\n+/u;

export function splitSentences(text: string): string[] {
  return text
    .split(SENTENCE_END)
    .map((sentence) => sentence.trim())
    .filter((sentence) => sentence.length > 0);
}

/** Tokenizes one sentence the way every ROUGE score here sees it. */
export function rougeTokens(sentence: string, options: RougeOptions = {}): string[] {
  const language = options.language ?? 'en';
  let tokens: string[] = sentence.toLowerCase().match(WORD) ?? [];
  if (options.removeStopWords) {
    const stop = stopWords(language);
    tokens = tokens.filter((token) => !stop.has(token));
  }
  if (options.stem) tokens = tokens.map((token) => stemWord(token, language));
  return tokens;
}

export function tokenizeText(text: RougeText, options: RougeOptions = {}): TokenizedText {
  const sentences = typeof text === 'string' ? splitSentences(text) : text;
  return sentences.map((sentence) => rougeTokens(sentence, options)).filter((tokens) => tokens.length > 0);
}

function referenceList(references: RougeReferences): readonly RougeText[] {
  return typeof references === 'string' ? [references] : references;
}

// ---------------------------------------------------------------------------------------------
// Combining several references

/** Lin 2004 §2.1: best pairwise score, or the jackknife average of leave-one-out bests. */
export function combineReferences(scores: readonly RougeScore[], aggregate: 'max' | 'jackknife' = 'max'): RougeScore {
  if (scores.length === 0) return ZERO;
  const best = (list: readonly RougeScore[]) => list.reduce((a, b) => (b.f1 > a.f1 ? b : a), ZERO);
  if (aggregate === 'max' || scores.length === 1) return best(scores);
  let precision = 0;
  let recall = 0;
  let f1 = 0;
  for (let left = 0; left < scores.length; left++) {
    const chosen = best(scores.filter((_, index) => index !== left));
    precision += chosen.precision;
    recall += chosen.recall;
    f1 += chosen.f1;
  }
  const m = scores.length;
  return { precision: precision / m, recall: recall / m, f1: f1 / m };
}

function scoreAgainstEach(
  candidate: RougeText,
  references: RougeReferences,
  options: RougeOptions,
  scoreTokens: (candidate: TokenizedText, reference: TokenizedText) => RougeScore,
): RougeScore {
  const candidateTokens = tokenizeText(candidate, options);
  const scores = referenceList(references).map((reference) => scoreTokens(candidateTokens, tokenizeText(reference, options)));
  return combineReferences(scores, options.aggregate);
}

// ---------------------------------------------------------------------------------------------
// ROUGE-N

export function ngramCounts(tokens: readonly string[], n: number): Map<string, number> {
  const counts = new Map<string, number>();
  for (let i = 0; i + n <= tokens.length; i++) {
    // U+0001 cannot occur inside a token, so joined keys never collide.
    const gram = n === 1 ? tokens[i]! : tokens.slice(i, i + n).join('\u0001');
    counts.set(gram, (counts.get(gram) ?? 0) + 1);
  }
  return counts;
}

/** Clipped matches: each n-gram counts up to the smaller of its two frequencies. */
export function clippedMatches(candidate: ReadonlyMap<string, number>, reference: ReadonlyMap<string, number>): number {
  let matches = 0;
  for (const [gram, count] of candidate) {
    const other = reference.get(gram);
    if (other !== undefined) matches += Math.min(count, other);
  }
  return matches;
}

/** ROUGE-N of token streams (sentences are flattened: n-grams may cross sentence boundaries). */
export function rougeNTokens(candidate: TokenizedText, reference: TokenizedText, n: number): RougeScore {
  const candidateTokens = candidate.flat();
  const referenceTokens = reference.flat();
  const candidateGrams = Math.max(0, candidateTokens.length - n + 1);
  const referenceGrams = Math.max(0, referenceTokens.length - n + 1);
  const matches = clippedMatches(ngramCounts(candidateTokens, n), ngramCounts(referenceTokens, n));
  return score(matches, candidateGrams, referenceGrams);
}

export function rougeN(candidate: RougeText, references: RougeReferences, n: number, options: RougeOptions = {}): RougeScore {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`ROUGE-N needs a whole n of at least 1, got ${n}`);
  return scoreAgainstEach(candidate, references, options, (c, r) => rougeNTokens(c, r, n));
}

// ---------------------------------------------------------------------------------------------
// ROUGE-L

/** LCS length table, row-major, (a.length + 1) x (b.length + 1). */
function lcsTable(a: readonly string[], b: readonly string[]): Uint32Array {
  const width = b.length + 1;
  const table = new Uint32Array((a.length + 1) * width);
  for (let i = 1; i <= a.length; i++) {
    for (let j = 1; j <= b.length; j++) {
      table[i * width + j] =
        a[i - 1] === b[j - 1]
          ? table[(i - 1) * width + j - 1]! + 1
          : Math.max(table[(i - 1) * width + j]!, table[i * width + j - 1]!);
    }
  }
  return table;
}

export function lcsLength(a: readonly string[], b: readonly string[]): number {
  return a.length === 0 || b.length === 0 ? 0 : lcsTable(a, b)[a.length * (b.length + 1) + b.length]!;
}

/**
 * Positions in `reference` of one longest common subsequence with `candidate`. When several LCSs
 * exist the choice matters for the union LCS; backtracking from the end prefers a match, then a step
 * up only when it is strictly better — the same preference as `js-rouge`, so the two agree.
 */
export function lcsReferencePositions(candidate: readonly string[], reference: readonly string[]): number[] {
  const table = lcsTable(candidate, reference);
  const width = reference.length + 1;
  const positions: number[] = [];
  let i = candidate.length;
  let j = reference.length;
  while (i > 0 && j > 0) {
    if (candidate[i - 1] === reference[j - 1]) {
      positions.push(j - 1);
      i--;
      j--;
    } else if (table[(i - 1) * width + j]! > table[i * width + j - 1]!) {
      i--;
    } else {
      j--;
    }
  }
  return positions.reverse();
}

/** Sentence-level ROUGE-L (Lin 2004 §3.1): LCS(a, b) over the lengths of b (recall) and a (precision). */
export function rougeLSentence(candidate: string, reference: string, options: RougeOptions = {}): RougeScore {
  const a = rougeTokens(candidate, options);
  const b = rougeTokens(reference, options);
  return score(lcsLength(a, b), a.length, b.length);
}

/**
 * Summary-level union LCS (Lin 2004 §3.2): Σ over reference sentences r of |∪_c LCS(r, c)|,
 * divided by the reference's word count (recall) and the candidate's (precision).
 * A candidate word occurrence is credited at most once across all reference sentences (clipping),
 * so repeating one good sentence cannot raise the score; Lin's formula leaves this implicit, and
 * js-rouge clips the same way.
 */
export function unionLcsMatches(candidate: TokenizedText, reference: TokenizedText): number {
  const available = new Map<string, number>();
  for (const sentence of candidate) for (const token of sentence) available.set(token, (available.get(token) ?? 0) + 1);
  let matches = 0;
  for (const referenceSentence of reference) {
    const union = new Set<number>();
    for (const candidateSentence of candidate) {
      for (const position of lcsReferencePositions(candidateSentence, referenceSentence)) union.add(position);
    }
    for (const position of union) {
      const token = referenceSentence[position]!;
      const left = available.get(token) ?? 0;
      if (left > 0) {
        matches++;
        available.set(token, left - 1);
      }
    }
  }
  return matches;
}

export function rougeLTokens(candidate: TokenizedText, reference: TokenizedText): RougeScore {
  const candidateCount = candidate.reduce((sum, sentence) => sum + sentence.length, 0);
  const referenceCount = reference.reduce((sum, sentence) => sum + sentence.length, 0);
  return score(unionLcsMatches(candidate, reference), candidateCount, referenceCount);
}

/** Summary-level ROUGE-L; pass sentence arrays when the sentence boundaries are known. */
export function rougeL(candidate: RougeText, references: RougeReferences, options: RougeOptions = {}): RougeScore {
  return scoreAgainstEach(candidate, references, options, rougeLTokens);
}

// ---------------------------------------------------------------------------------------------
// ROUGE-S

function skipBigramCounts(tokens: readonly string[], maxGap: number): Map<string, number> {
  const counts = new Map<string, number>();
  for (let i = 0; i < tokens.length; i++) {
    const last = Math.min(tokens.length - 1, i + maxGap + 1);
    for (let j = i + 1; j <= last; j++) {
      const pair = tokens[i] + '\u0001' + tokens[j];
      counts.set(pair, (counts.get(pair) ?? 0) + 1);
    }
  }
  return counts;
}

function total(counts: ReadonlyMap<string, number>): number {
  let sum = 0;
  for (const count of counts.values()) sum += count;
  return sum;
}

/** Skip-bigram co-occurrence (Lin 2004 §5); `maxGap` words may stand between the two (default: any). */
export function rougeS(
  candidate: RougeText,
  references: RougeReferences,
  options: RougeOptions & { readonly maxGap?: number } = {},
): RougeScore {
  const maxGap = options.maxGap ?? Number.POSITIVE_INFINITY;
  return scoreAgainstEach(candidate, references, options, (c, r) => {
    const candidateCounts = skipBigramCounts(c.flat(), maxGap);
    const referenceCounts = skipBigramCounts(r.flat(), maxGap);
    return score(clippedMatches(candidateCounts, referenceCounts), total(candidateCounts), total(referenceCounts));
  });
}
