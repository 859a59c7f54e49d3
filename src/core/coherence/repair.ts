/**
 * Automatic repair of summary sentences that do not stand alone (optional; the default is to
 * flag and suggest). For each flagged sentence, in document order, the first step that works:
 *
 * 1. trim a leading connective when that leaves a sentence that stands alone (display text only);
 * 2. add its context sentence(s), if the word budget has room;
 * 3. swap: add the context and drop the lowest-scored picks that are not flagged, not added as
 *    context, and not holding up another pick — only if every dropped pick scores below every
 *    added context sentence, and the result fits the budget;
 * 4. replace it with the best-scored unpicked sentence (any section) that stands alone and fits;
 * 5. drop it, unless it is the last sentence of the summary.
 * Afterwards, words the repairs freed are refilled with the best-scored sentences that stand alone.
 *
 * The order was chosen on the benchmark's train half (`node dist/bench.cjs tune-repair`): trimming
 * first keeps the sentence the ranker chose and costs one word; looking for a replacement in the
 * same section first cost 0.003 ROUGE-1 there (the section's next-best sentence is often weak);
 * refilling won back what dropped and shorter replacements lost. Rounds repeat until nothing is
 * flagged or nothing changes, at most `REPAIR_DEFAULTS.maxRounds` times. A sentence removed by
 * repair is never brought back, and a sentence added as context is never swapped out to make room
 * for other context, so rounds cannot undo each other.
 */
import type { ParsedDocument, StandAloneTrigger } from '../types';
import { bestReplacement, contextChain, danglingAt, memoizedTriggers, trimmedIfStandsAlone, type CheckState, type DanglingProblem } from './detect';

export interface RepairInput {
  readonly doc: ParsedDocument;
  readonly picked: readonly number[];
  /** Per sentence, higher is better. */
  readonly scores: Float64Array;
  readonly wordBudget: number;
  /** Most sentences the summary may hold (a sentence budget); no limit when absent. */
  readonly maxPicks?: number;
  readonly wordsOf: (sentence: number) => number;
  /** Sentences that may be brought into the summary (as context or replacement); all when absent. */
  readonly isCandidate?: (sentence: number) => boolean;
  /** How to repair; `REPAIR_STRATEGY` when absent (the benchmark's tuning tool tries others). */
  readonly strategy?: Partial<RepairStrategy>;
}

/** Choices the train-half tuning (`node dist/bench.cjs tune-repair`) compares. */
export interface RepairStrategy {
  /** Trim a leading connective before trying to add context (keeps the ranker's sentence as is). */
  readonly trimFirst: boolean;
  /** After repairing, fill words left unused with the best-scored sentences that stand alone. */
  readonly refill: boolean;
  /** Step 3 (swap) is tried at all. */
  readonly swap: boolean;
  /** Step 3 drops picks scoring below this share of the lowest context score (1 = below every context sentence). */
  readonly swapScoreRatio: number;
  /** Step 4 looks in the flagged sentence's own section first. */
  readonly sameSectionFirst: boolean;
  /** Triggers left flagged rather than replaced or dropped (steps 4-5). */
  readonly keepTriggers: readonly StandAloneTrigger[];
}

export const REPAIR_STRATEGY: RepairStrategy = { trimFirst: true, refill: true, swap: true, swapScoreRatio: 1, sameSectionFirst: false, keepTriggers: [] };

export interface RepairOutcome {
  /** Sentence indices in document order. */
  readonly picked: number[];
  /** Sentence → displayed text, for sentences shown without their leading connective. */
  readonly edited: Map<number, string>;
  /** One line per change, for people. */
  readonly log: string[];
}

export const REPAIR_DEFAULTS = {
  /** Each round fixes every sentence flagged at its start; later rounds only mop up knock-on effects. */
  maxRounds: 8,
} as const;

