/**
 * groundLevel: the lowest level of a model in its ground sector by Lanczos with deflation. Each
 * eigenvector is found by Lanczos runs kept orthogonal to the ones found before; runs continue
 * until one converges above E0 + degeneracy tolerance, which also gives the gap.
 */
import type { FermionModel } from '../model/FermionModel.js';
import { fockSector, type FockSector } from './fockSector.js';
import { memoryLimit } from '../core/memoryBudget.js';
import { combine, combineByRerun, combineCompact, lanczos, type LanczosSpec, type LanczosSteps } from './internal/lanczos.js';
import { countedProducts } from './internal/countedProducts.js';
import { groundSectorSpec } from './internal/modelSectors.js';
import { randomVector } from './internal/randomVector.js';
import { ensureSectorFits } from './internal/sectorMemory.js';
import { tridiagonalEigen } from './internal/tridiagonalEigen.js';
import { axpy, norm, orthogonalize, scale, zeroVec, type CVec } from './internal/vec.js';
import { sectorDimension } from './sectorDimension.js';
import { sectorHamiltonian, type SectorHamiltonian } from './sectorHamiltonian.js';

export interface GroundLevelOptions {
  /** Residual ‖Hψ − E0ψ‖ each ground vector must reach, relative to max(1, |E0|). Default 1e-10. */
  readonly tolerance?: number;
  /** Levels within this of E0, relative to max(1, |E0|), count as degenerate. Default 1e-8. */
  readonly degeneracyTolerance?: number;
  /** Lanczos steps per cycle before an explicit restart. Default 400. */
  readonly maxSteps?: number;
  /** Seed of the random start vectors. Default 1. */
  readonly seed?: number;
  /** Byte limit (default: memoryBudget's limit). */
  readonly memoryLimit?: number;
  /**
   * How each Lanczos run keeps its vectors: 'full' (stored, fully reorthogonalised), 'compact'
   * (single-precision copies, combined then refined by a further cycle), 'rerun' (none: the
   * recurrence runs again to form the eigenvector). Default: 'full' up to KEEP_BASIS_DIMENSION,
   * else 'compact' when at least MIN_COMPACT_STEPS single-precision vectors fit in a quarter of
   * the memory limit (at most 1 GiB), else 'rerun'.
   */
  readonly basis?: BasisMode;
}

export type BasisMode = 'full' | 'compact' | 'rerun';

export interface GroundLevel {
  readonly sector: FockSector;
  readonly hamiltonian: SectorHamiltonian;
  readonly energy: number;
  readonly degeneracy: number;
  /** E1 − E0 to the next distinct level of the sector; null when the sector has no other level. */
  readonly gap: number | null;
  /** Orthonormal basis of the ground level. */
  readonly states: readonly CVec[];
  /** Largest ‖Hψ − E0ψ‖ over the ground vectors. */
  readonly residual: number;
  /** Products with H used. */
  readonly applications: number;
}

/** Sectors up to this size keep their Lanczos basis (full reorthogonalisation); larger ones rerun. */
export const KEEP_BASIS_DIMENSION = 20000;
const MAX_CYCLES = 30;
/** Fewest single-precision vectors per cycle worth the 'compact' mode. */
export const MIN_COMPACT_STEPS = 60;
/** A 'compact' first cycle stops at this relative residual estimate: its eigenvector is only single-precision accurate. */
const COMPACT_FLOOR = 1e-7;

interface Lowest {
  value: number;
  vector: CVec | null;
  residual: number;
}

/**
 * Finds E0, an orthonormal basis of the ground level and the gap of `model` in its ground sector.
 * @throws InputError when the sector would not fit in memory or the electron count is impossible
 */
