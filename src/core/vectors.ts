/**
 * The engine's one vector module: sparse term vectors, the idf variants, tf-idf weighting, cosine
 * similarity, an inverted index (term → sentences) and top-k matching. Every ranker, the MMR
 * redundancy check and the abstract check weigh terms through here.
 *
 * Each sentence counts as one "document" for idf. Two idf variants, named by where they come from:
 *   - 'sentence': idf(t) = log(N / sf(t)), the form of LexRank's idf-modified cosine (Erkan & Radev
 *     2004) and of the centroid method (Radev et al. 2004). A term in every sentence weighs 0.
 *   - 'smoothed': idf(t) = 1 + ln(N / (1 + df(t))), the formula of the `natural` package's TfIdf
 *     class (npm); it stays positive, so a query that shares only common terms still matches.
 *
 * Term ids are given in order of first appearance, which keeps every result independent of hash
 * order and therefore deterministic.
 */
import type { AnalyzedDocument } from './types';

/** Term ids in increasing order with their weights; `norm` is the Euclidean length. */
export interface SparseVector {
  readonly ids: Int32Array;
  readonly values: Float64Array;
  readonly norm: number;
}

export interface TermIndex {
  /** Term → id, ids in order of first appearance. */
  readonly vocabulary: ReadonlyMap<string, number>;
  /** Raw term counts of each sentence. */
  readonly counts: readonly SparseVector[];
  /** Number of sentences containing each term (sentence frequency). */
  readonly sentenceFrequency: Int32Array;
  /** Occurrences of each term in the whole document. */
  readonly totalCount: Float64Array;
}

const termIndexCache = new WeakMap<AnalyzedDocument, TermIndex>();

/** The document's term index, built once per AnalyzedDocument (the blend asks for it several times). */
export function termIndexOf(a: AnalyzedDocument): TermIndex {
  let index = termIndexCache.get(a);
  if (!index) {
    index = buildTermIndex(a.terms);
    termIndexCache.set(a, index);
  }
  return index;
}

export function buildTermIndex(sentences: readonly (readonly string[])[]): TermIndex {
  const vocabulary = new Map<string, number>();
  const frequency: number[] = [];
  const total: number[] = [];
  // Every sentence's ids in one buffer, each sentence's part sorted in place; the vectors are then
  // views of two shared buffers: one allocation per document instead of three per sentence.
  let termCount = 0;
  for (const terms of sentences) termCount += terms.length;
  const sortedIds = new Int32Array(termCount);
  const from = new Int32Array(sentences.length + 1);
  let at = 0;
  sentences.forEach((terms, s) => {
    from[s] = at;
    for (const term of terms) {
      let id = vocabulary.get(term);
      if (id === undefined) {
        id = vocabulary.size;
        vocabulary.set(term, id);
        frequency.push(0);
        total.push(0);
      }
      sortedIds[at++] = id;
      total[id]! += 1;
    }
    sortedIds.subarray(from[s]!, at).sort();
  });
  from[sentences.length] = at;
  // Run-length encode each sentence's sorted ids into (id, count) pairs.
  let distinct = 0;
  for (let s = 0; s < sentences.length; s++) {
    for (let k = from[s]!; k < from[s + 1]!; k++) if (k === from[s] || sortedIds[k] !== sortedIds[k - 1]) distinct++;
  }
  const allIds = new Int32Array(distinct);
  const allValues = new Float64Array(distinct);
  let slot = -1;
  const counts = sentences.map((_, s) => {
    const first = slot + 1;
    for (let k = from[s]!; k < from[s + 1]!; k++) {
      if (k === from[s] || sortedIds[k] !== sortedIds[k - 1]) {
        allIds[++slot] = sortedIds[k]!;
        frequency[sortedIds[k]!]! += 1;
      }
      allValues[slot]! += 1;
    }
    return makeVector(allIds.subarray(first, slot + 1), allValues.subarray(first, slot + 1));
  });
  return {
    vocabulary,
    counts,
    sentenceFrequency: Int32Array.from(frequency),
    totalCount: Float64Array.from(total),
  };
}

export function makeVector(ids: Int32Array, values: Float64Array): SparseVector {
  let squares = 0;
  for (const value of values) squares += value * value;
  return { ids, values, norm: Math.sqrt(squares) };
}

export type IdfVariant = 'sentence' | 'smoothed';

/** idf of every term of the index, by the named variant (see the file header for the formulas). */
export function inverseFrequency(index: TermIndex, variant: IdfVariant): Float64Array {
  const n = index.counts.length;
  const idf = new Float64Array(index.sentenceFrequency.length);
  index.sentenceFrequency.forEach((sf, id) => {
    if (variant === 'smoothed') idf[id] = 1 + Math.log(Math.max(n, 1) / (1 + sf));
    else idf[id] = sf > 0 ? Math.log(n / sf) : 0;
  });
  return idf;
}

const sentenceVectorCache = new WeakMap<AnalyzedDocument, readonly SparseVector[]>();

