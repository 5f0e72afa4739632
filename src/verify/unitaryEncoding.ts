/**
 * unitaryEncoding: a unitary block seen as a block-encoding of itself (α = 1, no ancillas), paired
 * with an independently computed exact matrix so the verifier can check it.
 */
import type { Block } from '../circuit/types.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { memoiseMatrix, type BlockEncoding } from '../blocks/BlockEncoding.js';

export function unitaryEncoding(label: string, block: Block, exact: () => ComplexMatrix): BlockEncoding {
  return { label, block, systemQubits: block.qubits, ancillas: [], alpha: 1, exact: memoiseMatrix(exact), costNotes: [], errorBound: 0 };
}
