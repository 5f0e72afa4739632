/**
 * solveExact: the exact reference for a model: ground level, G_ij on the model's frequency grid
 * (z = ω + iη), G0, the self-energy when every entry is computed, with timings.
 */
import type { FermionModel } from '../model/FermionModel.js';
import { frequencyGrid } from './frequencyGrid.js';
import { allPairs, greensFunction, type GreenEntry } from './greensFunction.js';
import { groundLevel, type GroundLevel, type GroundLevelOptions } from './groundLevel.js';
import { nonInteractingGreen } from './nonInteractingGreen.js';
import { selfEnergy } from './selfEnergy.js';

export interface SolveExactOptions {
  /** Entries to compute; default all n². */
  readonly pairs?: readonly (readonly [number, number])[];
  /** Overrides model.broadening. */
  readonly broadening?: number;
  /** Overrides model.grid. */
  readonly grid?: { readonly from: number; readonly to: number; readonly points: number };
  readonly ground?: GroundLevelOptions;
  /** Continued-fraction tolerance (greensFunction's). */
  readonly tolerance?: number;
  readonly onProgress?: (done: number, total: number) => void;
  readonly memoryLimit?: number;
}

export interface SectorSummary {
  readonly electrons: number;
  /** Up and down electron numbers when the sector fixes S_z. */
  readonly up: number | null;
  readonly down: number | null;
  readonly dimension: number;
}

export interface ExactSolution {
  readonly modes: number;
  readonly sector: SectorSummary;
  readonly groundEnergy: number;
  readonly degeneracy: number;
  readonly gap: number | null;
  readonly residual: number;
  readonly broadening: number;
  readonly frequencies: Float64Array;
  readonly pairs: readonly (readonly [number, number])[];
  /** G_ij(ω_k + iη). */
  readonly green: readonly GreenEntry[];
  /** G0_ij(ω_k + iη), same pairs. */
  readonly nonInteracting: readonly GreenEntry[];
  /** Σ_ij(ω_k + iη), same pairs; null unless all n² entries were computed. */
  readonly selfEnergy: readonly GreenEntry[] | null;
  readonly timings: { readonly groundMs: number; readonly greenMs: number; readonly totalMs: number };
  readonly ground: GroundLevel;
}

export function solveExact(model: FermionModel, options: SolveExactOptions = {}): ExactSolution {
  const t0 = performance.now();
  const n = model.modes;
  const eta = options.broadening ?? model.broadening;
  const frequencies = frequencyGrid(options.grid ?? model.grid);
  const pairs = options.pairs ?? allPairs(n);
  const ground = groundLevel(model, { memoryLimit: options.memoryLimit, ...options.ground });
  const t1 = performance.now();
  const z = Array.from(frequencies, (w) => ({ re: w, im: eta }));
  const green = greensFunction(model, ground, {
    z,
    pairs,
    tolerance: options.tolerance,
    onProgress: options.onProgress,
    memoryLimit: options.memoryLimit,
  }).entries;
  const t2 = performance.now();
  const nz = z.length;
  const blank = (): GreenEntry[] => pairs.map(([i, j]) => ({ i, j, re: new Float64Array(nz), im: new Float64Array(nz) }));
  const g0 = blank();
  const complete = new Set(pairs.map(([i, j]) => i * n + j)).size === n * n;
  const sigma = complete ? blank() : null;
  const index = new Map<number, GreenEntry>(green.map((e) => [e.i * n + e.j, e]));
  for (let k = 0; k < nz; k++) {
    const g0k = nonInteractingGreen(model.oneBody, z[k]!);
    pairs.forEach(([i, j], p) => {
      g0[p]!.re[k] = g0k.re[i * n + j]!;
      g0[p]!.im[k] = g0k.im[i * n + j]!;
    });
    if (sigma !== null) {
      const gk = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
      for (const [key, e] of index) {
        gk.re[key] = e.re[k]!;
        gk.im[key] = e.im[k]!;
      }
      const s = selfEnergy(model.oneBody, gk, z[k]!);
      pairs.forEach(([i, j], p) => {
        sigma[p]!.re[k] = s.re[i * n + j]!;
        sigma[p]!.im[k] = s.im[i * n + j]!;
      });
    }
  }
  const spec = ground.sector.spec;
  const fixed = spec.lowCounts.length === 1 && model.spinBlocks !== undefined;
  const up = fixed ? spec.lowCounts[0]! : null;
  return {
    modes: n,
    sector: { electrons: model.electrons, up, down: up === null ? null : model.electrons - up, dimension: ground.sector.dimension },
    groundEnergy: ground.energy,
    degeneracy: ground.degeneracy,
    gap: ground.gap,
    residual: ground.residual,
    broadening: eta,
    frequencies,
    pairs,
    green,
    nonInteracting: g0,
    selfEnergy: sigma,
    timings: { groundMs: t1 - t0, greenMs: t2 - t1, totalMs: performance.now() - t0 },
    ground,
  };
}
