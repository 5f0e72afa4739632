/**
 * greensFunction: G_ij(z) = G⁺_ij(z) + G⁻_ij(z) (CONVENTIONS.md) at a list of complex frequencies,
 * averaged over the degenerate ground level. Diagonal entries are Lanczos continued fractions seeded
 * with a_j†|ψ0⟩ (N+1) and a_i|ψ0⟩ (N−1); off-diagonal ones follow from the polarisation identity
 * ⟨u|R|v⟩ = ½[⟨u+v|R|u+v⟩ − i⟨u+iv|R|u+iv⟩ − (1−i)(⟨u|R|u⟩ + ⟨v|R|v⟩)], valid for complex H.
 * The level's states may lie in several S_z sectors (GroundLevel.components); all count equally.
 * Each value carries a rigorous bound on its continued-fraction truncation error (truncationBound).
 */
import type { FermionModel } from '../model/FermionModel.js';
import { applyLadder } from './applyLadder.js';
import { fockSector, type FockSector, type SectorSpec } from './fockSector.js';
import { KEEP_BASIS_DIMENSION, type GroundComponent, type GroundLevel } from './groundLevel.js';
import { continuedFraction, evaluateFraction, truncationBound, type ContinuedFraction } from './internal/continuedFraction.js';
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
   * Continued fractions stop (checked every CHECK_EVERY levels) when the rigorous truncation bound
   * (truncationBound) at every z of the list is at most this times the largest |value| there. Default
   * 1e-6. Small sectors close their Krylov space first and are exact whatever the tolerance.
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

/** A GreenEntry with, per z, a rigorous bound on |G_ij − value| from cutting the continued fractions. */
export interface BoundedGreenEntry extends GreenEntry {
  readonly bound: Float64Array;
}

export interface GreensFunction {
  readonly z: readonly Complex[];
  readonly entries: readonly BoundedGreenEntry[];
  /** Products with H used by all continued fractions. */
  readonly applications: number;
}

interface Values {
  re: Float64Array;
  im: Float64Array;
  /** Bound on the truncation error of each value. */
  bound: Float64Array;
}

