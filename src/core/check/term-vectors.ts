/**
 * Tf-idf term vectors and cosine similarity, the measure the abstract check uses to match
 * abstract sentences with body sentences.
 *
 * Each sentence is one "document" for the idf count, so a term that appears in many sentences
 * (the document's main subject, say) weighs less than one that pins a sentence to a topic.
 *   - tf: raw count of the term in the sentence (sentences are short; sublinear damping changes little).
 *   - idf: 1 + ln(N / (1 + df)), the formula of the `natural` package's TfIdf class (npm), so the
 *     unit test can check the weights against that library. It stays positive for every df ≤ N.
 *   - cosine: Salton's vector-space cosine, dot(a, b) / (|a| |b|); 0 when either vector is empty.
 */

export interface TermVector {
  /** Term → tf × idf weight. Only terms with a non-zero weight are present. */
  readonly weights: ReadonlyMap<string, number>;
  /** Euclidean length of the weights (0 for a sentence without content terms). */
  readonly norm: number;
}

/** Number of term lists each term occurs in (a term counts once per list). */
export function documentFrequencies(termLists: readonly (readonly string[])[]): Map<string, number> {
  const df = new Map<string, number>();
  for (const terms of termLists) {
    for (const term of new Set(terms)) df.set(term, (df.get(term) ?? 0) + 1);
  }
  return df;
}

export interface IdfTable {
  /** Number of term lists the frequencies were counted over. */
  readonly count: number;
  readonly df: ReadonlyMap<string, number>;
}

export function idfTable(termLists: readonly (readonly string[])[]): IdfTable {
  return { count: termLists.length, df: documentFrequencies(termLists) };
}

/** 1 + ln(N / (1 + df)); a term the table never saw is treated as df = 0 (rarest possible). */
export function inverseDocumentFrequency(table: IdfTable, term: string): number {
  const df = table.df.get(term) ?? 0;
  return 1 + Math.log(Math.max(table.count, 1) / (1 + df));
}

export function termVector(terms: readonly string[], table: IdfTable): TermVector {
  const counts = new Map<string, number>();
  for (const term of terms) counts.set(term, (counts.get(term) ?? 0) + 1);
  const weights = new Map<string, number>();
  let squares = 0;
  for (const [term, count] of counts) {
    const weight = count * inverseDocumentFrequency(table, term);
    if (weight <= 0) continue;
    weights.set(term, weight);
    squares += weight * weight;
  }
  return { weights, norm: Math.sqrt(squares) };
}

export function cosineSimilarity(a: TermVector, b: TermVector): number {
  if (a.norm === 0 || b.norm === 0) return 0;
  // Iterate over the shorter vector; look terms up in the longer one.
  const [small, large] = a.weights.size <= b.weights.size ? [a, b] : [b, a];
  let dot = 0;
  for (const [term, weight] of small.weights) {
    const other = large.weights.get(term);
    if (other !== undefined) dot += weight * other;
  }
  // Rounding can push identical vectors a hair above 1.
  return Math.min(1, dot / (a.norm * b.norm));
}

/** A candidate and its similarity to some query. */
export interface ScoredMatch {
  readonly index: number;
  readonly similarity: number;
}

/** Similarity of `query` to each candidate, in candidate order. */
export function similarities(query: TermVector, candidates: readonly TermVector[]): Float64Array {
  const scores = new Float64Array(candidates.length);
  candidates.forEach((candidate, i) => (scores[i] = cosineSimilarity(query, candidate)));
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
    if (similarity <= 0) continue;
    if (best.length === k && similarity <= best[k - 1]!.similarity) continue;
    let at = best.length;
    while (at > 0 && best[at - 1]!.similarity < similarity) at--;
    best.splice(at, 0, { index, similarity });
    if (best.length > k) best.pop();
  }
  return best;
}
