import { eigs } from 'mathjs';
import { describe, expect, it } from 'vitest';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import type { FermionModel } from '../../src/model/FermionModel.js';
import { parseModel } from '../../src/model/parseModel.js';
import { expectClose } from '../helpers/close.js';
import { matrixFromRows, subMatrix } from '../helpers/complexMatrixOps.js';

const hubbard = (lattice: object, extra: object = {}): FermionModel =>
  parseModel({ lattice: { hopping: 1, ...lattice }, interaction: 4, chemicalPotential: 2, electrons: 2, ...extra }, 'h.json');

const realEigenvalues = (m: ComplexMatrix): number[] => {
  const rows = Array.from({ length: m.n }, (_, i) => Array.from(m.re.subarray(i * m.n, (i + 1) * m.n)));
  return (eigs(rows).values as unknown as number[]).map(Number).sort((a, b) => a - b);
};

describe('parseModel(input, source) — Hubbard preset', () => {
  it('builds the dimer T = [[−μ, −t], [−t, −μ]] in each spin block, nothing between blocks', () => {
    const model = hubbard({ shape: 'chain', sites: 2 });
    expect(model.modes).toBe(4);
    expect(model.spinBlocks).toEqual({ up: [0, 1], down: [2, 3] });
    const block = matrixFromRows([[-2, -1], [-1, -2]]);
    expect(subMatrix(model.oneBody, [0, 1])).toEqual(block);
    expect(subMatrix(model.oneBody, [2, 3])).toEqual(block);
    for (const i of [0, 1]) for (const j of [2, 3]) expect(model.oneBody.re[i * 4 + j]).toBe(0);
    expect(Array.from(model.oneBody.im).every((v) => v === 0)).toBe(true);
  });

  it('gives ring eigenvalues −2t cos(2πk/L) − μ in each spin block', () => {
    // Tight-binding ring spectrum (textbook, from memory).
    const t = 0.7;
    const mu = 0.3;
    const model = parseModel({ lattice: { shape: 'ring', sites: 5, hopping: t }, interaction: 1, chemicalPotential: mu, electrons: 5 }, 'r.json');
    const expected = Array.from({ length: 5 }, (_, k) => -2 * t * Math.cos((2 * Math.PI * k) / 5) - mu).sort((a, b) => a - b);
    for (const block of [[0, 1, 2, 3, 4], [5, 6, 7, 8, 9]]) {
      realEigenvalues(subMatrix(model.oneBody, block)).forEach((e, k) => expectClose(e, expected[k]!, 1e-12, `eigenvalue ${k}`));
    }
  });

  it('treats a ring of 2 sites as the chain (the bond is counted once)', () => {
    expect(hubbard({ shape: 'ring', sites: 2 }).oneBody).toEqual(hubbard({ shape: 'chain', sites: 2 }).oneBody);
  });

  it('closes a ring of 3 sites with the bond 2–0', () => {
    const model = hubbard({ shape: 'ring', sites: 3 });
    expect(model.oneBody.re[0 * 6 + 2]).toBe(-1);
    expect(model.oneBody.re[2 * 6 + 0]).toBe(-1);
  });

  it('numbers grid sites row-major with x fastest and wraps only periodic directions', () => {
    const open = hubbard({ shape: 'grid', size: [3, 2] });
    const at = (m: FermionModel, i: number, j: number) => m.oneBody.re[i * m.modes + j];
    expect(open.modes).toBe(12);
    expect(at(open, 0, 1)).toBe(-1); // (0,0)–(1,0)
    expect(at(open, 0, 3)).toBe(-1); // (0,0)–(0,1)
    expect(at(open, 0, 2)).toBe(0); // no x wrap
    expect(at(open, 6 + 2, 6 + 5)).toBe(-1); // spin down (2,0)–(2,1)
    const wrapped = hubbard({ shape: 'grid', size: [3, 2], periodic: [true, false] });
    expect(at(wrapped, 0, 2)).toBe(-1);
    expect(at(wrapped, 3, 5)).toBe(-1);
  });

  it('fixes no S_z sector unless the file gives spin, and checks a given one', () => {
    expect(hubbard({ shape: 'chain', sites: 3 }, { electrons: 3 }).spinPolarization).toBeUndefined();
    expect(hubbard({ shape: 'chain', sites: 3 }, { electrons: 3, spin: 1 }).spinPolarization).toBe(1);
    expect(hubbard({ shape: 'chain', sites: 3 }, { electrons: 4, spin: -2 }).spinPolarization).toBe(-2);
    expect(() => hubbard({ shape: 'chain', sites: 3 }, { electrons: 4, spin: 1 })).toThrow(/h\.json: spin: .*parity/);
    expect(() => hubbard({ shape: 'chain', sites: 3 }, { electrons: 2, spin: 4 })).toThrow(/h\.json: spin: .*≤ electrons/);
    expect(() => hubbard({ shape: 'chain', sites: 2 }, { electrons: 4, spin: 2 })).toThrow(/h\.json: spin: .*do not fit/);
  });

  it('asks for "sites" on a chain and "size" on a grid', () => {
    expect(() => hubbard({ shape: 'chain' })).toThrow(/lattice\.sites: required/);
    expect(() => hubbard({ shape: 'grid', sites: 4 })).toThrow(/lattice\.sites: not used by a grid[\s\S]*lattice\.size: required/);
  });
});

describe('parseModel(input, source) — impurity preset', () => {
  it('puts the impurity first in each spin block, bath in file order, couplings between them', () => {
    const model = parseModel({
      impurity: { level: -1, interaction: 3, bath: [{ level: 0.5, coupling: 0.2 }, { level: -0.25, coupling: 0.4 }] },
      chemicalPotential: 0.5,
      electrons: 3,
    }, 'aim.json');
    expect(model.modes).toBe(6);
    expect(model.spinBlocks).toEqual({ up: [0, 1, 2], down: [3, 4, 5] });
    const block = matrixFromRows([
      [-1.5, 0.2, 0.4],
      [0.2, 0, 0],
      [0.4, 0, -0.75],
    ]);
    expect(subMatrix(model.oneBody, [0, 1, 2])).toEqual(block);
    expect(subMatrix(model.oneBody, [3, 4, 5])).toEqual(block);
    const modesWithU = new Set(model.twoBody.flatMap((v) => [v.i, v.j, v.k, v.l]));
    expect(modesWithU).toEqual(new Set([0, 3]));
  });
});
