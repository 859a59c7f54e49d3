/**
 * Negation and its scope, after NegEx (Chapman et al. 2001, "A simple algorithm for identifying
 * negated findings and diseases in discharge summaries"): a negation cue ("not", "never", "no",
 * "without", "-n't"; "not" only after an auxiliary, since "a value, not an address" contrasts) negates the words after it up to a window of five words, cut short by
 * punctuation or a termination word ("but", "which", "although"); pseudo-negations ("not only",
 * "whether or not", "no doubt") negate nothing. The negated word is the first content word in
 * scope.
 *
 * The body is read where it speaks of the negated word: its sentences that use the word, closest
 * to the claim first (`NEGATION_NEIGHBOURS`).
 *   - The claim negates a word ("does not stop"; not a nominal "has no fields") that none of them
 *     negates: a finding (cited: the closest).
 *   - The claim asserts a word that the closest of them negates, and that sentence is about the
 *     claim's matter (its first support, its frame, or sharing `ABOUT_SHARED` more words) while
 *     the next ones do not assert it: a finding.
 * Either way the cited sentence must be close to the claim (`NEGATION_CLOSENESS`).
 * A word the body never uses is left to the support rule. English only.
 */
import type { CheckedText } from './claim-tokens';
import { sharedTerms } from './claim-tokens';
import { sentencesUsing, type Detector, type DetectorInput, type Evidence, type RawFinding } from './detector';

/** NegEx's window: a cue governs at most this many following words. */
export const NEGATION_WINDOW = 5;
const CUES = new Set(['not', 'no', 'never', 'none', 'nothing', 'neither', 'nor', 'without', 'cannot', 'nobody', 'nowhere']);
const TERMINATORS = new Set(['but', 'however', 'although', 'though', 'except', 'which', 'who', 'whereas', 'while', 'yet', 'because', 'since', 'unless', 'instead', 'rather', 'so']);
const PSEUDO_AFTER: Readonly<Record<string, readonly string[]>> = {
  not: ['only', 'just', 'necessarily', 'merely', 'least'],
  no: ['doubt', 'matter', 'less'],
};
const BREAK = /[,;:()[\]{}!?]|\.\s/u;
/** "not" negates a statement after an auxiliary ("does not reduce"); elsewhere it mostly contrasts ("a value, not an address"). */
const AUXILIARIES = new Set(['is', 'are', 'was', 'were', 'be', 'been', 'being', 'am', 'do', 'does', 'did', 'has', 'have', 'had', 'will', 'would', 'can', 'could', 'should', 'shall', 'may', 'might', 'must', 'need', 'also', 'still']);
/** Adverbs that sit between a negation and the word it negates ("does not currently check"). */
const SCOPE_ADVERBS = new Set(['currently', 'yet', 'always', 'really', 'necessarily', 'actually', 'generally', 'usually', 'normally', 'directly', 'explicitly', 'fully', 'entirely', 'simply', 'easily', 'typically', 'officially', 'today']);

export interface NegationScope {
  /** Token index of the cue. */
  readonly cue: number;
  /** Token indices in scope (after the cue). */
  readonly scope: readonly number[];
  /** Token index of the negated word, or null when no content word is in scope. */
  readonly head: number | null;
}

function isCue(text: CheckedText, i: number): boolean {
  const word = text.tokens[i]!.lower;
  if (word.endsWith("n't")) return true;
  if (!CUES.has(word)) return false;
  const next = text.tokens[i + 1]?.lower;
  if (next !== undefined && PSEUDO_AFTER[word]?.includes(next)) return false;
  const before = text.tokens[i - 1]?.lower;
  if (word === 'not' && (before === 'or' || before === 'if')) return false; // "whether or not", "if not"
  if (word === 'not' && (before === undefined || !AUXILIARIES.has(before))) return false;
  return true;
}

export function negationScopes(text: CheckedText): NegationScope[] {
  const scopes: NegationScope[] = [];
  const tokens = text.tokens;
  for (let i = 0; i < tokens.length; i++) {
    if (!isCue(text, i)) continue;
    const scope: number[] = [];
    let head: number | null = null;
    for (let k = i + 1; k < tokens.length && scope.length < NEGATION_WINDOW; k++) {
      if (BREAK.test(text.text.slice(tokens[k - 1]!.end, tokens[k]!.start)) || TERMINATORS.has(tokens[k]!.lower) || isCue(text, k)) break;
      scope.push(k);
      if (head === null && tokens[k]!.term !== null && !/\d/u.test(tokens[k]!.lower) && !SCOPE_ADVERBS.has(tokens[k]!.lower)) head = k;
    }
    scopes.push({ cue: i, scope, head });
  }
  return scopes;
}

/** Whether any occurrence of `term` in the sentence lies in a negation scope, and whether any lies outside. */
function polarityOf(text: CheckedText, scopes: readonly NegationScope[], term: string): { negated: number | null; plain: number | null } {
  const inScope = new Set(scopes.flatMap((s) => s.scope));
  let negated: number | null = null;
  let plain: number | null = null;
  text.tokens.forEach((token, i) => {
    if (token.term !== term) return;
    if (inScope.has(i)) negated ??= i;
    else plain ??= i;
  });
  return { negated, plain };
}

/** The negated (or asserted) word with the words around it: "do not reduce missed", "reduce missed appointments". */
function phrase(text: CheckedText, cue: number | null, head: number): string {
  const last = Math.min(text.tokens.length - 1, head + (cue === null ? 2 : 1));
  let first = cue ?? head;
  if (cue !== null && cue > 0 && AUXILIARIES.has(text.tokens[cue - 1]!.lower)) first = cue - 1;
  const end = BREAK.test(text.text.slice(text.tokens[head]!.end, text.tokens[last]!.start)) ? head : last;
  return text.text.slice(text.tokens[first]!.start, text.tokens[end]!.end);
}

