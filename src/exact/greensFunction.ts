/**
 * greensFunction: G_ij(z) = G⁺_ij(z) + G⁻_ij(z) (CONVENTIONS.md) at a list of complex frequencies,
 * averaged over the degenerate ground level. Diagonal entries are Lanczos continued fractions seeded
 * with a_j†|ψ0⟩ (N+1) and a_i|ψ0⟩ (N−1); off-diagonal ones follow from the polarisation identity
 * ⟨u|R|v⟩ = ½[⟨u+v|R|u+v⟩ − i⟨u+iv|R|u+iv⟩ − (1−i)(⟨u|R|u⟩ + ⟨v|R|v⟩)], valid for complex H.
 */
import type { FermionModel } from '../model/FermionModel.js';
import { applyLadder } from './applyLadder.js';
import { fockSector, type FockSector, type SectorSpec } from './fockSector.js';
import { KEEP_BASIS_DIMENSION, type GroundLevel } from './groundLevel.js';
import { continuedFraction, evaluateFraction, type ContinuedFraction } from './internal/continuedFraction.js';
import { lanczos } from './internal/lanczos.js';
import { countedProducts } from './internal/countedProducts.js';
import { shiftedSpec } from './internal/modelSectors.js';
import { ensureSectorFits } from './internal/sectorMemory.js';
import { dot, scale, zeroVec, type CVec } from './internal/vec.js';
import { sectorDimension } from './sectorDimension.js';
import { sectorHamiltonian, type SectorHamiltonian } from './sectorHamiltonian.js';

export interface Complex {
  readonly re: number;
  readonly im: number;
}

export interface GreenOptions {
  /** Complex frequencies z (Im z > 0 on the physical sheet; any z off the poles works). */
  readonly z: readonly Complex[];
  /** [i, j] entries to compute; default all n² in row-major order. */
  readonly pairs?: readonly (readonly [number, number])[];
  /**
   * Continued fractions stop when CHECK_EVERY more levels change no value on the z list by more than
   * this, relative to the largest |value| there. Default 1e-6 (a thousandth of a percent of the
   * peak; the change tracks the remaining error within a factor ~2). Small sectors exhaust their
   * Krylov space first and are exact whatever the tolerance.
   */
  readonly tolerance?: number;
  /** Lanczos steps per continued fraction at most. Default 3000. */
  readonly maxSteps?: number;
  /** Called after each continued fraction with (done, total). */
  readonly onProgress?: (done: number, total: number) => void;
  readonly memoryLimit?: number;
}

/** Default relative tolerance of the continued fractions (see GreenOptions.tolerance). */
export const DEFAULT_GREEN_TOLERANCE = 1e-6;
/** Lanczos levels between two convergence checks of a continued fraction. */
const CHECK_EVERY = 8;

/** Values of G_ij at each requested z. */
export interface GreenEntry {
  readonly i: number;
  readonly j: number;
  readonly re: Float64Array;
  readonly im: Float64Array;
}

export interface GreensFunction {
  readonly z: readonly Complex[];
  readonly entries: readonly GreenEntry[];
  /** Products with H used by all continued fractions. */
  readonly applications: number;
}

interface Values {
  re: Float64Array;
  im: Float64Array;
}

/** Every (i, j) of an n×n matrix, row-major. */
export function allPairs(n: number): [number, number][] {
  const pairs: [number, number][] = [];
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) pairs.push([i, j]);
  return pairs;
}

/**
 * Computes G_ij(z) for the requested pairs and frequencies.
 * @throws InputError when an N±1 sector would not fit in memory
 */
