import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ancillaQubits } from '../../src/blocks/BlockEncoding.js';
import { controlledEncoding } from '../../src/blocks/combine/controlledEncoding.js';
import { fastInverse } from '../../src/inversion/fastInverse.js';
import { verifyEncoding } from '../../src/verify/verifyEncoding.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { hermitianArb, referenceResolvent, withSpectrum } from './helpers/referenceResolvent.js';

const wArb = fc.record({
  re: fc.double({ min: -2, max: 2, noNaN: true }),
  im: fc.oneof(fc.double({ min: 0.1, max: 1, noNaN: true }), fc.double({ min: -1, max: -0.1, noNaN: true })),
});

describe('fastInverse(T, w)', () => {
  it('encodes (w − A)⁻¹ within its reported bound for random quadratic A and w (≤ 4 modes, both adders)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 4 }).chain((n) => hermitianArb(n)), wArb, fc.constantFrom('qft' as const, 'ripple' as const), (T, w, adder) => {
        const maxBits = adder === 'qft' ? Math.min(6, 11 - T.n) : 3;
        const encoding = fastInverse(T, w, { precision: 0.05, maxBits, adder });
        expect(encoding.alpha).toBeLessThanOrEqual(1 / Math.abs(w.im) + 1e-12);
        expectComplexArrayClose(encoding.exact(), referenceResolvent(T, w), 1e-9, 'exact operator');
        const report = verifyEncoding(encoding);
        expect(report.unitarityDeviation).toBeLessThan(1e-10);
        expect(report.maxError).toBeLessThanOrEqual(encoding.quantisationBound + 1e-10);
      }),
      { numRuns: 20 },
    );
  });

  it('is exact (bound and error ≤ 1e-10) when the single-particle energies lie on a dyadic grid', () => {
    const dyadic = fc.array(fc.integer({ min: -12, max: 12 }), { minLength: 1, maxLength: 4 });
    fc.assert(
      fc.property(dyadic, fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 32, maxLength: 32 }), wArb, (levels, entries, w) => {
        const T = withSpectrum(levels.map((j) => j / 4), entries);
        const encoding = fastInverse(T, w, { maxBits: 7 });
        expect(encoding.grid.commensurate).toBe(true);
        expect(encoding.quantisationBound).toBeLessThanOrEqual(1e-10);
        expect(verifyEncoding(encoding).maxError).toBeLessThanOrEqual(1e-10);
      }),
      { numRuns: 15 },
    );
  });

  it('reports the grid: register value v means energy minEnergy + v·step, ε̃_k = step·weights[k]', () => {
    // Diagonal T: the eigenvalues are the diagonal entries 0.75, −0.5, 1.25, multiples of 1/4 (step 2^−2).
    const T = { n: 3, re: new Float64Array([0.75, 0, 0, 0, -0.5, 0, 0, 0, 1.25]), im: new Float64Array(9) };
    const encoding = fastInverse(T, { re: 0, im: 0.5 });
    expect(encoding.grid.step).toBe(0.25);
    expect([...encoding.energies].map((e, k) => e - encoding.grid.step * encoding.grid.weights[k]!)).toEqual([0, 0, 0]);
    // Full Fock space: sums range from −0.5 (mode 1 alone) to 2 (modes 0 and 2): 11 values on the 1/4 grid, 4 bits.
    expect(encoding.grid.minEnergy).toBe(-0.5);
    expect(encoding.grid.values).toBe(11);
    expect(encoding.registerBits).toBe(4);
    // c = min |w − E| over the grid: E = 0 lies on it, so c = |Im w|.
    expect(encoding.c).toBe(0.5);
  });

  it('caps the register at maxBits and says so, the bound still holding and above the precision', () => {
    // Four irrational levels with many electrons: a 2-bit register cannot tell the window's energies apart.
    const levels = [0.3, -0.7 * Math.SQRT2, 0.1 * Math.PI, 0.55];
    const T = { n: 4, re: new Float64Array(16), im: new Float64Array(16) };
    levels.forEach((e, k) => (T.re[k * 4 + k] = e));
    const encoding = fastInverse(T, { re: 0.1, im: 0.2 }, { precision: 1e-4, maxBits: 2 });
    expect(encoding.bitsCapped).toBe(true);
    expect(encoding.registerBits).toBeLessThanOrEqual(2);
    expect(encoding.quantisationBound).toBeGreaterThan(1e-4);
    expect(verifyEncoding(encoding).maxError).toBeLessThanOrEqual(encoding.quantisationBound + 1e-10);
  });

  it('a controlled call controls only the flag rotation, and the controlled encoding holds the same bound', () => {
    const T = { n: 2, re: new Float64Array([0.3, 0.2, 0.2, -0.6]), im: new Float64Array(4) };
    const encoding = fastInverse(T, { re: -0.2, im: 0.3 }, { precision: 0.05, maxBits: 5 });
    expect(encoding.block.body.kind).toBe('conjugated');
    const controlled = controlledEncoding(encoding);
    expect(ancillaQubits(controlled)).toBe(ancillaQubits(encoding));
    expect(verifyEncoding(controlled).maxError).toBeLessThanOrEqual(encoding.quantisationBound + 1e-10);
  });

  it('rejects Im w = 0 and bad windows', () => {
    const T = { n: 1, re: new Float64Array([0.5]), im: new Float64Array(1) };
    expect(() => fastInverse(T, { re: 1, im: 0 })).toThrow(/Im w/);
    expect(() => fastInverse(T, { re: 1, im: 1 }, { electrons: 2 })).toThrow(/window/);
  });
});
