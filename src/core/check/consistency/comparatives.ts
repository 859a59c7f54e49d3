/**
 * Comparatives and directions of change: "faster" against "slower", "more" against "fewer",
 * "increases" against "reduces". Pairs of opposite words are a small fixed table (common practice,
 * no source). A finding needs a support sentence that uses the opposite word (and not the claim's)
 * about the same thing: a content word within three words of both comparatives is shared, and for
 * "more"/"less" it is the word they qualify. No sentence of the pool may use the claim's word
 * about it. Swapped order ("A is faster than B" against "B is faster than A") is not detected.
 * English only.
 */
import type { CheckedText } from './claim-tokens';
import type { Detector, Evidence, RawFinding } from './detector';

const PAIRS: readonly (readonly [readonly string[], readonly string[]])[] = [
  [['more'], ['less', 'fewer']],
  [['most'], ['least', 'fewest']],
  [['faster', 'quicker', 'sooner'], ['slower']],
  [['higher'], ['lower']],
  [['larger', 'bigger', 'greater'], ['smaller']],
  [['better'], ['worse']],
  [['longer'], ['shorter']],
  [['earlier'], ['later']],
  [['easier', 'simpler'], ['harder']],
  [['stronger'], ['weaker']],
  [['cheaper'], ['costlier', 'pricier']],
  [['increase', 'increases', 'increased', 'increasing'], ['decrease', 'decreases', 'decreased', 'decreasing', 'reduce', 'reduces', 'reduced', 'reducing']],
  [['rise', 'rises', 'rose', 'risen'], ['fall', 'falls', 'fell', 'fallen', 'drop', 'drops', 'dropped']],
];
/** Words that only mean something with the word they qualify. */
const QUALIFIERS = new Set(['more', 'less', 'fewer', 'most', 'least', 'fewest']);
const ANCHOR_WINDOW = 3;

interface Use {
  readonly pair: number;
  readonly side: 0 | 1;
  readonly token: number;
  readonly anchors: ReadonlySet<string>;
}

const SIDE = new Map<string, [number, 0 | 1]>();
PAIRS.forEach(([a, b], pair) => {
  for (const w of a) SIDE.set(w, [pair, 0]);
  for (const w of b) SIDE.set(w, [pair, 1]);
});

export function comparativeUses(text: CheckedText): Use[] {
  const uses: Use[] = [];
  text.tokens.forEach((token, i) => {
    const side = SIDE.get(token.lower);
    if (!side) return;
    const anchors = new Set<string>();
    if (QUALIFIERS.has(token.lower)) {
      const next = text.tokens.slice(i + 1, i + 3).find((t) => t.term !== null && !SIDE.has(t.lower));
      if (next) anchors.add(next.term!);
    } else {
      for (let k = Math.max(0, i - ANCHOR_WINDOW); k <= Math.min(text.tokens.length - 1, i + ANCHOR_WINDOW); k++) {
        const t = text.tokens[k]!;
        if (k !== i && t.term !== null && !SIDE.has(t.lower)) anchors.add(t.term);
      }
    }
    if (anchors.size > 0) uses.push({ pair: side[0], side: side[1], token: i, anchors });
  });
  return uses;
}

function overlaps(a: ReadonlySet<string>, b: ReadonlySet<string>): boolean {
  for (const x of a) if (b.has(x)) return true;
  return false;
}

function phrase(text: CheckedText, use: Use): string {
  const tokens = text.tokens;
  const next = tokens[use.token + 1];
  const end = next && next.term !== null && !/[,;:()]/u.test(text.text.slice(tokens[use.token]!.end, next.start)) ? use.token + 1 : use.token;
  return text.text.slice(tokens[use.token]!.start, tokens[end]!.end);
}

export const checkComparatives: Detector = (input) => {
  if (!input.language.startsWith('en')) return [];
  const findings: RawFinding[] = [];
  const claimUses = comparativeUses(input.claim);
  const usesCache = new Map<Evidence, Use[]>();
  const usesOf = (e: Evidence) => {
    let uses = usesCache.get(e);
    if (!uses) usesCache.set(e, (uses = comparativeUses(e.checked)));
    return uses;
  };
  for (const use of claimUses) {
    const sameSide = (e: Evidence) => usesOf(e).some((u) => u.pair === use.pair && u.side === use.side && overlaps(u.anchors, use.anchors));
    if (input.pool.some(sameSide)) continue;
    for (const evidence of input.support) {
      const opposite = usesOf(evidence).find((u) => u.pair === use.pair && u.side !== use.side && overlaps(u.anchors, use.anchors));
      if (!opposite) continue;
      findings.push({ kind: 'comparative', abstractSays: phrase(input.claim, use), bodySays: phrase(evidence.checked, opposite), evidence });
      break;
    }
  }
  return findings;
};
