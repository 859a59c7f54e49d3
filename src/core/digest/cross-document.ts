/**
 * What a digest learns by comparing the documents' kept sentences with each other:
 *
 *  - Centrality over the set: LexRank (Erkan & Radev 2004, built for sets of documents) on the
 *    threshold graph of the pooled sentences, and closeness to the set's centroid (Radev, Jing,
 *    Styś & Tam 2004, MEAD: the centroid of a cluster of documents).
 *  - Pyramid weight (Nenkova & Passonneau 2004): content expressed in more sources weighs more.
 *    A sentence's tier is the number of documents with a sentence that says much the same
 *    (cosine at least `shareThreshold`), its own included; the weight is (tier − 1) / (D − 1).
 *  - Cross-document near-duplicates (cosine at least `duplicateThreshold`, different documents)
 *    are grouped; only the best of a group may be picked, and the others are listed as "also in".
 * Sentences are compared in one tf·idf space built over the pool (vectors.ts), pairs found through
 * the inverted index within the limits of the sentence graph (similarity-graph.ts: each sentence
 * keeps its 32 strongest links, so a content unit shared by more documents than that is undercounted).
 */
import { pageRank, PAGERANK_DEFAULTS } from '../rank/power-iteration';
import { similarityGraph, SPARSE_GRAPH_DEFAULTS, type CsrGraph } from '../rank/similarity-graph';
import { minMax } from '../scale';
import { buildTermIndex, cosine, inverseFrequency, makeVector, tfidfVectors, type SparseVector } from '../vectors';
import type { PoolSentence } from './collect';

export const CROSS_DOCUMENT_DEFAULTS = {
  /** LexRank's link threshold; 0.1 is the paper's best setting for DUC 2004 (as lexrank.ts). */
  linkThreshold: 0.1,
  /** Cosine at which two sentences of different documents say much the same (ours). */
  shareThreshold: 0.3,
  /** Cosine at which two sentences of different documents are near-duplicates (ours). */
  duplicateThreshold: 0.7,
  /** Strongest centroid terms kept, as centroid.ts (common practice, no source). */
  centroidTerms: 100,
} as const;

/** How the digest's relevance is made of its parts (ours, untuned: the document's own ranking leads). */
export const DIGEST_WEIGHTS = { own: 0.5, pyramid: 0.25, lexrank: 0.15, centroid: 0.1 } as const;

export interface CrossDocument {
  readonly vectors: readonly SparseVector[];
  readonly vocabularySize: number;
  /** Parts of the relevance, each in [0, 1], and their weighted sum. */
  readonly pyramid: Float64Array;
  readonly lexrank: Float64Array;
  readonly centroid: Float64Array;
  readonly relevance: Float64Array;
  /** Pyramid tier: documents that express the sentence's content, its own included. */
  readonly tier: Int32Array;
  /** For each sentence, the representative of its near-duplicate group (itself when alone or best). */
  readonly representative: Int32Array;
}

export function crossDocument(pool: readonly PoolSentence[], documents: number, settings = CROSS_DOCUMENT_DEFAULTS, weights = DIGEST_WEIGHTS): CrossDocument {
  const n = pool.length;
  const index = buildTermIndex(pool.map((s) => s.terms));
  const vectors = tfidfVectors(index, inverseFrequency(index, 'sentence'));
  const vocabularySize = index.vocabulary.size;
  const cosineOf = (i: number, j: number, dot: number) => Math.min(1, dot / (vectors[i]!.norm * vectors[j]!.norm));
  const graph = similarityGraph(vectors, vocabularySize, cosineOf, settings.linkThreshold, SPARSE_GRAPH_DEFAULTS);

  const lexrankRaw = n > 1 ? pageRank({ ...graph, weights: new Float64Array(graph.weights.length).fill(1) }, PAGERANK_DEFAULTS).scores : new Float64Array(n).fill(1);
  const all = Array.from({ length: n }, (_, i) => i);
  const lexrank = minMax(lexrankRaw, all);
  const centroid = centroidCloseness(vectors, index.totalCount, inverseFrequency(index, 'sentence'), settings.centroidTerms);

  const tier = new Int32Array(n);
  const pyramid = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const sharing = new Set<number>([pool[i]!.document]);
    forEachLink(graph, i, (j, similarity) => {
      if (similarity >= settings.shareThreshold) sharing.add(pool[j]!.document);
    });
    tier[i] = sharing.size;
    pyramid[i] = documents > 1 ? (sharing.size - 1) / (documents - 1) : 0;
  }

  const relevance = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    relevance[i] = weights.own * pool[i]!.own + weights.pyramid * pyramid[i]! + weights.lexrank * lexrank[i]! + weights.centroid * centroid[i]!;
  }
  const representative = duplicateGroups(pool, graph, relevance, settings.duplicateThreshold);
  return { vectors, vocabularySize, pyramid, lexrank, centroid, relevance, tier, representative };
}

function forEachLink(graph: CsrGraph, i: number, visit: (j: number, similarity: number) => void): void {
  for (let e = graph.offsets[i]!; e < graph.offsets[i + 1]!; e++) visit(graph.targets[e]!, graph.weights[e]!);
}

/** Cosine of each sentence with the pool's centroid c(t) = idf(t) · count(t) / n, cut to its largest terms. */
function centroidCloseness(vectors: readonly SparseVector[], totalCount: Float64Array, idf: Float64Array, keep: number): Float64Array {
  const n = vectors.length;
  const entries: { id: number; value: number }[] = [];
  idf.forEach((weight, id) => {
    const value = (weight * totalCount[id]!) / Math.max(n, 1);
    if (value > 0) entries.push({ id, value });
  });
  entries.sort((x, y) => y.value - x.value || x.id - y.id);
  const kept = entries.slice(0, keep).sort((x, y) => x.id - y.id);
  const centroid = makeVector(Int32Array.from(kept, (e) => e.id), Float64Array.from(kept, (e) => e.value));
  return Float64Array.from(vectors, (vector) => cosine(vector, centroid));
}

/**
 * Near-duplicate groups across documents (union–find over links at or above the threshold); each
 * group's representative is its most relevant sentence (ties: the earlier one).
 */
function duplicateGroups(pool: readonly PoolSentence[], graph: CsrGraph, relevance: Float64Array, threshold: number): Int32Array {
  const n = pool.length;
  const parent = Int32Array.from({ length: n }, (_, i) => i);
  const find = (x: number): number => {
    while (parent[x] !== x) {
      parent[x] = parent[parent[x]!]!;
      x = parent[x]!;
    }
    return x;
  };
  for (let i = 0; i < n; i++) {
    forEachLink(graph, i, (j, similarity) => {
      if (j > i && similarity >= threshold && pool[i]!.document !== pool[j]!.document) parent[find(i)] = find(j);
    });
  }
  const best = new Map<number, number>();
  for (let i = 0; i < n; i++) {
    const root = find(i);
    const current = best.get(root);
    if (current === undefined || relevance[i]! > relevance[current]!) best.set(root, i);
  }
  return Int32Array.from({ length: n }, (_, i) => best.get(find(i))!);
}
