// inversionCheckEncodings: the four block-encodings `polewright check` verifies for a model — the fast inverse (w − A)⁻¹ and
// the direct shift w − H, each at the particle and the hole shift of the Green's function.
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import { directShift } from './directShift.js';
import { fastInverse, type FastInverseOptions } from './fastInverse.js';
import { greensShifts } from './greensShifts.js';
import { oneBodyOfA } from './oneBodyOfA.js';

export interface InversionCheckOptions {
  /** Ground energy in the model's electron-number sector. */
  readonly E0: number;
  /** Default: the frequency grid's midpoint + iη. */
  readonly z?: ComplexScalar;
  /**
   * Passed to fastInverse (the electron window is set per row unless given here). Default precision 1e-3 (the bound a
   * check accepts) and maxBits 10, small enough to simulate; a register the cap keeps above the precision is reported
   * by the encoding's `bitsCapped` and its bound.
   */
  readonly fastInverse?: FastInverseOptions;
}

/**
 * Rows labelled exactly "fast inverse (particle)", "fast inverse (hole)", "direct shift (particle)", "direct shift (hole)",
 * in that order, at w⁺ = z + E0 and w⁻ = E0 − z (greensShifts). The fast inverses act on the sector the Green's function
 * needs — N + 1 electrons for the particle part, N − 1 for the hole part (clamped to 0…modes) — so their exact operator is
 * P_{N±1} (w − A)⁻¹ P_{N±1}; the direct shifts act on the whole Fock space. A fast inverse is correct when its verified error
 * is within its `quantisationBound`, and a check is conclusive only when that bound is below the check's precision.
 */
export interface InversionCheckRow {
  readonly label: string;
  readonly encoding: BlockEncoding;
  /** The shift the row encodes at. */
  readonly w: ComplexScalar;
  /** The electron number the row is restricted to (fast inverses), null for the whole Fock space (direct shifts). */
  readonly electrons: number | null;
}

export function inversionCheckEncodings(model: FermionModel, options: InversionCheckOptions): InversionCheckRow[] {
  const z = options.z ?? { re: (model.grid.from + model.grid.to) / 2, im: model.broadening };
  const { particle, hole } = greensShifts(options.E0, z);
  const A = oneBodyOfA(model);
  const sector = (N: number): number => Math.min(model.modes, Math.max(0, N));
  const fast = (w: ComplexScalar, N: number, label: string): BlockEncoding =>
    fastInverse(A, w, { electrons: N, precision: 1e-3, maxBits: 10, ...options.fastInverse, label });
  const fastRow = (w: ComplexScalar, N: number, label: string): InversionCheckRow => ({ label, encoding: fast(w, sector(N), label), w, electrons: sector(N) });
  return [
    fastRow(particle, model.electrons + 1, 'fast inverse (particle)'),
    fastRow(hole, model.electrons - 1, 'fast inverse (hole)'),
    { label: 'direct shift (particle)', encoding: directShift(model, particle, 'direct shift (particle)'), w: particle, electrons: null },
    { label: 'direct shift (hole)', encoding: directShift(model, hole, 'direct shift (hole)'), w: hole, electrons: null },
  ];
}
