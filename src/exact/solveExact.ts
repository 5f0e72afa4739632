/**
 * solveExact: the exact reference for a model: ground level (over every S_z sector unless the model
 * fixes one), G_ij on the model's frequency grid (z = ω + iη) with a rigorous bound on the
 * continued-fraction truncation error, G0, and the self-energy with a propagated bound when every
 * entry is computed, with timings.
 */
import { InputError } from '../core/InputError.js';
import type { FermionModel } from '../model/FermionModel.js';
import { frequencyGrid } from './frequencyGrid.js';
import { allPairs, DEFAULT_GREEN_TOLERANCE, greensFunction, type BoundedGreenEntry, type GreenEntry } from './greensFunction.js';
import { groundLevel, type GroundLevel, type GroundLevelOptions, type SpinSectors } from './groundLevel.js';
import { SingularMatrixError } from './internal/complexInverse.js';
import { nonInteractingGreen } from './nonInteractingGreen.js';
import { selfEnergy } from './selfEnergy.js';
import { selfEnergyBound } from './selfEnergyBound.js';

export interface SolveExactOptions {
  /** Entries to compute; default all n². */
  readonly pairs?: readonly (readonly [number, number])[];
  /** Overrides model.broadening. */
  readonly broadening?: number;
  /** Overrides model.grid. */
  readonly grid?: { readonly from: number; readonly to: number; readonly points: number };
  readonly ground?: GroundLevelOptions;
  /** Continued-fraction tolerance (greensFunction's). Default DEFAULT_GREEN_TOLERANCE. */
  readonly tolerance?: number;
  readonly onProgress?: (done: number, total: number) => void;
  readonly memoryLimit?: number;
}

/** One sector holding part of the ground level. */
export interface GroundSectorSummary {
  /** Up and down electron numbers when the sector fixes S_z; null otherwise. */
  readonly up: number | null;
  readonly down: number | null;
  readonly dimension: number;
  /** Ground-level states in this sector. */
  readonly states: number;
}

export interface SectorSummary {
  readonly electrons: number;
  /** Up and down electron numbers when the level lies in one fixed S_z sector. */
  readonly up: number | null;
  readonly down: number | null;
  /** Dimension of the sector(s) holding the ground level, summed. */
  readonly dimension: number;
  /** 'fixed': the model file fixes S_z (the average is over that sector only); 'all': every S_z sector counts; 'none': no spin blocks. */
  readonly spinSectors: SpinSectors;
  readonly groundSectors: readonly GroundSectorSummary[];
}

export interface ExactSolution {
  readonly modes: number;
  readonly sector: SectorSummary;
  readonly groundEnergy: number;
  readonly degeneracy: number;
  readonly gap: number | null;
  readonly residual: number;
  readonly broadening: number;
  /** Continued-fraction tolerance used. */
  readonly tolerance: number;
  readonly frequencies: Float64Array;
  readonly pairs: readonly (readonly [number, number])[];
  /** G_ij(ω_k + iη) with, per frequency, a rigorous bound on the continued-fraction truncation error. */
  readonly green: readonly BoundedGreenEntry[];
  /** Per frequency, the largest truncation bound over the computed entries. */
  readonly greenBound: Float64Array;
  /** G0_ij(ω_k + iη), same pairs. */
  readonly nonInteracting: readonly GreenEntry[];
  /** Σ_ij(ω_k + iη), same pairs; null unless all n² entries were computed. */
  readonly selfEnergy: readonly GreenEntry[] | null;
  /** Per frequency, a bound on every |δΣ_ij| propagated from G's bounds (selfEnergyBound); null with selfEnergy. */
  readonly selfEnergyBound: Float64Array | null;
  readonly timings: { readonly groundMs: number; readonly greenMs: number; readonly totalMs: number };
  readonly ground: GroundLevel;
}

/**
 * @throws InputError for an impossible sector, a sector that does not fit in memory, or a G(z) that
 *         is singular at some frequency (naming it)
 * @throws ConvergenceError when the ground level's Lanczos does not converge
 */