function zeroValues(nz: number): Values {
  return { re: new Float64Array(nz), im: new Float64Array(nz), bound: new Float64Array(nz) };
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
  const components = ground.components;
  const real = components.every((c) => c.hamiltonian.real && c.states.every((s) => s.im === null));
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

  /** ⟨φ|(z − s(H − E0))⁻¹|φ⟩ at every z for φ = Σ c·(a_m† or a_m)ψ, ψ in `from`. */
  function fraction(from: FockSector, particle: boolean, psi: CVec, combo: readonly (readonly [number, number, number])[]): Values {
    const out = zeroValues(nz);
    const delta = particle ? 1 : -1;
    const target = sectorOf(shiftedSpec(from.spec, delta, combo.map((c) => c[0])));
    if (target === null) return out;
    const complex = !real || combo.some((c) => c[2] !== 0);
    const seed = zeroVec(target.sector.dimension, complex);
    for (const [m, cr, ci] of combo) applyLadder(from, target.sector, m, particle, psi, cr, ci, seed);
    const weight = dot(seed, seed)[0];
    if (!(weight > 0)) return out;
    scale(1 / Math.sqrt(weight), seed);
    const dim = target.sector.dimension;
    const evaluate = (cf: ContinuedFraction, withBound: boolean): Values => {
      const v = zeroValues(nz);
      for (let k = 0; k < nz; k++) {
        const z = options.z[k]!;
        [v.re[k], v.im[k]] = evaluateFraction(cf, z.re, z.im);
        if (withBound) v.bound[k] = truncationBound(cf, z.re, z.im);
      }
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
        const now = evaluate(continuedFraction(weight, alpha, beta, sign, e0), true);
        let bound = 0;
        let size = 0;
        for (let k = 0; k < nz; k++) {
          size = Math.max(size, Math.hypot(now.re[k]!, now.im[k]!));
          bound = Math.max(bound, now.bound[k]!);
        }
        return bound <= tol * Math.max(size, 1e-300);
      },
    });
    return evaluate(continuedFraction(weight, run.alpha, run.beta, sign, e0), true);
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
  /** Off-diagonal pairs that can be non-zero from a component's sector (one S_z sector: same spin block only). */
  const coupledFrom = (c: GroundComponent): [number, number][] => {
    const spec = c.sector.spec;
    const spinSector = spec.lowCounts.length < spec.lowModes + 1;
    return [...offPairs.values()].filter(([i, j]) => !spinSector || (i < spec.lowModes) === (j < spec.lowModes));
  };
  const perState = (c: GroundComponent): number => 2 * (diagonalModes.size + coupledFrom(c).length * (real ? 1 : 2));
  const total = components.reduce((sum, c) => sum + perState(c) * c.states.length, 0);
  let done = 0;
  const tick = (): void => {
    done += 1;
    options.onProgress?.(done, total);
  };

  // acc holds Σ over ground states of G_ij and of its error bound; keyed "i,j".
  const acc = new Map<string, Values>();
  const add = (i: number, j: number, v: Values): void => {
    const key = `${i},${j}`;
    let a = acc.get(key);
    if (a === undefined) {
      a = zeroValues(nz);
      acc.set(key, a);
    }
    for (let k = 0; k < nz; k++) {
      a.re[k]! += v.re[k]!;
      a.im[k]! += v.im[k]!;
      a.bound[k]! += v.bound[k]!;
    }
  };
  for (const component of components) {
    const coupled = coupledFrom(component);
    for (const psi of component.states) {
      for (const particle of [true, false]) {
        const diag = new Map<number, Values>();
        for (const m of [...diagonalModes].sort((a, b) => a - b)) {
          const v = fraction(component.sector, particle, psi, [[m, 1, 0]]);
          diag.set(m, v);
          add(m, m, v);
          tick();
        }
        for (const [i, j] of coupled) {
          const p = fraction(component.sector, particle, psi, [[i, 1, 0], [j, 1, 0]]);
          tick();
          const di = diag.get(i)!;
          const dj = diag.get(j)!;
          const uv = zeroValues(nz);
          const vu = zeroValues(nz);
          if (real) {
            for (let k = 0; k < nz; k++) {
              uv.re[k] = vu.re[k] = 0.5 * (p.re[k]! - di.re[k]! - dj.re[k]!);
              uv.im[k] = vu.im[k] = 0.5 * (p.im[k]! - di.im[k]! - dj.im[k]!);
              uv.bound[k] = vu.bound[k] = 0.5 * (p.bound[k]! + di.bound[k]! + dj.bound[k]!);
            }
          } else {
            const q = fraction(component.sector, particle, psi, [[i, 1, 0], [j, 0, 1]]);
            tick();
            for (let k = 0; k < nz; k++) {
              const sRe = di.re[k]! + dj.re[k]!;
              const sIm = di.im[k]! + dj.im[k]!;
              // A_uv = ½[P − iQ − (1−i)S], A_vu = ½[P − i(2S − Q) − (1−i)S] = ½[P + iQ − (1+i)S]
              const baseRe = p.re[k]! - sRe - sIm;
              const baseIm = p.im[k]! - sIm + sRe;
              uv.re[k] = 0.5 * (baseRe + q.im[k]!);
              uv.im[k] = 0.5 * (baseIm - q.re[k]!);
              vu.re[k] = 0.5 * (baseRe + 2 * sIm - q.im[k]!);
              vu.im[k] = 0.5 * (baseIm - 2 * sRe + q.re[k]!);
              uv.bound[k] = vu.bound[k] = 0.5 * (p.bound[k]! + q.bound[k]! + Math.SQRT2 * (di.bound[k]! + dj.bound[k]!));
            }
          }
          // particle: u = a_i†ψ, v = a_j†ψ → G⁺_ij = A_uv; hole: u = a_iψ, v = a_jψ → G⁻_ji = A_uv.
          if (particle) {
            add(i, j, uv);
            add(j, i, vu);
          } else {
            add(j, i, uv);
            add(i, j, vu);
          }
        }
      }
    }
  }
  for (const entry of sectors.values()) entry.hamiltonian.release();
  const d = ground.degeneracy;
  const entries = pairs.map(([i, j]) => {
    const a = acc.get(`${i},${j}`) ?? zeroValues(nz);
    return { i, j, re: a.re.map((x) => x / d), im: a.im.map((x) => x / d), bound: a.bound.map((x) => x / d) };
  });
  return { z: options.z, entries, applications };
}
