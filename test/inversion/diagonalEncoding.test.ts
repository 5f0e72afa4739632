import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { diagonalEncoding, type DiagonalEncoding } from '../../src/inversion/diagonalEncoding.js';
import { diagonalBound } from '../../src/inversion/diagonalBound.js';
import type { FermionModel, TwoBodyTerm } from '../../src/model/FermionModel.js';
import { jordanWigner } from '../../src/operators/jordanWigner.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { modelHamiltonian } from '../../src/operators/modelHamiltonian.js';
import { pauliOneNorm } from '../../src/operators/pauliOneNorm.js';
import { simplifyPauli } from '../../src/operators/simplifyPauli.js';
import { popcount32 } from '../../src/operators/internal/popcount.js';
import { cleanRegisterLeak } from '../../src/verify/cleanRegisterLeak.js';
import { onZeroAncillas, verifyEncoding } from '../../src/verify/verifyEncoding.js';
import { ancillaQubits } from '../../src/blocks/BlockEncoding.js';
import { expectClose } from '../helpers/close.js';
import { hubbard } from '../helpers/models.js';

const zeros = (n: number) => ({ n, re: new Float64Array(n * n), im: new Float64Array(n * n) });

/** B = Σ_p c_p n_p (moved into B by the split) + Σ V_pq n_p n_q, written as V_pqpq = V_qpqp = V (n_p n_q = a†p a†q a_q a_p). */
function diagonalModel(single: readonly number[], pairs: readonly { p: number; q: number; v: number }[]): FermionModel {
  const n = single.length;
  const inB = zeros(n);
  single.forEach((c, p) => (inB.re[p * n + p] = c));
  const twoBody: TwoBodyTerm[] = pairs.flatMap(({ p, q, v }) => [
    { i: p, j: q, k: p, l: q, re: v, im: 0 },
    { i: q, j: p, k: q, l: p, re: v, im: 0 },
  ]);
  return { name: 'diagonal', modes: n, electrons: 0, oneBody: inB, oneBodyInB: inB, twoBody, broadening: 0.1, grid: { from: -1, to: 1, points: 3 } };
}

const modelArb = (maxModes: number, maxPairs: number) =>
  fc.integer({ min: 2, max: maxModes }).chain((n) =>
    fc.record({
      single: fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: n, maxLength: n }),
      pairs: fc.uniqueArray(
        fc.record({ p: fc.integer({ min: 0, max: n - 2 }), gap: fc.integer({ min: 1, max: n - 1 }), v: fc.double({ min: -1, max: 1, noNaN: true }) }),
        { maxLength: maxPairs, selector: (t) => `${t.p},${Math.min(n - 1, t.p + t.gap)}` },
      ),
    }).map(({ single, pairs }) => diagonalModel(single, pairs.map(({ p, gap, v }) => ({ p, q: Math.min(n - 1, p + gap), v })))),
  );

const windowArb = (n: number) =>
  fc.oneof(fc.constant(undefined), fc.tuple(fc.integer({ min: 0, max: n }), fc.integer({ min: 0, max: n })).map(([a, b]) => [Math.min(a, b), Math.max(a, b)] as const));

/** B(x) from the dense matrix of B's fermion terms (Jordan–Wigner-free ladder algebra), for every occupation x. */
function diagonalOf(model: FermionModel): Float64Array {
  const M = ladderSumMatrix(modelHamiltonian(model, { part: 'B' }), model.modes);
  const dim = 2 ** model.modes;
  return Float64Array.from({ length: dim }, (_, s) => M.re[s * dim + s]!);
}

function built(model: FermionModel, options: Parameters<typeof diagonalEncoding>[1]): DiagonalEncoding {
  const e = diagonalEncoding(model, options);
  if ('notDiagonal' in e) throw new Error(e.notDiagonal);
  return e;
}

