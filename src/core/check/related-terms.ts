/**
 * The document's own vocabulary: which terms it uses together, by latent semantic analysis
 * (Deerwester, Dumais, Furnas, Landauer & Harshman 1990, "Indexing by latent semantic analysis").
 * The term × sentence tf-idf matrix of the body (vectors.ts, 'smoothed' idf) is reduced to its
 * leading singular vectors; two terms are related when their rows in U·Σ point the same way
 * (cosine). "fell" and "reduced" are related in a document that uses them in the same sentences and
 * with the same neighbours; nothing is learnt from outside the document, so no network, no model.
 *
 * The truncated SVD is computed by randomized subspace iteration (Halko, Martinsson & Tropp 2011,
 * "Finding structure with randomness", algorithm 4.4) with a seeded generator, then an exact
 * eigen-decomposition (cyclic Jacobi) of the small projected matrix: deterministic, and linear in
 * the number of non-zeros of the matrix.
 */
import { buildTermIndex, inverseFrequency, tfidfVectors } from '../vectors';

export const LSA_DEFAULTS = {
  /** Most latent dimensions kept (Deerwester et al. used 100 for thousands of documents; a document has fewer sentences). */
  dimensions: 30,
  /** Extra sampled dimensions for accuracy (Halko et al. recommend 5-10). */
  oversampling: 8,
  /** Power iterations (Halko et al.: 1-2 suffice when singular values decay slowly). */
  iterations: 2,
  /** Below this many sentences there is too little co-occurrence to learn from; no relations. */
  minSentences: 12,
  /**
   * A term in fewer sentences than this relates to nothing: its row only repeats the one sentence
   * it is in, so every word of that sentence would look related to it ("text" and "third").
   */
  minTermSentences: 2,
  seed: 0x1a5e,
};

export interface TermSpace {
  readonly vocabulary: ReadonlyMap<string, number>;
  /** Unit-length term rows of U·Σ, `dimensions` values each. */
  readonly rows: Float64Array;
  readonly dimensions: number;
  /** Per term id: 1 when the term is in enough sentences to take part in relations. */
  readonly relatable: Uint8Array;
}

/** mulberry32 (common practice, no source), mapped to [-1, 1). */
function random(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = Math.imul(state ^ (state >>> 15), state | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return (((t ^ (t >>> 14)) >>> 0) / 4294967296) * 2 - 1;
  };
}

/** Orthonormalizes the `cols` columns of a rows × cols row-major matrix in place (modified Gram-Schmidt, twice). */
function orthonormalize(m: Float64Array, rows: number, cols: number): void {
  for (let pass = 0; pass < 2; pass++) {
    for (let c = 0; c < cols; c++) {
      for (let p = 0; p < c; p++) {
        let d = 0;
        for (let r = 0; r < rows; r++) d += m[r * cols + c]! * m[r * cols + p]!;
        for (let r = 0; r < rows; r++) m[r * cols + c]! -= d * m[r * cols + p]!;
      }
      let norm = 0;
      for (let r = 0; r < rows; r++) norm += m[r * cols + c]! ** 2;
      norm = Math.sqrt(norm);
      for (let r = 0; r < rows; r++) m[r * cols + c] = norm > 1e-12 ? m[r * cols + c]! / norm : 0;
    }
  }
}

/** Eigenvalues and eigenvectors (columns of the returned matrix) of a symmetric n × n matrix, by cyclic Jacobi rotations. */
export function symmetricEigen(input: Float64Array, n: number): { values: Float64Array; vectors: Float64Array } {
  const a = Float64Array.from(input);
  const v = new Float64Array(n * n);
  for (let i = 0; i < n; i++) v[i * n + i] = 1;
  for (let sweep = 0; sweep < 60; sweep++) {
    let off = 0;
    for (let p = 0; p < n; p++) for (let q = p + 1; q < n; q++) off += a[p * n + q]! ** 2;
    if (off < 1e-22) break;
    for (let p = 0; p < n; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = a[p * n + q]!;
        if (Math.abs(apq) < 1e-300) continue;
        const theta = (a[q * n + q]! - a[p * n + p]!) / (2 * apq);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        for (let k = 0; k < n; k++) {
          const akp = a[k * n + p]!;
          const akq = a[k * n + q]!;
          a[k * n + p] = c * akp - s * akq;
          a[k * n + q] = s * akp + c * akq;
        }
        for (let k = 0; k < n; k++) {
          const apk = a[p * n + k]!;
          const aqk = a[q * n + k]!;
          a[p * n + k] = c * apk - s * aqk;
          a[q * n + k] = s * apk + c * aqk;
        }
        for (let k = 0; k < n; k++) {
          const vkp = v[k * n + p]!;
          const vkq = v[k * n + q]!;
          v[k * n + p] = c * vkp - s * vkq;
          v[k * n + q] = s * vkp + c * vkq;
        }
      }
    }
  }
  const values = new Float64Array(n);
  for (let i = 0; i < n; i++) values[i] = a[i * n + i]!;
  return { values, vectors: v };
}

