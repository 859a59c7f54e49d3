/**
 * Puts scores of different rankers on one scale before they are combined.
 */

export type Normalization = 'minmax' | 'rank';

/**
 * Min-max scaling to [0, 1]. When every score is equal the scores carry no preference, so all
 * become 0 (rather than 1) and the component adds nothing to a combination.
 */
export function minMax(scores: Float64Array): Float64Array {
  let low = Infinity;
  let high = -Infinity;
  for (const s of scores) {
    if (s < low) low = s;
    if (s > high) high = s;
  }
  const out = new Float64Array(scores.length);
  const range = high - low;
  if (!(range > 0)) return out;
  scores.forEach((s, i) => {
    out[i] = (s - low) / range;
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
  if (n < 2) return out;
  const order = Array.from({ length: n }, (_, i) => i).sort((x, y) => scores[x]! - scores[y]! || x - y);
  // All tied: no preference, same rule as minMax.
  if (scores[order[0]!] === scores[order[n - 1]!]) return out;
  let start = 0;
  while (start < n) {
    let end = start + 1;
    while (end < n && scores[order[end]!] === scores[order[start]!]) end++;
    const meanRank = (start + end - 1) / 2;
    for (let k = start; k < end; k++) out[order[k]!] = meanRank / (n - 1);
    start = end;
  }
  return out;
}

export function normalize(scores: Float64Array, method: Normalization): Float64Array {
  return method === 'rank' ? rankScale(scores) : minMax(scores);
}