const scopeCache = new WeakMap<CheckedText, NegationScope[]>();
function scopesOf(text: CheckedText): NegationScope[] {
  let scopes = scopeCache.get(text);
  if (!scopes) {
    scopes = negationScopes(text);
    scopeCache.set(text, scopes);
  }
  return scopes;
}

/** Cues that deny that something exists ("has no fields", "without a lock") rather than what happens. */
const NOMINAL_CUES = new Set(['no', 'none', 'nothing', 'without', 'nobody', 'nowhere', 'neither', 'nor']);

/**
 * Whether a cue negates what happens ("does not stop", "never stops"). A claim's nominal negation
 * ("has no fields") is not contradicted by a body that names the thing elsewhere ("the fields of a
 * struct"): on the train half such claims raised 11 of 85 negation false alarms, and leaving them
 * out lost no flipped negation that was caught (239 → 241 caught).
 */
function verbal(text: CheckedText, cue: number): boolean {
  return !NOMINAL_CUES.has(text.tokens[cue]!.lower);
}

/** Words besides the negated one that a body sentence shares with the claim to speak of the same matter. */
export const ABOUT_SHARED = 3;
/**
 * Least support strength (support.ts) of the body sentence cited against a claim's negation: a
 * sentence that merely uses the word says little about the claim. Chosen on the train half.
 */
export const NEGATION_CLOSENESS = 0.1;

/** Whether a body sentence speaks of the claim's matter: its closest support, its frame, or one sharing enough words besides `term`. */
function aboutClaim(input: DetectorInput, evidence: Evidence, term: string): boolean {
  return evidence === input.support[0] || evidence === input.frame || sharedTerms(input.claim, evidence.checked, new Set([term])).length >= ABOUT_SHARED;
}

/**
 * Support strength from which a body sentence restates the claim: then restatements alone decide
 * the word's polarity, not the other sentences that use it. Chosen on the train half: at 0.8 three
 * more flipped negations were caught and no false alarm was added; 0.7 and 0.6 caught the same
 * and added 2 and 3.
 */
export const RESTATES = 0.8;

function restates(input: DetectorInput, evidence: Evidence): boolean {
  return (input.closeness?.(evidence) ?? 0) >= RESTATES;
}

/** How many of the body's sentences about a word are read for its polarity (the closest to the claim first). */
export const NEGATION_NEIGHBOURS = 3;

export const checkNegation: Detector = (input) => {
  if (!input.language.startsWith('en')) return [];
  const findings: RawFinding[] = [];
  const claim = input.claim;
  const claimScopes = scopesOf(claim);
  const reported = new Set<string>();
  const polarity = (e: Evidence, term: string) => polarityOf(e.checked, scopesOf(e.checked), term);

  // The claim negates a word: the body's closest sentences about that word must negate it too.
  for (const scope of claimScopes) {
    if (scope.head === null || !verbal(claim, scope.cue)) continue;
    const term = claim.tokens[scope.head]!.term!;
    if (reported.has(term)) continue;
    const near = sentencesUsing(input, term, NEGATION_NEIGHBOURS);
    if (near.length === 0) continue; // the body never speaks of it: the support rule decides
    // Body sentences that restate the claim decide alone; without one, any of them negating the word agrees.
    const restating = near.filter((e) => restates(input, e));
    if ((restating.length > 0 ? restating : near).some((e) => polarity(e, term).negated !== null)) continue;
    const evidence = restating[0] ?? near[0]!;
    // Only a sentence close enough to the claim to stand for what the body says about it.
    if ((input.closeness?.(evidence) ?? 1) < NEGATION_CLOSENESS) continue;
    reported.add(term);
    findings.push({ kind: 'negation', abstractSays: phrase(claim, scope.cue, scope.head), bodySays: phrase(evidence.checked, null, polarity(evidence, term).plain!), evidence });
  }
  // The claim asserts a word that the body's closest sentence about it negates.
  const claimPolarity = new Map<string, { negated: number | null; plain: number | null }>();
  for (const term of claim.terms) claimPolarity.set(term, polarityOf(claim, claimScopes, term));
  for (const [term, p] of claimPolarity) {
    if (p.plain === null || p.negated !== null || reported.has(term) || /\d/u.test(term)) continue;
    const near = sentencesUsing(input, term, NEGATION_NEIGHBOURS);
    const closest = near[0];
    if (!closest) continue;
    const there = polarity(closest, term);
    if (there.negated === null || there.plain !== null) continue;
    if (!aboutClaim(input, closest, term)) continue;
    // The same closeness as the other direction asks of the sentence it cites.
    if ((input.closeness?.(closest) ?? 1) < NEGATION_CLOSENESS) continue;
    // Said plainly in the next sentences about it: the body says it both ways. When the closest
    // restates the claim, only another restatement can say it the other way.
    const others = restates(input, closest) ? near.slice(1).filter((e) => restates(input, e)) : near.slice(1);
    if (others.some((e) => polarity(e, term).plain !== null && polarity(e, term).negated === null)) continue;
    const scope = scopesOf(closest.checked).find((s) => s.scope.includes(there.negated!));
    if (!scope || scope.head === null || closest.checked.tokens[scope.head]!.term !== term) continue;
    reported.add(term);
    findings.push({ kind: 'negation', abstractSays: phrase(claim, null, p.plain), bodySays: phrase(closest.checked, scope.cue, scope.head), evidence: closest });
  }
  return findings;
};
