/**
 * Redundancy tracking for Maximal Marginal Relevance (Carbonell & Goldstein 1998):
 * keeps, for every sentence, its highest cosine similarity to any sentence picked so far.
 *
 * Sentences are compared in the same tf·idf space LexRank and the centroid use (vectors.ts).
 * Adding a pick walks only the postings of the pick's own terms (an inverted index), so the cost is
 * proportional to the overlap, never to n²: a 1 MB document stays fast and small.
 */
import { invertedIndex, type InvertedIndex, type SparseVector } from '../vectors';

export class RedundancyTracker {
  private readonly maxSim: Float64Array;
  /** Bumped whenever a sentence's redundancy rises, so a lazy selector knows what to re-evaluate. */
  private readonly changes: Uint32Array;
  private readonly accumulator: Float64Array;
  private readonly postings: InvertedIndex;

  constructor(
    private readonly vectors: readonly SparseVector[],
    vocabularySize: number,
  ) {
    this.maxSim = new Float64Array(vectors.length);
    this.changes = new Uint32Array(vectors.length);
    this.accumulator = new Float64Array(vectors.length);
    this.postings = invertedIndex(vectors, vocabularySize);
  }

  /** Highest cosine similarity of `sentence` to any pick so far (0 before the first pick). */
  similarityToPicked(sentence: number): number {
    return this.maxSim[sentence] ?? 0;
  }

  /** How often `sentence`'s redundancy has risen so far. */
  version(sentence: number): number {
    return this.changes[sentence] ?? 0;
  }

  addPick(sentence: number): void {
    const vector = this.vectors[sentence];
    if (!vector || vector.norm === 0) return;
    const { offsets, sentences, values } = this.postings;
    const touched: number[] = [];
    vector.ids.forEach((id, k) => {
      const w = vector.values[k]!;
      for (let p = offsets[id]!; p < offsets[id + 1]!; p++) {
        const other = sentences[p]!;
        if (this.accumulator[other] === 0) touched.push(other);
        this.accumulator[other] = this.accumulator[other]! + w * values[p]!;
      }
    });
    for (const other of touched) {
      // Rounding can push identical vectors a hair above 1.
      const similarity = Math.min(1, this.accumulator[other]! / (vector.norm * this.vectors[other]!.norm));
      if (similarity > this.maxSim[other]!) {
        this.maxSim[other] = similarity;
        this.changes[other] = this.changes[other]! + 1;
      }
      this.accumulator[other] = 0;
    }
  }
}
