/**
 * Claim alignment: for each abstract sentence, the body sentences that back it, one or (when the
 * claim gathers several places) two or three combined.
 *
 * Support strength is the tf-idf cosine (vectors.ts, 'smoothed' idf over the body and the abstract)
 * of the claim with the chosen sentences taken together. A claim term the sentences lack still
 * counts, at `relatedCredit`, when they use a term the document relates to it (related-terms.ts,
 * latent semantic analysis). Terms are stems with numbers normalized ("three" = "3"), so
 * inflection and spelled-out numbers are paraphrase, not change. (An idf-weighted recall of the
 * claim's terms was tried first and separated real abstract sentences from foreign ones worse on
 * the train half: real abstracts use many words their body never uses.)
 *
 * Sentences are combined greedily: the best single sentence, then whichever adds most, while it
 * adds at least `minGain`.
 */
import { contentTerms } from '../text/tokens';
import { numberWordValue } from './consistency/quantities';
import type { TermSpace } from './related-terms';
import { relatedTerms } from './related-terms';

/**
 * `supported` was read off the train half of the check benchmark (bench/check.ts; even RFC
 * numbers, even-hashed Nova specs: at 0.2, about 19% of the first 70 documents' real claim
 * sentences per corpus fall below it against 77% of foreign sentences; lower thresholds lose
 * foreign sentences faster than they spare real ones). `related`, `relatedCredit` and `minGain`
 * were set by hand on the demo documents. Test-half figures: bench/RESULTS.md.
 */
export const SUPPORT_DEFAULTS = {
  /** A claim is supported when its support reaches this share of its weighted terms. */
  supported: 0.2,
  /** Relatedness (LSA cosine) from which a body term stands in for a claim term. */
  related: 0.9,
  /** Credit for a claim term matched through a related term, against 1 for the term itself. */
  relatedCredit: 0.5,
  /** Least gain in support for a second or third sentence to be combined. */
  minGain: 0.04,
  maxSentences: 3,
  /** Closest sentences, besides the support, where agreeing evidence silences a finding. */
  poolSize: 6,
};

export type SupportSettings = typeof SUPPORT_DEFAULTS;

/** Content terms with spelled-out numbers written as digits. */
export function normalizedTerms(words: readonly string[], language: string): string[] {
  return contentTerms(words.map((w) => {
    const value = numberWordValue(w);
    return value === null ? w : String(value);
  }), language);
}

export interface ClaimTerms {
  /** Distinct terms with their weights. */
  readonly weights: ReadonlyMap<string, number>;
  /** Terms that are numbers or come from identifiers: left out of the frame. */
  readonly slots: ReadonlySet<string>;
}

export interface MatchedTerm {
  readonly term: string;
  /** The body term that stood in for it (latent semantic analysis), or null for the term itself. */
  readonly via: string | null;
}

export interface SupportPick {
  /** Position in the body list. */
  readonly position: number;
  /** Claim terms this sentence contributed. */
  readonly matched: readonly MatchedTerm[];
}

export interface Alignment {
  /** Best first; empty when no body sentence shares anything with the claim. */
  readonly picks: readonly SupportPick[];
  /** Share of the claim's weight the picks contain, 0-1. */
  readonly strength: number;
  /** Each body sentence's strength alone (same order as the body list). */
  readonly single: Float64Array;
  /** The closest body sentences by strength alone (positions), best first. */
  readonly pool: readonly number[];
  /** The body sentence closest to the claim's terms other than numbers and identifiers (a position), or null. */
  readonly frame: number | null;
}

interface Related {
  readonly term: string;
  /** tf·idf weight in the claim. */
  readonly weight: number;
  readonly related: ReadonlyMap<string, number>;
}

/** A body sentence (or several merged) as tf·idf weights by term. */
export type WeightedTerms = ReadonlyMap<string, number>;

/**
 * Cosine of the claim with body weights, where a claim term the body lacks borrows, at
 * `relatedCredit` × relatedness, the weight of the body term the document relates to it.
 */