export function groundLevel(model: FermionModel, options: GroundLevelOptions = {}): GroundLevel {
  const tol = options.tolerance ?? 1e-10;
  const degTol = options.degeneracyTolerance ?? 1e-8;
  const maxSteps = options.maxSteps ?? 400;
  const spec = groundSectorSpec(model);
  const dim = sectorDimension(spec);
  const complexModel = !isRealModel(model);
  const compactSteps = Math.min(
    maxSteps,
    Math.floor(Math.min(2 ** 30, 0.25 * memoryLimit(options.memoryLimit)) / (4 * dim * (complexModel ? 2 : 1))),
  );
  const mode: BasisMode =
    options.basis ?? (dim <= KEEP_BASIS_DIMENSION ? 'full' : compactSteps >= MIN_COMPACT_STEPS ? 'compact' : 'rerun');
  const stepsPerCycle = mode === 'compact' ? Math.max(2, compactSteps) : maxSteps;
  const stored = mode === 'full' ? Math.min(dim, maxSteps) : mode === 'compact' ? Math.ceil(stepsPerCycle / 2) : 0;
  ensureSectorFits(dim, stored + 8, complexModel, 'the ground-state sector', options.memoryLimit);
  const sector = fockSector(spec);
  const hamiltonian = sectorHamiltonian(model, sector);
  const complex = !hamiltonian.real;
  let applications = 0;
  const { apply, steps } = countedProducts(hamiltonian, () => {
    applications += 1;
  });
  const states: CVec[] = [];
  let energy = Number.NaN;
  let gap: number | null = null;
  let residual = 0;
  for (let found = 0; found <= dim; found++) {
    const start = randomVector(dim, complex, (options.seed ?? 1) + found);
    orthogonalize(start, states);
    orthogonalize(start, states);
    const size = norm(start);
    if (found === dim || size < 1e-8) break;
    scale(1 / size, start);
    const target = found === 0 ? null : energy + degTol * Math.max(1, Math.abs(energy));
    const lowest = lowestEigenpair(apply, steps, start, states, { tol, maxSteps: stepsPerCycle, mode, complex, aboveOf: target, dim });
    if (target !== null && lowest.value > target) {
      gap = lowest.value - energy;
      break;
    }
    if (found === 0) energy = lowest.value;
    states.push(lowest.vector!);
    residual = Math.max(residual, lowest.residual);
  }
  return { sector, hamiltonian, energy, degeneracy: states.length, gap, states, residual, applications };
}

function isRealModel(model: FermionModel): boolean {
  return model.oneBody.im.every((x) => x === 0) && model.twoBody.every((t) => t.im === 0);
}

interface LowestOptions {
  readonly tol: number;
  readonly maxSteps: number;
  readonly mode: BasisMode;
  readonly complex: boolean;
  /** When set, stop as soon as the lowest level is certainly above this (only its value is needed). */
  readonly aboveOf: number | null;
  readonly dim: number;
}

/** Lowest eigenpair in the complement of `deflate`, by restarted Lanczos. */
function lowestEigenpair(
  apply: (x: CVec, y: CVec) => void,
  steps: LanczosSteps | null,
  start0: CVec,
  deflate: readonly CVec[],
  o: LowestOptions,
): Lowest {
  let start = start0;
  for (let cycle = 0; cycle < MAX_CYCLES; cycle++) {
    let theta = 0;
    let certainlyAbove = false;
    // Only the first compact cycle starts far from the eigenvector; later ones refine to o.tol.
    const stopAt = o.mode === 'compact' && cycle === 0 ? Math.max(0.5 * o.tol, COMPACT_FLOOR) : 0.5 * o.tol;
    const spec: LanczosSpec = {
      apply,
      steps,
      start,
      maxSteps: Math.min(o.maxSteps, o.dim),
      deflate,
      keepBasis: o.mode === 'full',
      compactBasis: o.mode === 'compact',
      complex: o.complex,
      stop: (alpha, beta) => {
        const m = alpha.length;
        if (m < 2 && o.dim > 1) return false;
        const eig = tridiagonalEigen(alpha, beta, [m - 1]);
        theta = eig.values[0]!;
        const estimate = Math.abs(beta[m - 1]! * eig.rows[0]![0]!);
        const scaleE = Math.max(1, Math.abs(theta));
        if (estimate <= stopAt * scaleE) return true;
        if (o.aboveOf !== null && m > 1) {
          // Eigenvalue error ≤ r²/δ with δ the distance to the rest of the spectrum (Kato–Temple).
          const delta = eig.values[1]! - theta;
          const bound = delta > 0 ? (estimate * estimate) / delta : Number.POSITIVE_INFINITY;
          if (estimate <= 1e-4 * scaleE && bound <= 1e-10 * scaleE && theta - bound > o.aboveOf) {
            certainlyAbove = true;
            return true;
          }
        }
        return false;
      },
    };
    const run = lanczos(spec);
    const m = run.alpha.length;
    const eig = tridiagonalEigen(run.alpha, run.beta, Array.from({ length: m }, (_, k) => k));
    theta = eig.values[0]!;
    if (certainlyAbove) return { value: theta, vector: null, residual: Number.NaN };
    const y = eig.rows.map((row) => row[0]!);
    const vector =
      run.basis !== null
        ? combine(run.basis, y, o.complex)
        : run.compact !== null
          ? combineCompact(start, run.compact, y, o.complex)
          : combineByRerun(spec, m, y);
    orthogonalize(vector, deflate);
    scale(1 / norm(vector), vector);
    const hv = zeroVec(vector.re.length, o.complex);
    apply(vector, hv);
    axpy(-theta, 0, vector, hv);
    const residual = norm(hv);
    // A compact vector is single-precision accurate even when the Krylov space closed: refine it.
    if (residual <= o.tol * Math.max(1, Math.abs(theta)) || (run.exhausted && o.mode !== 'compact')) {
      return { value: theta, vector, residual };
    }
    start = vector;
  }
  throw new Error(`groundLevel: Lanczos did not reach the residual tolerance in ${MAX_CYCLES} cycles`);
}
