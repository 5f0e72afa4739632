// Test helper: the simulated projected block <i,0_anc| U |j,0_anc> of an encoding, column by column (all columns, or the given ones).
import { ancillaQubits, type BlockEncoding } from '../../src/blocks/BlockEncoding.js';
import { call } from '../../src/circuit/ops.js';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { StateVector } from '../../src/sim/StateVector.js';
import { applyUnitaryOps } from '../../src/sim/applyUnitaryOps.js';

/** Entries of unsimulated columns are left 0. */
export function projectedBlock(encoding: BlockEncoding, columns?: readonly number[]): ComplexMatrix {
  const n = encoding.systemQubits;
  const dim = 2 ** n;
  const total = n + ancillaQubits(encoding);
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  const qubits = Array.from({ length: encoding.block.qubits }, (_, k) => k);
  for (const j of columns ?? Array.from({ length: dim }, (_, k) => k)) {
    const state = StateVector.basis(total, j);
    applyUnitaryOps(state, [call(encoding.block, qubits)]);
    for (let i = 0; i < dim; i++) {
      re[i * dim + j] = state.re[i]!;
      im[i * dim + j] = state.im[i]!;
    }
  }
  return { n: dim, re, im };
}
