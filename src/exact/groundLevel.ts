/**
 * groundLevel: the lowest level of a model's N-electron sector by Lanczos with deflation. Each
 * eigenvector is found by Lanczos runs kept orthogonal to the ones found before; runs continue
 * until one converges above E0 + degeneracy tolerance, which also gives the gap. A spin-block model
 * that fixes no spin is searched S_z sector by S_z sector (CONVENTIONS.md: a multiplet counts whole);
 * sector ground energies within the degeneracy tolerance form one level.
 */
import type { FermionModel } from '../model/FermionModel.js';
import { ConvergenceError } from './ConvergenceError.js';
import { fockSector, type FockSector, type SectorSpec } from './fockSector.js';
import { chooseBasis, type BasisMode } from './internal/chooseBasis.js';
import { combine, combineByRerun, combineCompact, lanczos, type LanczosSpec, type LanczosSteps } from './internal/lanczos.js';
import { countedProducts } from './internal/countedProducts.js';
import { groundSectorSpecs, polarizationOf, type SpinSectors } from './internal/modelSectors.js';
import { randomVector } from './internal/randomVector.js';
import { ensureSectorFits } from './internal/sectorMemory.js';
import { spinRotationInvariant } from './internal/spinRotationInvariant.js';
import { tridiagonalEigen } from './internal/tridiagonalEigen.js';
import { axpy, norm, orthogonalize, scale, zeroVec, type CVec } from './internal/vec.js';
import { sectorDimension } from './sectorDimension.js';
import { sectorHamiltonian, type SectorHamiltonian } from './sectorHamiltonian.js';

export { KEEP_BASIS_DIMENSION, MIN_COMPACT_STEPS, type BasisMode } from './internal/chooseBasis.js';
export type { SpinSectors } from './internal/modelSectors.js';

export interface GroundLevelOptions {
  /** Residual ‖Hψ − E0ψ‖ each ground vector must reach, relative to max(1, |E0|). Default 1e-10. */
  readonly tolerance?: number;
  /**
   * Levels within this of E0, relative to max(1, |E0|), count as degenerate — inside one sector and
   * between the ground energies of different S_z sectors. Default 1e-8.
   */
  readonly degeneracyTolerance?: number;
  /** Lanczos steps per cycle before an explicit restart. Default 400. */
  readonly maxSteps?: number;
  /** Seed of the random start vectors. Default 1. */
  readonly seed?: number;
  /** Byte limit (default: memoryBudget's limit); also the limit the basis choice plans for. */
  readonly memoryLimit?: number;
  /**
   * How each Lanczos run keeps its vectors: 'full' (stored, fully reorthogonalised), 'compact'
   * (single-precision copies, combined then refined by a further cycle), 'rerun' (none: the
   * recurrence runs again to form the eigenvector). Default: chooseBasis — from the dimension and
   * the planned memory limit only (never the machine's free memory).
   */
  readonly basis?: BasisMode;
}

/** The part of the ground level that lies in one sector. */
export interface GroundComponent {
  readonly sector: FockSector;
  readonly hamiltonian: SectorHamiltonian;
  /** Orthonormal ground-level vectors in this sector. */
  readonly states: readonly CVec[];
  /** N↑ − N↓ of the sector; null when the sector is not a single S_z sector. */
  readonly spinPolarization: number | null;
  /** Basis mode the sector's Lanczos runs used. */
  readonly basis: BasisMode;
}

/** One sector searched for the ground level and its lowest energy. */
export interface SectorSearchResult {
  readonly spinPolarization: number | null;
  readonly dimension: number;
  readonly lowestEnergy: number;
}

export interface GroundLevel {
  readonly energy: number;
  /** Total number of ground-level states over all components. */
  readonly degeneracy: number;
  /** E1 − E0 to the next distinct level of the N-electron sector; null when it has no other level. */
  readonly gap: number | null;
  /** The ground level, sector by sector (one component unless a multiplet spans several S_z sectors). */
  readonly components: readonly GroundComponent[];
  /** 'fixed': the model fixes S_z; 'all': every S_z sector counted; 'none': no spin blocks (whole N sector). */
  readonly spinSectors: SpinSectors;
  /** Every sector searched, in search order (sectors skipped by the SU(2) argument are not listed). */
  readonly searched: readonly SectorSearchResult[];
  /** The first component's sector (the whole level's when there is one component). */
  readonly sector: FockSector;
  /** The first component's Hamiltonian. */
  readonly hamiltonian: SectorHamiltonian;
  /** The first component's states; use `components` when the level spans several sectors. */
  readonly states: readonly CVec[];
  /** Largest ‖Hψ − E0ψ‖ over the ground vectors. */
  readonly residual: number;
  /** Products with H used. */
  readonly applications: number;
  /** Lets the thread pool drop the components' tables. */
  release(): void;
}

const MAX_CYCLES = 30;
/** A 'compact' first cycle stops at this relative residual estimate: its eigenvector is only single-precision accurate. */
const COMPACT_FLOOR = 1e-7;

interface Lowest {
  value: number;
  vector: CVec | null;
  residual: number;
}

interface SectorLevel {
  readonly component: GroundComponent;
  /** The sector's lowest energy. */
  readonly lowest: number;
  /** Lowest energy found above the level's window in this sector, if any. */
  readonly above: number | null;
  readonly residual: number;
}

