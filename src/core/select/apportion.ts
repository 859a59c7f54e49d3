/**
 * Largest-remainder (Hamilton) apportionment: seats in proportion to weights, each party first
 * gets the floor of its exact quota, the remaining seats go to the largest remainders.
 * Ties break towards the earlier party so the result is deterministic.
 */
export function apportionHamilton(weights: readonly number[], seats: number, minimum = 0): number[] {
  const n = weights.length;
  const result = new Array<number>(n).fill(0);
  if (n === 0 || seats <= 0) return result;
  const eligible = weights.map((w) => (Number.isFinite(w) && w > 0 ? w : 0));
  const parties = eligible.filter((w) => w > 0).length;
  if (parties === 0) return result;

  // A guaranteed minimum only when every eligible party can have it; otherwise pure proportion.
  let remaining = seats;
  if (minimum > 0 && parties * minimum <= seats) {
    eligible.forEach((w, i) => {
      if (w > 0) result[i] = minimum;
    });
    remaining -= parties * minimum;
  }
  if (remaining === 0) return result;

  const total = eligible.reduce((a, b) => a + b, 0);
  const remainders: { index: number; remainder: number }[] = [];
  let given = 0;
  eligible.forEach((w, i) => {
    const exact = (w / total) * remaining;
    const whole = Math.floor(exact);
    result[i] = (result[i] ?? 0) + whole;
    given += whole;
    remainders.push({ index: i, remainder: exact - whole });
  });
  remainders.sort((a, b) => b.remainder - a.remainder || a.index - b.index);
  for (let k = 0; k < remaining - given; k++) {
    const entry = remainders[k % remainders.length]!;
    result[entry.index] = (result[entry.index] ?? 0) + 1;
  }
  return result;
}
