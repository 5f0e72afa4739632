// defaultGrid: the frequency window used when a model file gives no "grid".
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import type { FrequencyGrid, TwoBodyTerm } from '../FermionModel.js';

/** Points of the default grid. */
export const DEFAULT_GRID_POINTS = 401;

/**
 * A heuristic window, symmetric about 0: ±(R + 5η) with R = max_i Σ_j |T_ij| (Gershgorin bound on ‖T‖) plus
 * the largest per-mode interaction weight max_p ½ Σ_{V terms touching p} |V_ijkl| (U for Hubbard), 401 points.
 */
export function defaultGrid(oneBody: ComplexMatrix, twoBody: readonly TwoBodyTerm[], broadening: number): FrequencyGrid {
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
  const half = rowBound + weight.reduce((a, b) => Math.max(a, b), 0) + 5 * broadening;
  return { from: -half, to: half, points: DEFAULT_GRID_POINTS };
}
