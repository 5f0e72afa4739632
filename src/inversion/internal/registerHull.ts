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

const EMPTY_LOW = 2 ** 31 - 1;

/**
 * One mode added to one electron count: every reached cell first … last of the (N)-row, raised by `shift` cells into the
 * (N + 1)-row, offers its energies plus e. In its own function so that the engine compiles the loop on its own.
 */
function addMode(low: Float64Array, high: Float64Array, first: number, last: number, shift: number, e: number): void {
  for (let i = last; i >= first; i--) {
    const l = low[i]!;
    if (l === Infinity) continue;
    const j = i + shift;
    if (l + e < low[j]!) low[j] = l + e;
    const h = high[i]! + e;
    if (h > high[j]!) high[j] = h;
  }
}

/**
 * Partial sums use the shifted weights a_k − min_k a_k ≥ 0, so an N-electron partial sum lies in 0 … N·span; the
 * tables hold the least and greatest energy per (N, partial sum), modes added one at a time (0/1 knapsack order).
 * Row N holds N·span + 1 cells; a cell is initialised when the row's reachable range first covers it, so cells no
 * partial sum reaches are never touched.
 */
export function registerHull(energies: Float64Array, weights: readonly number[], window: Window, sumMin: number, top: number): RegisterHull {
  const n = energies.length;
  const aMin = n === 0 ? 0 : Math.min(...weights);
  const shifted = Int32Array.from(weights, (a) => a - aMin);
  const span = Math.max(0, ...shifted);
  const maxN = window.max;
  const start = (N: number): number => (span * N * (N - 1)) / 2 + N;
  const cells = start(maxN + 1);
  ensureFits(2 * 8 * cells + 2 * 8 * (top + 1), 'fast inverse register energies');
  // Int32 offsets keep the sweep's indices integers (what fits in memory has far fewer than 2^31 cells).
  const rowStart = Int32Array.from({ length: maxN + 2 }, (_, N) => start(N));
  const low = new Float64Array(cells);
  const high = new Float64Array(cells);
  // Reachable partial sums after the modes so far: for N electrons, reachLow[N] … reachHigh[N] (empty: EMPTY_LOW … −1).
  // Only those cells are swept, and only electron counts that can still end inside the window (N + modes left ≥ min).
  const reachLow = new Int32Array(maxN + 1).fill(EMPTY_LOW);
  const reachHigh = new Int32Array(maxN + 1).fill(-1);
  low[0] = 0;
  high[0] = 0;
  reachLow[0] = 0;
  reachHigh[0] = 0;
  const clear = (from: number, to: number): void => {
    low.fill(Infinity, from, to);
    high.fill(-Infinity, from, to);
  };
  for (let k = 0; k < n; k++) {
    const a = shifted[k]!;
    const e = energies[k]!;
    const lowestN = Math.max(0, window.min - (n - k));
    for (let N = Math.min(k, maxN - 1); N >= lowestN; N--) {
      const first = reachLow[N]!;
      const last = reachHigh[N]!;
      if (first > last) continue;
      const row = rowStart[N]!;
      const next = rowStart[N + 1]!;
      const oldLow = reachLow[N + 1]!;
      const oldHigh = reachHigh[N + 1]!;
      const newLow = Math.min(oldLow, first + a);
      const newHigh = Math.max(oldHigh, last + a);
      if (oldLow > oldHigh) clear(next + newLow, next + newHigh + 1);
      else {
        clear(next + newLow, next + oldLow);
        clear(next + oldHigh + 1, next + newHigh + 1);
      }
      addMode(low, high, row + first, row + last, next + a - row, e);
      reachLow[N + 1] = newLow;
      reachHigh[N + 1] = newHigh;
    }
  }
  const outLow = new Float64Array(top + 1).fill(Number.NaN);
  const outHigh = new Float64Array(top + 1).fill(Number.NaN);
  for (let N = window.min; N <= window.max; N++) {
    const row = rowStart[N]!;
    for (let s = Math.max(0, reachLow[N]!); s <= Math.min(N * span, reachHigh[N]!); s++) {
      const l = low[row + s]!;
      if (l === Infinity) continue;
      const h = high[row + s]!;
      const v = s + N * aMin - sumMin;
      if (v < 0 || v > top) throw new RangeError(`registerHull: value ${v} outside 0…${top}`);
      outLow[v] = Number.isNaN(outLow[v]!) ? l : Math.min(outLow[v]!, l);
      outHigh[v] = Number.isNaN(outHigh[v]!) ? h : Math.max(outHigh[v]!, h);
    }
  }
  return { low: outLow, high: outHigh };
}
