/**
 * identityEncoding: the identity on n system qubits as a block-encoding (α = 1, no ancillas, no gates).
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';
import { identityMatrix } from '../../linalg/identityMatrix.js';

export function identityEncoding(systemQubits: number): BlockEncoding {
  return {
    label: 'identity',
    block: defineBlock({ name: 'identity', role: `identity on ${systemQubits} qubits`, qubits: systemQubits }, []),
    systemQubits,
    ancillas: [],
    alpha: 1,
    exact: memoiseMatrix(() => identityMatrix(2 ** systemQubits)),
    costNotes: [],
    errorBound: 0,
  };
}
