/**
 * A summary with a focus (a question or a few words): what changes in selection.
 *
 *  - Ranking: the method's scores are joined by topic-sensitive LexRank (biased-lexrank.ts,
 *    Otterbacher, Erkan & Radev 2005), which walks the sentence graph from the sentences that
 *    speak to the focus.
 *  - Relevance in MMR: Carbonell & Goldstein (1998) define Maximal Marginal Relevance for a query,
 *    MMR = argmax λ·Sim1(D_i, Q) − (1 − λ)·max_j Sim2(D_i, D_j); Sim1 here is the cosine between
 *    the sentence and the focus in the document's tf·idf space, added to the relevance the
 *    selector maximises (its redundancy term, Sim2, is unchanged).
 *  - Eligibility: only sentences that share a term with the focus may be picked, so a section
 *    with nothing relevant gets no share, and a document with little about the focus gives a
 *    short summary that says so instead of being padded with unrelated sentences.
 */
import { contentTerms, wordTokens } from '../text/tokens';
import { minMax } from '../scale';
import { cosine, inverseFrequency, makeVector, sentenceVectorsOf, termIndexOf, type SparseVector } from '../vectors';
import { sentenceFitness, summaryRelevance } from '../select/fitness';
import type { PreparedSelection } from '../select/selection-input';
import type { AnalyzedDocument, FocusReport, RankResult } from '../types';
import { biasedLexRank, termCounts, type BiasedLexRankSettings } from './biased-lexrank';

export interface FocusWeights {
  /** The method's own (generic) scores. */
  readonly generic: number;
  /** Topic-sensitive LexRank. */
  readonly biased: number;
  /** Sim1 of MMR: cosine with the focus. */
  readonly query: number;
}

/** Ours, to be chosen on the benchmark's train half (bench/focus.ts reports the test half). */
export const FOCUS_WEIGHTS: FocusWeights = { generic: 0.3, biased: 0.4, query: 0.3 };

export interface FocusedSelection extends PreparedSelection {
  /** Combined scores in [0, 1] over the eligible sentences (0 elsewhere), with the parts as features. */
  readonly ranked: RankResult;
  readonly report: FocusReport;
}

/** The focus as the document's content terms (stemmed, stop words out), with counts. */
export function focusTerms(focus: string, language: string): Map<string, number> {
  return termCounts(contentTerms(wordTokens(focus), language));
}

/** The focus as a tf·idf vector in the document's term space ('sentence' idf, as the sentences). */
function focusVector(a: AnalyzedDocument, terms: ReadonlyMap<string, number>): SparseVector {
  const index = termIndexOf(a);
  const idf = inverseFrequency(index, 'sentence');
  const entries: [number, number][] = [];
  for (const [term, count] of terms) {
    const id = index.vocabulary.get(term);
    if (id !== undefined && idf[id]! > 0) entries.push([id, count * idf[id]!]);
  }
  entries.sort((x, y) => x[0] - y[0]);
  return makeVector(Int32Array.from(entries, (e) => e[0]), Float64Array.from(entries, (e) => e[1]));
}

/**
 * The general selection input narrowed and re-weighted for a focus: the selector itself is
 * unchanged; it gets other relevance, candidates and section importance.
 */
export function focusSelection(
  a: AnalyzedDocument,
  focus: string,
  generic: RankResult,
  general: PreparedSelection,
  weights: FocusWeights = FOCUS_WEIGHTS,
  settings: Partial<BiasedLexRankSettings> = {},
): FocusedSelection {
  const terms = focusTerms(focus, a.language);
  const walk = biasedLexRank(a, terms, settings);
  const n = a.terms.length;
  const unitOf = new Int32Array(n).fill(-1);
  const eligible: number[] = [];
  for (let i = 0; i < n; i++) {
    if (general.candidates.unitOf[i]! < 0 || !(walk.relevance[i]! > 0)) continue;
    eligible.push(i);
    unitOf[i] = general.candidates.unitOf[i]!;
  }
  const query = focusVector(a, terms);
  // The same tf·idf vectors MMR's redundancy term compares (cached per document).
  const vectors = sentenceVectorsOf(a);
  const genericScaled = minMax(generic.scores, eligible);
  const biasedScaled = minMax(walk.scores, eligible);
  const similarity = new Float64Array(n);
  const scores = new Float64Array(n);
  for (const i of eligible) {
    similarity[i] = cosine(vectors[i]!, query);
    scores[i] = weights.generic * genericScaled[i]! + weights.biased * biasedScaled[i]! + weights.query * similarity[i]!;
  }
  const relevance = summaryRelevance(scores, sentenceFitness(a), eligible);
  // A section's claim to seats: the focused relevance of its content words, as for the general summary.
  const importance = new Map<number, number>();
  const unitWeights = new Map<number, number>();
  for (const i of eligible) {
    const unit = unitOf[i]!;
    const words = a.words[i]!.length;
    importance.set(unit, (importance.get(unit) ?? 0) + (general.kinds.fragment[i] === 1 ? 0 : relevance[i]! * words));
    unitWeights.set(unit, (unitWeights.get(unit) ?? 0) + words);
  }
  const found = [...terms.keys()].filter((t) => termIndexOf(a).vocabulary.has(t));
  return {
    input: { ...general.input, relevance, unitOf, unitWeights: importance },
    candidates: { unitOf, unitWeights },
    candidateList: eligible,
    kinds: general.kinds,
    ranked: {
      scores,
      features: { ...(generic.features ?? {}), focusWalk: walk.scores, focusMatch: similarity },
      converged: (generic.converged ?? true) && walk.converged,
      iterations: Math.max(generic.iterations ?? 0, walk.iterations),
    },
    report: { text: focus, terms: terms.size, termsFound: found.length, matchingSentences: eligible.length },
  };
}

/** What to tell people when the focus found little: null when the summary is as long as asked. */
export function focusNotice(report: FocusReport, short: boolean): string | null {
  const quoted = `"${report.text.length > 60 ? report.text.slice(0, 60) + '…' : report.text}"`;
  if (report.terms === 0) return `The focus ${quoted} has no content words (only stop words or punctuation), so nothing can match it.`;
  if (report.matchingSentences === 0) return `Nothing in the document matches the focus ${quoted}: no sentence uses any of its words.`;
  if (short) {
    return `The document has little about the focus ${quoted}: only ${report.matchingSentences} sentence${report.matchingSentences === 1 ? '' : 's'} use${report.matchingSentences === 1 ? 's' : ''} its words, so the summary is shorter than asked rather than padded with unrelated sentences.`;
  }
  return null;
}
