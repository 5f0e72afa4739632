/**
 * modelLimits: the sane ranges of every number a model file or a command option may give, checked
 * before anything is allocated. Energies are in the model's own units.
 *
 * | quantity | range |
 * |---|---|
 * | modes (explicit `modes`, 2 × lattice sites, 2 × (1 + bath levels), 2 × continuum grid points) | 1 … 1024 |
 * | energies (T and V entries, hopping, interaction, chemical potential, levels, couplings, contact g) | \|x\| ≤ 1e6 |
 * | continuum: box lengths, \|charge positions\| (bohr) | box 0 < L ≤ 1e6, \|x\| ≤ 1e6 |
 * | continuum: charges, number of charges | \|Z\| ≤ 1e6, at most 1024 |
 * | continuum: largest kinetic energy k²/2, Coulomb v(0), \|external potential\|, contact g/ΔV (hartree) | ≤ 1e6 |
 * | broadening η | 1e-9 … 1e6 |
 * | grid points (model file and `--grid`) | 1 … 100,000 |
 * | grid ends | finite, from < to when points > 1, \|ω\| ≤ 1000 × the model's energy scale |
 * | model file size | ≤ 64 MiB |
 *
 * The energy scale is the half-width of the default window: R + 5η with R = max_i Σ_j |T_ij| plus
 * the largest per-mode interaction weight (defaultGrid), at least 1.
 */
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { FrequencyGrid, TwoBodyTerm } from './FermionModel.js';

export const MAX_MODES = 1024;
export const MAX_ENERGY = 1e6;
export const MIN_BROADENING = 1e-9;
export const MAX_BROADENING = 1e6;
export const MAX_GRID_POINTS = 100_000;
/** Grid ends may reach this many energy scales from zero. */
export const GRID_SCALE_FACTOR = 1000;
export const MAX_MODEL_FILE_BYTES = 64 * 2 ** 20;
/** Continuum preset: largest box length and |coordinate| of a charge (bohr). */
export const MAX_LENGTH = 1e6;
/** Continuum preset: largest |Z| of an external charge. */
export const MAX_CHARGE = 1e6;
/** Continuum preset: most external charges (their potential costs O(charges × grid points)). */
export const MAX_EXTERNAL_CHARGES = 1024;

/** R + 5η: max_i Σ_j |T_ij| (Gershgorin bound on ‖T‖) plus the largest per-mode interaction weight ½ Σ |V| (U for Hubbard). */
export function energyScale(oneBody: ComplexMatrix, twoBody: readonly TwoBodyTerm[], broadening: number): number {
  const n = oneBody.n;
  let rowBound = 0;
  for (let i = 0; i < n; i++) {
    let sum = 0;
    for (let j = 0; j < n; j++) sum += Math.hypot(oneBody.re[i * n + j]!, oneBody.im[i * n + j]!);
    rowBound = Math.max(rowBound, sum);
  }
  const weight = new Float64Array(n);
  for (const t of twoBody) {
    for (const mode of new Set([t.i, t.j, t.k, t.l])) weight[mode]! += Math.hypot(t.re, t.im) / 2;
  }
  return rowBound + weight.reduce((a, b) => Math.max(a, b), 0) + 5 * broadening;
}

/** What is wrong with a frequency grid for a model of this energy scale, or undefined when it is fine. */
export function gridProblem(grid: FrequencyGrid, scale: number): string | undefined {
  const { from, to, points } = grid;
  if (!Number.isInteger(points) || points < 1 || points > MAX_GRID_POINTS) {
    return `points must be an integer from 1 to ${MAX_GRID_POINTS}, got ${points}`;
  }
  if (!Number.isFinite(from) || !Number.isFinite(to)) return `from and to must be finite, got from ${from}, to ${to}`;
  if (points > 1 && !(from < to)) return `needs from < to when points > 1, got from ${from}, to ${to}`;
  const reach = GRID_SCALE_FACTOR * Math.max(1, scale);
  if (Math.abs(from) > reach || Math.abs(to) > reach) {
    return `from and to must lie within ±${reach.toPrecision(4)} (${GRID_SCALE_FACTOR} × the model's energy scale ` +
      `${Math.max(1, scale).toPrecision(4)}), got from ${from}, to ${to}`;
  }
  return undefined;
}
