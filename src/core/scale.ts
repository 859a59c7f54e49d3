/**
 * The engine's one place for putting scores on a common [0, 1] scale: the blend scales its
 * components, the selector scales ranker scores once before MMR.
 *
 * One rule for scores that carry no preference (all equal, or a single sentence): every one of them
 * is as good as the best and scales to 1, so multipliers applied afterwards (sentence fitness)
 * still order them. Non-finite scores count as the lowest and scale to 0.
 */

export type Normalization = 'minmax' | 'rank';

/**
 * Min-max scaling to [0, 1]. With `among`, the range is taken over those indices only and only they
 * are scaled; every other entry is 0 (the selector scales over its candidates).
 */
export function minMax(scores: Float64Array, among?: readonly number[]): Float64Array {
  const out = new Float64Array(scores.length);
  let low = Infinity;
  let high = -Infinity;
  const visit = (fn: (i: number) => void) => {
    if (among) for (const i of among) fn(i);
    else for (let i = 0; i < scores.length; i++) fn(i);
  };
  visit((i) => {
    const s = scores[i]!;
    if (!Number.isFinite(s)) return;
    if (s < low) low = s;
    if (s > high) high = s;
  });
  const range = high - low;
  visit((i) => {
    const s = scores[i]!;
    out[i] = !Number.isFinite(s) ? 0 : range > 0 ? (s - low) / range : 1;
  });
  return out;
}

/**
 * Rank scaling to [0, 1]: the best score gets 1, the worst 0, evenly spaced in between; ties share
 * the mean of their ranks (common practice, no source). Insensitive to outliers, unlike min-max.
 */
export function rankScale(scores: Float64Array): Float64Array {
  const n = scores.length;
  const out = new Float64Array(n);
  const value = (i: number) => (Number.isFinite(scores[i]!) ? scores[i]! : -Infinity);
  const order = Array.from({ length: n }, (_, i) => i).sort((x, y) => value(x) - value(y) || x - y);
  // No preference (see the file header): every score is the best.
  if (n === 0 || value(order[0]!) === value(order[n - 1]!)) return out.fill(n > 0 && Number.isFinite(value(order[0]!)) ? 1 : 0);
  let start = 0;
  while (start < n) {
    let end = start + 1;
    while (end < n && value(order[end]!) === value(order[start]!)) end++;
    const meanRank = (start + end - 1) / 2;
    for (let k = start; k < end; k++) out[order[k]!] = meanRank / (n - 1);
    start = end;
  }
  return out;
}

export function normalize(scores: Float64Array, method: Normalization): Float64Array {
  return method === 'rank' ? rankScale(scores) : minMax(scores);
}