/**
 * tf·idf vectors of the document's sentences with the 'sentence' idf, built once per document:
 * LexRank, the centroid and MMR redundancy all compare sentences in this one space.
 */
export function sentenceVectorsOf(a: AnalyzedDocument): readonly SparseVector[] {
  let vectors = sentenceVectorCache.get(a);
  if (!vectors) {
    const index = termIndexOf(a);
    vectors = tfidfVectors(index, inverseFrequency(index, 'sentence'));
    sentenceVectorCache.set(a, vectors);
  }
  return vectors;
}

/** tf·idf vectors (tf = raw count in the sentence); entries whose weight is 0 are dropped. */
export function tfidfVectors(index: TermIndex, idf: Float64Array): SparseVector[] {
  // Kept entries of all sentences in two shared buffers (views per sentence), as in buildTermIndex.
  let kept = 0;
  for (const counts of index.counts) {
    for (let k = 0; k < counts.ids.length; k++) if (counts.values[k]! * idf[counts.ids[k]!]! > 0) kept++;
  }
  const allIds = new Int32Array(kept);
  const allValues = new Float64Array(kept);
  let slot = 0;
  return index.counts.map((counts) => {
    const first = slot;
    for (let k = 0; k < counts.ids.length; k++) {
      const id = counts.ids[k]!;
      if (!(counts.values[k]! * idf[id]! > 0)) continue;
      allIds[slot] = id;
      allValues[slot++] = counts.values[k]! * idf[id]!;
    }
    return makeVector(allIds.subarray(first, slot), allValues.subarray(first, slot));
  });
}

/** Dot product by merging the two sorted id lists. */
export function dot(a: SparseVector, b: SparseVector): number {
  let sum = 0;
  let i = 0;
  let j = 0;
  while (i < a.ids.length && j < b.ids.length) {
    const ai = a.ids[i]!;
    const bj = b.ids[j]!;
    if (ai === bj) sum += a.values[i++]! * b.values[j++]!;
    else if (ai < bj) i++;
    else j++;
  }
  return sum;
}

/** 0/1 vectors: their dot product counts the distinct terms two sentences share. */
export function presenceVectors(index: TermIndex): SparseVector[] {
  let entries = 0;
  for (const counts of index.counts) entries += counts.ids.length;
  // One buffer of ones; every sentence's values are a view of it.
  const ones = new Float64Array(entries).fill(1);
  let at = 0;
  return index.counts.map((counts) => makeVector(counts.ids, ones.subarray(at, (at += counts.ids.length))));
}

/** Cosine of two sparse vectors; 0 when either is empty (no direction to compare). */
export function cosine(a: SparseVector, b: SparseVector): number {
  if (a.norm === 0 || b.norm === 0) return 0;
  // Rounding can push identical vectors a hair above 1.
  return Math.min(1, dot(a, b) / (a.norm * b.norm));
}

/**
 * Postings in compressed form: the sentences holding term t are `sentences[offsets[t] .. offsets[t+1])`,
 * ascending, and `values` holds the term's weight in each of them.
 */
export interface InvertedIndex {
  readonly offsets: Int32Array;
  readonly sentences: Int32Array;
  readonly values: Float64Array;
}

export function invertedIndex(vectors: readonly SparseVector[], vocabularySize: number): InvertedIndex {
  const offsets = new Int32Array(vocabularySize + 1);
  for (const vector of vectors) for (const id of vector.ids) offsets[id + 1]! += 1;
  for (let t = 0; t < vocabularySize; t++) offsets[t + 1]! += offsets[t]!;
  const fill = offsets.slice(0, vocabularySize);
  const sentences = new Int32Array(offsets[vocabularySize]!);
  const values = new Float64Array(offsets[vocabularySize]!);
  vectors.forEach((vector, s) => {
    vector.ids.forEach((id, k) => {
      values[fill[id]!] = vector.values[k]!;
      sentences[fill[id]!++] = s;
    });
  });
  return { offsets, sentences, values };
}

/** A candidate and its similarity to some query. */
export interface ScoredMatch {
  readonly index: number;
  readonly similarity: number;
}

/** Cosine of `query` with each candidate, in candidate order. */
export function similarities(query: SparseVector, candidates: readonly SparseVector[]): Float64Array {
  const scores = new Float64Array(candidates.length);
  candidates.forEach((candidate, i) => (scores[i] = cosine(query, candidate)));
  return scores;
}

/**
 * The `k` best-scored candidates, best first; ties go to the earlier candidate so the result is
 * deterministic. Candidates scoring zero are left out.
 */
export function topMatches(scores: ArrayLike<number>, k: number): ScoredMatch[] {
  const best: ScoredMatch[] = [];
  if (k <= 0) return best;
  for (let index = 0; index < scores.length; index++) {
    const similarity = scores[index]!;
    if (!(similarity > 0)) continue;
    if (best.length === k && similarity <= best[k - 1]!.similarity) continue;
    let at = best.length;
    while (at > 0 && best[at - 1]!.similarity < similarity) at--;
    best.splice(at, 0, { index, similarity });
    if (best.length > k) best.pop();
  }
  return best;
}
