/**
 * modelSectors: which Fock sectors a model is solved in. Presets (spinBlocks) split the modes into
 * the up block (low modes) and the down block; with a spin polarisation the ground sector is the
 * (N, S_z) sector, otherwise the full electron-number sector. Adding or removing an electron in
 * mode m shifts the up count by one when m is an up mode.
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

/** The sector the ground state is sought in. */
export function groundSectorSpec(model: FermionModel): SectorSpec {
  const n = model.modes;
  const N = model.electrons;
  if (!Number.isInteger(N) || N < 0 || N > n) {
    throw new InputError(`electrons must be an integer from 0 to modes (${n}), got ${N}`);
  }
  if (n > 30) throw new InputError(`the exact solver handles at most 30 modes, the model has ${n}`);
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

/** The sector reached from `spec` by adding (delta = +1) or removing (−1) an electron in any of `modes`. */
export function shiftedSpec(spec: SectorSpec, delta: 1 | -1, modes: readonly number[]): SectorSpec {
  const counts = new Set<number>();
  const all = spec.lowCounts.length === spec.lowModes + 1;
  for (const k of spec.lowCounts) {
    for (const m of modes) counts.add(all ? k : k + (m < spec.lowModes ? delta : 0));
  }
  return { ...spec, electrons: spec.electrons + delta, lowCounts: [...counts].sort((a, b) => a - b) };
}
