/**
 * applyUnitaryOps: applies a list of IR unitary operations (gates and block calls on global qubits)
 * to a state in place, without building a circuit first.
 */
import type { UnitaryOp } from '../circuit/types.js';
import type { SimulationOptions } from './SimulationOptions.js';
import type { StateVector } from './StateVector.js';
import { applyCircuit } from './applyCircuit.js';

/** Applies `ops` in order to `state`; qubit indices refer to the state's qubits. */
export function applyUnitaryOps(state: StateVector, ops: readonly UnitaryOp[], options: SimulationOptions = {}): void {
  const circuit = { qubitRegisters: [{ name: 'q', size: state.qubits, offset: 0 }], bitRegisters: [], ops };
  applyCircuit(state, circuit, options);
}