/**
 * Finds E0, an orthonormal basis of the ground level and the gap of `model`'s N-electron sector.
 * Sector by sector (spin-block models fixing no spin): sectors are searched by |N↑ − N↓| ascending;
 * for an SU(2)-invariant H (checked symbolically) the search stops at the first |N↑ − N↓| whose
 * lowest energy is above the level, since a spin-S multiplet has a state in every sector |N↑ − N↓| ≤ 2S.
 * @throws InputError when a sector would not fit in memory or the electron count is impossible
 * @throws ConvergenceError when Lanczos does not reach the residual tolerance (naming the residual reached)
 */
export function groundLevel(model: FermionModel, options: GroundLevelOptions = {}): GroundLevel {
  const degTol = options.degeneracyTolerance ?? 1e-8;
  const { spinSectors, specs } = groundSectorSpecs(model);
  const prune = spinSectors === 'all' && spinRotationInvariant(model);
  const window = (e: number): number => e + degTol * Math.max(1, Math.abs(e));
  let applications = 0;
  const count = (): void => {
    applications += 1;
  };
  let level: SectorLevel[] = [];
  let energy = Number.POSITIVE_INFINITY;
  const aboveEnergies: number[] = [];
  const searched: SectorSearchResult[] = [];
  const aboveAt = new Set<number>();
  for (const spec of specs) {
    const polarization = polarizationOf(model, spec);
    const size = Math.abs(polarization ?? 0);
    // SU(2): sector −P has the spectrum of sector P; every |P'| > |P| lies above sector P.
    if (prune && [...aboveAt].some((p) => size >= p)) continue;
    const result = solveSector(model, spec, polarization, Number.isFinite(energy) ? energy : null, options, count);
    searched.push({ spinPolarization: polarization, dimension: result.component.sector.dimension, lowestEnergy: result.lowest });
    if (result.above !== null) aboveEnergies.push(result.above);
    if (result.component.states.length === 0) {
      result.component.hamiltonian.release();
      aboveAt.add(size);
      continue;
    }
    if (result.lowest > window(energy) || !Number.isFinite(result.lowest)) continue;
    if (Number.isFinite(energy) && energy > window(result.lowest)) {
      // A lower level than the one found so far: that one becomes an excited level.
      aboveEnergies.push(energy);
      for (const old of level) old.component.hamiltonian.release();
      level = [];
    }
    level.push(result);
    energy = Math.min(energy, result.lowest);
  }
  const components = level.map((l) => l.component);
  const above = aboveEnergies.filter((e) => e > window(energy));
  const first = components[0]!;
  return {
    energy,
    degeneracy: components.reduce((sum, c) => sum + c.states.length, 0),
    gap: above.length === 0 ? null : Math.min(...above) - energy,
    components,
    spinSectors,
    searched,
    sector: first.sector,
    hamiltonian: first.hamiltonian,
    states: first.states,
    residual: Math.max(...level.map((l) => l.residual)),
    applications,
    release: () => {
      for (const c of components) c.hamiltonian.release();
    },
  };
}

/**
 * The lowest level of one sector. With `reference` (the lowest energy of sectors searched before),
 * the search stops as soon as the sector's lowest energy is certainly above the reference's window
 * (then `states` is empty and `lowest` is that energy).
 */
function solveSector(
  model: FermionModel,
  spec: SectorSpec,
  spinPolarization: number | null,
  reference: number | null,
  options: GroundLevelOptions,
  count: () => void,
): SectorLevel {
  const tol = options.tolerance ?? 1e-10;
  const degTol = options.degeneracyTolerance ?? 1e-8;
  const maxSteps = options.maxSteps ?? 400;
  const window = (e: number): number => e + degTol * Math.max(1, Math.abs(e));
  const dim = sectorDimension(spec);
  const choice = chooseBasis(dim, !isRealModel(model), maxSteps, options.memoryLimit, options.basis);
  ensureSectorFits(dim, choice.storedVectors + 8, !isRealModel(model), 'the ground-state sector', options.memoryLimit);
  const sector = fockSector(spec);
  const hamiltonian = sectorHamiltonian(model, sector);
  const complex = !hamiltonian.real;
  const { apply, steps } = countedProducts(hamiltonian, count);
  const states: CVec[] = [];
  let lowest = Number.NaN;
  let above: number | null = null;
  let residual = 0;
  for (let found = 0; found <= dim; found++) {
    const start = randomVector(dim, complex, (options.seed ?? 1) + found);
    orthogonalize(start, states);
    orthogonalize(start, states);
    const size = norm(start);
    if (found === dim || size < 1e-8) break;
    scale(1 / size, start);
    const levelEnergy = found === 0 ? reference : Math.min(lowest, reference ?? lowest);
    const target = levelEnergy === null ? null : window(levelEnergy);
    const next = lowestEigenpair(apply, steps, start, states, {
      tol,
      maxSteps: choice.stepsPerCycle,
      mode: choice.mode,
      complex,
      aboveOf: target,
      dim,
      what: `the ground level (sector of dimension ${dim})`,
    });
    if (found === 0) lowest = next.value;
    if (target !== null && next.value > target) {
      above = next.value;
      break;
    }
    states.push(next.vector!);
    residual = Math.max(residual, next.residual);
  }
  return { component: { sector, hamiltonian, states, spinPolarization, basis: choice.mode }, lowest, above, residual };
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
  /** What is being computed, for the error message. */
  readonly what: string;
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
  let lastResidual = Number.NaN;
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
    lastResidual = residual / Math.max(1, Math.abs(theta));
  }
  throw new ConvergenceError(
    `Lanczos did not reach the residual tolerance ${o.tol} for ${o.what} in ${MAX_CYCLES} restart cycles ` +
      `(relative residual reached ${lastResidual.toExponential(2)}); the level may be nearly degenerate: ` +
      `try a larger degeneracy tolerance or a smaller model`,
  );
}

