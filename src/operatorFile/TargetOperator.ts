/**
 * TargetOperator: the operator a user means a circuit to block-encode, in one of the operator-file forms — a dense
 * matrix, a Pauli sum or a fermion ladder sum (mapped to qubits by Jordan–Wigner, mode j = qubit j of the system
 * register; ../shared/CONVENTIONS.md). The tag is the form's key in the JSON file, so `{ pauli: sum }` reads as the file.
 */
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { LadderSum } from '../operators/LadderSum.js';
import type { PauliSum } from '../operators/PauliSum.js';

export type TargetOperator =
  | { readonly matrix: ComplexMatrix }
  | { readonly pauli: PauliSum }
  | { readonly ladder: LadderSum; readonly modes?: number };

/**
 * Why `target` cannot act on `qubits` system qubits, or undefined when it can: a matrix must be 2^qubits square, a
 * Pauli sum must be stated on exactly `qubits` qubits, a ladder sum's modes must be below `qubits` (and its stated
 * mode count, if any, equal to it).
 */
export function targetSizeProblem(target: TargetOperator, qubits: number): string | undefined {
  if ('matrix' in target) {
    const n = target.matrix.n;
    if (n === 2 ** qubits) return undefined;
    const width = Math.log2(n);
    return `the operator is a ${n}×${n} matrix${Number.isInteger(width) ? ` (${width} qubits)` : ', not a power of two'}, the register needs ${2 ** qubits}×${2 ** qubits}`;
  }
  if ('pauli' in target) {
    return target.pauli.qubits === qubits ? undefined : `the Pauli sum is stated on ${target.pauli.qubits} qubits, the register has ${qubits}`;
  }
  if (target.modes !== undefined && target.modes !== qubits) return `the ladder sum is stated on ${target.modes} modes, the register has ${qubits} qubits`;
  let highest = -1;
  for (const term of target.ladder.terms) for (const op of term.ops) highest = Math.max(highest, op.mode);
  return highest < qubits ? undefined : `the ladder sum uses mode ${highest}, beyond the register's ${qubits} qubits (modes 0…${qubits - 1})`;
}
