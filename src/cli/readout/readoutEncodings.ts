/**
 * readoutEncodings: the bare block-encodings behind one G_ij(z) readout, each with the operator it encodes in an
 * operator-file form that `verify` reads: the model's Pauli-LCU encodings of H, A and B and the Jordan–Wigner ladder
 * encodings a_i and a†_j (ladder form: the model's fermion terms, not the Pauli sums the circuits come from), and per
 * Green's-function part its resolvent (w − H)⁻¹ and the whole part a_i (w⁺ − H)⁻¹ a†_j or a†_j (w⁻ − H)⁻¹ a_i that the
 * Hadamard tests control (matrix form: the dense reference the encodings compute from the model by diagonalisation,
 * independently of their circuits). Dense matrices are left out above MAX_DENSE_OPERATOR_MODES modes, with the reason.
 */
import type { BlockEncoding } from '../../blocks/BlockEncoding.js';
import { modelEncodings } from '../../blocks/builders/modelEncodings.js';
import { ladderEncoding } from '../../blocks/builders/ladderEncoding.js';
import type { FermionModel } from '../../model/FermionModel.js';
import type { TargetOperator } from '../../operatorFile/TargetOperator.js';
import { ladder } from '../../operators/ladder.js';
import { modelHamiltonian } from '../../operators/modelHamiltonian.js';
import type { GreenPart } from '../../readout/greenParts.js';
import { formatComplex } from './formatComplex.js';
import type { Route } from './parseReadoutOptions.js';

/** Most modes for which the dense operator of a resolvent or a part is written (2^8 × 2^8 entries, a few MB of JSON). */
export const MAX_DENSE_OPERATOR_MODES = 8;

export interface ReadoutEncoding {
  /** File-name stem, e.g. "encoding-H" or "encoding-resolvent-particle". */
  readonly stem: string;
  /** What the encoding encodes, in words. */
  readonly encodes: string;
  readonly encoding: BlockEncoding;
  readonly operator: TargetOperator;
}

export interface OmittedEncoding {
  readonly stem: string;
  readonly encodes: string;
  readonly reason: string;
}

export interface ReadoutEncodings {
  readonly encodings: readonly ReadoutEncoding[];
  readonly omitted: readonly OmittedEncoding[];
}

export function readoutEncodings(model: FermionModel, pair: readonly [number, number], parts: readonly GreenPart[], route: Route): ReadoutEncodings {
  const [i, j] = pair;
  const modes = model.modes;
  const lcu = modelEncodings(model);
  const fermion = (part: 'all' | 'A' | 'B'): TargetOperator => ({ ladder: modelHamiltonian(model, { part }), modes });
  const encodings: ReadoutEncoding[] = [
    { stem: 'encoding-H', encodes: 'H, the model Hamiltonian (Pauli LCU of its Jordan-Wigner image)', encoding: lcu.H, operator: fermion('all') },
    { stem: 'encoding-A', encodes: 'A, the one-body part of H (Pauli LCU)', encoding: lcu.A, operator: fermion('A') },
    { stem: 'encoding-B', encodes: 'B = H - A, the two-body part and any one-body terms the model moves into it (Pauli LCU)', encoding: lcu.B, operator: fermion('B') },
    { stem: `encoding-a${i}`, encodes: `a_${i}, the Jordan-Wigner annihilation operator of mode ${i}`, encoding: ladderEncoding(i, false, modes), operator: { ladder: ladder(i, false), modes } },
    { stem: `encoding-a${j}-dagger`, encodes: `a_${j}^dagger, the Jordan-Wigner creation operator of mode ${j}`, encoding: ladderEncoding(j, true, modes), operator: { ladder: ladder(j, true), modes } },
  ];
  const omitted: OmittedEncoding[] = [];
  for (const part of parts) {
    const shift = `w = ${formatComplex(part.w, 12)}`;
    const product = part.part === 'particle' ? `a_${i} (w - H)^-1 a_${j}^dagger` : `a_${j}^dagger (w - H)^-1 a_${i}`;
    const dense = [
      { stem: `encoding-resolvent-${part.part}`, encodes: `(w - H)^-1 at ${shift} (the ${part.part} part's resolvent, ${route} route, whole Fock space)`, encoding: part.resolvent },
      { stem: `encoding-${part.part}`, encodes: `${product} at ${shift}: the block-encoding U that the ${part.part} Hadamard tests control`, encoding: part.encoding },
    ];
    for (const { stem, encodes, encoding } of dense) {
      if (modes > MAX_DENSE_OPERATOR_MODES) {
        omitted.push({ stem, encodes, reason: `its operator is a dense 2^${modes} x 2^${modes} matrix, written only up to ${MAX_DENSE_OPERATOR_MODES} modes` });
      } else encodings.push({ stem, encodes, encoding, operator: { matrix: encoding.exact() } });
    }
  }
  return { encodings, omitted };
}
