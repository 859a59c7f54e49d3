/**
 * What every consistency detector receives and returns. A detector compares one abstract sentence
 * (the claim) with the body sentences chosen to support it, and reports a finding only when the
 * body says something else: it needs conflicting evidence in the support and no agreeing evidence
 * among the claim's closest body sentences (the pool). Precision first: a detector that cannot tell
 * stays silent.
 */
import type { Span } from '../../types';
import type { FindingKind } from '../abstract-report';
import type { CheckedText } from './claim-tokens';

export interface Evidence {
  /** Index into the checked document's sentences. */
  readonly sentence: number;
  readonly checked: CheckedText;
  /** The sentence's source slice (markup kept: code spans stay visible). */
  readonly source: string;
  readonly span: Span;
}

/** Facts about the whole body, for "the body never says X". */
export interface BodyFacts {
  /** Every numeric value the body states (digits, number words, percentages). */
  readonly numbers: ReadonlySet<number>;
  /**
   * Every numeric value written anywhere in the body's text (code and tables too), digits or
   * number words; when absent, `numbers`.
   */
  readonly textNumbers?: ReadonlySet<number>;
  /** The body's source text, lower case, for identifier look-ups. */
  readonly lowerSource: string;
  /** Body sentences in document order, for citing the nearest mention. */
  readonly sentences: readonly Evidence[];
}

export interface DetectorInput {
  readonly claim: CheckedText;
  /** The claim's source slice (for a separate abstract, its own text). */
  readonly claimSource: string;
  /** The support chosen for the claim, best first. */
  readonly support: readonly Evidence[];
  /** The support plus the next closest body sentences: agreeing evidence anywhere here silences a finding. */
  readonly pool: readonly Evidence[];
  /** The body sentence closest to the claim once numbers and identifiers are set aside. */
  readonly frame: Evidence | null;
  readonly body: BodyFacts;
  readonly language: string;
  /**
   * The body sentences that use a term (a stem, as in `CheckedText.terms`), the closest to the
   * claim first, at most `n`: where the body speaks of the same thing. Without it, the pool.
   */
  readonly using?: (term: string, n: number) => readonly Evidence[];
  /** Support strength of one body sentence alone for the claim, 0-1 (support.ts); without it, 1. */
  readonly closeness?: (evidence: Evidence) => number;
}

/** `input.using`, or the pool sentences that use the term. */
export function sentencesUsing(input: DetectorInput, term: string, n: number): readonly Evidence[] {
  if (input.using) return input.using(term, n);
  return input.pool.filter((e) => e.checked.terms.has(term)).slice(0, n);
}

export interface RawFinding {
  readonly kind: FindingKind;
  /** The claim's words, as written ("12 stations"). */
  readonly abstractSays: string;
  /** The body's words at `evidence`, or null when the body never says it. */
  readonly bodySays: string | null;
  readonly evidence: Evidence | null;
  /** Optional extra for the message, e.g. "the body never gives 12". */
  readonly note?: string;
}

export type Detector = (input: DetectorInput) => RawFinding[];
