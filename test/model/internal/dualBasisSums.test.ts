// dualBasisSums and planeWaveGrid: the kinetic table is exactly symmetric and translation-invariant (property test), the
// Coulomb and external-potential sums equal their defining series written out here term by term, and the symmetric
// frequency set takes the Nyquist term +n/2 once.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { coulombSeries, externalPotential, kineticSeries } from '../../../src/model/internal/dualBasisSums.js';
import { axisFrequency, displacementIndex, planeWaveGrid } from '../../../src/model/internal/planeWaveGrid.js';
import { reciprocalFrequencies as frequencies } from '../../helpers/reciprocalFrequencies.js';
import { expectClose } from '../../helpers/close.js';

/** Grid coordinates r_p = (i_d L_d / n_d)_d, first dimension fastest. */
function positions(points: readonly number[], box: readonly number[]): number[][] {
  const size = points.reduce((a, b) => a * b, 1);
  return Array.from({ length: size }, (_, p) => {
    let rest = p;
    return points.map((n, d) => {
      const i = rest % n;
      rest = Math.floor(rest / n);
      return (i * box[d]!) / n;
    });
  });
}

const kVector = (nu: readonly number[], box: readonly number[]): number[] => nu.map((v, d) => (2 * Math.PI * v) / box[d]!);
const dot = (a: readonly number[], b: readonly number[]): number => a.reduce((s, x, d) => s + x * b[d]!, 0);

describe('axisFrequency(m, n)', () => {
  it('maps 0 … n−1 onto −⌊(n−1)/2⌋ … ⌊n/2⌋, the Nyquist +n/2 once for even n', () => {
    expect(Array.from({ length: 4 }, (_, m) => axisFrequency(m, 4))).toEqual([0, 1, 2, -1]);
    expect(Array.from({ length: 5 }, (_, m) => axisFrequency(m, 5))).toEqual([0, 1, 2, -2, -1]);
  });
});

describe('kineticSeries(grid)', () => {
  it('gives a real symmetric, translation-invariant T for random small grids (exactly, not within rounding)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 1, max: 5 }), { minLength: 1, maxLength: 3 }),
        fc.array(fc.double({ min: 0.5, max: 20, noNaN: true }), { minLength: 3, maxLength: 3 }),
        (points, lengths) => {
          const grid = planeWaveGrid(points, lengths.slice(0, points.length));
          const table = kineticSeries(grid);
          const entry = (p: number, q: number): number => table[displacementIndex(grid, p, q)]!;
          for (let p = 0; p < grid.size; p++) {
            for (let q = 0; q < grid.size; q++) {
              if (entry(p, q) !== entry(q, p)) return false;
              // Shift both points by every grid vector s: r_{p+s} − r_{q+s} = r_p − r_q.
              for (let s = 0; s < grid.size; s++) {
                if (entry(displacementIndex(grid, p, s), displacementIndex(grid, q, s)) !== entry(p, q)) return false;
              }
            }
          }
          return true;
        },
      ),
      { numRuns: 60, seed: 20240601 },
    );
  });

  it('equals (1/P) Σ_ν (k_ν²/2) cos(k_ν·(r_p − r_q)) written out, on a 3×4 grid', () => {
    const points = [3, 4];
    const box = [2, 3.5];
    const grid = planeWaveGrid(points, box);
    const table = kineticSeries(grid);
    const r = positions(points, box);
    for (let p = 0; p < grid.size; p++) {
      for (let q = 0; q < grid.size; q++) {
        let expected = 0;
        for (const nu of frequencies(points)) {
          const k = kVector(nu, box);
          expected += (dot(k, k) / 2) * Math.cos(dot(k, r[p]!.map((x, d) => x - r[q]![d]!)));
        }
        expectClose(table[displacementIndex(grid, p, q)]!, expected / grid.size, 1e-12, `T[${p}][${q}]`);
      }
    }
  });
});

describe('coulombSeries(grid)', () => {
  it('equals the periodic Coulomb series (4π/Ω) Σ_{ν≠0} cos(k_ν·(r_p − r_q))/k_ν² written out, on 2×3 and 4 grids', () => {
    // Series from Babbush et al., Phys. Rev. X 8, 011044 (2018), the dual-basis two-body term (per unordered pair).
    for (const [points, box] of [[[2, 3], [1.5, 2]], [[4], [6]]] as const) {
      const grid = planeWaveGrid(points, box);
      const table = coulombSeries(grid);
      const r = positions(points, box);
      const volume = box.reduce((a: number, b: number) => a * b, 1);
      for (let p = 0; p < grid.size; p++) {
        for (let q = 0; q < grid.size; q++) {
          let expected = 0;
          for (const nu of frequencies(points)) {
            if (nu.every((v) => v === 0)) continue;
            const k = kVector(nu, box);
            expected += Math.cos(dot(k, r[p]!.map((x, d) => x - r[q]![d]!))) / dot(k, k);
          }
          expectClose(table[displacementIndex(grid, p, q)]!, ((4 * Math.PI) / volume) * expected, 1e-12, `v[${p}][${q}]`);
        }
      }
    }
  });
});

describe('externalPotential(grid, charges)', () => {
  it('equals −(4π/Ω) Σ_j Z_j Σ_{ν≠0} cos(k_ν·(R_j − r_p))/k_ν² written out, off-grid and outside-box charges', () => {
    const points = [4, 3];
    const box = [3, 2];
    const charges = [
      { position: [0.7, 1.9], charge: 2 },
      { position: [-1.2, 5.1], charge: -0.5 },
    ];
    const grid = planeWaveGrid(points, box);
    const potential = externalPotential(grid, charges);
    const r = positions(points, box);
    for (let p = 0; p < grid.size; p++) {
      let expected = 0;
      for (const { position, charge } of charges) {
        for (const nu of frequencies(points)) {
          if (nu.every((v) => v === 0)) continue;
          const k = kVector(nu, box);
          expected += (charge * Math.cos(dot(k, position.map((x, d) => x - r[p]![d]!)))) / dot(k, k);
        }
      }
      expectClose(potential[p]!, (-4 * Math.PI * expected) / (box[0]! * box[1]!), 1e-12, `U[${p}]`);
    }
  });
});
