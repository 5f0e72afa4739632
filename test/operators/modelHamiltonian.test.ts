import fc from 'fast-check';
import { eigs } from 'mathjs';
import { describe, expect, it } from 'vitest';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { parseModel } from '../../src/model/parseModel.js';
import { addFermion } from '../../src/operators/addFermion.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { fermionProduct } from '../../src/operators/fermionProduct.js';
import { isHermitianPauli } from '../../src/operators/isHermitianPauli.js';
import { jordanWigner } from '../../src/operators/jordanWigner.js';
import { modelHamiltonian } from '../../src/operators/modelHamiltonian.js';
import { pauliSumMatrix } from '../../src/operators/pauliSumMatrix.js';
import { expectClose, expectComplexArrayClose } from '../helpers/close.js';
import { conjTranspose, matAdd } from '../helpers/complexMatrixOps.js';

const bit = (s: number, j: number) => (s >> j) & 1;

/** U Σ_i n_i↑ n_i↓ − μ N on the Fock space of 2L modes (up block then down block), built from occupation bits. */
function hubbardDiagonal(sites: number, u: number, mu: number): ComplexMatrix {
  const dim = 1 << (2 * sites);
  const re = new Float64Array(dim * dim);
  for (let s = 0; s < dim; s++) {
    let e = 0;
    for (let i = 0; i < sites; i++) e += u * bit(s, i) * bit(s, sites + i) - mu * (bit(s, i) + bit(s, sites + i));
    re[s * dim + s] = e;
  }
  return { n: dim, re, im: new Float64Array(dim * dim) };
}

const hop = (i: number, j: number, t: number) =>
  addFermion(fermionProduct([{ mode: i, dagger: true }, { mode: j, dagger: false }], -t),
    fermionProduct([{ mode: j, dagger: true }, { mode: i, dagger: false }], -t));

describe('modelHamiltonian(model, options)', () => {
  it('represents U n↑ n↓ − μ N of a Hubbard chain as the occupation-bit diagonal', () => {
    const model = parseModel({ lattice: { shape: 'chain', sites: 3, hopping: 0 }, interaction: 2.5, chemicalPotential: 0.75, electrons: 3 }, 'h.json');
    expectComplexArrayClose(ladderSumMatrix(modelHamiltonian(model), 6), hubbardDiagonal(3, 2.5, 0.75), 1e-14);
  });

  it('gives the Hubbard dimer as diagonal plus −t hopping in each spin block', () => {
    const model = parseModel({ lattice: { shape: 'chain', sites: 2, hopping: 1 }, interaction: 4, chemicalPotential: 2, electrons: 2 }, 'd.json');
    const hopping = ladderSumMatrix(addFermion(hop(0, 1, 1), hop(2, 3, 1)), 4);
    expectComplexArrayClose(ladderSumMatrix(modelHamiltonian(model), 4), matAdd(hubbardDiagonal(2, 4, 2), hopping), 1e-14);
  });

  it('has the Hubbard-dimer ground energy (U − c)/2 − 2μ, c = √(U² + 16t²), at half filling', () => {
    // Standard textbook result for the two-site Hubbard model (from memory, as stated in issue 3); with μ = U/2
    // the N = 2 ground level is the lowest level of the whole Fock space.
    const [t, u] = [1, 4];
    const mu = u / 2;
    const model = parseModel({ lattice: { shape: 'chain', sites: 2, hopping: t }, interaction: u, chemicalPotential: mu, electrons: 2 }, 'd.json');
    const h = ladderSumMatrix(modelHamiltonian(model), 4);
    const rows = Array.from({ length: 16 }, (_, i) => Array.from(h.re.subarray(i * 16, (i + 1) * 16)));
    const lowest = Math.min(...(eigs(rows).values as unknown as number[]).map(Number));
    expectClose(lowest, (u - Math.sqrt(u * u + 16 * t * t)) / 2 - 2 * mu, 1e-10, 'E0');
  });

  it('splits H into A (one-body minus oneBodyInB) and B (the rest) with A + B = H', () => {
    const model = parseModel({
      modes: 3,
      electrons: 1,
      oneBody: [[0, 0, 1], [0, 1, 0.5, 0.25], [1, 0, 0.5, -0.25], [2, 2, -1]],
      twoBody: [[0, 2, 0, 2, 3], [2, 0, 2, 0, 3]],
      split: { oneBodyInB: [[0, 1]] },
    }, 'm.json');
    const m = (part: 'all' | 'A' | 'B') => ladderSumMatrix(modelHamiltonian(model, { part }), 3);
    expectComplexArrayClose(matAdd(m('A'), m('B')), m('all'), 1e-14);
    const onlyHopping = ladderSumMatrix(addFermion(
      fermionProduct([{ mode: 0, dagger: true }, { mode: 1, dagger: false }], 0.5, 0.25),
      fermionProduct([{ mode: 1, dagger: true }, { mode: 0, dagger: false }], 0.5, -0.25),
    ), 3);
    const interaction = ladderSumMatrix(fermionProduct([
      { mode: 0, dagger: true }, { mode: 2, dagger: true }, { mode: 2, dagger: false }, { mode: 0, dagger: false },
    ], 3), 3);
    expectComplexArrayClose(m('B'), matAdd(onlyHopping, interaction), 1e-14);
    expect(modelHamiltonian(model, { part: 'A' }).terms.every((t) => t.ops.length === 2)).toBe(true);
  });

  it('maps a random Hermitian explicit model to a Hermitian Pauli sum with real coefficients', () => {
    const coefficient = fc.integer({ min: -4, max: 4 }).map((k) => k / 4);
    const entry = fc.tuple(fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 3 }), coefficient, coefficient);
    const pair = fc.tuple(fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 3 }),
      fc.integer({ min: 0, max: 3 }), coefficient, coefficient);
    fc.assert(fc.property(fc.array(entry, { maxLength: 6 }), fc.array(pair, { maxLength: 4 }), (ones, twos) => {
      const model = parseModel({
        modes: 4,
        electrons: 2,
        oneBody: ones.flatMap(([i, j, re, im]) => [[i, j, re, im], [j, i, re, -im]]),
        twoBody: twos.flatMap(([i, j, k, l, re, im]) => [[i, j, k, l, re, im], [k, l, i, j, re, -im]]),
      }, 'r.json');
      const pauli = jordanWigner(modelHamiltonian(model), 4);
      expect(isHermitianPauli(pauli)).toBe(true);
      for (const t of pauli.terms) expect(Math.abs(t.im)).toBeLessThanOrEqual(1e-12);
      const matrix = pauliSumMatrix(pauli);
      expectComplexArrayClose(matrix, conjTranspose(matrix), 1e-12);
    }), { numRuns: 100 });
  });
});
