/**
 * chooseBasis: how a ground-state Lanczos run keeps its vectors, decided from the sector dimension,
 * the step budget and the planned memory limit only (plannedMemoryLimit: the stated limit or the
 * fixed default), never from the machine's free memory — the same input takes the same path anywhere.
 */
import { plannedMemoryLimit } from '../../core/memoryBudget.js';

export type BasisMode = 'full' | 'compact' | 'rerun';

/** Sectors up to this size keep their Lanczos basis (full reorthogonalisation). */
export const KEEP_BASIS_DIMENSION = 20000;
/** Fewest single-precision vectors per cycle worth the 'compact' mode. */
export const MIN_COMPACT_STEPS = 60;

export interface BasisChoice {
  readonly mode: BasisMode;
  /** Lanczos steps per restart cycle. */
  readonly stepsPerCycle: number;
  /** Double-precision vectors (of the sector's dimension) the choice stores at once. */
  readonly storedVectors: number;
}

/**
 * 'full' up to KEEP_BASIS_DIMENSION; else 'compact' when at least MIN_COMPACT_STEPS single-precision
 * vectors fit in a quarter of the planned limit (at most 1 GiB); else 'rerun'. `forced` overrides.
 */
export function chooseBasis(dimension: number, complex: boolean, maxSteps: number, memoryLimit?: number, forced?: BasisMode): BasisChoice {
  const budget = Math.min(2 ** 30, 0.25 * plannedMemoryLimit(memoryLimit));
  const compactSteps = Math.min(maxSteps, Math.floor(budget / (4 * dimension * (complex ? 2 : 1))));
  const mode: BasisMode =
    forced ?? (dimension <= KEEP_BASIS_DIMENSION ? 'full' : compactSteps >= MIN_COMPACT_STEPS ? 'compact' : 'rerun');
  const stepsPerCycle = mode === 'compact' ? Math.max(2, compactSteps) : maxSteps;
  const storedVectors = mode === 'full' ? Math.min(dimension, maxSteps) : mode === 'compact' ? Math.ceil(stepsPerCycle / 2) : 0;
  return { mode, stepsPerCycle, storedVectors };
}
