// energyGrid: the fixed-point grid of the energy register — step Δ, per-mode offset, integer weights a_k, the reachable
// range of Σ a_k n_k in the electron-number window, the register width — chosen so that the register's rounding and an
// inexact diagonalisation stay within the precision asked for, with the energies every register value stands for.
import { registerEnergies, type RegisterEnergies } from './flagAmplitude.js';
import { cachedRegisterHull } from './cachedRegisterHull.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';

export interface EnergyGrid {
  /** Δ, a power of two. */
  readonly step: number;
  /** o with ε̃_k = o + Δ·a_k (non-zero only for a one-electron-number window). */
  readonly modeOffset: number;
  /** a_k. */
  readonly weights: readonly number[];
  /** Min and max of Σ_k a_k n_k over the window's occupations. */
  readonly sumMin: number;
  readonly sumMax: number;
  /** Register width m: 2^m > sumMax − sumMin. */
  readonly bits: number;
  /** True when every register value that occurs stands for one energy (no rounding to speak of). */
  readonly commensurate: boolean;
  /** True when maxBits forced a coarser grid than the precision asked for. */
  readonly capped: boolean;
  /** The energies per register value, c and the rounding and decomposition bounds at w. */
  readonly values: RegisterEnergies;
}

/** Electron-number window [min, max]. */
export interface Window {
  readonly min: number;
  readonly max: number;
}

export interface GridTarget {
  /** Target for the rounding + decomposition part of the bound (the flag rotation's pruning gets the same again). */
  readonly budget: number;
  readonly w: ComplexScalar;
  readonly maxBits: number;
  /** ρ ≥ ‖A − A'‖ on the window (A' the operator the rotation diagonalises exactly). */
  readonly rho: number;
}

const COMMENSURATE_TOLERANCE = 1e-12;
/** Largest (N, partial sum) rectangle registerHull's table may span: 2^22 entries (its triangular rows fill at most 64 MiB). */
const HULL_TABLE_LIMIT = 2 ** 22;

function rangeOf(weights: readonly number[], window: Window): { sumMin: number; sumMax: number } {
  const ascending = [...weights].sort((x, y) => x - y);
  let sumMin = Infinity;
  let sumMax = -Infinity;
  for (let N = window.min; N <= window.max; N++) {
    let low = 0;
    let high = 0;
    for (let k = 0; k < N; k++) {
      low += ascending[k]!;
      high += ascending[ascending.length - 1 - k]!;
    }
    sumMin = Math.min(sumMin, low);
    sumMax = Math.max(sumMax, high);
  }
  return { sumMin, sumMax };
}

/** The register fits maxBits and registerHull's table fits HULL_TABLE_LIMIT. */
function fits(layout: Layout, window: Window, maxBits: number): boolean {
  const span = Math.max(...layout.weights) - Math.min(...layout.weights);
  return layout.bits <= maxBits && (window.max + 1) * (window.max * span + 1) <= HULL_TABLE_LIMIT;
}

interface Layout {
  readonly step: number;
  readonly modeOffset: number;
  readonly weights: number[];
  readonly sumMin: number;
  readonly sumMax: number;
  readonly bits: number;
}

function layoutFor(energies: Float64Array, window: Window, step: number, offset: number): Layout {
  const weights = Array.from(energies, (e) => Math.round((e - offset) / step));
  const { sumMin, sumMax } = rangeOf(weights, window);
  const bits = Math.max(1, Math.ceil(Math.log2(sumMax - sumMin + 1)));
  return { step, modeOffset: offset, weights, sumMin, sumMax, bits };
}

function complete(energies: Float64Array, window: Window, layout: Layout, target: GridTarget, capped: boolean): EnergyGrid {
  const hull = cachedRegisterHull(energies, layout.weights, window, layout.sumMin, layout.sumMax - layout.sumMin);
  const values = registerEnergies(hull, target.w, target.rho);
  return { ...layout, commensurate: values.exact, capped, values };
}

/**
 * First the coarsest power-of-two grid on which all ε_k (after a common offset when the window is one electron number)
 * are integer multiples within 1e-12 and that fits maxBits (every value then stands for one energy). Else, among the grids
 * that fit maxBits (and the hull table its limit), a coarse one whose rounding + decomposition bound at w is ≤ budget,
 * found by bisection; when even the finest misses the budget, the finest, marked `capped`.
 */
export function energyGrid(energies: Float64Array, window: Window, target: GridTarget): EnergyGrid {
  const offsets = window.min === window.max && energies.length > 0 ? [0, energies[0]!] : [0];
  const spreadOf = (offset: number): number => Math.max(0, ...Array.from(energies, (e) => Math.abs(e - offset)));
  for (const offset of offsets) {
    const spread = spreadOf(offset);
    if (spread === 0) return complete(energies, window, layoutFor(energies, window, 1, offset), target, false);
    for (let j = -Math.ceil(Math.log2(spread)); j <= 60; j++) {
      const layout = layoutFor(energies, window, 2 ** -j, offset);
      if (!fits(layout, window, target.maxBits)) break;
      const exact = Array.from(energies).every((e, k) => Math.abs(e - offset - layout.step * layout.weights[k]!) <= COMMENSURATE_TOLERANCE);
      if (exact) return complete(energies, window, layout, target, false);
    }
  }
  const offset = offsets[offsets.length - 1]!;
  const layouts: Layout[] = [];
  for (let j = -Math.ceil(Math.log2(spreadOf(offset))); j <= 60; j++) {
    const layout = layoutFor(energies, window, 2 ** -j, offset);
    if (!fits(layout, window, target.maxBits)) break;
    layouts.push(layout);
  }
  if (layouts.length > 0) {
    // Each candidate costs a hull table; the finest is tried first (when it misses the budget, coarser grids are not tried), then a
    // bisection for the coarsest that meets it. Every grid returned as uncapped meets the budget.
    const meets = (grid: EnergyGrid): boolean => grid.values.rounding + grid.values.decomposition <= target.budget;
    let best = complete(energies, window, layouts[layouts.length - 1]!, target, false);
    if (!meets(best)) return { ...best, capped: true };
    let coarse = -1;
    let fine = layouts.length - 1;
    while (fine - coarse > 1) {
      const middle = (coarse + fine) >> 1;
      const grid = complete(energies, window, layouts[middle]!, target, false);
      if (meets(grid)) {
        fine = middle;
        best = grid;
      } else coarse = middle;
    }
    return best;
  }
  const coarsest = layoutFor(energies, window, 2 ** Math.ceil(Math.log2(spreadOf(offset) || 1)), offset);
  let layout = coarsest;
  while (!fits(layout, window, target.maxBits)) layout = layoutFor(energies, window, layout.step * 2, offset);
  return complete(energies, window, layout, target, true);
}
