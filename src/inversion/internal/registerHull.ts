// registerHull: for every energy-register value v, the interval [low_v, high_v] spanned by the true energies Σ_k ε_k n_k of
// the electron-number window's occupations that the arithmetic maps to v (v = Σ_k a_k n_k − sumMin) — by a subset-sum
// dynamic programme over modes, electron counts and partial weight sums, never by listing occupations.
import { ensureFits } from '../../core/memoryBudget.js';
import type { Window } from './energyGrid.js';

export interface RegisterHull {
  /** low[v] ≤ E ≤ high[v] for every occupation with register value v; NaN for a value no occupation takes. */
  readonly low: Float64Array;
  readonly high: Float64Array;
}

/**
 * Partial sums use the shifted weights a_k − min_k a_k ≥ 0, so an N-electron partial sum lies in 0 … N·span; the
 * table holds the least and greatest energy per (N, partial sum), modes added one at a time (0/1 knapsack order).
 */
export function registerHull(energies: Float64Array, weights: readonly number[], window: Window, sumMin: number, top: number): RegisterHull {
  const n = energies.length;
  const aMin = n === 0 ? 0 : Math.min(...weights);
  const shifted = weights.map((a) => a - aMin);
  const span = Math.max(0, ...shifted);
  const maxN = window.max;
  const width = maxN * span + 1;
  ensureFits(2 * 8 * (maxN + 1) * width + 2 * 8 * (top + 1), 'fast inverse register energies');
  const low = new Float64Array((maxN + 1) * width).fill(Infinity);
  const high = new Float64Array((maxN + 1) * width).fill(-Infinity);
  low[0] = 0;
  high[0] = 0;
  // Reachable partial sums after the modes so far: for N electrons, reachLow[N] … reachHigh[N] (empty when low > high).
  // Only those cells are swept, and only electron counts that can still end inside the window (N + modes left ≥ min).
  const reachLow = new Float64Array(maxN + 1).fill(Infinity);
  const reachHigh = new Float64Array(maxN + 1).fill(-Infinity);
  reachLow[0] = 0;
  reachHigh[0] = 0;
  for (let k = 0; k < n; k++) {
    const a = shifted[k]!;
    const e = energies[k]!;
    const lowestN = Math.max(0, window.min - (n - k));
    for (let N = Math.min(k, maxN - 1); N >= lowestN; N--) {
      if (reachLow[N]! > reachHigh[N]!) continue;
      const from = N * width;
      const to = (N + 1) * width + a;
      for (let s = reachHigh[N]!; s >= reachLow[N]!; s--) {
        const l = low[from + s]!;
        if (l === Infinity) continue;
        if (l + e < low[to + s]!) low[to + s] = l + e;
        const h = high[from + s]! + e;
        if (h > high[to + s]!) high[to + s] = h;
      }
      reachLow[N + 1] = Math.min(reachLow[N + 1]!, reachLow[N]! + a);
      reachHigh[N + 1] = Math.max(reachHigh[N + 1]!, reachHigh[N]! + a);
    }
  }
  const outLow = new Float64Array(top + 1).fill(Number.NaN);
  const outHigh = new Float64Array(top + 1).fill(Number.NaN);
  for (let N = window.min; N <= window.max; N++) {
    for (let s = Math.max(0, reachLow[N]!); s <= Math.min(N * span, reachHigh[N]!); s++) {
      const l = low[N * width + s]!;
      if (l === Infinity) continue;
      const v = s + N * aMin - sumMin;
      if (v < 0 || v > top) throw new RangeError(`registerHull: value ${v} outside 0…${top}`);
      outLow[v] = Number.isNaN(outLow[v]!) ? l : Math.min(outLow[v]!, l);
      outHigh[v] = Number.isNaN(outHigh[v]!) ? high[N * width + s]! : Math.max(outHigh[v]!, high[N * width + s]!);
    }
  }
  return { low: outLow, high: outHigh };
}
