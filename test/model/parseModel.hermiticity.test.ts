import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isInputError } from '../../src/core/InputError.js';
import { parseModel } from '../../src/model/parseModel.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import type { LadderTerm } from '../../src/operators/LadderSum.js';
import { conjTranspose } from '../helpers/complexMatrixOps.js';

type Row = [number, number, number, number, number, number];

/** Equivalent ways to write the Hermitian partner conj(V_klij) of V_ijkl, using V_ijkl = −V_jikl = −V_ijlk. */
const partners = (r: Row, form: number): Row => {
  const [i, j, k, l, re, im] = r;
  if (form === 0) return [k, l, i, j, re, -im];
  if (form === 1) return [l, k, i, j, -re, im];
  if (form === 2) return [k, l, j, i, -re, im];
  return [l, k, j, i, re, -im];
};

describe('parseModel(input, source) — two-body Hermiticity', () => {
  it('accepts twoBody exactly when ½ Σ V a†i a†j a_l a_k has a Hermitian Fock-space matrix', () => {
    const index = fc.integer({ min: 0, max: 2 });
    const coefficient = fc.integer({ min: -2, max: 2 });
    const row = fc.tuple(index, index, index, index, coefficient, coefficient);
    const input = fc.tuple(fc.array(row, { minLength: 1, maxLength: 3 }), fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 3, maxLength: 3 }),
      fc.boolean(), fc.boolean());
    fc.assert(fc.property(input, ([rows, forms, withPartners, perturb]) => {
      const all: Row[] = [...rows];
      if (withPartners) rows.forEach((r, n) => all.push(partners(r, forms[n]!)));
      if (perturb) all.push([rows[0]![0], rows[0]![1], rows[0]![2], rows[0]![3], 0, 1]);
      const terms: LadderTerm[] = all.map(([i, j, k, l, re, im]) => ({
        ops: [{ mode: i, dagger: true }, { mode: j, dagger: true }, { mode: l, dagger: false }, { mode: k, dagger: false }],
        re: re / 2,
        im: im / 2,
      }));
      const m = ladderSumMatrix({ terms }, 3);
      const adj = conjTranspose(m);
      const hermitian = m.re.every((v, e) => v === adj.re[e]) && m.im.every((v, e) => v === adj.im[e]);
      let accepted = true;
      try {
        parseModel({ modes: 3, electrons: 1, twoBody: all }, 'v.json');
      } catch (error) {
        expect(isInputError(error)).toBe(true);
        expect((error as Error).message).toMatch(/^v\.json: twoBody: not Hermitian/);
        accepted = false;
      }
      expect(accepted).toBe(hermitian);
    }), { numRuns: 400 });
  });
});
