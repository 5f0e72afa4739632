// selfEnergyBound: ‖(G + E)⁻¹ − G⁻¹‖ entry by entry never exceeds the bound for |E_ij| ≤ b_ij,
// the inverses taken independently with mathjs.
import fc from 'fast-check';
import { complex, inv, matrix, type Complex as MathComplex } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { selfEnergyBound } from '../../src/exact/selfEnergyBound.js';

const entry = fc.double({ min: -1, max: 1, noNaN: true });

describe('selfEnergyBound(green, entryBounds)', () => {
  it('bounds every entry of the change of G⁻¹ under any perturbation within the entry bounds', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 4 }).chain((n) =>
          fc.tuple(
            fc.constant(n),
            fc.array(fc.tuple(entry, entry), { minLength: n * n, maxLength: n * n }),
            fc.array(fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 2 * Math.PI, noNaN: true })), { minLength: n * n, maxLength: n * n }),
            fc.double({ min: 1e-6, max: 0.05, noNaN: true }),
          ),
        ),
        ([n, g, e, size]) => {
          // G = 2·1 + random keeps it well conditioned; E_ij = size·u_ij·e^{iφ_ij} with u ∈ [0, 1].
          const G = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
          g.forEach(([re, im], k) => {
            G.re[k] = re + (k % (n + 1) === 0 ? 2 : 0);
            G.im[k] = im;
          });
          const bounds = new Float64Array(n * n).fill(size);
          const rows = (shift: boolean): MathComplex[][] =>
            Array.from({ length: n }, (_, i) =>
              Array.from({ length: n }, (_, j) => {
                const k = i * n + j;
                const [u, phi] = e[k]!;
                return complex(G.re[k]! + (shift ? size * u * Math.cos(phi) : 0), G.im[k]! + (shift ? size * u * Math.sin(phi) : 0));
              }),
            );
          const a = inv(matrix(rows(false))).toArray() as unknown as MathComplex[][];
          const b = inv(matrix(rows(true))).toArray() as unknown as MathComplex[][];
          let worst = 0;
          for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) worst = Math.max(worst, Math.hypot(a[i]![j]!.re - b[i]![j]!.re, a[i]![j]!.im - b[i]![j]!.im));
          expect(worst).toBeLessThanOrEqual(selfEnergyBound(G, bounds) * (1 + 1e-9) + 1e-14);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('is 0 for exact entries and Infinity when the perturbation can make G singular', () => {
    const G = { n: 1, re: new Float64Array([0.5]), im: new Float64Array([0]) };
    expect(selfEnergyBound(G, [0])).toBe(0);
    expect(selfEnergyBound(G, [0.6])).toBe(Number.POSITIVE_INFINITY);
  });
});
