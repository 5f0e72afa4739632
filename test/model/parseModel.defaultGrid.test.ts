import { describe, expect, it } from 'vitest';
import { parseModel } from '../../src/model/parseModel.js';

describe('parseModel(input, source) — default grid', () => {
  it('covers every Green-function pole of the half-filled Hubbard dimer with 401 points', () => {
    // Poles of G_00 at ±(c/2 − t) and ±(c/2 + t), c = √(U² + 16t²), for μ = U/2 (textbook, from memory; issue 3).
    for (const [t, u] of [[1, 4], [1, 8], [0.5, 1]] as const) {
      const model = parseModel({ lattice: { shape: 'chain', sites: 2, hopping: t }, interaction: u, chemicalPotential: u / 2, electrons: 2 }, 'd.json');
      const c = Math.sqrt(u * u + 16 * t * t);
      const outer = c / 2 + t;
      expect(model.grid.points).toBe(401);
      expect(model.grid.from).toBeLessThan(-outer);
      expect(model.grid.to).toBeGreaterThan(outer);
    }
  });

  it('is symmetric about zero and wider than the broadening for an empty model', () => {
    const grid = parseModel({ modes: 1, electrons: 0, broadening: 0.2 }, 'e.json').grid;
    expect(grid.from).toBe(-grid.to);
    expect(grid.to).toBeGreaterThan(0.2);
  });
});
