import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  actOnBasisState,
  adjointFockTerms,
  applyFockOperator,
  fockOperatorMatrix,
  modelFockTerms,
} from '../../../src/verify/internal/fockOperatorMatrix.js';
import { expectClose } from '../../helpers/close.js';
import { denseHamiltonian, sectorStates } from '../../helpers/denseFock.js';
import type { FermionModel } from '../../../src/model/FermionModel.js';
import { randomModel } from '../../helpers/models.js';

describe('fockOperatorMatrix(modelFockTerms(model, part), n)', () => {
  it('agrees with the test reference denseHamiltonian on every electron-number sector of random models', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), fc.integer({ min: 2, max: 5 }), fc.boolean(), (seed, modes, complex) => {
        const model = randomModel(seed, modes, 1, complex);
        const H = fockOperatorMatrix(modelFockTerms(model, 'all'), modes);
        const dim = 2 ** modes;
        for (let N = 0; N <= modes; N++) {
          const states = sectorStates(modes, N);
          const reference = denseHamiltonian(model, N);
          states.forEach((r, a) => states.forEach((s, b) => {
            expectClose(H.re[r * dim + s]!, reference[a]![b]!.re, 1e-12, `Re H[${r},${s}]`);
            expectClose(H.im[r * dim + s]!, reference[a]![b]!.im, 1e-12, `Im H[${r},${s}]`);
          }));
        }
      }),
      { numRuns: 15 },
    );
  });

  it('gives the hand-computed 2-mode Hubbard-like matrix −t(a0†a1 + a1†a0) + U n0 n1', () => {
    // Hand computation with the Jordan–Wigner convention of ../shared/CONVENTIONS.md (a_j = Z_<j (X_j + iY_j)/2, mode j =
    // bit j): basis |s>, s = 0 … 3; the hops connect |1> (mode 0) and |2> (mode 1) with amplitude −t and no sign; the
    // two-body terms V_0101 = V_1010 = U give ½(U a0†a1†a1a0 + U a1†a0†a0a1) = U n0 n1, so <3|H|3> = U (the ½ counts).
    const t = 0.7;
    const U = 2.5;
    const zero = { n: 2, re: new Float64Array(4), im: new Float64Array(4) };
    const model: FermionModel = {
      name: 'two modes',
      modes: 2,
      electrons: 1,
      oneBody: { n: 2, re: new Float64Array([0, -t, -t, 0]), im: new Float64Array(4) },
      oneBodyInB: zero,
      twoBody: [{ i: 0, j: 1, k: 0, l: 1, re: U, im: 0 }, { i: 1, j: 0, k: 1, l: 0, re: U, im: 0 }],
      broadening: 0.1,
      grid: { from: -1, to: 1, points: 3 },
    };
    const H = fockOperatorMatrix(modelFockTerms(model, 'all'), 2);
    const expected = [
      [0, 0, 0, 0],
      [0, 0, -t, 0],
      [0, -t, 0, 0],
      [0, 0, 0, U],
    ];
    expected.forEach((row, r) => row.forEach((value, c) => expectClose(H.re[r * 4 + c]!, value, 1e-15, `H[${r},${c}]`)));
    expect([...H.im].every((x) => x === 0)).toBe(true);
  });

  it('counts the Jordan–Wigner sign: <11|a1†|01> = −1 because mode 0 is occupied (CONVENTIONS.md, hand computation)', () => {
    expect(actOnBasisState([3], 0b01)).toEqual({ state: 0b11, sign: -1 });
    expect(actOnBasisState([1], 0b10)).toEqual({ state: 0b11, sign: 1 });
    expect(actOnBasisState([0], 0b10)).toBeNull();
  });

  it('applyFockOperator equals the dense matrix times a vector, and the adjoint terms give the conjugate transpose', () => {
    const model = randomModel(5, 4, 2, true);
    const terms = modelFockTerms(model, 'B');
    const M = fockOperatorMatrix(terms, 4);
    const Mdag = fockOperatorMatrix(adjointFockTerms(terms), 4);
    const re = Float64Array.from({ length: 16 }, (_, k) => Math.sin(k + 1));
    const im = Float64Array.from({ length: 16 }, (_, k) => Math.cos(3 * k));
    const y = applyFockOperator(terms, 4, re, im);
    for (let r = 0; r < 16; r++) {
      let sr = 0;
      let si = 0;
      for (let c = 0; c < 16; c++) {
        sr += M.re[r * 16 + c]! * re[c]! - M.im[r * 16 + c]! * im[c]!;
        si += M.re[r * 16 + c]! * im[c]! + M.im[r * 16 + c]! * re[c]!;
        expectClose(Mdag.re[r * 16 + c]!, M.re[c * 16 + r]!, 1e-15, 'Re adjoint');
        expectClose(Mdag.im[r * 16 + c]!, -M.im[c * 16 + r]!, 1e-15, 'Im adjoint');
      }
      expectClose(y.re[r]!, sr, 1e-13, 'Re y');
      expectClose(y.im[r]!, si, 1e-13, 'Im y');
    }
  });

  it('splits H into A + B as the model says (A from oneBody − oneBodyInB)', () => {
    const model = randomModel(9, 3, 1, false);
    const [H, A, B] = (['all', 'A', 'B'] as const).map((part) => fockOperatorMatrix(modelFockTerms(model, part), 3));
    H!.re.forEach((x, e) => expectClose(x, A!.re[e]! + B!.re[e]!, 1e-13, `H = A + B at ${e}`));
  });

  it('refuses more than 12 modes densely and modes beyond the register', () => {
    expect(() => fockOperatorMatrix([], 13)).toThrow(RangeError);
    expect(() => fockOperatorMatrix([{ factors: [8], re: 1, im: 0 }], 3)).toThrow(/mode 4/);
  });
});
