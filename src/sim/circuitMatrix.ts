/**
 * circuitMatrix: the exact unitary of a small measurement-free circuit, built column by column by
 * simulating every basis state.
 */
import { qubitCount } from '../circuit/CircuitBuilder.js';
import type { Circuit } from '../circuit/types.js';
import { InputError } from '../core/InputError.js';
import type { SimulationOptions } from './SimulationOptions.js';
import { StateVector } from './StateVector.js';
import { applyCircuit } from './applyCircuit.js';
import { ensureFits } from '../core/memoryBudget.js';

/** Largest circuit circuitMatrix accepts. */
export const MAX_MATRIX_QUBITS = 12;

/**
 * Returns the dim × dim unitary (dim = 2^n) in row-major order: entry (i, j) = <i|U|j> at
 * re[i·dim + j], im[i·dim + j]. Throws InputError for more than 12 qubits or a circuit with
 * measurements or resets.
 */
export function circuitMatrix(circuit: Circuit, options: SimulationOptions = {}): { re: Float64Array; im: Float64Array; dim: number } {
  const n = qubitCount(circuit);
  if (n > MAX_MATRIX_QUBITS) throw new InputError(`circuitMatrix: ${n} qubits exceed the limit of ${MAX_MATRIX_QUBITS} for an explicit matrix`);
  const dim = 2 ** n;
  ensureFits(16 * dim * dim, `the ${dim}×${dim} matrix of a ${n}-qubit circuit`, options.memoryLimitBytes);
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  for (let j = 0; j < dim; j++) {
    const column = StateVector.basis(n, j, options);
    applyCircuit(column, circuit, options);
    for (let i = 0; i < dim; i++) {
      re[i * dim + j] = column.re[i]!;
      im[i * dim + j] = column.im[i]!;
    }
  }
  return { re, im, dim };
}
