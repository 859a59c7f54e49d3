/**
 * Everything in one sentence that may stop it from standing alone, in reading order.
 * Pure text analysis: whether the context is in the summary is decided in `detect.ts`.
 */
import type { StandAloneTrigger } from '../types';
import { clauseLayout } from './clause';
import { pronounTriggers, type FoundTrigger } from './pronouns';
import { referenceTriggers } from './references';
import { tokenize } from './tokens';

export interface TriggerHit {
  readonly trigger: StandAloneTrigger;
  /** The words as written in the sentence text. */
  readonly words: string;
  /** Offsets into the sentence text, half-open. */
  readonly start: number;
  readonly end: number;
}

export function danglingTriggers(sentenceText: string): TriggerHit[] {
  const tokens = tokenize(sentenceText);
  const layout = clauseLayout(tokens);
  const found: FoundTrigger[] = [];
  const connective = layout.connective;
  const hits: TriggerHit[] = [];
  if (connective?.connective.dependsOnPrior) {
    hits.push({ trigger: 'connective', words: sentenceText.slice(connective.start, connective.end), start: connective.start, end: connective.end });
  }
  found.push(...pronounTriggers(layout), ...referenceTriggers(layout));
  for (const hit of found) {
    const start = tokens[hit.first]!.start;
    const end = tokens[hit.last - 1]!.end;
    hits.push({ trigger: hit.trigger, words: sentenceText.slice(start, end), start, end });
  }
  hits.sort((a, b) => a.start - b.start || b.end - a.end);
  // Overlapping hits ("Also," as connective and as additive) are reported once, the first wins.
  const kept: TriggerHit[] = [];
  for (const hit of hits) {
    const last = kept[kept.length - 1];
    if (last && hit.start < last.end) continue;
    kept.push(hit);
  }
  return kept;
}

/** The first trigger in the sentence, or null when it reads on its own. */
export function danglingTrigger(sentenceText: string): TriggerHit | null {
  return danglingTriggers(sentenceText)[0] ?? null;
}
