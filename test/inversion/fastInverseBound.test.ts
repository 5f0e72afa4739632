// The fast inverse's c and error bound hold for the true operator: c never exceeds the distance from w to A's spectrum on
// the window (so ‖c (w − A)⁻¹‖ ≤ 1 whatever the register), the bound covers the measured error with no slack (the
// floating-point term included), it meets the precision unless the register was capped, and it covers a T that is
// circulant only within the tolerance (where the Fourier route reads its energies from row 0).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fastInverse } from '../../src/inversion/fastInverse.js';
import { oneBodyRotation } from '../../src/rotations/oneBodyRotation.js';
import { verifyEncoding } from '../../src/verify/verifyEncoding.js';
import { hermitianArb } from './helpers/referenceResolvent.js';

const wArb = fc.record({
  re: fc.double({ min: -2, max: 2, noNaN: true }),
  im: fc.oneof(fc.double({ min: 0.01, max: 0.5, noNaN: true }), fc.double({ min: -0.5, max: -0.01, noNaN: true })),
});

/** Distance from w to { Σ_k ε_k n_k : N_min ≤ Σ n_k ≤ N_max } by listing every occupation. */
function spectrumDistance(energies: Float64Array, w: { re: number; im: number }, min: number, max: number): number {
  let best = Infinity;
  for (let s = 0; s < 2 ** energies.length; s++) {
    let E = 0;
    let N = 0;
    energies.forEach((e, k) => {
      if ((s >> k) & 1) {
        E += e;
        N++;
      }
    });
    if (N >= min && N <= max) best = Math.min(best, Math.hypot(w.re - E, w.im));
  }
  return best;
}

/** Ring of L sites with hopping −t and one bond −t(1 + ε). */
function ring(L: number, t: number, epsilon: number) {
  const T = { n: L, re: new Float64Array(L * L), im: new Float64Array(L * L) };
  for (let i = 0; i < L; i++) T.re[i * L + ((i + 1) % L)] = T.re[((i + 1) % L) * L + i] = -t;
  T.re[1] = T.re[L] = -t * (1 + epsilon);
  return T;
}

describe('fastInverse bound and normaliser', () => {
  it('c ≤ dist(w, spectrum of A on the window), c ≥ |Im w|, and the measured error ≤ the bound, on coarse registers too', () => {
    const caseArb = fc.integer({ min: 1, max: 4 }).chain((n) =>
      fc.tuple(hermitianArb(n, 2), fc.integer({ min: 0, max: n }), fc.integer({ min: 0, max: n }), fc.integer({ min: 1, max: 4 })),
    );
    fc.assert(
      fc.property(caseArb, wArb, ([T, a, b, maxBits], w) => {
        const [min, max] = [Math.min(a, b), Math.max(a, b)];
        const encoding = fastInverse(T, w, { precision: 0.05, maxBits, electrons: [min, max] });
        const energies = oneBodyRotation(T).energies;
        expect(encoding.c).toBeLessThanOrEqual(spectrumDistance(energies, w, min, max) * (1 + 1e-12));
        expect(encoding.c).toBeGreaterThanOrEqual(Math.abs(w.im));
        if (!encoding.bitsCapped) expect(encoding.quantisationBound).toBeLessThanOrEqual(0.05);
        expect(verifyEncoding(encoding).maxError).toBeLessThanOrEqual(encoding.quantisationBound);
      }),
      { numRuns: 25 },
    );
  });

  it('covers a ring that is circulant only within the tolerance (Fourier route), at hopping 1 and 1000', () => {
    for (const t of [1, 1000]) {
      const T = ring(4, t, 4e-11);
      const rotation = oneBodyRotation(T, { fourierBlocks: 1 });
      expect(rotation.method).toBe('fourier');
      // The one off bond changes T by 4e-11·t in two entries: the residual sees at least that much.
      expect(rotation.residual).toBeGreaterThanOrEqual(4e-11 * t);
      const w = { re: 2 * t, im: 0.01 };
      const encoding = fastInverse(T, w, { electrons: 2, rotation: { fourierBlocks: 1 } });
      expect(encoding.boundParts.decomposition).toBeGreaterThan(0);
      expect(verifyEncoding(encoding).maxError).toBeLessThanOrEqual(encoding.quantisationBound);
    }
  });

  it('says how the bound splits: rounding + decomposition + piecewise + floating point', () => {
    const T = { n: 3, re: new Float64Array([0.31, 0.2, 0, 0.2, -0.77, 0.1, 0, 0.1, 0.52]), im: new Float64Array(9) };
    const encoding = fastInverse(T, { re: 0.05, im: 0.1 }, { precision: 1e-3 });
    const p = encoding.boundParts;
    expect(encoding.quantisationBound).toBeCloseTo(p.rounding + p.decomposition + p.piecewise + p.floatingPoint, 15);
    expect(p.floatingPoint).toBeGreaterThan(0);
    expect(encoding.quantisationBound).toBeLessThanOrEqual(1e-3);
    expect(encoding.inverseErrorBound).toBeCloseTo(encoding.quantisationBound / encoding.c, 12);
  });
});
