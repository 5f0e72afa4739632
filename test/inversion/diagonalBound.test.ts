// diagonalBound: memoised per model and window — the same object again, equal to the bound of an equal model built anew.
import { describe, expect, it } from 'vitest';
import { diagonalBound } from '../../src/inversion/diagonalBound.js';
import { hubbard } from '../helpers/models.js';

describe('diagonalBound(model, electrons)', () => {
  it('returns the same bound object for the same model and window, equal to an uncached computation', () => {
    const spec = { sites: 3, hopping: 1, interaction: 4, chemicalPotential: 0.5 };
    const model = hubbard(spec);
    const first = diagonalBound(model, 3);
    expect(diagonalBound(model, [3, 3])).toBe(first);
    expect(diagonalBound(hubbard(spec), 3)).toEqual(first);
    const whole = diagonalBound(model);
    expect(whole).not.toBe(first);
    expect(whole).toEqual(diagonalBound(hubbard(spec), [0, model.modes]));
  });

  it('encloses the true range of U Σ n↑n↓ for 4 electrons on 3 sites', () => {
    // 4 electrons on 3 sites doubly occupy at least one site (pigeonhole) and at most two: B ranges over [U, 2U].
    const model = hubbard({ sites: 3, hopping: 1, interaction: 4, chemicalPotential: 0 });
    const bound = diagonalBound(model, 4);
    if ('notDiagonal' in bound) throw new Error(bound.notDiagonal);
    expect(bound.low).toBeLessThanOrEqual(4);
    expect(bound.high).toBeGreaterThanOrEqual(8);
  });
});
