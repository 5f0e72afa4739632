/**
 * zeroEncoding: the zero operator on n qubits (α = 1): one ancilla flipped to |1>, so its |0> block vanishes.
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { gate } from '../../circuit/ops.js';
import { memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';
import { zeroMatrix } from '../../linalg/zeroMatrix.js';

export function zeroEncoding(systemQubits: number, label = '0'): BlockEncoding {
  return {
    label,
    block: defineBlock({ name: 'zero_operator', role: 'encodes the zero operator', qubits: systemQubits + 1 }, [gate('x', [systemQubits])]),
    systemQubits,
    ancillas: [{ name: 'zero_flag', size: 1, role: 'signal' }],
    alpha: 1,
    exact: memoiseMatrix(() => zeroMatrix(2 ** systemQubits)),
    costNotes: [],
    errorBound: 0,
  };
}