export function greensFunction(model: FermionModel, ground: GroundLevel, options: GreenOptions): GreensFunction {
  const n = model.modes;
  const pairs = options.pairs ?? allPairs(n);
  const nz = options.z.length;
  const tol = options.tolerance ?? DEFAULT_GREEN_TOLERANCE;
  const maxSteps = options.maxSteps ?? 3000;
  const e0 = ground.energy;
  const real = ground.hamiltonian.real && ground.states.every((s) => s.im === null);
  const spec = ground.sector.spec;
  const spinSector = spec.lowCounts.length < spec.lowModes + 1;
  const sectors = new Map<string, { sector: FockSector; hamiltonian: SectorHamiltonian }>();
  let applications = 0;

  function sectorOf(target: SectorSpec): { sector: FockSector; hamiltonian: SectorHamiltonian } | null {
    const key = `${target.electrons}:${target.lowCounts.join(',')}`;
    const known = sectors.get(key);
    if (known !== undefined) return known;
    if (target.electrons < 0 || target.electrons > n) return null;
    const dim = sectorDimension(target);
    if (dim === 0) return null;
    const keep = dim <= KEEP_BASIS_DIMENSION ? Math.min(dim, maxSteps) : 0;
    ensureSectorFits(dim, keep + 6, !real, `the ${target.electrons}-electron sector`, options.memoryLimit);
    const sector = fockSector(target);
    const entry = { sector, hamiltonian: sectorHamiltonian(model, sector) };
    sectors.set(key, entry);
    return entry;
  }

  /** ⟨φ|(z − s(H − E0))⁻¹|φ⟩ at every z for φ = Σ c·(a_m† or a_m)ψ. */
  function fraction(particle: boolean, psi: CVec, combo: readonly (readonly [number, number, number])[]): Values {
    const out = { re: new Float64Array(nz), im: new Float64Array(nz) };
    const delta = particle ? 1 : -1;
    const target = sectorOf(shiftedSpec(spec, delta, combo.map((c) => c[0])));
    if (target === null) return out;
    const complex = !real || combo.some((c) => c[2] !== 0);
    const seed = zeroVec(target.sector.dimension, complex);
    for (const [m, cr, ci] of combo) applyLadder(ground.sector, target.sector, m, particle, psi, cr, ci, seed);
    const weight = dot(seed, seed)[0];
    if (!(weight > 0)) return out;
    scale(1 / Math.sqrt(weight), seed);
    const dim = target.sector.dimension;
    let previous: Values | null = null;
    const evaluate = (cf: ContinuedFraction): Values => {
      const v = { re: new Float64Array(nz), im: new Float64Array(nz) };
      for (let k = 0; k < nz; k++) [v.re[k], v.im[k]] = evaluateFraction(cf, options.z[k]!.re, options.z[k]!.im);
      return v;
    };
    const sign = particle ? 1 : -1;
    const run = lanczos({
      ...countedProducts(target.hamiltonian, () => {
        applications += 1;
      }),
      start: seed,
      maxSteps: Math.min(dim, maxSteps),
      deflate: [],
      keepBasis: dim <= KEEP_BASIS_DIMENSION,
      complex: complex || !target.hamiltonian.real,
      stop: (alpha, beta) => {
        if (alpha.length % CHECK_EVERY !== 0) return false;
        const now = evaluate(continuedFraction(weight, alpha, beta, sign, e0));
        let change = 0;
        let size = 0;
        for (let k = 0; k < nz; k++) {
          size = Math.max(size, Math.hypot(now.re[k]!, now.im[k]!));
          if (previous !== null) change = Math.max(change, Math.hypot(now.re[k]! - previous.re[k]!, now.im[k]! - previous.im[k]!));
        }
        const done = previous !== null && change <= tol * Math.max(size, 1e-300);
        previous = now;
        return done;
      },
    });
    return evaluate(continuedFraction(weight, run.alpha, run.beta, sign, e0));
  }

  const diagonalModes = new Set<number>();
  const offPairs = new Map<string, [number, number]>();
  for (const [i, j] of pairs) {
    if (i === j) diagonalModes.add(i);
    else {
      diagonalModes.add(i);
      diagonalModes.add(j);
      const a = Math.min(i, j);
      const b = Math.max(i, j);
      offPairs.set(`${a},${b}`, [a, b]);
    }
  }
  const sameBlock = (i: number, j: number): boolean => !spinSector || (i < spec.lowModes) === (j < spec.lowModes);
  const coupled = [...offPairs.values()].filter(([i, j]) => sameBlock(i, j));
  const perState = 2 * (diagonalModes.size + coupled.length * (real ? 1 : 2));
  const total = perState * ground.states.length;
  let done = 0;
  const tick = (): void => {
    done += 1;
    options.onProgress?.(done, total);
  };

  // acc holds Σ over ground states of G_ij; keyed "i,j".
  const acc = new Map<string, Values>();
  const add = (i: number, j: number, v: Values, sr: number, si: number): void => {
    const key = `${i},${j}`;
    let a = acc.get(key);
    if (a === undefined) {
      a = { re: new Float64Array(nz), im: new Float64Array(nz) };
      acc.set(key, a);
    }
    for (let k = 0; k < nz; k++) {
      a.re[k]! += sr * v.re[k]! - si * v.im[k]!;
      a.im[k]! += sr * v.im[k]! + si * v.re[k]!;
    }
  };
  for (const psi of ground.states) {
    for (const particle of [true, false]) {
      const diag = new Map<number, Values>();
      for (const m of [...diagonalModes].sort((a, b) => a - b)) {
        const v = fraction(particle, psi, [[m, 1, 0]]);
        diag.set(m, v);
        add(m, m, v, 1, 0);
        tick();
      }
      for (const [i, j] of coupled) {
        const p = fraction(particle, psi, [[i, 1, 0], [j, 1, 0]]);
        tick();
        const s = { re: new Float64Array(nz), im: new Float64Array(nz) };
        for (let k = 0; k < nz; k++) {
          s.re[k] = diag.get(i)!.re[k]! + diag.get(j)!.re[k]!;
          s.im[k] = diag.get(i)!.im[k]! + diag.get(j)!.im[k]!;
        }
        const uv = { re: new Float64Array(nz), im: new Float64Array(nz) };
        const vu = { re: new Float64Array(nz), im: new Float64Array(nz) };
        if (real) {
          for (let k = 0; k < nz; k++) {
            uv.re[k] = vu.re[k] = 0.5 * (p.re[k]! - s.re[k]!);
            uv.im[k] = vu.im[k] = 0.5 * (p.im[k]! - s.im[k]!);
          }
        } else {
          const q = fraction(particle, psi, [[i, 1, 0], [j, 0, 1]]);
          tick();
          for (let k = 0; k < nz; k++) {
            // A_uv = ½[P − iQ − (1−i)S], A_vu = ½[P − i(2S − Q) − (1−i)S]
            const baseRe = p.re[k]! - s.re[k]! - s.im[k]!;
            const baseIm = p.im[k]! - s.im[k]! + s.re[k]!;
            uv.re[k] = 0.5 * (baseRe + q.im[k]!);
            uv.im[k] = 0.5 * (baseIm - q.re[k]!);
            vu.re[k] = 0.5 * (baseRe + 2 * s.im[k]! - q.im[k]!);
            vu.im[k] = 0.5 * (baseIm - 2 * s.re[k]! + q.re[k]!);
          }
        }
        // particle: u = a_i†ψ, v = a_j†ψ → G⁺_ij = A_uv; hole: u = a_iψ, v = a_jψ → G⁻_ji = A_uv.
        if (particle) {
          add(i, j, uv, 1, 0);
          add(j, i, vu, 1, 0);
        } else {
          add(j, i, uv, 1, 0);
          add(i, j, vu, 1, 0);
        }
      }
    }
  }
  for (const entry of sectors.values()) entry.hamiltonian.release();
  const d = ground.states.length;
  const entries = pairs.map(([i, j]) => {
    const a = acc.get(`${i},${j}`);
    const re = new Float64Array(nz);
    const im = new Float64Array(nz);
    if (a !== undefined) {
      for (let k = 0; k < nz; k++) {
        re[k] = a.re[k]! / d;
        im[k] = a.im[k]! / d;
      }
    }
    return { i, j, re, im };
  });
  return { z: options.z, entries, applications };
}
