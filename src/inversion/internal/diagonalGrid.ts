// diagonalGrid: the fixed-point grid of a diagonal operator's register — step Δ (a power of two), integer weights
// a_p ≈ c_p/Δ and b_pq ≈ V_pq/Δ, the range of Σ a_p n_p + Σ b_pq n_p n_q over the electron window, the register width —
// and a rigorous bound on what rounding the coefficients to the grid costs on any occupation of the window.
import { diagonalRange } from './diagonalRange.js';
import type { DiagonalTerms } from './diagonalTerms.js';
import type { Window } from './energyGrid.js';

export interface DiagonalGrid {
  readonly step: number;
  /** a_p per mode. */
  readonly single: number[];
  /** b_pq in the order of the terms' pairs. */
  readonly pairs: number[];
  /** Integer bounds on Σ a_p n_p + Σ b_pq n_p n_q over the window; register value v = that sum − sumLow. */
  readonly sumLow: number;
  readonly sumHigh: number;
  /** Register width m: 2^m > sumHigh − sumLow. */
  readonly bits: number;
  /** max over the window of |Σ (c_p − Δa_p) n_p + Σ (V_pq − Δb_pq) n_p n_q| ≤ this (each active term off by ≤ Δ/2). */
  readonly rounding: number;
  /** Every coefficient is a multiple of Δ within 1e-12 (relative). */
  readonly commensurate: boolean;
  /** True when maxBits kept the rounding above the budget. */
  readonly capped: boolean;
}

const COMMENSURATE_TOLERANCE = 1e-12;

function layoutFor(terms: DiagonalTerms, window: Window, step: number): Omit<DiagonalGrid, 'capped'> {
  const single = Array.from(terms.single, (c) => Math.round(c / step));
  const pairs = terms.pairs.map((t) => Math.round(t.value / step));
  const integerPairs = terms.pairs.map((t, k) => ({ ...t, value: pairs[k]! }));
  // The weighted sums are integers, so the (possibly fractional) range bounds round outward to integer ones.
  const range = diagonalRange(Float64Array.from(single), integerPairs, window);
  const low = Math.floor(range.low);
  const high = Math.ceil(range.high);
  const singleError = Float64Array.from(terms.single, (c, p) => Math.abs(c - step * single[p]!));
  const pairError = terms.pairs.map((t, k) => ({ ...t, value: Math.abs(t.value - step * pairs[k]!) }));
  const rounding = Math.max(0, diagonalRange(singleError, pairError, window).high);
  const exact = (c: number, a: number): boolean => Math.abs(c - step * a) <= COMMENSURATE_TOLERANCE * Math.max(1, Math.abs(c));
  const commensurate = Array.from(terms.single).every((c, p) => exact(c, single[p]!)) && terms.pairs.every((t, k) => exact(t.value, pairs[k]!));
  return { step, single, pairs, sumLow: low, sumHigh: high, bits: Math.max(1, Math.ceil(Math.log2(high - low + 1))), rounding, commensurate };
}

/**
 * First the coarsest power-of-two grid on which every coefficient is a multiple (no rounding) and that fits maxBits; else,
 * from coarse to fine, the first whose rounding ≤ budget (in the operator's units); when none fits maxBits, the finest that
 * does, marked `capped` (and when even the coarsest candidate is too wide, coarser ones until the register fits).
 */
export function diagonalGrid(terms: DiagonalTerms, window: Window, budget: number, maxBits: number): DiagonalGrid {
  const largest = Math.max(0, ...Array.from(terms.single, Math.abs), ...terms.pairs.map((t) => Math.abs(t.value)));
  if (largest === 0) return { ...layoutFor(terms, window, 1), capped: false };
  const first = -Math.ceil(Math.log2(largest));
  const candidates: Omit<DiagonalGrid, 'capped'>[] = [];
  for (let j = first; j <= first + 60; j++) {
    const layout = layoutFor(terms, window, 2 ** -j);
    if (layout.bits > maxBits) break;
    if (layout.commensurate) return { ...layout, capped: false };
    candidates.push(layout);
  }
  const met = candidates.find((layout) => layout.rounding <= budget);
  if (met) return { ...met, capped: false };
  if (candidates.length > 0) return { ...candidates[candidates.length - 1]!, capped: true };
  let step = 2 ** -first;
  let layout = layoutFor(terms, window, step);
  while (layout.bits > maxBits) layout = layoutFor(terms, window, (step *= 2));
  return { ...layout, capped: layout.rounding > budget };
}
