// groundLevel / greensFunction over S_z sectors: a doublet counts twice and G averages the whole level
// (CONVENTIONS.md), checked against an independent dense diagonalisation of the whole N-electron sector;
// a fixed spin restricts the average; spinRotationInvariant; Lanczos failing to converge.
import { describe, expect, it } from 'vitest';
import { isConvergenceError } from '../../src/exact/ConvergenceError.js';
import { groundLevel } from '../../src/exact/groundLevel.js';
import { greensFunction } from '../../src/exact/greensFunction.js';
import { spinRotationInvariant } from '../../src/exact/internal/spinRotationInvariant.js';
import type { FermionModel } from '../../src/model/FermionModel.js';
import { expectClose, expectComplexClose } from '../helpers/close.js';
import { denseGreen, denseGround } from '../helpers/denseFock.js';
import { anderson, hubbard } from '../helpers/models.js';

const STRICT = { tolerance: 1e-13 };
const zs = [{ re: -1.7, im: 0.1 }, { re: 0.3, im: 0.2 }, { re: 2.2, im: 0.05 }];

function expectGreenMatchesDense(model: FermionModel, up?: number): void {
  const ground = groundLevel(model);
  const g = greensFunction(model, ground, { ...STRICT, z: zs });
  zs.forEach((z, k) => {
    const dense = denseGreen(model, z, up);
    for (const e of g.entries) {
      expectComplexClose([e.re[k]!, e.im[k]!], [dense[e.i]![e.j]!.re, dense[e.i]![e.j]!.im], 1e-9, `G_${e.i}${e.j}(z${k})`);
    }
  });
}

describe('groundLevel(model) over S_z sectors', () => {
  const chain = hubbard({ sites: 3, hopping: 1, interaction: 4, chemicalPotential: 0.5, electrons: 3 });
  const impurity = anderson(-1, 3, [{ level: -0.5, coupling: 0.4 }, { level: 0.8, coupling: 0.6 }], 0.2, 3);

  it('gives the 3-site Hubbard chain with 3 electrons a doublet (degeneracy 2, S_z = ±½) at the dense E0', () => {
    const g = groundLevel(chain);
    // Independent reference: dense diagonalisation of the whole 3-electron sector (test/helpers/denseFock.ts).
    const dense = denseGround(chain, 3);
    expectClose(g.energy, dense.energy, 1e-10, 'E0');
    expect(dense.states).toHaveLength(2);
    expect(g.degeneracy).toBe(2);
    expect(g.spinSectors).toBe('all');
    expect(g.components.map((c) => c.spinPolarization)).toEqual([1, -1]);
    const next = dense.values.find((e) => e > dense.energy + 1e-6)!;
    expectClose(g.gap!, next - dense.energy, 1e-8, 'gap');
  });

  it('averages G over both states of the doublet: Hubbard chain and two-bath impurity equal the dense full-sector average', () => {
    expectGreenMatchesDense(chain);
    expect(groundLevel(impurity).degeneracy).toBe(2);
    expectGreenMatchesDense(impurity);
  });

  it('restricts the level and the average to the S_z sector a fixed spin names', () => {
    for (const spin of [1, -1]) {
      const fixed = { ...chain, spinPolarization: spin };
      const g = groundLevel(fixed);
      expect(g.degeneracy).toBe(1);
      expect(g.spinSectors).toBe('fixed');
      expectGreenMatchesDense(fixed, (3 + spin) / 2);
    }
  });

  it('finds a polarised ground level when a field breaks spin symmetry (every sector searched)', () => {
    // Zeeman field −B(n↑ − n↓) on a 2-site chain with 2 electrons: strong B makes the S_z = 1 triplet state lowest.
    const model = hubbard({ sites: 2, hopping: 0.2, interaction: 1, chemicalPotential: 0, electrons: 2 });
    const n = model.modes;
    const T = { n, re: model.oneBody.re.slice(), im: model.oneBody.im.slice() };
    for (let s = 0; s < 2; s++) {
      T.re[s * n + s]! -= 2;
      T.re[(2 + s) * n + 2 + s]! += 2;
    }
    const field = { ...model, oneBody: T };
    expect(spinRotationInvariant(field)).toBe(false);
    const g = groundLevel(field);
    expectClose(g.energy, denseGround(field, 2).energy, 1e-10, 'E0');
    expect(g.components.map((c) => c.spinPolarization)).toEqual([2]);
    expect(g.searched).toHaveLength(3);
  });
});

describe('spinRotationInvariant(model)', () => {
  it('holds for the Hubbard and impurity presets and fails for a field or a spin-flip hop', () => {
    const chain = hubbard({ sites: 3, hopping: 1, interaction: 4, chemicalPotential: 0.5 });
    expect(spinRotationInvariant(chain)).toBe(true);
    expect(spinRotationInvariant(anderson(-1, 3, [{ level: 0.1, coupling: 0.5 }], 0, 2))).toBe(true);
    const n = chain.modes;
    const flip = { n, re: chain.oneBody.re.slice(), im: chain.oneBody.im.slice() };
    flip.re[0 * n + 4] = 0.3;
    flip.re[4 * n + 0] = 0.3;
    expect(spinRotationInvariant({ ...chain, oneBody: flip })).toBe(false);
    // n_{0↑} n_{1↑} alone (no matching spin-down term) is not SU(2) invariant.
    const upOnly = [{ i: 0, j: 1, k: 0, l: 1, re: 1, im: 0 }, { i: 1, j: 0, k: 1, l: 0, re: 1, im: 0 }];
    expect(spinRotationInvariant({ ...chain, twoBody: [...chain.twoBody, ...upOnly] })).toBe(false);
  });
});

describe('groundLevel(model) when Lanczos cannot converge', () => {
  it('throws a ConvergenceError naming the residual reached', () => {
    const model = hubbard({ sites: 4, hopping: 1, interaction: 4, chemicalPotential: 2, spin: 0 });
    let caught: unknown;
    try {
      groundLevel(model, { maxSteps: 2, tolerance: 1e-300, basis: 'rerun' });
    } catch (error) {
      caught = error;
    }
    expect(isConvergenceError(caught)).toBe(true);
    expect((caught as Error).message).toMatch(/relative residual reached \d\.\d\de[-+]\d+/);
  });
});