export function solveExact(model: FermionModel, options: SolveExactOptions = {}): ExactSolution {
  const t0 = performance.now();
  const n = model.modes;
  const eta = options.broadening ?? model.broadening;
  const tolerance = options.tolerance ?? DEFAULT_GREEN_TOLERANCE;
  const frequencies = frequencyGrid(options.grid ?? model.grid);
  const pairs = options.pairs ?? allPairs(n);
  const ground = groundLevel(model, { memoryLimit: options.memoryLimit, ...options.ground });
  const t1 = performance.now();
  const z = Array.from(frequencies, (w) => ({ re: w, im: eta }));
  const green = greensFunction(model, ground, {
    z,
    pairs,
    tolerance,
    onProgress: options.onProgress,
    memoryLimit: options.memoryLimit,
  }).entries;
  ground.release();
  const t2 = performance.now();
  const nz = z.length;
  const blank = (): GreenEntry[] => pairs.map(([i, j]) => ({ i, j, re: new Float64Array(nz), im: new Float64Array(nz) }));
  const g0 = blank();
  const complete = new Set(pairs.map(([i, j]) => i * n + j)).size === n * n;
  const sigma = complete ? blank() : null;
  const sigmaBound = complete ? new Float64Array(nz) : null;
  const greenBound = new Float64Array(nz);
  const index = new Map<number, BoundedGreenEntry>(green.map((e) => [e.i * n + e.j, e]));
  for (let k = 0; k < nz; k++) {
    for (const e of green) greenBound[k] = Math.max(greenBound[k]!, e.bound[k]!);
    const g0k = nonInteractingGreen(model.oneBody, z[k]!);
    pairs.forEach(([i, j], p) => {
      g0[p]!.re[k] = g0k.re[i * n + j]!;
      g0[p]!.im[k] = g0k.im[i * n + j]!;
    });
    if (sigma !== null) {
      const gk = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
      const bounds = new Float64Array(n * n);
      for (const [key, e] of index) {
        gk.re[key] = e.re[k]!;
        gk.im[key] = e.im[k]!;
        bounds[key] = e.bound[k]!;
      }
      let s;
      try {
        s = selfEnergy(model.oneBody, gk, z[k]!);
        sigmaBound![k] = selfEnergyBound(gk, bounds);
      } catch (error) {
        if (!(error instanceof SingularMatrixError)) throw error;
        throw new InputError(
          `the self-energy needs G(z) invertible, but G is singular at frequency ${k} (ω = ${frequencies[k]}, η = ${eta}): ` +
            `elimination found no pivot for column ${error.column} (entries G_${error.column}j); ` +
            'narrow the grid to the model\'s energy scale, raise the broadening, or select entries with --pairs (no self-energy)',
        );
      }
      pairs.forEach(([i, j], p) => {
        sigma[p]!.re[k] = s.re[i * n + j]!;
        sigma[p]!.im[k] = s.im[i * n + j]!;
      });
    }
  }
  const groundSectors = ground.components.map((c) => {
    const up = c.sector.spec.lowCounts.length === 1 && model.spinBlocks !== undefined ? c.sector.spec.lowCounts[0]! : null;
    return { up, down: up === null ? null : model.electrons - up, dimension: c.sector.dimension, states: c.states.length };
  });
  const single = groundSectors.length === 1 ? groundSectors[0]! : null;
  return {
    modes: n,
    sector: {
      electrons: model.electrons,
      up: single?.up ?? null,
      down: single?.down ?? null,
      dimension: groundSectors.reduce((sum, g) => sum + g.dimension, 0),
      spinSectors: ground.spinSectors,
      groundSectors,
    },
    groundEnergy: ground.energy,
    degeneracy: ground.degeneracy,
    gap: ground.gap,
    residual: ground.residual,
    broadening: eta,
    tolerance,
    frequencies,
    pairs,
    green,
    greenBound,
    nonInteracting: g0,
    selfEnergy: sigma,
    selfEnergyBound: sigmaBound,
    timings: { groundMs: t1 - t0, greenMs: t2 - t1, totalMs: performance.now() - t0 },
    ground,
  };
}
