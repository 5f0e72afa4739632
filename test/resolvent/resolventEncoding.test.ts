import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { ComplexScalar } from '../../src/linalg/ComplexScalar.js';
import type { FermionModel } from '../../src/model/FermionModel.js';
import { resolventEncoding, type ResolventEncoding } from '../../src/resolvent/resolventEncoding.js';
import { hubbard } from '../helpers/models.js';
import { projectedBlock } from '../qsvt/projectedBlock.js';
import { sectorResolvent } from './sectorReference.js';

/** Two modes, non-dyadic one-body energies and hopping, interaction U n_0 n_1 (V_0101 = V_1010 = U). */
function twoModeModel(e0: number, e1: number, hop: number, U: number): FermionModel {
  return {
    name: 'two-mode',
    modes: 2,
    electrons: 1,
    oneBody: { n: 2, re: Float64Array.from([e0, hop, hop, e1]), im: new Float64Array(4) },
    oneBodyInB: { n: 2, re: new Float64Array(4), im: new Float64Array(4) },
    twoBody: [{ i: 0, j: 1, k: 0, l: 1, re: U, im: 0 }, { i: 1, j: 0, k: 1, l: 0, re: U, im: 0 }],
    broadening: 0.5,
    grid: { from: -2, to: 2, points: 5 },
  };
}

/** Max entry gap between the simulated block on a sector's columns (rows in the sector) and (w − H)⁻¹/α there. */
function sectorGap(encoding: ResolventEncoding, model: FermionModel, w: ComplexScalar, electrons: number): { simulated: number; exact: number } {
  const { states, entries } = sectorResolvent(model, w, electrons);
  const block = projectedBlock(encoding, states);
  const exact = encoding.exact();
  const dim = block.n;
  let simulated = 0;
  let exactGap = 0;
  states.forEach((j, c) =>
    states.forEach((i, r) => {
      const ref = entries[r]![c]!;
      simulated = Math.max(simulated, Math.hypot(block.re[i * dim + j]! - ref.re / encoding.alpha, block.im[i * dim + j]! - ref.im / encoding.alpha));
      exactGap = Math.max(exactGap, Math.hypot(exact.re[i * dim + j]! - ref.re, exact.im[i * dim + j]! - ref.im));
    }),
  );
  return { simulated, exact: exactGap };
}

const energy = fc.double({ min: -1.5, max: 1.5, noNaN: true });
const shiftArb = fc.record({ re: fc.double({ min: -2, max: 2, noNaN: true }), im: fc.double({ min: 0.6, max: 1.2, noNaN: true }), sign: fc.boolean() })
  .map(({ re, im, sign }) => ({ re, im: sign ? im : -im }));

describe('resolventEncoding', () => {
  for (const route of ['direct', 'preconditioned'] as const) {
    it(`(${route}) equals (w − H)⁻¹ on the one- and two-electron sectors within its reported bound (random two-mode models)`, () => {
      fc.assert(
        fc.property(energy, energy, fc.double({ min: -0.7, max: 0.7, noNaN: true }), fc.double({ min: 0.05, max: 0.5, noNaN: true }), shiftArb, (e0, e1, hop, U, w) => {
          const model = twoModeModel(e0, e1, hop, U);
          const encoding = resolventEncoding(model, w, { route, precision: 0.05, fastInverse: { maxBits: 8 } });
          expect(encoding.errorBound).toBeLessThanOrEqual(0.05);
          expect(encoding.report.errorBoundOperator).toBeCloseTo(encoding.errorBound * encoding.alpha, 12);
          for (const electrons of [1, 2]) {
            const gap = sectorGap(encoding, model, w, electrons);
            expect(gap.exact).toBeLessThan(1e-9);
            expect(gap.simulated).toBeLessThanOrEqual(encoding.errorBound + 1e-12);
          }
        }),
        { numRuns: 40, seed: 11 },
      );
    });
  }

  it('(direct) keeps within its bound on the case an unseeded run once found above it, when the polynomial error was a grid measurement', () => {
    // e0 = e1 = 0, hop = −0.6488, U = 0.05, w = 1.1375i: the two-electron gap was 3.8e-8 above a bound whose polynomial
    // part was measured on a Chebyshev grid; the polynomial part is now certified (inverseApproximation.errorBound).
    const model = twoModeModel(0, 0, -0.6488, 0.05);
    const w = { re: 0, im: 1.1375 };
    const encoding = resolventEncoding(model, w, { route: 'direct', precision: 0.05, fastInverse: { maxBits: 8 } });
    for (const electrons of [1, 2]) expect(sectorGap(encoding, model, w, electrons).simulated).toBeLessThanOrEqual(encoding.errorBound);
  });

  it('(preconditioned, electron window) encodes P (w − H)⁻¹ P on the Hubbard dimer, zero outside the window', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 0.5, chemicalPotential: 0.3 });
    const w = { re: 0.37, im: 1.1 };
    const encoding = resolventEncoding(model, w, { route: 'preconditioned', precision: 0.05, electrons: 3 });
    expect(encoding.report.window).toEqual({ min: 3, max: 3 });
    const gap = sectorGap(encoding, model, w, 3);
    expect(gap.exact).toBeLessThan(1e-9);
    expect(gap.simulated).toBeLessThanOrEqual(encoding.errorBound + 1e-9);
    const outside = projectedBlock(encoding, [0b0011]);
    let leak = 0;
    for (let i = 0; i < 16; i++) leak = Math.max(leak, Math.hypot(outside.re[i * 16 + 3]!, outside.im[i * 16 + 3]!));
    expect(leak).toBeLessThanOrEqual(encoding.errorBound + 1e-9);
  });

  it('reports α of each factor, K = 1 + α_B/|Im w|, queries to each factor and the α relations of the construction', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 0.5, chemicalPotential: 0.3 });
    const w = { re: 0.37, im: -1.1 };
    const pre = resolventEncoding(model, w, { route: 'preconditioned', precision: 0.05 }).report;
    expect(pre.conditionBound).toBeCloseTo(1 + pre.alphas.B! / 1.1, 12);
    expect(pre.alphas.M).toBeCloseTo(1 + pre.alphas.fastInverse! * pre.alphas.B!, 12);
    expect(pre.alphas.total).toBeCloseTo(pre.alphas.inverse * pre.alphas.fastInverse!, 9);
    expect(pre.alphas.inverse).toBeCloseTo(1 / (pre.scale! * pre.alphas.M), 9);
    expect(pre.queries).toEqual({ M: pre.degree, fastInverse: pre.degree + 1, B: pre.degree, H: 0 });
    expect(pre.delta).toBeLessThanOrEqual(1 / (pre.alphas.M * pre.conditionBound));
    const direct = resolventEncoding(model, w, { route: 'direct', precision: 0.05 }).report;
    expect(direct.conditionBound).toBeCloseTo(1 / 1.1, 12);
    expect(direct.queries).toEqual({ M: direct.degree, fastInverse: 0, B: 0, H: direct.degree });
    expect(direct.split).toEqual({ polynomial: 0.05, quantisation: 0 });
  });
});
