/**
 * pauliLcu: block-encoding of a Pauli sum Σ_t c_t P_t by PREPARE/SELECT, α = Σ_t |c_t|. The simulated
 * SELECT applies each Pauli string under full index control; a cost note gives the Toffoli count of
 * SELECT by unary iteration instead (Babbush et al., Phys. Rev. X 8, 041015, 2018: L − 1 Toffolis for
 * L terms, from memory).
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { gate } from '../../circuit/ops.js';
import type { GateOp } from '../../circuit/types.js';
import type { PauliSum, PauliTerm } from '../../operators/PauliSum.js';
import { pauliSumMatrix } from '../../operators/pauliSumMatrix.js';
import { simplifyPauli } from '../../operators/simplifyPauli.js';
import { memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';
import { InputError } from '../../core/InputError.js';
import { linearCombination } from '../combine/linearCombination.js';
import { MAX_LCU_INDEX_QUBITS } from '../prepareAmplitudes.js';
import { zeroEncoding } from './zeroEncoding.js';

/** Name of a Pauli string for display, qubit 0 first, e.g. "X0 Z1 Y3" ("I" for the identity). */
export function pauliLabel(term: PauliTerm, qubits: number): string {
  const parts: string[] = [];
  for (let q = 0; q < qubits; q++) {
    const bit = 1n << BigInt(q);
    const x = (term.x & bit) !== 0n;
    const z = (term.z & bit) !== 0n;
    if (x || z) parts.push(`${x && z ? 'Y' : x ? 'X' : 'Z'}${q}`);
  }
  return parts.length === 0 ? 'I' : parts.join(' ');
}

function stringEncoding(term: PauliTerm, qubits: number): BlockEncoding {
  const ops: GateOp[] = [];
  for (let q = 0; q < qubits; q++) {
    const bit = 1n << BigInt(q);
    const x = (term.x & bit) !== 0n;
    const z = (term.z & bit) !== 0n;
    if (x || z) ops.push(gate(x && z ? 'y' : x ? 'x' : 'z', [q]));
  }
  const label = pauliLabel(term, qubits);
  const unit: PauliSum = { qubits, terms: [{ x: term.x, z: term.z, re: 1, im: 0 }] };
  return {
    label,
    block: defineBlock({ name: 'pauli_string', role: `Pauli string ${label}`, qubits }, ops),
    systemQubits: qubits,
    ancillas: [],
    alpha: 1,
    exact: memoiseMatrix(() => pauliSumMatrix(unit)),
    costNotes: [],
    errorBound: 0,
  };
}

/**
 * Encodes the simplified sum (like strings merged, exact zeros dropped); α is its 1-norm.
 * @throws InputError naming `label` when the sum has more than 2^MAX_LCU_INDEX_QUBITS terms (a model too large for an LCU).
 */
export function pauliLcu(given: PauliSum, label: string): BlockEncoding {
  const sum = simplifyPauli(given);
  if (sum.terms.length === 0) return zeroEncoding(sum.qubits, label);
  if (sum.terms.length > 2 ** MAX_LCU_INDEX_QUBITS) {
    throw new InputError(`the Pauli LCU of ${label} would have ${sum.terms.length} terms; at most 2^${MAX_LCU_INDEX_QUBITS} are supported`);
  }
  const combination = linearCombination(
    sum.terms.map((t) => ({ coefficient: { re: t.re, im: t.im }, encoding: stringEncoding(t, sum.qubits) })),
    label,
  );
  return {
    ...combination,
    costNotes: [
      {
        label: `SELECT of ${label} by unary iteration`,
        toffoli: Math.max(0, sum.terms.length - 1),
        source: 'Babbush et al., Phys. Rev. X 8, 041015 (2018)',
      },
    ],
  };
}
