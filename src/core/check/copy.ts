/**
 * Copy detection: abstract sentences that repeat a body sentence word for word, or nearly.
 *
 * Containment of word 3-gram shingles (Broder 1997, "On the resemblance and containment of
 * documents"): c(a, b) = |S(a) ∩ S(b)| / |S(a)|, the share of the claim's shingles found in the body
 * sentence (or in two consecutive body sentences, for a claim that joins them). Words are the
 * engine's word tokens, stop words kept, so a copy with one word changed still shares most shingles.
 *   - verbatim: every shingle is found (c = 1);
 *   - near-verbatim: c ≥ 0.6 (common practice in text-reuse studies, no source: one changed word
 *     in a 12-word sentence leaves 0.7).
 * Claims under four words have too few shingles to judge and are never marked.
 */
export const COPY_DEFAULTS = { shingle: 3, nearVerbatim: 0.6, minWords: 4 };

export interface CopyMatch {
  readonly kind: 'verbatim' | 'nearVerbatim';
  /** Body positions (one, or two consecutive). */
  readonly positions: readonly number[];
  readonly containment: number;
}

function shingles(words: readonly string[], size: number): Set<string> {
  const out = new Set<string>();
  for (let i = 0; i + size <= words.length; i++) out.add(words.slice(i, i + size).join(' '));
  return out;
}

export class CopyIndex {
  private readonly postings = new Map<string, number[]>();
  constructor(bodyWords: readonly (readonly string[])[], private readonly settings = COPY_DEFAULTS) {
    bodyWords.forEach((words, p) => {
      const own = shingles(words, settings.shingle);
      for (const s of own) {
        const list = this.postings.get(s);
        if (list) list.push(p);
        else this.postings.set(s, [p]);
      }
    });
  }

  /** The best copy source of a claim, or null. */
  match(claimWords: readonly string[]): CopyMatch | null {
    if (claimWords.length < this.settings.minWords) return null;
    const own = shingles(claimWords, this.settings.shingle);
    if (own.size === 0) return null;
    const hits = new Map<number, Set<string>>();
    for (const s of own) {
      for (const p of this.postings.get(s) ?? []) {
        const set = hits.get(p) ?? new Set<string>();
        set.add(s);
        hits.set(p, set);
      }
    }
    let best: { positions: number[]; containment: number } | null = null;
    for (const [p, found] of hits) {
      const single = found.size / own.size;
      const next = hits.get(p + 1);
      const joined = next ? new Set([...found, ...next]).size / own.size : 0;
      const candidate = joined > single + 1e-9 ? { positions: [p, p + 1], containment: joined } : { positions: [p], containment: single };
      if (!best || candidate.containment > best.containment + 1e-9 || (Math.abs(candidate.containment - best.containment) < 1e-9 && candidate.positions[0]! < best.positions[0]!)) best = candidate;
    }
    if (!best || best.containment < this.settings.nearVerbatim) return null;
    return { kind: best.containment >= 1 - 1e-9 ? 'verbatim' : 'nearVerbatim', positions: best.positions, containment: best.containment };
  }
}
