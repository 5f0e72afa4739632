// Test-only FermionModel builders: Hubbard chains/rings/atoms, the Anderson impurity and random explicit models.
import { seededRandom } from '../../src/core/seededRandom.js';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import type { FermionModel, TwoBodyTerm } from '../../src/model/FermionModel.js';

function zeros(n: number): ComplexMatrix {
  return { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
}

const defaults = { broadening: 0.1, grid: { from: -4, to: 4, points: 9 } };

export interface HubbardSpec {
  sites: number;
  hopping: number;
  interaction: number;
  chemicalPotential: number;
  ring?: boolean;
  electrons?: number;
  spin?: number;
}

/** H = −t Σ_<ij>σ (a†a + h.c.) + U Σ n↑n↓ − μ N; up modes 0…L−1, down modes L…2L−1. */
export function hubbard(spec: HubbardSpec): FermionModel {
  const L = spec.sites;
  const n = 2 * L;
  const T = zeros(n);
  const bonds: [number, number][] = [];
  for (let s = 0; s + 1 < L; s++) bonds.push([s, s + 1]);
  if (spec.ring === true && L > 2) bonds.push([L - 1, 0]);
  for (const block of [0, L]) {
    for (const [a, b] of bonds) {
      T.re[(block + a) * n + block + b]! -= spec.hopping;
      T.re[(block + b) * n + block + a]! -= spec.hopping;
    }
    for (let s = 0; s < L; s++) T.re[(block + s) * n + block + s] = -spec.chemicalPotential;
  }
  const twoBody: TwoBodyTerm[] = [];
  for (let s = 0; s < L; s++) {
    // U n_s↑ n_s↓ = ½ U (a†_↑ a†_↓ a_↓ a_↑ + a†_↓ a†_↑ a_↑ a_↓), i.e. V_{↑↓↑↓} = V_{↓↑↓↑} = U.
    twoBody.push({ i: s, j: L + s, k: s, l: L + s, re: spec.interaction, im: 0 });
    twoBody.push({ i: L + s, j: s, k: L + s, l: s, re: spec.interaction, im: 0 });
  }
  const up = Array.from({ length: L }, (_, k) => k);
  return {
    name: `hubbard-${L}`,
    modes: n,
    electrons: spec.electrons ?? L,
    spinBlocks: { up, down: up.map((k) => k + L) },
    ...(spec.spin === undefined ? {} : { spinPolarization: spec.spin }),
    oneBody: T,
    oneBodyInB: zeros(n),
    twoBody,
    ...defaults,
  };
}

/** Single-impurity Anderson model; impurity = mode 0 of each spin block, bath after it. */
export function anderson(level: number, interaction: number, bath: { level: number; coupling: number }[], mu: number, electrons: number): FermionModel {
  const L = 1 + bath.length;
  const n = 2 * L;
  const T = zeros(n);
  for (const block of [0, L]) {
    T.re[block * n + block] = level - mu;
    bath.forEach((b, k) => {
      const m = block + 1 + k;
      T.re[m * n + m] = b.level - mu;
      T.re[block * n + m] = b.coupling;
      T.re[m * n + block] = b.coupling;
    });
  }
  const up = Array.from({ length: L }, (_, k) => k);
  return {
    name: 'anderson',
    modes: n,
    electrons,
    spinBlocks: { up, down: up.map((k) => k + L) },
    oneBody: T,
    oneBodyInB: zeros(n),
    twoBody: [
      { i: 0, j: L, k: 0, l: L, re: interaction, im: 0 },
      { i: L, j: 0, k: L, l: 0, re: interaction, im: 0 },
    ],
    ...defaults,
  };
}

/**
 * A random explicit model: Hermitian T and a V with the symmetries V_ijkl = V_jilk (relabelling) and
 * V_ijkl = conj(V_klij) (Hermiticity), entries uniform in [−1, 1); `density` is the fraction of kept V terms.
 */
export function randomModel(seed: number, modes: number, electrons: number, complex: boolean, density = 0.3): FermionModel {
  const random = seededRandom(seed);
  const u = (): number => 2 * random.next() - 1;
  const n = modes;
  const T = zeros(n);
  for (let i = 0; i < n; i++) {
    T.re[i * n + i] = u();
    for (let j = i + 1; j < n; j++) {
      const re = u();
      const im = complex ? u() : 0;
      T.re[i * n + j] = re;
      T.im[i * n + j] = im;
      T.re[j * n + i] = re;
      T.im[j * n + i] = -im;
    }
  }
  const V = new Map<string, TwoBodyTerm>();
  const put = (i: number, j: number, k: number, l: number, re: number, im: number): void => {
    V.set(`${i},${j},${k},${l}`, { i, j, k, l, re, im });
  };
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      for (let k = 0; k < n; k++) {
        for (let l = 0; l < n; l++) {
          if (V.has(`${i},${j},${k},${l}`)) continue;
          const keep = random.next() < density;
          const re = keep ? u() : 0;
          const im = keep && complex ? u() : 0;
          if (!keep) continue;
          const orbit: [number, number, number, number, number][] = [
            [i, j, k, l, 1],
            [j, i, l, k, 1],
            [k, l, i, j, -1],
            [l, k, j, i, -1],
          ];
          const self = orbit.some(([a, b, c, d, s]) => s === -1 && a === i && b === j && c === k && d === l);
          for (const [a, b, c, d, s] of orbit) put(a, b, c, d, re, self ? 0 : s * im);
        }
      }
    }
  }
  return {
    name: `random-${seed}`,
    modes: n,
    electrons,
    oneBody: T,
    oneBodyInB: zeros(n),
    twoBody: [...V.values()].filter((t) => t.re !== 0 || t.im !== 0),
    ...defaults,
  };
}

/** A model with the given one-body matrix only (no interaction). */
export function quadraticModel(T: ComplexMatrix, electrons: number): FermionModel {
  return { name: 'quadratic', modes: T.n, electrons, oneBody: T, oneBodyInB: zeros(T.n), twoBody: [], ...defaults };
}
