/**
 * Numbers, dates and versions: the claim's quantity against the body's.
 *   - Agreement anywhere in the pool (the same value, 50% = half) silences the check.
 *   - Contradiction: a support sentence gives a different value for the same thing (a shared
 *     counted word: "12 stations" against "21 stations"; "Rust 1.50" against "Rust 1.51").
 *   - Absence: the body never writes the value anywhere (its code and tables included); the first
 *     place that counts the same thing is cited when there is one. A figure that appears nowhere
 *     in the document cannot be checked against it, so it is reported.
 * Ratio words ("half", "twice") only take part in contradictions: "halved" is often said of a fall
 * the body gives as two figures.
 * Not claims: numbers written only inside code spans (`[0; 4]`, reStructuredText ``x``) and
 * inline targets (_`Requirement 3`), which name or show code rather than count. A number naming
 * another document ("RFC 1728", "issue #961") is a reference: a different one in the body is a
 * contradiction, but one the body never mentions is not reported (common practice, no source).
 */
import type { CheckedText } from './claim-tokens';
import type { Detector, Evidence, RawFinding } from './detector';
import { CODE_SPAN } from './identifiers';
import { comparable, quantitiesIn, sameQuantity, type Quantity } from './quantities';

const KIND_OF: Readonly<Record<Quantity['kind'], RawFinding['kind']>> = {
  number: 'number',
  percent: 'number',
  ratio: 'number',
  date: 'date',
  version: 'version',
};

function sharesContext(a: Quantity, b: Quantity): boolean {
  for (const term of a.context) if (b.context.has(term)) return true;
  return false;
}

const quantityCache = new WeakMap<Evidence, Quantity[]>();
function quantitiesOf(evidence: Evidence): Quantity[] {
  let found = quantityCache.get(evidence);
  if (!found) {
    found = quantitiesIn(evidence.checked);
    quantityCache.set(evidence, found);
  }
  return found;
}

/** Words before a number that make it the name of another document, not a count. */
const REFERENCE_WORDS = new Set(['rfc', 'rfcs', 'issue', 'issues', 'pr', 'prs', 'bug', 'bugs', 'ticket', 'pep']);

/** Words that join the numbers of a list of references ("RFCs 352 and 955"). */
const LIST_JOINERS = new Set(['and', 'or']);

/** Whether the number is a reference: after "#", or after a reference word, directly or through a list of numbers. */
function isReference(claim: CheckedText, token: number): boolean {
  const at = claim.tokens[token]!;
  if (claim.text[at.start - 1] === '#') return true;
  let k = token - 1;
  while (k >= 0 && (/^\d+$/u.test(claim.tokens[k]!.lower) || LIST_JOINERS.has(claim.tokens[k]!.lower))) k--;
  const before = claim.tokens[k];
  return before !== undefined && REFERENCE_WORDS.has(before.lower);
}

/** Words of the source written only inside code spans or inline targets (none of their kind outside). */
function codeOnlyWords(source: string): Set<string> {
  const words = (text: string) => text.toLowerCase().match(/[\p{L}\p{N}.,%]+/gu) ?? [];
  const inside = new Set<string>();
  let outside = source;
  for (const m of source.matchAll(CODE_SPAN)) {
    for (const w of words(m[2]!)) inside.add(w);
    outside = outside.replace(m[0], ' ');
  }
  for (const w of words(outside)) inside.delete(w);
  return inside;
}

function valueText(q: Quantity): string {
  if (q.kind === 'percent') return `${q.value}%`;
  return String(q.value);
}

export const checkNumbers: Detector = (input) => {
  const findings: RawFinding[] = [];
  const claimQuantities = quantitiesIn(input.claim);
  if (claimQuantities.length === 0) return findings;
  const inCode = codeOnlyWords(input.claimSource);
  const primary = input.frame ? [input.frame, ...input.support.filter((s) => s !== input.frame)] : input.support;
  for (const claimed of claimQuantities) {
    // Numbers inside a link target or a reference ("[3]") are not claims.
    const token = input.claim.tokens[claimed.token]!;
    if (/[/#:=]\S*$/u.test(input.claim.text.slice(0, token.start))) continue;
    if (input.claim.text[token.start - 1] === '[' && input.claim.text[token.end] === ']') continue;
    if (inCode.has(token.lower)) continue;
    const agrees = input.pool.some((e) => quantitiesOf(e).some((q) => sameQuantity(claimed, q)));
    if (agrees) continue;
    let conflict: { evidence: Evidence; quantity: Quantity } | null = null;
    for (const evidence of primary) {
      const other = quantitiesOf(evidence).find((q) => comparable(claimed, q) && !sameQuantity(claimed, q) && sharesContext(claimed, q));
      if (other) {
        conflict = { evidence, quantity: other };
        break;
      }
    }
    if (conflict) {
      findings.push({ kind: KIND_OF[claimed.kind], abstractSays: claimed.phrase, bodySays: conflict.quantity.phrase, evidence: conflict.evidence });
      continue;
    }
    if (claimed.kind === 'ratio' || isReference(input.claim, claimed.token)) continue;
    if (stated(claimed, input.body.textNumbers ?? input.body.numbers, input.body.sentences)) continue;
    // The body never gives the value: cite the first place that counts the same thing, if any.
    let elsewhere: { evidence: Evidence; quantity: Quantity } | null = null;
    for (const evidence of input.body.sentences) {
      const other = quantitiesOf(evidence).find((q) => comparable(claimed, q) && sharesContext(claimed, q));
      if (other) {
        elsewhere = { evidence, quantity: other };
        break;
      }
    }
    findings.push({
      kind: KIND_OF[claimed.kind],
      abstractSays: claimed.phrase,
      bodySays: elsewhere ? elsewhere.quantity.phrase : null,
      evidence: elsewhere?.evidence ?? null,
      note: `the body never gives ${valueText(claimed)}`,
    });
  }
  return findings;
};

/** Whether the body states the value at all (numbers by value; dates and versions as written). */
function stated(q: Quantity, numbers: ReadonlySet<number>, body: readonly Evidence[]): boolean {
  if (q.kind === 'number') return numbers.has(q.value as number);
  if (q.kind === 'percent') return numbers.has(q.value as number) || numbers.has((q.value as number) / 100);
  return body.some((e) => quantitiesOf(e).some((other) => sameQuantity(q, other)));
}
