/** frequencyGrid: ω_k = from + k·(to − from)/(points − 1), k = 0…points−1 (just `from` when points = 1). */
import type { FrequencyGrid } from '../model/FermionModel.js';

export function frequencyGrid(grid: FrequencyGrid): Float64Array {
  const out = new Float64Array(grid.points);
  const step = grid.points > 1 ? (grid.to - grid.from) / (grid.points - 1) : 0;
  for (let k = 0; k < grid.points; k++) out[k] = grid.from + k * step;
  return out;
}
