// greensFunction against outside references: Hubbard atom and dimer, non-interacting models, the
// Anderson impurity self-energy, and an independent dense mathjs computation on random models.
import fc from 'fast-check';
import { describe, it } from 'vitest';
import { groundLevel } from '../../src/exact/groundLevel.js';
import { greenMatrixAt } from '../../src/exact/greenMatrixAt.js';
import { greensFunction } from '../../src/exact/greensFunction.js';
import { nonInteractingGreen } from '../../src/exact/nonInteractingGreen.js';
import { selfEnergy } from '../../src/exact/selfEnergy.js';
import { seededRandom } from '../../src/core/seededRandom.js';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { expectClose, expectComplexClose } from '../helpers/close.js';
import { denseGreen } from '../helpers/denseFock.js';
import { anderson, hubbard, quadraticModel, randomModel } from '../helpers/models.js';

const div = (nr: number, ni: number, dr: number, di: number): [number, number] => {
  const d = dr * dr + di * di;
  return [(nr * dr + ni * di) / d, (ni * dr - nr * di) / d];
};

function randomHermitian(seed: number, n: number): ComplexMatrix {
  const r = seededRandom(seed);
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    re[i * n + i] = 2 * r.next() - 1;
    for (let j = i + 1; j < n; j++) {
      const a = 2 * r.next() - 1;
      const b = 2 * r.next() - 1;
      re[i * n + j] = a;
      im[i * n + j] = b;
      re[j * n + i] = a;
      im[j * n + i] = -b;
    }
  }
  return { n, re, im };
}

// The references are checked at a strict continued-fraction tolerance (the default is 1e-6).
const STRICT = { tolerance: 1e-13 };

