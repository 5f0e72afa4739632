// The preconditioned route with B' block-encoded by reversible arithmetic (diagonalEncoding) instead of the Pauli LCU.
import { describe, expect, it } from 'vitest';
import type { BlockEncoding } from '../../src/blocks/BlockEncoding.js';
import type { FermionModel } from '../../src/model/FermionModel.js';
import { resolventCost } from '../../src/resolvent/resolventCost.js';
import { resolventEncoding } from '../../src/resolvent/resolventEncoding.js';
import { hubbard } from '../helpers/models.js';
import { projectedBlock } from '../qsvt/projectedBlock.js';
import { sectorResolvent } from './sectorReference.js';

function twoModeModel(U: number): FermionModel {
  return {
    name: 'two-mode', modes: 2, electrons: 1,
    oneBody: { n: 2, re: Float64Array.from([0.3, 0.4, 0.4, -0.2]), im: new Float64Array(4) },
    oneBodyInB: { n: 2, re: new Float64Array(4), im: new Float64Array(4) },
    twoBody: [{ i: 0, j: 1, k: 0, l: 1, re: U, im: 0 }, { i: 1, j: 0, k: 1, l: 0, re: U, im: 0 }],
    broadening: 0.5, grid: { from: -2, to: 2, points: 5 },
  };
}

describe("planResolvent with bEncoding 'arithmetic'", () => {
  it('encodes (w − H)⁻¹ on every sector within its bound, with α_B = β below the Pauli α and b0 the centre of B', () => {
    const model = twoModeModel(0.75);
    const w = { re: 0.2, im: 0.8 };
    const encoding = resolventEncoding(model, w, { route: 'preconditioned', precision: 0.05, bEncoding: 'arithmetic' });
    const b = encoding.report.bEncoding!;
    expect(b.used).toBe('arithmetic');
    // B = U n0 n1 ∈ [0, U] on the whole Fock space: β = U/2 and b0 = U/2; the Pauli LCU of B' = (U/4)(−Z0 − Z1 + Z0Z1) has 3U/4.
    expect(b.alphaArithmetic).toBeCloseTo(0.375, 14);
    expect(b.alphaPauli).toBeCloseTo(0.5625, 14);
    expect(encoding.report.bShift).toBeCloseTo(0.375, 14);
    expect(encoding.errorBound).toBeLessThanOrEqual(0.05);
    for (const electrons of [0, 1, 2]) {
      const { states, entries } = sectorResolvent(model, w, electrons);
      const block = projectedBlock(encoding, states);
      let gap = 0;
      states.forEach((j, c) => states.forEach((i, r) => {
        const ref = entries[r]![c]!;
        gap = Math.max(gap, Math.hypot(block.re[i * block.n + j]! - ref.re / encoding.alpha, block.im[i * block.n + j]! - ref.im / encoding.alpha));
      }));
      expect(gap).toBeLessThanOrEqual(encoding.errorBound + 1e-9);
    }
  });

  it('falls back to the Pauli LCU, saying why, when B is not diagonal', () => {
    const model = twoModeModel(0.75);
    const inB = { n: 2, re: Float64Array.from([0, 0.4, 0.4, 0]), im: new Float64Array(4) };
    const plan = resolventCost({ ...model, oneBodyInB: inB }, { re: 0, im: 0.5 }, { route: 'preconditioned', precision: 0.05, bEncoding: 'arithmetic' }).report.bEncoding!;
    expect(plan.used).toBe('pauli');
    expect(plan.alphaArithmetic).toBeNull();
    expect(plan.notDiagonal).toMatch(/not a number operator/);
  });
});

describe("resolventCost with bEncoding 'cheaper'", () => {
  it('keeps the encoding whose route has fewer Toffolis by the caller\'s count, reporting both counts', () => {
    const model = { ...hubbard({ sites: 2, hopping: 1, interaction: 4, chemicalPotential: 2 }), electrons: 2 };
    const w = { re: 1, im: 0.1 };
    // Stand-in counts (the route's α and its negative), so that both outcomes are reachable.
    const byAlpha = (e: BlockEncoding): number => e.alpha;
    const byNegativeAlpha = (e: BlockEncoding): number => -e.alpha;
    const options = { route: 'preconditioned' as const, precision: 1e-2, electrons: 3, reachablePrecision: true };
    const fewer = resolventCost(model, w, { ...options, bEncoding: 'cheaper', countToffoli: byAlpha }).report.bEncoding!;
    const more = resolventCost(model, w, { ...options, bEncoding: 'cheaper', countToffoli: byNegativeAlpha }).report.bEncoding!;
    expect(fewer.toffoli!.pauli).not.toBe(fewer.toffoli!.arithmetic);
    const smaller = fewer.toffoli!.pauli! < fewer.toffoli!.arithmetic! ? 'pauli' : 'arithmetic';
    expect(fewer.used).toBe(smaller);
    expect(more.used).toBe(smaller === 'pauli' ? 'arithmetic' : 'pauli');
    expect(() => resolventCost(model, w, { ...options, bEncoding: 'cheaper' })).toThrow(/countToffoli/);
  });

  it('weighs each count by α² (the shots the readout needs): fewer Toffolis per application lose to a smaller α', () => {
    const model = { ...hubbard({ sites: 2, hopping: 1, interaction: 4, chemicalPotential: 2 }), electrons: 2 };
    const w = { re: 1, im: 0.1 };
    const options = { route: 'preconditioned' as const, precision: 1e-2, electrons: 3, reachablePrecision: true };
    // 1/α per application: the larger α has fewer, but 1/α · α² = α over all shots favours the smaller α.
    const chosen = resolventCost(model, w, { ...options, bEncoding: 'cheaper', countToffoli: (e) => 1 / e.alpha });
    const pauli = resolventCost(model, w, { ...options, bEncoding: 'pauli' }).report.alphas.total;
    const arithmetic = resolventCost(model, w, { ...options, bEncoding: 'arithmetic' }).report.alphas.total;
    expect(pauli).not.toBe(arithmetic);
    expect(chosen.report.bEncoding!.used).toBe(pauli < arithmetic ? 'pauli' : 'arithmetic');
  });
});
