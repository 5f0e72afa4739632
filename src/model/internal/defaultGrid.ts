// defaultGrid: the frequency window used when a model file gives no "grid".
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import type { FrequencyGrid, TwoBodyTerm } from '../FermionModel.js';
import { energyScale } from '../modelLimits.js';

/** Points of the default grid. */
export const DEFAULT_GRID_POINTS = 401;

/**
 * A heuristic window, symmetric about 0: ±(R + 5η) with R = max_i Σ_j |T_ij| (Gershgorin bound on ‖T‖) plus
 * the largest per-mode interaction weight max_p ½ Σ_{V terms touching p} |V_ijkl| (U for Hubbard), 401 points.
 */
export function defaultGrid(oneBody: ComplexMatrix, twoBody: readonly TwoBodyTerm[], broadening: number): FrequencyGrid {
  const half = energyScale(oneBody, twoBody, broadening);
  return { from: -half, to: half, points: DEFAULT_GRID_POINTS };
}