/** The term space of a set of sentences (their content terms), or null when there are too few sentences. */
export function termSpace(sentences: readonly (readonly string[])[], settings = LSA_DEFAULTS): TermSpace | null {
  const index = buildTermIndex(sentences);
  const columns = tfidfVectors(index, inverseFrequency(index, 'smoothed'));
  const n = columns.length;
  const m = index.vocabulary.size;
  if (n < settings.minSentences || m < 2) return null;
  // Fewer dimensions for fewer sentences: near full rank, LSA would only repeat the sentences back
  // (no term would relate to one it never meets); too few, and everything relates. k = ⌈√n⌉, chosen
  // by hand on the demo documents, not tuned on the corpus.
  const k = Math.min(settings.dimensions, Math.ceil(Math.sqrt(n)), n - 1, m - 1);
  const l = Math.min(k + settings.oversampling, n, m);
  const next = random(settings.seed);

  // Y = A·Ω (m × l), A's columns being the sentences.
  const omega = new Float64Array(n * l).map(() => next());
  const y = new Float64Array(m * l);
  const timesA = (from: Float64Array, into: Float64Array) => {
    into.fill(0);
    columns.forEach((col, j) => col.ids.forEach((term, e) => {
      const w = col.values[e]!;
      for (let c = 0; c < l; c++) into[term * l + c]! += w * from[j * l + c]!;
    }));
  };
  const timesAT = (from: Float64Array, into: Float64Array) => {
    into.fill(0);
    columns.forEach((col, j) => col.ids.forEach((term, e) => {
      const w = col.values[e]!;
      for (let c = 0; c < l; c++) into[j * l + c]! += w * from[term * l + c]!;
    }));
  };
  timesA(omega, y);
  orthonormalize(y, m, l);
  const z = new Float64Array(n * l);
  for (let q = 0; q < settings.iterations; q++) {
    timesAT(y, z);
    orthonormalize(z, n, l);
    timesA(z, y);
    orthonormalize(y, m, l);
  }
  // B = Qᵀ·A (l × n); B·Bᵀ = W·Λ·Wᵀ gives A ≈ (Q·W)·Σ·Vᵀ with Σ = √Λ.
  timesAT(y, z); // z = Aᵀ·Q = Bᵀ (n × l)
  const gram = new Float64Array(l * l);
  for (let j = 0; j < n; j++) for (let a = 0; a < l; a++) for (let b = a; b < l; b++) gram[a * l + b]! += z[j * l + a]! * z[j * l + b]!;
  for (let a = 0; a < l; a++) for (let b = 0; b < a; b++) gram[a * l + b] = gram[b * l + a]!;
  const { values, vectors } = symmetricEigen(gram, l);
  const order = [...values.keys()].sort((a, b) => values[b]! - values[a]!).slice(0, k);

  const rows = new Float64Array(m * k);
  for (let t = 0; t < m; t++) {
    let norm = 0;
    order.forEach((e, d) => {
      let u = 0;
      for (let c = 0; c < l; c++) u += y[t * l + c]! * vectors[c * l + e]!;
      const value = u * Math.sqrt(Math.max(0, values[e]!));
      rows[t * k + d] = value;
      norm += value * value;
    });
    norm = Math.sqrt(norm);
    if (norm > 0) for (let d = 0; d < k; d++) rows[t * k + d]! /= norm;
  }
  const relatable = new Uint8Array(m);
  for (let t = 0; t < m; t++) relatable[t] = index.sentenceFrequency[t]! >= settings.minTermSentences ? 1 : 0;
  return { vocabulary: index.vocabulary, rows, dimensions: k, relatable };
}

/** Cosine of two terms in the space; 0 for a term the body never uses or uses in too few sentences. */
export function relatedness(space: TermSpace, a: string, b: string): number {
  if (a === b) return 1;
  const i = space.vocabulary.get(a);
  const j = space.vocabulary.get(b);
  if (i === undefined || j === undefined || !space.relatable[i] || !space.relatable[j]) return 0;
  let dot = 0;
  for (let d = 0; d < space.dimensions; d++) dot += space.rows[i * space.dimensions + d]! * space.rows[j * space.dimensions + d]!;
  return dot;
}

/** Terms related to `term` at `min` or more, with their relatedness (the term itself left out). */
export function relatedTerms(space: TermSpace, term: string, min: number): Map<string, number> {
  const related = new Map<string, number>();
  const i = space.vocabulary.get(term);
  if (i === undefined || !space.relatable[i]) return related;
  const k = space.dimensions;
  for (const [other, j] of space.vocabulary) {
    if (j === i || !space.relatable[j]) continue;
    let dot = 0;
    for (let d = 0; d < k; d++) dot += space.rows[i * k + d]! * space.rows[j * k + d]!;
    if (dot >= min) related.set(other, dot);
  }
  return related;
}