export function repairAutomatically(input: RepairInput): RepairOutcome {
  const { doc, scores, wordsOf } = input;
  const strategy: RepairStrategy = { ...REPAIR_STRATEGY, ...input.strategy };
  const isCandidate = input.isCandidate ?? (() => true);
  const chosen = new Set(input.picked.filter((i) => Number.isInteger(i) && i >= 0 && i < doc.sentences.length));
  const edited = new Map<number, string>();
  const state: CheckState = { chosen, edited, triggers: memoizedTriggers() };
  const log: string[] = [];
  const addedAsContext = new Set<number>();
  const removed = new Set<number>();
  let used = 0;
  for (const i of chosen) used += wordsOf(i);
  // Picks may already exceed the budget (a minimum sentence count); swaps must not make it worse.
  const ceiling = () => Math.max(input.wordBudget, used);
  // Context may replace one long pick with several short ones; a sentence budget caps the count too.
  const maxPicks = input.maxPicks ?? Infinity;
  const words = (sentences: Iterable<number>) => {
    let total = 0;
    for (const i of sentences) total += wordsOf(i);
    return total;
  };
  const remove = (i: number) => {
    chosen.delete(i);
    edited.delete(i);
    removed.add(i);
    used -= wordsOf(i);
  };
  const add = (i: number) => {
    chosen.add(i);
    used += wordsOf(i);
  };

  for (let round = 0; round < REPAIR_DEFAULTS.maxRounds; round++) {
    const flagged = [...chosen].sort((a, b) => a - b).filter((i) => danglingAt(doc, i, state) !== null);
    if (flagged.length === 0) break;
    let changed = false;

    for (const sentence of flagged) {
      if (!chosen.has(sentence)) continue;
      const problem = danglingAt(doc, sentence, state);
      if (!problem) continue;
      const label = `sentence ${sentence} (“${problem.hit.words}”)`;
      const context = contextChain(doc, problem.context, state).filter((c) => !chosen.has(c) && !removed.has(c) && isCandidate(c));
      const contextComplete = context.length > 0 && context.includes(problem.context);

      // 1. Trim a leading connective.
      if (strategy.trimFirst && tryTrim(sentence, problem, label)) {
        changed = true;
        continue;
      }

      // 2. Add the context when the budget has room.
      if (contextComplete && used + words(context) <= input.wordBudget && chosen.size + context.length <= maxPicks) {
        for (const c of context) {
          add(c);
          addedAsContext.add(c);
        }
        log.push(`${label}: added context sentence ${context.join(', ')}`);
        changed = true;
        continue;
      }

      // 3. Swap low-scored picks for the context.
      if (contextComplete && strategy.swap) {
        const dropped = swapOut(sentence, context);
        if (dropped) {
          for (const d of dropped) remove(d);
          for (const c of context) {
            add(c);
            addedAsContext.add(c);
          }
          log.push(`${label}: added context sentence ${context.join(', ')} in place of sentence ${dropped.join(', ')}`);
          changed = true;
          continue;
        }
      }

      // Trimming after the context steps (the first version's order, kept for comparison).
      if (!strategy.trimFirst && tryTrim(sentence, problem, label)) {
        changed = true;
        continue;
      }

      // 4. Replace with the best sentence that stands alone (optionally the same section first).
      const section = doc.sentences[sentence]!.section;
      const fits = (c: number) => !removed.has(c) && isCandidate(c) && used - wordsOf(sentence) + wordsOf(c) <= ceiling();
      if (strategy.keepTriggers.includes(problem.hit.trigger)) continue;
      const replacement =
        (strategy.sameSectionFirst ? bestReplacement(doc, sentence, state, scores, (c) => fits(c) && doc.sentences[c]!.section === section) : null) ??
        bestReplacement(doc, sentence, state, scores, fits);
      if (replacement !== null) {
        remove(sentence);
        add(replacement);
        log.push(`${label}: replaced by sentence ${replacement}`);
        changed = true;
        continue;
      }

      // 5. Drop it.
      if (chosen.size > 1) {
        remove(sentence);
        log.push(`${label}: dropped (no context, trim or replacement fits)`);
        changed = true;
      }
    }
    if (!changed) break;
  }

  if (strategy.refill) refill();
  // A trimmed sentence whose context is now picked (as a refill) reads as written.
  for (const i of [...edited.keys()]) {
    const untrimmed = new Map(edited);
    untrimmed.delete(i);
    if (chosen.has(i) && danglingAt(doc, i, { ...state, edited: untrimmed }) === null) edited.delete(i);
  }
  const picked = [...chosen].sort((a, b) => a - b);
  for (const i of edited.keys()) if (!chosen.has(i)) edited.delete(i);
  return { picked, edited, log };

  function tryTrim(sentence: number, problem: DanglingProblem, label: string): boolean {
    const trimmed = trimmedIfStandsAlone(doc, sentence, problem.hit, state);
    if (trimmed === null) return false;
    edited.set(sentence, trimmed);
    log.push(`${label}: shown without its leading connective`);
    return true;
  }

  /** Spend words that repairs freed on the best-scored unpicked sentences that stand alone. */
  function refill(): void {
    const order = [...scores.keys()]
      .filter((c) => !chosen.has(c) && !removed.has(c) && isCandidate(c) && Number.isFinite(scores[c]!))
      .sort((a, b) => scores[b]! - scores[a]! || a - b);
    for (const c of order) {
      if (chosen.size >= maxPicks) break;
      if (used + wordsOf(c) > input.wordBudget || danglingAt(doc, c, state) !== null) continue;
      add(c);
      log.push(`sentence ${c}: added to refill the word budget`);
    }
  }

  /** Picks to drop so that `context` fits, or null when no acceptable swap exists. */
  function swapOut(flaggedSentence: number, context: readonly number[]): number[] | null {
    const contextScore = Math.min(...context.map((c) => scores[c]!)) * strategy.swapScoreRatio;
    if (!Number.isFinite(contextScore)) return null;
    const limit = ceiling();
    const needed = used + words(context) - limit;
    const candidates = [...chosen]
      .filter((p) => p !== flaggedSentence && !addedAsContext.has(p) && scores[p]! < contextScore)
      .filter((p) => danglingAt(doc, p, state) === null && !holdsUpAnother(p))
      .sort((a, b) => scores[a]! - scores[b]! || b - a);
    const dropped: number[] = [];
    let freed = 0;
    const tooMany = () => chosen.size - dropped.length + context.length > maxPicks;
    for (const p of candidates) {
      if (freed >= needed && !tooMany()) break;
      dropped.push(p);
      freed += wordsOf(p);
    }
    return freed >= needed && !tooMany() && dropped.length > 0 ? dropped : null;
  }

  /** Would removing pick `p` leave another pick dangling that does not dangle now? */
  function holdsUpAnother(p: number): boolean {
    const without = new Set(chosen);
    without.delete(p);
    const trial: CheckState = { ...state, chosen: without };
    for (const q of without) {
      if (danglingAt(doc, q, trial) !== null && danglingAt(doc, q, state) === null) return true;
    }
    return false;
  }
}
