// diagonalRange: rigorous bounds on the largest and smallest value of Σ_p c_p n_p + Σ_{p<q} V_pq n_p n_q over the occupations
// with N electrons, N in an electron-number window — without listing occupations (the exact maximum is a quadratic binary
// programme).
import type { Window } from './energyGrid.js';
import type { PairTerm } from './diagonalTerms.js';

export interface DiagonalRange {
  /** low ≤ Σ c_p n_p + Σ V_pq n_p n_q ≤ high for every occupation in the window. */
  readonly low: number;
  readonly high: number;
}

/** Prefix sums of the values sorted from largest to smallest: prefix[k] = sum of the k largest. */
function descendingPrefix(values: readonly number[]): Float64Array {
  const sorted = [...values].sort((x, y) => y - x);
  const prefix = new Float64Array(sorted.length + 1);
  sorted.forEach((v, k) => (prefix[k + 1] = prefix[k]! + v));
  return prefix;
}

/**
 * For |S| = N, the larger of two upper bounds is dropped:
 * (i) Σ_{p∈S} c_p ≤ the N largest c_p, and the N(N−1)/2 pairs of S contribute at most the N(N−1)/2 largest max(V, 0);
 * (ii) Σ_{p<q∈S} V_pq = ½ Σ_{p∈S} Σ_{q∈S∖p} V_pq ≤ ½ Σ_{p∈S} r_p with r_p the sum of the N − 1 largest max(V_pq, 0) of row
 * p, so the whole sum is at most the N largest g_p = c_p + r_p/2.
 */
function upperBounds(single: Float64Array, pairs: readonly PairTerm[], window: Window): number {
  const n = single.length;
  const singlePrefix = descendingPrefix([...single]);
  const pairPrefix = descendingPrefix(pairs.map((t) => Math.max(0, t.value)));
  const rows: number[][] = Array.from({ length: n }, () => []);
  for (const t of pairs) {
    if (t.value <= 0) continue;
    rows[t.p]!.push(t.value);
    rows[t.q]!.push(t.value);
  }
  const rowPrefix = rows.map(descendingPrefix);
  let best = -Infinity;
  for (let N = window.min; N <= window.max; N++) {
    const pairCount = Math.min(pairPrefix.length - 1, (N * (N - 1)) / 2);
    const greedy = singlePrefix[N]! + pairPrefix[pairCount]!;
    const g = Array.from(single, (c, p) => c + rowPrefix[p]![Math.min(rowPrefix[p]!.length - 1, Math.max(0, N - 1))]! / 2);
    const byRows = descendingPrefix(g)[N]!;
    best = Math.max(best, Math.min(greedy, byRows));
  }
  return best;
}

/** @throws RangeError for a window outside 0…modes. */
export function diagonalRange(single: Float64Array, pairs: readonly PairTerm[], window: Window): DiagonalRange {
  const n = single.length;
  if (!(Number.isInteger(window.min) && Number.isInteger(window.max) && window.min >= 0 && window.max <= n && window.min <= window.max)) {
    throw new RangeError(`diagonalRange: window [${window.min}, ${window.max}] is not within 0…${n}`);
  }
  const negated = pairs.map((t) => ({ ...t, value: -t.value }));
  return { low: -upperBounds(Float64Array.from(single, (c) => -c), negated, window), high: upperBounds(single, pairs, window) };
}
