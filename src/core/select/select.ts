/**
 * Chooses summary sentences from ranker scores: the budget is shared across balance units by
 * Hamilton apportionment, each unit first contributes its best sentence, then the rest of the
 * budget goes by Maximal Marginal Relevance within each unit's quota, and finally (when short
 * sentences leave words over) without quotas.
 *
 * Selection is lazy (lazy-pool.ts): each round keeps its candidates in a max-heap of MMR values
 * and re-evaluates only stale entries that reach the top, so a pick costs about log n instead of
 * a scan of every candidate; the picks are the same as a full scan's.
 */
import { apportionHamilton } from './apportion';
import { LazyPool } from './lazy-pool';
import { PickRules, type LeftOutReason, type PickRuleInput } from './pick-rules';
import { RedundancyTracker } from './redundancy';
import { autoWords, WORDS_PER_MINUTE } from '../reading';
import type { Budget } from '../types';
import type { SparseVector } from '../vectors';

export interface SelectionInput extends PickRuleInput {
  /**
   * How good a summary line each sentence is, in [0, 1] over the candidates (ranker scores scaled
   * once and multiplied by sentence fitness; see fitness.ts), so λ means the same for every ranker.
   */
  readonly relevance: Float64Array;
  /** Word count of each sentence. */
  readonly wordCounts: readonly number[];
  /** Term vectors of the sentences and the size of their vocabulary (for redundancy). */
  readonly vectors: readonly SparseVector[];
  readonly vocabularySize: number;
  /** Balance unit of each sentence, or -1 when the sentence is not a candidate. */
  readonly unitOf: Int32Array;
  /** Weight of each balance unit (index = unit id); used only when balancing. */
  readonly unitWeights: ReadonlyMap<number, number>;
  readonly budget: Budget;
  readonly minSentences: number;
  readonly minPerSection: number;
  readonly balance: boolean;
  readonly mmrLambda: number;
}

export interface Selection {
  /** Picked sentence indices in document order. */
  readonly picked: number[];
  /** Seats planned per unit (0 when balance is off). */
  readonly quotas: ReadonlyMap<number, number>;
  /** Words the budget allows (Infinity for sentence budgets). */
  readonly wordLimit: number;
  /** Balance units given no seat, and why (balance on only). */
  readonly leftOut: ReadonlyMap<number, LeftOutReason>;
  /** MMR values computed (the benchmark's measure of selection work). */
  readonly stats: { readonly evaluations: number };
}

interface Quotas {
  readonly quotas: Map<number, number>;
  readonly leftOut: Map<number, LeftOutReason>;
}

/**
 * How much less a further sentence from an already represented section counts when the budget is
 * too small for every section (0 = no spreading, 1 = one sentence per section). Measured on the
 * benchmark's train half, ROUGE-1 F1 of the default method: 0 → 0.348, 0.5 → 0.345, 1 → 0.344.
 * We take 1: a small cost in ROUGE for the spread across topics that the balance setting promises.
 * Re-measured with the maxent default (3 December 2026, train halves, RFCs / Nova): 0 → 0.350 /
 * 0.400, 0.5 → 0.347 / 0.395, 1 → 0.347 / 0.392; the same choice, for the same reason.
 */
export const SECTION_REPEAT_PENALTY = 1;

interface Limits {
  readonly maxSentences: number;
  readonly wordLimit: number;
  /** Sentences to reach even if that passes the word limit (ratio budgets only). */
  readonly floorSentences: number;
}

function limitsFor(input: SelectionInput, candidateCount: number, candidateWords: number): Limits {
  const { budget } = input;
  if (budget.unit === 'sentences') {
    return { maxSentences: Math.min(candidateCount, budget.value), wordLimit: Infinity, floorSentences: 0 };
  }
  if (budget.unit === 'words') {
    // An explicit word count is a hard limit; a summary still gets one sentence if any fits nowhere.
    return { maxSentences: candidateCount, wordLimit: budget.value, floorSentences: 0 };
  }
  // Soft limits: a share of the words, a reading time, or the default that grows with the document.
  const wordLimit =
    budget.unit === 'minutes' ? Math.round(budget.value * WORDS_PER_MINUTE) : budget.unit === 'auto' ? autoWords(candidateWords) : Math.round(budget.value * candidateWords);
  return { maxSentences: candidateCount, wordLimit, floorSentences: Math.min(candidateCount, input.minSentences) };
}

