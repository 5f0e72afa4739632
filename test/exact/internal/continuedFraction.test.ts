// truncationBound: the error of a continued fraction cut after m levels never exceeds the bound, checked
// against a direct solve of the whole tridiagonal system (an independent computation, not the fraction).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { continuedFraction, evaluateFraction, truncationBound } from '../../../src/exact/internal/continuedFraction.js';

/** w ⟨e0|(z − s(J − e0))⁻¹|e0⟩ for the Jacobi matrix J (diagonal alpha, off-diagonal beta) by the Thomas algorithm. */
function directValue(alpha: number[], beta: number[], sign: 1 | -1, e0: number, w: number, zr: number, zi: number): [number, number] {
  const n = alpha.length;
  // A = z − s(J − e0): diagonal z − s(α_k − e0), off-diagonal −s β_k; solve A x = e_0, return w x_0.
  const dr = alpha.map((a) => zr - sign * (a - e0));
  const di = alpha.map(() => zi);
  const off = beta.slice(0, n - 1).map((b) => -sign * b);
  // Backward elimination keeps x_0 last: g_k = 1/(d_k − off_k² g_{k+1}).
  let gr = 0;
  let gi = 0;
  for (let k = n - 1; k >= 0; k--) {
    const o2 = k < n - 1 ? off[k]! * off[k]! : 0;
    const ar = dr[k]! - o2 * gr;
    const ai = di[k]! - o2 * gi;
    const den = ar * ar + ai * ai;
    gr = ar / den;
    gi = -ai / den;
  }
  return [w * gr, w * gi];
}

describe('truncationBound(cf, z)', () => {
  it('bounds |exact − cut fraction| for random Jacobi matrices, levels and z (Im z ≠ 0)', () => {
    const level = fc.double({ min: -3, max: 3, noNaN: true });
    const coupling = fc.double({ min: 0.05, max: 2, noNaN: true });
    fc.assert(
      fc.property(
        fc.array(fc.tuple(level, coupling), { minLength: 2, maxLength: 40 }),
        fc.integer({ min: 1, max: 39 }),
        fc.constantFrom<1 | -1>(1, -1),
        fc.double({ min: -4, max: 4, noNaN: true }),
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        fc.boolean(),
        (rows, cut, sign, zr, eta, below) => {
          const alpha = rows.map((r) => r[0]);
          const beta = rows.map((r) => r[1]);
          const m = Math.min(cut, alpha.length - 1);
          const zi = below ? -eta : eta;
          const exact = directValue(alpha, beta, sign, 0.3, 0.7, zr, zi);
          const cf = continuedFraction(0.7, alpha.slice(0, m), beta.slice(0, m), sign, 0.3);
          const [vr, vi] = evaluateFraction(cf, zr, zi);
          const error = Math.hypot(exact[0] - vr, exact[1] - vi);
          const bound = truncationBound(cf, zr, zi);
          expect(error).toBeLessThanOrEqual(bound * (1 + 1e-9) + 1e-13 * Math.hypot(...exact));
        },
      ),
      { numRuns: 400 },
    );
  });

  it('is 0 when the Krylov space closed (no tail) and Infinity on the real axis', () => {
    const closed = continuedFraction(1, [0.1, 0.4], [1, 0], 1, 0);
    expect(truncationBound(closed, 0.2, 0.1)).toBe(0);
    const open = continuedFraction(1, [0.1, 0.4], [1, 0.5], 1, 0);
    expect(truncationBound(open, 0.2, 0)).toBe(Number.POSITIVE_INFINITY);
    expect(truncationBound(open, 0.2, 0.1)).toBeGreaterThan(0);
  });
});
