/**
 * adjointEncoding: M† from an encoding of M, by running its block inverted (same α, ancillas and error bound: the
 * projected block of U† is the adjoint of that of U, and the operator norm is invariant under adjoints). A clean register
 * stays clean: U keeps the subspace where it is |0> invariant, hence so does U†.
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { call } from '../../circuit/ops.js';
import { memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';
import { adjointMatrix } from '../../linalg/adjointMatrix.js';

export function adjointEncoding(encoding: BlockEncoding, label = `(${encoding.label})†`): BlockEncoding {
  const width = encoding.block.qubits;
  return {
    label,
    block: defineBlock({ name: 'adjoint', role: `block-encoding of ${label}`, qubits: width }, [
      call(encoding.block, Array.from({ length: width }, (_, k) => k), [], { inverse: true }),
    ]),
    systemQubits: encoding.systemQubits,
    ancillas: encoding.ancillas,
    alpha: encoding.alpha,
    exact: memoiseMatrix(() => adjointMatrix(encoding.exact())),
    costNotes: encoding.costNotes,
    errorBound: encoding.errorBound,
  };
}