export function selectSentences(input: SelectionInput): Selection {
  const n = input.relevance.length;
  const candidates: number[] = [];
  let candidateWords = 0;
  for (let i = 0; i < n; i++) {
    if (input.unitOf[i]! >= 0) {
      candidates.push(i);
      candidateWords += input.wordCounts[i]!;
    }
  }
  const limits = limitsFor(input, candidates.length, candidateWords);
  const stats = { evaluations: 0 };
  if (candidates.length === 0 || limits.maxSentences === 0) return { picked: [], quotas: new Map(), wordLimit: limits.wordLimit, leftOut: new Map(), stats };

  const relevance = input.relevance;
  const tracker = new RedundancyTracker(input.vectors, input.vocabularySize);
  const rules = new PickRules(input);
  const picked = new Set<number>();
  const perUnit = new Map<number, number>();
  const unitChanges = new Map<number, number>();
  let words = 0;

  const fits = (i: number) =>
    words + input.wordCounts[i]! <= limits.wordLimit || picked.size < limits.floorSentences;
  const full = () =>
    picked.size >= limits.maxSentences || (words >= limits.wordLimit && picked.size >= limits.floorSentences);
  const take = (i: number) => {
    picked.add(i);
    words += input.wordCounts[i]!;
    const unit = input.unitOf[i]!;
    perUnit.set(unit, (perUnit.get(unit) ?? 0) + 1);
    unitChanges.set(unit, (unitChanges.get(unit) ?? 0) + 1);
    tracker.addPick(i);
    rules.addPick(i);
  };
  const { quotas, leftOut } = input.balance ? planQuotas(input, candidates, limits, rules) : { quotas: new Map<number, number>(), leftOut: new Map<number, LeftOutReason>() };
  rules.leaveOut(leftOut.keys());
  // With balance on but too few sentences for every section, each further pick from a section that
  // already has one counts for less, so the summary spreads over the sections with the best sentences.
  const repeatPenalty = input.balance && quotas.size === 0 ? SECTION_REPEAT_PENALTY : 0;
  const mmr = (i: number) =>
    input.mmrLambda * relevance[i]! * (1 - repeatPenalty) ** (perUnit.get(input.unitOf[i]!) ?? 0) -
    (1 - input.mmrLambda) * tracker.similarityToPicked(i);
  // A value changes only when the sentence's redundancy rose or its section gained a pick; both
  // counters only grow, so their sum changes whenever either does.
  const version = (i: number) => tracker.version(i) + (repeatPenalty > 0 ? (unitChanges.get(input.unitOf[i]!) ?? 0) : 0);

  /** A lazy pool over `members`; `allowed` must stay false once false. */
  const pool = (members: readonly number[], allowed: (i: number) => boolean) =>
    new LazyPool(members, { value: mmr, version, usable: (i) => !picked.has(i) && allowed(i) && fits(i) && !rules.blocked(i) });
  const drain = (p: LazyPool) => {
    stats.evaluations += p.evaluations;
  };

  if (input.balance && quotas.size > 0) {
    // Round 1: every unit with a seat gets its best sentence, heaviest units first.
    const units = [...quotas.entries()].filter(([, q]) => q > 0).sort((a, b) => (input.unitWeights.get(b[0]) ?? 0) - (input.unitWeights.get(a[0]) ?? 0) || a[0] - b[0]);
    const members = new Map<number, number[]>();
    for (const i of candidates) {
      if (!rules.filler(i)) continue;
      const list = members.get(input.unitOf[i]!);
      if (list) list.push(i);
      else members.set(input.unitOf[i]!, [i]);
    }
    for (const [unit] of units) {
      if (full()) break;
      const p = pool(members.get(unit) ?? [], () => true);
      const choice = p.takeBest();
      drain(p);
      if (choice >= 0) take(choice);
    }
    // Round 2: fill each unit up to its quota by MMR across the whole document.
    const underQuota = (i: number) => (perUnit.get(input.unitOf[i]!) ?? 0) < (quotas.get(input.unitOf[i]!) ?? 0);
    const second = pool(candidates.filter((i) => rules.filler(i)), underQuota);
    while (!full()) {
      const choice = second.takeBest();
      if (choice < 0) break;
      take(choice);
    }
    drain(second);
  }
  // Round 3 (or the only round without balance): whatever budget is left, by MMR alone; fragments
  // only on their own merit.
  const third = pool(candidates.filter((i) => rules.free(i)), () => true);
  while (!full()) {
    const choice = third.takeBest();
    if (choice < 0) break;
    take(choice);
  }
  drain(third);
  // A hard word budget smaller than every sentence would leave nothing; one short sentence is more useful.
  if (picked.size === 0) {
    const pickable = candidates.filter((i) => rules.free(i));
    const from = pickable.length > 0 ? pickable : candidates;
    take(from.reduce((a, b) => (input.wordCounts[b]! < input.wordCounts[a]! ? b : a)));
  }
  return { picked: [...picked].sort((a, b) => a - b), quotas, wordLimit: limits.wordLimit, leftOut, stats };
}

/**
 * Seats per unit: sentence budgets share seats directly; word budgets share the number of
 * average-length sentences that fit.
 */
function planQuotas(input: SelectionInput, candidates: readonly number[], limits: Limits, rules: PickRules): Quotas {
  const leftOut = rules.unitsLeftOut(candidates);
  const units = [...new Set(candidates.map((i) => input.unitOf[i]!))].filter((u) => !leftOut.has(u)).sort((a, b) => a - b);
  let seats = limits.maxSentences;
  if (Number.isFinite(limits.wordLimit)) {
    const averageWords = candidates.reduce((sum, i) => sum + input.wordCounts[i]!, 0) / candidates.length || 1;
    seats = Math.max(limits.floorSentences, Math.min(limits.maxSentences, Math.round(limits.wordLimit / averageWords)));
  }
  // Too few sentences to give every section one: no quotas; the selector then spreads the picks
  // with a per-section repeat penalty instead (see SECTION_REPEAT_PENALTY).
  if (seats < units.length || units.length === 0) return { quotas: new Map(), leftOut };
  const allocation = apportionHamilton(
    units.map((u) => input.unitWeights.get(u) ?? 0),
    Math.max(seats, 1),
    input.minPerSection,
  );
  return { quotas: new Map(units.map((u, k) => [u, allocation[k]!])), leftOut };
}
