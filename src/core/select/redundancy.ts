/**
 * Redundancy tracking for Maximal Marginal Relevance (Carbonell & Goldstein 1998):
 * keeps, for every sentence, its highest cosine similarity to any sentence picked so far.
 *
 * Adding a pick walks only the postings of the pick's own terms (an inverted index), so the
 * cost is proportional to the overlap, never to n²: a 1 MB document stays fast and small.
 */
export class RedundancyTracker {
  private readonly maxSim: Float64Array;
  private readonly accumulator: Float64Array;
  private readonly postings = new Map<string, { sentences: number[]; weights: number[] }>();
  private readonly vectors: { terms: string[]; weights: Float64Array }[];

  constructor(terms: readonly (readonly string[])[]) {
    const n = terms.length;
    this.maxSim = new Float64Array(n);
    this.accumulator = new Float64Array(n);
    const documentFrequency = new Map<string, number>();
    for (const sentenceTerms of terms) {
      for (const term of new Set(sentenceTerms)) documentFrequency.set(term, (documentFrequency.get(term) ?? 0) + 1);
    }
    this.vectors = terms.map((sentenceTerms, sentence) => {
      const counts = new Map<string, number>();
      for (const term of sentenceTerms) counts.set(term, (counts.get(term) ?? 0) + 1);
      const unique = [...counts.keys()];
      const weights = new Float64Array(unique.length);
      let norm = 0;
      unique.forEach((term, k) => {
        const idf = Math.log(n / (documentFrequency.get(term) ?? 1)) + 1;
        const w = (counts.get(term) ?? 0) * idf;
        weights[k] = w;
        norm += w * w;
      });
      norm = Math.sqrt(norm) || 1;
      unique.forEach((term, k) => {
        weights[k] = weights[k]! / norm;
        let list = this.postings.get(term);
        if (!list) this.postings.set(term, (list = { sentences: [], weights: [] }));
        list.sentences.push(sentence);
        list.weights.push(weights[k]!);
      });
      return { terms: unique, weights };
    });
  }

  /** Highest cosine similarity of `sentence` to any pick so far (0 before the first pick). */
  similarityToPicked(sentence: number): number {
    return this.maxSim[sentence] ?? 0;
  }

  addPick(sentence: number): void {
    const vector = this.vectors[sentence];
    if (!vector) return;
    const touched: number[] = [];
    vector.terms.forEach((term, k) => {
      const list = this.postings.get(term)!;
      const w = vector.weights[k]!;
      for (let p = 0; p < list.sentences.length; p++) {
        const other = list.sentences[p]!;
        if (this.accumulator[other] === 0) touched.push(other);
        this.accumulator[other] = this.accumulator[other]! + w * list.weights[p]!;
      }
    });
    for (const other of touched) {
      if (this.accumulator[other]! > this.maxSim[other]!) this.maxSim[other] = this.accumulator[other]!;
      this.accumulator[other] = 0;
    }
  }
}
