import { describe, expect, it } from 'vitest';
import { describeModel } from '../../src/model/describeModel.js';
import { parseModel } from '../../src/model/parseModel.js';

describe('describeModel(model)', () => {
  it('states form, modes, electrons and sector in one line, saying whether the file fixes the spin', () => {
    const hubbard = parseModel({ lattice: { shape: 'grid', size: [2, 3], hopping: 1 }, interaction: 2, electrons: 5 }, 'g.json');
    expect(describeModel(hubbard)).toBe('g: Hubbard grid of 2×3 sites, 12 modes, 5 electrons (all S_z), η = 0.1');
    const fixed = parseModel({ lattice: { shape: 'chain', sites: 3, hopping: 1 }, interaction: 2, electrons: 3, spin: -1 }, 'c.json');
    expect(describeModel(fixed)).toBe('c: Hubbard chain of 3 sites, 6 modes, 3 electrons (spin -1 fixed), η = 0.1');
    const explicit = parseModel({ modes: 3, electrons: 1, name: 'e', broadening: 0.5 }, 'x.json');
    expect(describeModel(explicit)).toBe('e: explicit model, 3 modes, 1 electron, η = 0.5');
    const aim = parseModel({ impurity: { level: 0, interaction: 1, bath: [{ level: 0, coupling: 1 }] }, electrons: 2 }, 'a.json');
    expect(describeModel(aim)).toBe('a: Anderson impurity with 1 bath level, 4 modes, 2 electrons (all S_z), η = 0.1');
    const wire = parseModel({ continuum: { dimension: 2, points: [2, 3], box: [1.5, 2], interaction: 'none' }, electrons: 1, spin: 1 }, 'w.json');
    expect(describeModel(wire)).toBe('w: continuum 2D grid of 2×3 points, box 1.5×2 bohr, 12 modes, 1 electron (spin 1 fixed), η = 0.1');
  });
});
