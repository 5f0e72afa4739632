// Test helper: the image of a computational basis state under IR ops, required to be a single basis state.
import type { UnitaryOp } from '../../../src/circuit/types.js';
import { StateVector } from '../../../src/sim/StateVector.js';
import { applyUnitaryOps } from '../../../src/sim/applyUnitaryOps.js';

/** Index of the basis state U|index> (throws unless |<that|U|index>| = 1 within 1e-10) and its amplitude. */
export function basisImage(qubits: number, index: number, ops: readonly UnitaryOp[], useNativeKernels: boolean): { index: number; re: number; im: number } {
  const state = StateVector.basis(qubits, index);
  applyUnitaryOps(state, ops, { useNativeKernels });
  for (let i = 0; i < state.re.length; i++) {
    const weight = Math.hypot(state.re[i]!, state.im[i]!);
    if (weight > 1 - 1e-10) return { index: i, re: state.re[i]!, im: state.im[i]! };
    if (weight > 1e-10) throw new Error(`basisImage: |${index}> is not mapped to a basis state (amplitude ${weight} on |${i}>)`);
  }
  throw new Error(`basisImage: no output for |${index}>`);
}