describe('greensFunction(model, ground, options)', () => {
  it('gives the Hubbard atom G = ½/(z + U/2) + ½/(z − U/2) at half filling, averaging the degenerate level', () => {
    const U = 3;
    const model = hubbard({ sites: 1, hopping: 0, interaction: U, chemicalPotential: U / 2 });
    const ground = groundLevel(model);
    const zs = [{ re: -2.1, im: 0.1 }, { re: 0.4, im: 0.05 }, { re: 1.3, im: 1 }];
    const g = greensFunction(model, ground, { ...STRICT, z: zs, pairs: [[0, 0], [1, 1], [0, 1]] });
    zs.forEach((z, k) => {
      // Hubbard 1963, Proc. R. Soc. A 276, 238 (atomic limit): ½/(z + U/2) + ½/(z − U/2).
      const a = div(0.5, 0, z.re + U / 2, z.im);
      const b = div(0.5, 0, z.re - U / 2, z.im);
      for (const e of g.entries.slice(0, 2)) expectComplexClose([e.re[k]!, e.im[k]!], [a[0] + b[0], a[1] + b[1]], 1e-12, `G_${e.i}${e.i}`);
      expectComplexClose([g.entries[2]!.re[k]!, g.entries[2]!.im[k]!], [0, 0], 1e-12, 'G_01');
    });
  });

  it('gives the Hubbard dimer G_00 with poles ±(c/2 ∓ t) and weights (1 ± 4t/c)/4 at half filling', () => {
    const t = 1;
    const U = 5;
    const model = hubbard({ sites: 2, hopping: t, interaction: U, chemicalPotential: U / 2, spin: 0 });
    const ground = groundLevel(model);
    const c = Math.sqrt(U * U + 16 * t * t);
    // Standard textbook result, from memory (checked numerically by this suite's Lehmann test):
    // poles ±(c/2 − t) with weight (1 + 4t/c)/4 and ±(c/2 + t) with weight (1 − 4t/c)/4.
    const poles = [
      [c / 2 - t, (1 + (4 * t) / c) / 4],
      [-(c / 2 - t), (1 + (4 * t) / c) / 4],
      [c / 2 + t, (1 - (4 * t) / c) / 4],
      [-(c / 2 + t), (1 - (4 * t) / c) / 4],
    ];
    const zs = [{ re: -3, im: 0.1 }, { re: 0.2, im: 0.3 }, { re: 2.5, im: 0.01 }];
    const g = greensFunction(model, ground, { ...STRICT, z: zs, pairs: [[0, 0]] });
    zs.forEach((z, k) => {
      let er = 0;
      let ei = 0;
      for (const [p, w] of poles) {
        const [a, b] = div(w!, 0, z.re - p!, z.im);
        er += a;
        ei += b;
      }
      expectComplexClose([g.entries[0]!.re[k]!, g.entries[0]!.im[k]!], [er, ei], 1e-10, `G_00(z${k})`);
    });
  });

  it('equals (z − T)⁻¹ for random complex Hermitian T at any filling (non-interacting limit)', () => {
    for (const [seed, n, N] of [[1, 4, 2], [2, 5, 1], [3, 6, 4]] as const) {
      const T = randomHermitian(seed, n);
      const model = quadraticModel(T, N);
      const ground = groundLevel(model);
      const z = { re: 0.37, im: 0.21 };
      const g = greenMatrixAt(model, ground, z, STRICT);
      // Fetter & Walecka, Quantum Theory of Many-Particle Systems (1971): G0(z) = (z − T)⁻¹.
      const ref = nonInteractingGreen(T, z);
      for (let e = 0; e < n * n; e++) expectComplexClose([g.re[e]!, g.im[e]!], [ref.re[e]!, ref.im[e]!], 1e-10, `G[${e}] seed ${seed}`);
    }
  });

  it('makes the Anderson-impurity self-energy vanish off the impurity spin-orbitals', () => {
    const model = anderson(-1, 2, [{ level: -0.5, coupling: 0.4 }, { level: 0.8, coupling: 0.6 }], 0, 3);
    const ground = groundLevel(model);
    const L = 3;
    for (const z of [{ re: 0.3, im: 0.1 }, { re: -1.2, im: 0.5 }]) {
      const s = selfEnergy(model.oneBody, greenMatrixAt(model, ground, z, STRICT), z);
      const n = model.modes;
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          // Common practice (a known fact of the trade): in the Anderson model only the impurity
          // interacts, so Σ is non-zero only on the impurity spin-orbitals (modes 0 and L).
          if ((i === 0 || i === L) && i === j) continue;
          expectComplexClose([s.re[i * n + j]!, s.im[i * n + j]!], [0, 0], 1e-9, `Σ_${i}${j}`);
        }
      }
      expectClose(Math.hypot(s.re[0]!, s.im[0]!) > 1e-3 ? 1 : 0, 1, 0, 'Σ_00 is non-zero');
    }
  });

  it('agrees with an independent dense mathjs computation on random explicit models of ≤ 8 modes', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 8 }).chain((n) =>
          fc.tuple(fc.constant(n), fc.integer({ min: 0, max: n }), fc.boolean(), fc.integer({ min: 1, max: 1 << 20 })),
        ),
        fc.double({ min: -2, max: 2, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        ([n, N, complex, seed], zr, zi) => {
          const model = randomModel(seed, n, N, complex, n > 6 ? 0.1 : 0.3);
          const z = { re: zr, im: zi };
          const ref = denseGreen(model, z);
          const g = greenMatrixAt(model, groundLevel(model), z, STRICT);
          for (let i = 0; i < n; i++) {
            for (let j = 0; j < n; j++) {
              expectComplexClose([g.re[i * n + j]!, g.im[i * n + j]!], [ref[i]![j]!.re, ref[i]![j]!.im], 1e-9, `G_${i}${j}`);
            }
          }
        },
      ),
      { numRuns: 14, seed: 20240611 },
    );
  });
});

describe('greensFunction tolerance', () => {
  it('stays within 10× the default relative tolerance of the exhausted-Krylov result (Hubbard ring, η = 0.1)', () => {
    const model = hubbard({ sites: 6, hopping: 1, interaction: 4, chemicalPotential: 2, ring: true, spin: 0 });
    const ground = groundLevel(model);
    const z = Array.from({ length: 200 }, (_, k) => ({ re: -8 + (16 * k) / 199, im: 0.1 }));
    const exact = greensFunction(model, ground, { ...STRICT, z, pairs: [[0, 0]] }).entries[0]!;
    const loose = greensFunction(model, ground, { z, pairs: [[0, 0]] });
    let peak = 0;
    let error = 0;
    for (let k = 0; k < z.length; k++) {
      peak = Math.max(peak, Math.hypot(exact.re[k]!, exact.im[k]!));
      error = Math.max(error, Math.hypot(loose.entries[0]!.re[k]! - exact.re[k]!, loose.entries[0]!.im[k]! - exact.im[k]!));
    }
    expectClose(Math.min(error / peak, 1e-5), error / peak, 0, 'relative error ≤ 1e-5');
  });
});
