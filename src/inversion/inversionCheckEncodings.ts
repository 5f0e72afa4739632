// inversionCheckEncodings: the four block-encodings `polewright check` verifies for a model — the fast inverse (w − A)⁻¹ and
// the direct shift w − H, each at the particle and the hole shift of the Green's function.
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { FermionModel } from '../model/FermionModel.js';
import { directShift } from './directShift.js';
import { fastInverse, type FastInverseOptions } from './fastInverse.js';
import { greensShifts } from './greensShifts.js';

export interface InversionCheckOptions {
  /** Ground energy in the model's electron-number sector. */
  readonly E0: number;
  /** Default: the frequency grid's midpoint + iη. */
  readonly z?: ComplexScalar;
  /** Passed to fastInverse (the electron window is set per row unless given here). Default precision 1e-2, maxBits 8, small enough to simulate. */
  readonly fastInverse?: FastInverseOptions;
}

/** A's matrix T − T_B (the model's one-body part minus what the split moves into B). */
function oneBodyA(model: FermionModel): ComplexMatrix {
  const n = model.modes;
  return {
    n,
    re: Float64Array.from(model.oneBody.re, (x, e) => x - model.oneBodyInB.re[e]!),
    im: Float64Array.from(model.oneBody.im, (x, e) => x - model.oneBodyInB.im[e]!),
  };
}

/**
 * Rows labelled exactly "fast inverse (particle)", "fast inverse (hole)", "direct shift (particle)", "direct shift (hole)",
 * in that order, at w⁺ = z + E0 and w⁻ = E0 − z (greensShifts). The fast inverses act on the sector the Green's function
 * needs — N + 1 electrons for the particle part, N − 1 for the hole part (clamped to 0…modes) — so their exact operator is
 * P_{N±1} (w − A)⁻¹ P_{N±1}; the direct shifts act on the whole Fock space. A fast inverse is correct when its verified error
 * is within its `quantisationBound` (zero up to rounding when the ε_k are dyadic), so a check should pass it at
 * max(tolerance, quantisationBound).
 */
export function inversionCheckEncodings(model: FermionModel, options: InversionCheckOptions): { label: string; encoding: BlockEncoding }[] {
  const z = options.z ?? { re: (model.grid.from + model.grid.to) / 2, im: model.broadening };
  const { particle, hole } = greensShifts(options.E0, z);
  const A = oneBodyA(model);
  const sector = (N: number): number => Math.min(model.modes, Math.max(0, N));
  const fast = (w: ComplexScalar, N: number, label: string): BlockEncoding =>
    fastInverse(A, w, { electrons: sector(N), precision: 1e-2, maxBits: 8, ...options.fastInverse, label });
  return [
    { label: 'fast inverse (particle)', encoding: fast(particle, model.electrons + 1, 'fast inverse (particle)') },
    { label: 'fast inverse (hole)', encoding: fast(hole, model.electrons - 1, 'fast inverse (hole)') },
    { label: 'direct shift (particle)', encoding: directShift(model, particle, 'direct shift (particle)') },
    { label: 'direct shift (hole)', encoding: directShift(model, hole, 'direct shift (hole)') },
  ];
}
