// cachedRegisterHull: registerHull computed once per energy list, layout and window. The hulls do not depend on w or on the
// precision, so the plans that differ only in those (B' as Pauli LCU and as arithmetic, re-planned precisions, the
// bisection over grids) share one table. Results are read-only.
import type { Window } from './energyGrid.js';
import { registerHull, type RegisterHull } from './registerHull.js';

const hullsPerEnergies = new WeakMap<Float64Array, Map<string, RegisterHull>>();

/** As registerHull; `energies` must not be changed after the call (they come from a memoised orbital rotation). */
export function cachedRegisterHull(energies: Float64Array, weights: readonly number[], window: Window, sumMin: number, top: number): RegisterHull {
  let byLayout = hullsPerEnergies.get(energies);
  if (!byLayout) hullsPerEnergies.set(energies, (byLayout = new Map()));
  const key = `${window.min}:${window.max}:${sumMin}:${top}:${weights.join(',')}`;
  let hull = byLayout.get(key);
  if (!hull) byLayout.set(key, (hull = registerHull(energies, weights, window, sumMin, top)));
  return hull;
}