function credit(claim: readonly Related[], claimNorm: number, body: WeightedTerms, settings: SupportSettings): { score: number; matched: MatchedTerm[] } {
  let dot = 0;
  let extra = 0;
  let bodySquares = 0;
  for (const value of body.values()) bodySquares += value * value;
  const matched: MatchedTerm[] = [];
  for (const c of claim) {
    const own = body.get(c.term);
    if (own !== undefined) {
      dot += c.weight * own;
      matched.push({ term: c.term, via: null });
      continue;
    }
    let best: string | null = null;
    let bestValue = 0;
    for (const [t, w] of body) {
      const r = c.related.get(t);
      if (r !== undefined && r * w > bestValue) {
        best = t;
        bestValue = r * w;
      }
    }
    if (best !== null) {
      const borrowed = settings.relatedCredit * bestValue;
      dot += c.weight * borrowed;
      extra += borrowed * borrowed;
      matched.push({ term: c.term, via: best });
    }
  }
  const norm = Math.sqrt(bodySquares + extra);
  return { score: norm === 0 || claimNorm === 0 ? 0 : Math.min(1, dot / (claimNorm * norm)), matched };
}

function merge(a: WeightedTerms, b: WeightedTerms): Map<string, number> {
  const merged = new Map(a);
  for (const [t, w] of b) merged.set(t, (merged.get(t) ?? 0) + w);
  return merged;
}

export function alignClaim(
  claim: ClaimTerms,
  body: readonly WeightedTerms[],
  space: TermSpace | null,
  settings: SupportSettings = SUPPORT_DEFAULTS,
): Alignment {
  const related: Related[] = [...claim.weights].map(([term, weight]) => ({
    term,
    weight,
    related: space ? relatedTerms(space, term, settings.related) : new Map(),
  }));
  const normOf = (list: readonly Related[]) => Math.sqrt(list.reduce((sum, r) => sum + r.weight * r.weight, 0));
  const claimNorm = normOf(related);
  const single = new Float64Array(body.length);
  if (claimNorm === 0) return { picks: [], strength: 0, single, pool: [], frame: null };
  body.forEach((terms, p) => (single[p] = credit(related, claimNorm, terms, settings).score));

  const frameClaim = related.filter((r) => !claim.slots.has(r.term));
  const frameNorm = normOf(frameClaim);
  let frame: number | null = null;
  let frameBest = 0;
  if (frameNorm > 0) {
    body.forEach((terms, p) => {
      const value = credit(frameClaim, frameNorm, terms, settings).score;
      if (value > frameBest) {
        frameBest = value;
        frame = p;
      }
    });
  }

  const ranked = [...single.keys()].filter((p) => single[p]! > 0).sort((a, b) => single[b]! - single[a]! || a - b);
  const picks: SupportPick[] = [];
  let union: WeightedTerms = new Map();
  let unionMatched = new Set<string>();
  let strength = 0;
  const candidates = ranked.slice(0, 40);
  while (picks.length < settings.maxSentences && candidates.length > 0) {
    let bestPosition = -1;
    let bestScore = strength;
    for (const p of candidates) {
      const score = credit(related, claimNorm, merge(union, body[p]!), settings).score;
      if (score > bestScore + 1e-12) {
        bestScore = score;
        bestPosition = p;
      }
    }
    if (bestPosition < 0 || (picks.length > 0 && bestScore - strength < settings.minGain)) break;
    union = merge(union, body[bestPosition]!);
    const after = credit(related, claimNorm, union, settings).matched;
    picks.push({ position: bestPosition, matched: after.filter((m) => !unionMatched.has(m.term)) });
    unionMatched = new Set(after.map((m) => m.term));
    strength = bestScore;
    candidates.splice(candidates.indexOf(bestPosition), 1);
  }
  const chosen = new Set(picks.map((p) => p.position));
  const pool = ranked.filter((p) => !chosen.has(p)).slice(0, settings.poolSize);
  return { picks, strength, single, pool, frame };
}
