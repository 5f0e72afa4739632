import { describe, expect, it } from 'vitest';
import { parseModel } from '../../src/model/parseModel.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';

describe('parseModel(input, source) — explicit form', () => {
  it('adds repeated entries, reads a missing im as 0 and keeps V as listed', () => {
    const model = parseModel({
      modes: 2,
      electrons: 1,
      oneBody: [[0, 1, 0.5, 1], [0, 1, 0.5], [1, 0, 1, -1], [1, 1, 2]],
      twoBody: [[0, 1, 0, 1, 1.5], [0, 1, 0, 1, 0.5], [1, 0, 1, 0, 2]],
    }, 'm.json');
    expect(model.oneBody).toEqual(matrixFromRows([[0, [1, 1]], [[1, -1], 2]]));
    expect(model.twoBody).toEqual([
      { i: 0, j: 1, k: 0, l: 1, re: 2, im: 0 },
      { i: 1, j: 0, k: 1, l: 0, re: 2, im: 0 },
    ]);
  });

  it('accepts V whose Hermitian partner is written in an antisymmetry-equivalent order', () => {
    // ½V_0123 a†0 a†1 a3 a2 has adjoint ½ a†2 a†3 a1 a0 = ½ a†3 a†2 a0 a1, i.e. V_3210 = conj(V_0123).
    expect(() => parseModel({ modes: 4, electrons: 2, twoBody: [[0, 1, 2, 3, 1, 2], [3, 2, 1, 0, 1, -2]] }, 'm.json')).not.toThrow();
    // V_1023 = −1 is the same operator as V_0123 = 1, whose partner is V_2301 = 1.
    expect(() => parseModel({ modes: 4, electrons: 2, twoBody: [[1, 0, 2, 3, -1], [2, 3, 0, 1, 1]] }, 'm.json')).not.toThrow();
  });

  it('defaults name to the file base name, broadening to 0.1 and split to nothing', () => {
    const model = parseModel({ modes: 2, electrons: 1, oneBody: [[0, 1, 1], [1, 0, 1]] }, 'some/dir/my-model.json');
    expect(model.name).toBe('my-model');
    expect(model.broadening).toBe(0.1);
    expect(Array.from(model.oneBodyInB.re).every((v) => v === 0)).toBe(true);
    expect(model.form).toEqual({ kind: 'explicit' });
  });

  it('uses a given name, broadening and grid', () => {
    const model = parseModel({ modes: 1, electrons: 0, name: 'x', broadening: 0.25, grid: { from: -1, to: 2, points: 7 } }, 'm.json');
    expect([model.name, model.broadening, model.grid]).toEqual(['x', 0.25, { from: -1, to: 2, points: 7 }]);
  });

  it('accepts a one-point grid with from = to', () => {
    expect(parseModel({ modes: 1, electrons: 0, grid: { from: 1, to: 1, points: 1 } }, 'm.json').grid.points).toBe(1);
  });

  it('moves split.oneBodyInB entries and their Hermitian partners into B', () => {
    const model = parseModel({
      modes: 3,
      electrons: 1,
      oneBody: [[0, 0, 1], [1, 1, 2], [0, 2, 0.5, 0.5], [2, 0, 0.5, -0.5], [1, 2, 3], [2, 1, 3]],
      split: { oneBodyInB: [[2, 0], [1, 1]] },
    }, 'm.json');
    expect(model.oneBodyInB).toEqual(matrixFromRows([[0, 0, [0.5, 0.5]], [0, 2, 0], [[0.5, -0.5], 0, 0]]));
  });
});
