// energyGrid: the fixed-point grid of the energy register — step Δ, per-mode offset, integer weights a_k, the reachable
// range of Σ a_k n_k in the electron-number window, the register width, and the rounding errors ε_k − ε̃_k.

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
  /** True when every |ε_k − ε̃_k| ≤ 1e-12 on a power-of-two grid (no rounding to speak of). */
  readonly commensurate: boolean;
  /** True when maxBits forced a coarser grid than the precision asked for. */
  readonly capped: boolean;
  /** δ ≥ max over window occupations of |Σ_k (ε_k − ε̃_k) n_k|: the sum of the N_max largest |ε_k − ε̃_k|. */
  readonly roundingDelta: number;
}

/** Electron-number window [min, max]. */
export interface Window {
  readonly min: number;
  readonly max: number;
}

const COMMENSURATE_TOLERANCE = 1e-12;

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

function gridFor(energies: Float64Array, window: Window, step: number, offset: number, commensurate: boolean, capped: boolean): EnergyGrid {
  const weights = Array.from(energies, (e) => Math.round((e - offset) / step));
  const { sumMin, sumMax } = rangeOf(weights, window);
  const bits = Math.max(1, Math.ceil(Math.log2(sumMax - sumMin + 1)));
  const errors = Array.from(energies, (e, k) => Math.abs(e - offset - step * weights[k]!)).sort((x, y) => y - x);
  const roundingDelta = errors.slice(0, window.max).reduce((s, x) => s + x, 0);
  return { step, modeOffset: offset, weights, sumMin, sumMax, bits, commensurate, capped, roundingDelta };
}

/**
 * The coarsest power-of-two grid on which all ε_k (after a common offset when the window is one electron number) are
 * integer multiples within 1e-12 and that fits maxBits; else the step 2^⌊log2(precision·η/N_max)⌋ (so that
 * N_max·Δ/2 ≤ precision·η/2), doubled until the register fits maxBits.
 */
export function energyGrid(energies: Float64Array, window: Window, precision: number, eta: number, maxBits: number): EnergyGrid {
  const offsets = window.min === window.max && energies.length > 0 ? [0, energies[0]!] : [0];
  for (const offset of offsets) {
    const spread = Math.max(0, ...Array.from(energies, (e) => Math.abs(e - offset)));
    if (spread === 0) return gridFor(energies, window, 1, offset, true, false);
    for (let j = -Math.ceil(Math.log2(spread)); j <= 60; j++) {
      const grid = gridFor(energies, window, 2 ** -j, offset, true, false);
      if (grid.bits > maxBits) break;
      const exact = Array.from(energies).every((e, k) => Math.abs(e - offset - grid.step * grid.weights[k]!) <= COMMENSURATE_TOLERANCE);
      if (exact) return grid;
    }
  }
  const target = (precision * eta) / Math.max(1, window.max);
  let grid = gridFor(energies, window, 2 ** Math.floor(Math.log2(target)), 0, false, false);
  while (grid.bits > maxBits) grid = gridFor(energies, window, grid.step * 2, 0, false, true);
  return grid;
}
