// Test helpers over the project simulator (src/sim): one block applied to a state, its dense unitary, and its one-particle matrix.
import { call } from '../../../src/circuit/ops.js';
import type { Block } from '../../../src/circuit/types.js';
import type { ComplexMatrix } from '../../../src/linalg/ComplexMatrix.js';
import { applyUnitaryOps } from '../../../src/sim/applyUnitaryOps.js';
import { StateVector } from '../../../src/sim/StateVector.js';

export interface State {
  re: Float64Array;
  im: Float64Array;
}

/** The block (with numeric `args`) applied to `input` on qubits 0 … block.qubits−1 (little-endian). */
export function simulateBlock(block: Block, input: State, args: readonly number[] = []): State {
  const state = StateVector.fromAmplitudes(input.re, input.im);
  applyUnitaryOps(state, [call(block, Array.from({ length: block.qubits }, (_, q) => q), args)]);
  return { re: Float64Array.from(state.re), im: Float64Array.from(state.im) };
}

/** The computational basis state |index> on `qubits` qubits. */
export function basisState(qubits: number, index: number): State {
  const re = new Float64Array(1 << qubits);
  re[index] = 1;
  return { re, im: new Float64Array(1 << qubits) };
}

/** The full 2^q × 2^q unitary of the block, column c = block applied to |c>. */
export function blockUnitary(block: Block, args: readonly number[] = []): ComplexMatrix {
  const dim = 1 << block.qubits;
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  for (let c = 0; c < dim; c++) {
    const out = simulateBlock(block, basisState(block.qubits, c), args);
    for (let r = 0; r < dim; r++) {
      re[r * dim + c] = out.re[r]!;
      im[r * dim + c] = out.im[r]!;
    }
  }
  return { n: dim, re, im };
}

/** The one-particle matrix u of a mode-register block: u_jk = <j| U |k> with |k> = a_k†|vac> = basis index 2^k. */
export function oneParticleMatrix(block: Block): ComplexMatrix {
  const n = block.qubits;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let k = 0; k < n; k++) {
    const out = simulateBlock(block, basisState(n, 1 << k));
    for (let j = 0; j < n; j++) {
      re[j * n + k] = out.re[1 << j]!;
      im[j * n + k] = out.im[1 << j]!;
    }
  }
  return { n, re, im };
}
