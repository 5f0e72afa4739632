/**
 * modelSectors: which Fock sectors a model is solved in. Presets (spinBlocks) split the modes into
 * the up block (low modes) and the down block. The ground level is sought in the (N, S_z) sector the
 * model fixes (spinPolarization), else in every S_z sector of the N-electron sector one by one
 * (groundSectorSpecs), else — without spin blocks — in the whole N-electron sector. Adding or
 * removing an electron in mode m shifts the up count by one when m is an up mode.
 */
import { InputError } from '../../core/InputError.js';
import type { FermionModel } from '../../model/FermionModel.js';
import type { SectorSpec } from '../fockSector.js';

export function lowModesOf(model: FermionModel): number {
  const blocks = model.spinBlocks;
  if (blocks === undefined) return Math.floor(model.modes / 2);
  const L = blocks.up.length;
  const contiguous =
    blocks.up.every((m, k) => m === k) && blocks.down.every((m, k) => m === L + k) && L + blocks.down.length === model.modes;
  if (!contiguous) throw new Error('modelSectors: spin blocks must be up = 0…L−1 and down = L…n−1 (CONVENTIONS.md)');
  return L;
}

function allCounts(lowModes: number): number[] {
  return Array.from({ length: lowModes + 1 }, (_, k) => k);
}

/** The largest number of modes the exact solver handles (Fock patterns are 32-bit integers). */
export const MAX_EXACT_MODES = 30;

/** The N-electron sector (all S_z together when the model has spin blocks and fixes no spin). */
export function groundSectorSpec(model: FermionModel): SectorSpec {
  const n = model.modes;
  const N = model.electrons;
  if (!Number.isInteger(N) || N < 0 || N > n) {
    throw new InputError(`electrons must be an integer from 0 to modes (${n}), got ${N}`);
  }
  if (n > MAX_EXACT_MODES) throw new InputError(`the exact solver handles at most ${MAX_EXACT_MODES} modes, the model has ${n}`);
  const lowModes = lowModesOf(model);
  const P = model.spinPolarization;
  if (model.spinBlocks === undefined || P === undefined) {
    return { modes: n, electrons: N, lowModes, lowCounts: allCounts(lowModes) };
  }
  const up = (N + P) / 2;
  if (!Number.isInteger(up) || up < 0 || up > lowModes || N - up < 0 || N - up > n - lowModes) {
    throw new InputError(`spin ${P} is impossible with ${N} electrons on ${lowModes} sites`);
  }
  return { modes: n, electrons: N, lowModes, lowCounts: [up] };
}

/** How the ground level's sectors were chosen (see groundSectorSpecs). */
export type SpinSectors = 'fixed' | 'all' | 'none';

export interface GroundSectorSearch {
  readonly spinSectors: SpinSectors;
  /** Sectors to search, by |N↑ − N↓| ascending (positive first) for 'all'; one sector otherwise. */
  readonly specs: readonly SectorSpec[];
}

/**
 * The sectors the ground level is sought in: the fixed (N, S_z) sector ('fixed'); each (N, S_z)
 * sector of a spin-block model that fixes no spin ('all'); the whole N-electron sector ('none').
 */
export function groundSectorSpecs(model: FermionModel): GroundSectorSearch {
  const whole = groundSectorSpec(model);
  if (model.spinBlocks === undefined) return { spinSectors: 'none', specs: [whole] };
  if (model.spinPolarization !== undefined) return { spinSectors: 'fixed', specs: [whole] };
  const N = whole.electrons;
  const ups = whole.lowCounts.filter((up) => N - up >= 0 && N - up <= whole.modes - whole.lowModes);
  const polarization = (up: number): number => 2 * up - N;
  ups.sort((a, b) => Math.abs(polarization(a)) - Math.abs(polarization(b)) || polarization(b) - polarization(a));
  return { spinSectors: 'all', specs: ups.map((up) => ({ ...whole, lowCounts: [up] })) };
}

/** N↑ − N↓ of a one-S_z sector of a spin-block model; null for any other sector. */
export function polarizationOf(model: FermionModel, spec: SectorSpec): number | null {
  if (model.spinBlocks === undefined || spec.lowCounts.length !== 1) return null;
  return 2 * spec.lowCounts[0]! - spec.electrons;
}

/** The sector reached from `spec` by adding (delta = +1) or removing (−1) an electron in any of `modes`. */
export function shiftedSpec(spec: SectorSpec, delta: 1 | -1, modes: readonly number[]): SectorSpec {
  const counts = new Set<number>();
  const all = spec.lowCounts.length === spec.lowModes + 1;
  for (const k of spec.lowCounts) {
    for (const m of modes) counts.add(all ? k : k + (m < spec.lowModes ? delta : 0));
  }
  return { ...spec, electrons: spec.electrons + delta, lowCounts: [...counts].sort((a, b) => a - b) };
}
