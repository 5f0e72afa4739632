// greenCost on both routes for a Hubbard chain at fixed U and η while the hopping (‖A‖) grows from 1 to 1000: the
// preconditioned route's Toffoli count stays bounded up to the logarithmic growth of the energy register, the direct
// route's grows at least linearly.
import { describe, expect, it } from 'vitest';
import { parseModel } from '../../src/model/parseModel.js';
import { greenCost } from '../../src/cost/greenCost.js';
import { routeBuilder } from '../../src/cost/costRoutes.js';

function toffoli(hopping: number, route: 'preconditioned' | 'direct'): { toffoli: number; bits: number } {
  const model = parseModel({ lattice: { shape: 'chain', sites: 2, hopping }, interaction: 4, electrons: 2, broadening: 0.1 }, 'chain');
  // E0 = 0 for every hopping keeps the shift w fixed, so only ‖A‖ changes.
  const cost = greenCost({ model, pair: [0, 0], z: { re: 0, im: 0.1 }, precision: 1e-2, groundEnergy: 0, build: routeBuilder(model, route) });
  if ('unavailable' in cost) throw new Error(cost.unavailable);
  return { toffoli: cost.toffoli, bits: Math.max(...cost.parts.map((p) => p.registerBits)) };
}

describe('greenCost against the hopping', () => {
  const hoppings = [1, 10, 100, 1000];
  const pre = hoppings.map((t) => toffoli(t, 'preconditioned'));
  const direct = hoppings.map((t) => toffoli(t, 'direct'));

  it('keeps the preconditioned Toffoli count within a factor of the register growth', () => {
    // The claim under test (the fast inverse's α does not grow with ‖A‖): per-run cost may grow only through the
    // energy register width m (log ‖A‖), so allow a factor (m_max/m_min)^2 + 1 for the QFT-adder part.
    const growth = (Math.max(...pre.map((p) => p.bits)) / Math.min(...pre.map((p) => p.bits))) ** 2 + 1;
    expect(Math.max(...pre.map((p) => p.toffoli))).toBeLessThanOrEqual(growth * pre[0]!.toffoli);
  });

  it('makes the direct Toffoli count grow at least linearly in the hopping', () => {
    // α(w − H) = |w| + α_U + c·t, so the degree ∝ α/η is linear in t once t dominates: from t = 10 on, each tenfold
    // hopping must at least quintuple the count (linear up to the constant part), and it never falls.
    for (let k = 1; k < hoppings.length; k++) expect(direct[k]!.toffoli).toBeGreaterThan(direct[k - 1]!.toffoli);
    for (let k = 2; k < hoppings.length; k++) {
      expect(direct[k]!.toffoli / direct[k - 1]!.toffoli).toBeGreaterThanOrEqual(hoppings[k]! / hoppings[k - 1]! / 2);
    }
  });
});
