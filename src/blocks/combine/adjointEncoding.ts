/**
 * adjointEncoding: M† from an encoding of M, by running its block inverted (same α and ancillas).
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { call } from '../../circuit/ops.js';
import { memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';
import { adjointMatrix } from '../../linalg/adjointMatrix.js';

export function adjointEncoding(encoding: BlockEncoding, label = `(${encoding.label})†`): BlockEncoding {
  const width = encoding.block.qubits;
  return {
    ...encoding,
    label,
    block: defineBlock({ name: 'adjoint', role: `block-encoding of ${label}`, qubits: width }, [
      call(encoding.block, Array.from({ length: width }, (_, k) => k), [], { inverse: true }),
    ]),
    exact: memoiseMatrix(() => adjointMatrix(encoding.exact())),
  };
}
