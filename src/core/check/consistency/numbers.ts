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
 * another document ("RFC 1728", "issue #961") is a reference: a different one in the support is a
 * contradiction; one the body never names is reported only when the body names others of its kind
 * (an abstract may cite what the body does not, but "#964" where the body speaks of "#961" is
 * likelier a slip). On the train half this caught 3 more changed numbers (recall 0.871 → 0.934)
 * and raised 2 false alarms, both in one abstract that cites issues its body does not.
 */
import type { CheckedText } from './claim-tokens';
import type { BodyFacts, Detector, Evidence, RawFinding } from './detector';
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

/** A "#" that starts a reference ("issue #961", "(#12)", "rfcs#3875"), not one inside a link target. */
const REFERENCE_HASH = /(?:^|[\s([])[A-Za-z]*#$/u;

/** Words that join the numbers of a list of references ("RFCs 352 and 955"). */
const LIST_JOINERS = new Set(['and', 'or']);

/**
 * The document a number names, or null for a count: after a "#" (kind "#"), or after a reference
 * word, directly or through a list of numbers ("RFCs 352 and 955"; kind the word in the singular).
 * `name` is the reference as the text writes it, for one document: "#964", "RFC 955".
 */
function referenceAt(text: CheckedText, token: number): { readonly kind: string; readonly name: string } | null {
  const at = text.tokens[token]!;
  if (text.text[at.start - 1] === '#') return { kind: '#', name: `#${at.lower}` };
  let k = token - 1;
  while (k >= 0 && (/^\d+$/u.test(text.tokens[k]!.lower) || LIST_JOINERS.has(text.tokens[k]!.lower))) k--;
  const before = text.tokens[k];
  if (before === undefined || !REFERENCE_WORDS.has(before.lower)) return null;
  return { kind: before.lower.replace(/s$/u, ''), name: `${before.raw.replace(/s$/u, '')} ${at.lower}` };
}

interface NamedReference {
  readonly evidence: Evidence;
  readonly phrase: string;
}

/** The references each body names, by kind and number: the first sentence that names each. */
const referenceCache = new WeakMap<BodyFacts, Map<string, Map<number, NamedReference>>>();
function bodyReferences(body: BodyFacts): Map<string, Map<number, NamedReference>> {
  let found = referenceCache.get(body);
  if (found) return found;
  found = new Map();
  for (const evidence of body.sentences) {
    const { checked } = evidence;
    checked.tokens.forEach((token, i) => {
      if (!/^\d+$/u.test(token.lower)) return;
      const kind = referenceAt(checked, i)?.kind;
      if (kind === undefined) return;
      const byNumber = found!.get(kind) ?? new Map<number, NamedReference>();
      if (!byNumber.has(Number(token.lower))) byNumber.set(Number(token.lower), { evidence, phrase: checked.text.slice(Math.max(0, token.start - (kind === '#' ? 1 : 0)), token.end) });
      found!.set(kind, byNumber);
    });
  }
  referenceCache.set(body, found);
  return found;
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
    const before = input.claim.text.slice(0, token.start);
    if (/[/#:=]\S*$/u.test(before) && !REFERENCE_HASH.test(before)) continue;
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
    if (claimed.kind === 'ratio') continue;
    const reference = claimed.kind === 'number' ? referenceAt(input.claim, claimed.token) : null;
    if (reference !== null) {
      // A reference the body never names is not checked, unless the body names others of its kind and never this one.
      const named = bodyReferences(input.body).get(reference.kind);
      if (!named || named.has(claimed.value as number)) continue;
      const other = named.values().next().value!;
      findings.push({ kind: 'number', abstractSays: claimed.phrase, bodySays: other.phrase, evidence: other.evidence, note: `the body never names ${reference.name}` });
      continue;
    }
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
