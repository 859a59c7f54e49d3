/**
 * Stand-alone (coherence) checks: find summary sentences that lean on text the summary leaves
 * out, suggest repairs, and optionally apply them.
 */
import type { StandAloneTrigger } from '../types';
import { danglingTrigger as firstTrigger } from './triggers';

export { findStandAloneProblems, type CheckOptions } from './detect';
export { repairAutomatically, REPAIR_DEFAULTS, type RepairInput, type RepairOutcome } from './repair';
export { danglingTriggers, type TriggerHit } from './triggers';
export { CONNECTIVES, PDTB2_CONNECTIVES, type Connective, type ConnectiveRole } from './connectives';

/**
 * For one sentence on its own: the first word(s) that make it lean on earlier text, with their
 * offsets in `sentenceText`, or null when it reads on its own.
 */
export function danglingTrigger(
  sentenceText: string,
): { trigger: StandAloneTrigger; words: string; start: number; end: number } | null {
  const hit = firstTrigger(sentenceText);
  return hit ? { trigger: hit.trigger, words: hit.words, start: hit.start, end: hit.end } : null;
}
