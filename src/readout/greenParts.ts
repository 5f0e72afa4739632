/**
 * greenParts: the two block-encodings whose ground-state expectations make up G_ij(z) (CONVENTIONS.md): the particle
 * part a_i · (w⁺ − H)⁻¹ · a_j† with w⁺ = z + E0 and sign +1, the hole part a_j† · (w⁻ − H)⁻¹ · a_i with w⁻ = E0 − z and
 * sign −1 (greensShifts), so that G_ij(z) = Σ_parts sign · <ψ0| M_part |ψ0>.
 */
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import { ladderEncoding } from '../blocks/builders/ladderEncoding.js';
import { productEncoding } from '../blocks/combine/productEncoding.js';
import { greensShifts } from '../inversion/greensShifts.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { ResolventFactory } from './ResolventFactory.js';

export type GreenPartName = 'particle' | 'hole';

export interface GreenPart {
  readonly part: GreenPartName;
  /** +1 for the particle part, −1 for the hole part. */
  readonly sign: 1 | -1;
  /** The shift of the resolvent (w⁺ or w⁻). */
  readonly w: ComplexScalar;
  /** Electron number of the sector the resolvent acts on (N + 1 or N − 1). */
  readonly electrons: number;
  readonly resolvent: BlockEncoding;
  /** a_i · R · a_j† (particle) or a_j† · R · a_i (hole). */
  readonly encoding: BlockEncoding;
}

export interface GreenPartsOptions {
  readonly modes: number;
  /** Electron number N of the ground state. */
  readonly electrons: number;
  readonly groundEnergy: number;
  readonly pair: readonly [number, number];
  /** z = ω + iη with η > 0. */
  readonly z: ComplexScalar;
  readonly resolvent: ResolventFactory;
}

/**
 * The parts that can be nonzero, particle first: the particle part is left out when N = modes (a_j†|ψ0> = 0), the hole
 * part when N = 0.
 * @throws RangeError for a pair outside 0…modes−1, an electron number outside 0…modes, or Im z ≤ 0.
 */
export function greenParts(options: GreenPartsOptions): GreenPart[] {
  const { modes, electrons, pair, z } = options;
  const [i, j] = pair;
  if (![i, j].every((m) => Number.isInteger(m) && m >= 0 && m < modes)) throw new RangeError(`greenParts: pair (${i}, ${j}) outside 0…${modes - 1}`);
  if (!Number.isInteger(electrons) || electrons < 0 || electrons > modes) throw new RangeError(`greenParts: electron number ${electrons} outside 0…${modes}`);
  if (!(z.im > 0) || !Number.isFinite(z.re) || !Number.isFinite(z.im)) throw new RangeError(`greenParts: z = ${z.re} + ${z.im}i needs a finite z with Im z > 0`);
  const shifts = greensShifts(options.groundEnergy, z);
  const parts: GreenPart[] = [];
  if (electrons < modes) {
    const resolvent = options.resolvent(shifts.particle, electrons + 1);
    const encoding = productEncoding(
      [ladderEncoding(i, false, modes), resolvent, ladderEncoding(j, true, modes)],
      `a_${i} · R(w⁺) · a†_${j}`,
    );
    parts.push({ part: 'particle', sign: 1, w: shifts.particle, electrons: electrons + 1, resolvent, encoding });
  }
  if (electrons > 0) {
    const resolvent = options.resolvent(shifts.hole, electrons - 1);
    const encoding = productEncoding(
      [ladderEncoding(j, true, modes), resolvent, ladderEncoding(i, false, modes)],
      `a†_${j} · R(w⁻) · a_${i}`,
    );
    parts.push({ part: 'hole', sign: -1, w: shifts.hole, electrons: electrons - 1, resolvent, encoding });
  }
  return parts;
}