describe('diagonalEncoding(model)', () => {
  it('encodes P(B − b0)P within its error bound, which is at most the precision, with clean work registers (≤ 6 modes, both adders)', () => {
    fc.assert(
      fc.property(modelArb(6, 6).chain((m) => fc.tuple(fc.constant(m), windowArb(m.modes), fc.constantFrom('qft' as const, 'ripple' as const))), ([model, window, adder]) => {
        const bound = diagonalBound(model, window);
        fc.pre(!('notDiagonal' in bound) && bound.beta > 1e-6);
        const encoding = built(model, { precision: 0.05, maxBits: 5, adder, ...(window ? { electrons: window } : {}) });
        if (!encoding.bitsCapped) expect(encoding.errorBound).toBeLessThanOrEqual(0.05);
        const report = verifyEncoding(encoding);
        expect(report.unitarityDeviation).toBeLessThan(1e-10);
        expect(report.maxError).toBeLessThanOrEqual(encoding.errorBound + 1e-12);
        expect(cleanRegisterLeak(encoding)).toBeLessThan(1e-10);
      }),
      { numRuns: 16, seed: 7 },
    );
  });

  it('keeps integer register arguments when the range bound of the rounded weights is fractional (a found counterexample)', () => {
    // One negative pair weight: the row-sum bound gives a range end of −0.5 units, rounded outward to −1.
    const model = diagonalModel([0, 0, 0, 0, 0.462815437051985], [{ p: 1, q: 4, v: -0.031204342842102026 }]);
    const encoding = built(model, { precision: 0.05, maxBits: 5, adder: 'qft' });
    expect(Number.isInteger(encoding.grid.sumLow) && Number.isInteger(encoding.grid.sumHigh)).toBe(true);
    expect(verifyEncoding(encoding).maxError).toBeLessThanOrEqual(encoding.errorBound + 1e-12);
  });

  it('all pair terms share one AND qubit, which the Fourier route\'s simulation leaves out of the state (every pair of 6 modes)', () => {
    const n = 6;
    const pairs = Array.from({ length: n }, (_, p) => Array.from({ length: n - p - 1 }, (_, k) => ({ p, q: p + k + 1, v: 0.25 * (1 + ((p + k) % 3)) }))).flat();
    const model = diagonalModel([0.5, -0.25, 1, 0, 0.75, -0.5], pairs);
    for (const adder of ['qft', 'ripple'] as const) {
      const e = built(model, { adder, electrons: [1, 4], precision: 0.05, maxBits: 4 });
      expect(e.pairQubits).toBe(1);
      expect(e.ancillas.find((r) => r.name === 'pair_and')).toEqual({ name: 'pair_and', size: 1, role: 'clean' });
      const counter = Math.ceil(Math.log2(n + 1));
      const ripple = adder === 'ripple' ? Math.max(e.registerBits, counter) + 1 : 0;
      expect(ancillaQubits(e)).toBe(1 + e.registerBits + 1 + counter + 1 + ripple);
      // The Fourier adder's kernel runs without its AND qubit; the ripple route's ccx gates touch it.
      expect(onZeroAncillas(e, {}).stateQubits).toBe(n + ancillaQubits(e) - (adder === 'qft' ? 1 : 0));
      // Simulated here on the Fourier route only (the ripple route's 21 qubits are checked on smaller models above).
      if (adder === 'qft') expect(verifyEncoding(e).maxError).toBeLessThanOrEqual(e.errorBound + 1e-12);
    }
    const withoutPairs = built(diagonalModel([0.5, -0.25, 1], []), {});
    expect(withoutPairs.pairQubits).toBe(0);
    expect(withoutPairs.ancillas.some((r) => r.name === 'pair_and')).toBe(false);
  });

  it('exact() is P(B − b0)P of the model (diagonal, zero outside the window)', () => {
    const model = diagonalModel([0.5, -0.25, 1], [{ p: 0, q: 2, v: 0.75 }]);
    const e = built(model, { electrons: 1 });
    const dim = 8;
    const M = e.exact();
    // B(x) by hand: x = 001 → 0.5, 010 → −0.25, 100 → 1; the one-electron window is these three.
    const expected = new Map([[1, 0.5], [2, -0.25], [4, 1]]);
    for (let r = 0; r < dim; r++) {
      for (let c = 0; c < dim; c++) {
        const want = r === c && expected.has(r) ? expected.get(r)! - e.shift : 0;
        expectClose(M.re[r * dim + c]!, want, 1e-14, `entry ${r},${c}`);
      }
    }
    // Range [−0.25, 1] (attained): b0 = 0.375, β = 0.625.
    expectClose(e.shift, 0.375, 1e-15, 'b0');
    expectClose(e.alpha, 0.625, 1e-15, 'beta');
  });

  it('α = β bounds max|B(x) − b0| over the window and is at most Σ N largest |c_p| + the N(N−1)/2 largest |V_pq| (≤ 6 modes)', () => {
    fc.assert(
      fc.property(modelArb(6, 8).chain((m) => fc.tuple(fc.constant(m), windowArb(m.modes))), ([model, window]) => {
        const bound = diagonalBound(model, window);
        if ('notDiagonal' in bound) throw new Error(bound.notDiagonal);
        const values = diagonalOf(model);
        const [min, max] = window ?? [0, model.modes];
        let worst = 0;
        let simple = 0;
        const c = [...bound.terms.single].map(Math.abs).sort((a, b) => b - a);
        const v = bound.terms.pairs.map((t) => Math.abs(t.value)).sort((a, b) => b - a);
        for (let N = min; N <= max; N++) {
          simple = Math.max(simple, c.slice(0, N).reduce((s, x) => s + x, 0) + v.slice(0, (N * (N - 1)) / 2).reduce((s, x) => s + x, 0));
        }
        values.forEach((b, s) => {
          if (popcount32(s) >= min && popcount32(s) <= max) worst = Math.max(worst, Math.abs(b - bound.shift));
        });
        expect(worst).toBeLessThanOrEqual(bound.beta + 1e-12);
        // Centring: |B − b0| ≤ β ≤ max|B| ≤ the simple bound (B − constant takes values within ±simple).
        expect(bound.beta).toBeLessThanOrEqual(simple + 1e-12);
      }),
      { numRuns: 60, seed: 5 },
    );
  });

  it('reports a B that is not diagonal (a hopping moved into B) instead of encoding it', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 4, chemicalPotential: 0 });
    const inB = zeros(4);
    inB.re[1] = model.oneBody.re[1]!;
    inB.re[4] = model.oneBody.re[4]!;
    const e = diagonalEncoding({ ...model, oneBodyInB: inB });
    expect('notDiagonal' in e && e.notDiagonal).toMatch(/not a number operator/);
  });

  it("encodes the Hubbard dimer's U n↑n↓ exactly: β = U·N/4 on N electrons (half the largest double occupancy times U)", () => {
    const U = 4;
    const model = hubbard({ sites: 2, hopping: 1, interaction: U, chemicalPotential: 2 });
    for (const N of [2, 4]) {
      const e = built(model, { electrons: N });
      // N = 2: B ∈ {0, U} (one double occupancy at most), N = 4: B = 2U always — the row bound gives N·U/2 on top, 0 below.
      expectClose(e.alpha, (U * N) / 4, 1e-14, `β at N = ${N}`);
      expect(e.grid.commensurate).toBe(true);
      expect(verifyEncoding(e).maxError).toBeLessThanOrEqual(1e-10);
    }
  });

  it('keeps β ∝ U·electrons while the Pauli α of B′ grows with the sites (Hubbard chains, 4 electrons, α only)', () => {
    const U = 4;
    for (const sites of [4, 8, 16, 32]) {
      const model = hubbard({ sites, hopping: 1, interaction: U, chemicalPotential: 0 });
      const bound = diagonalBound(model, 4);
      if ('notDiagonal' in bound) throw new Error(bound.notDiagonal);
      const pauli = simplifyPauli(jordanWigner(modelHamiltonian(model, { part: 'B' }), model.modes));
      const identity = pauli.terms.find((t) => t.x === 0n && t.z === 0n)?.re ?? 0;
      // U n↑n↓ = (U/4)(1 − Z↑ − Z↓ + Z↑Z↓) under Jordan–Wigner (from memory): 3U/4 per site without the identity.
      expectClose(pauliOneNorm(pauli) - Math.abs(identity), (3 * U * sites) / 4, 1e-9, `Pauli α at ${sites} sites`);
      expectClose(bound.beta, U, 1e-12, `β at ${sites} sites`);
    }
  });
});
