// groundLevel: Hubbard atom degeneracy, Hubbard dimer energy, ring single-particle energies, memory refusal.
import { describe, expect, it } from 'vitest';
import { isInputError } from '../../src/core/InputError.js';
import { groundLevel } from '../../src/exact/groundLevel.js';
import { expectClose } from '../helpers/close.js';
import { hubbard, quadraticModel } from '../helpers/models.js';

describe('groundLevel(model)', () => {
  it('finds the two-fold degenerate Hubbard atom ground level E0 = −U/2 at μ = U/2 with no gap in the sector', () => {
    const U = 4;
    const g = groundLevel(hubbard({ sites: 1, hopping: 0, interaction: U, chemicalPotential: U / 2 }));
    // Hubbard 1963, Proc. R. Soc. A 276, 238: one electron on the atom, E = −μ = −U/2, spin up or down.
    expectClose(g.energy, -U / 2, 1e-12, 'E0');
    expect(g.degeneracy).toBe(2);
    expect(g.gap).toBeNull();
  });

  it('gives the Hubbard dimer E0 = (U − c)/2 − 2μ, c = √(U² + 16t²)', () => {
    for (const [t, U] of [[1, 4], [0.5, 1], [1, 10]] as const) {
      const g = groundLevel(hubbard({ sites: 2, hopping: t, interaction: U, chemicalPotential: U / 2, spin: 0 }));
      // Standard textbook result, from memory.
      expectClose(g.energy, (U - Math.sqrt(U * U + 16 * t * t)) / 2 - U, 1e-10, `E0 t=${t} U=${U}`);
      expect(g.degeneracy).toBe(1);
      expect(g.residual).toBeLessThanOrEqual(1e-9);
    }
  });

  it('gives ring single-particle energies −2t cos(2πk/L) − μ without interaction', () => {
    const L = 6;
    const t = 0.7;
    const mu = 0.3;
    const model = hubbard({ sites: L, hopping: t, interaction: 0, chemicalPotential: mu, ring: true });
    // Common practice (tight-binding ring): ε_k = −2t cos(2πk/L) − μ.
    const eps = Array.from({ length: L }, (_, k) => -2 * t * Math.cos((2 * Math.PI * k) / L) - mu).sort((a, b) => a - b);
    const oneUp = { ...quadraticModel(model.oneBody, 1) };
    const g1 = groundLevel(oneUp);
    expectClose(g1.energy, eps[0]!, 1e-10, 'lowest level');
    // 1 electron: spin up or down in k = 0 → degeneracy 2; next level at k = ±1.
    expect(g1.degeneracy).toBe(2);
    expectClose(g1.gap!, eps[1]! - eps[0]!, 1e-9, 'gap to k = ±1');
    const g3 = groundLevel({ ...model, electrons: 3, spinPolarization: 3 });
    expectClose(g3.energy, eps[0]! + eps[1]! + eps[2]!, 1e-10, 'three up electrons');
  });

  it('refuses a sector that does not fit the memory limit with an InputError', () => {
    const model = hubbard({ sites: 8, hopping: 1, interaction: 4, chemicalPotential: 2, ring: true, spin: 0 });
    let caught: unknown;
    try {
      groundLevel(model, { memoryLimit: 1e5 });
    } catch (error) {
      caught = error;
    }
    expect(isInputError(caught)).toBe(true);
    expect(String((caught as Error).message)).toMatch(/ground-state sector .*dimension 4900/);
  });
});

describe('groundLevel(model, { basis })', () => {
  it("gives the same level with 'compact' (single-precision basis, refined) and 'rerun' as with 'full'", () => {
    const models = [
      hubbard({ sites: 6, hopping: 1, interaction: 4, chemicalPotential: 2, ring: true, spin: 0 }),
      hubbard({ sites: 1, hopping: 0, interaction: 4, chemicalPotential: 2 }),
      { ...quadraticModel(hubbard({ sites: 6, hopping: 0.7, interaction: 0, chemicalPotential: 0.3, ring: true }).oneBody, 1) },
    ];
    for (const model of models) {
      const full = groundLevel(model, { basis: 'full' });
      for (const basis of ['compact', 'rerun'] as const) {
        const g = groundLevel(model, { basis });
        expectClose(g.energy, full.energy, 1e-10 * Math.max(1, Math.abs(full.energy)), `E0 ${basis} ${model.name}`);
        expect(g.degeneracy).toBe(full.degeneracy);
        if (full.gap === null) expect(g.gap).toBeNull();
        else expectClose(g.gap!, full.gap, 1e-8, `gap ${basis} ${model.name}`);
        expect(g.residual).toBeLessThanOrEqual(1e-10 * Math.max(1, Math.abs(g.energy)));
      }
    }
  });
});
