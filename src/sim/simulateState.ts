/**
 * simulateState: the final state of a measurement-free circuit started from |0…0>.
 */
import { qubitCount } from '../circuit/CircuitBuilder.js';
import type { Circuit } from '../circuit/types.js';
import type { SimulationOptions } from './SimulationOptions.js';
import { StateVector } from './StateVector.js';
import { applyCircuit } from './applyCircuit.js';

/**
 * Simulates `circuit` from |0…0> and returns the state. Throws InputError when the state would not
 * fit in memory or the circuit measures or resets (use outcomeDistribution for those).
 */
export function simulateState(circuit: Circuit, options: SimulationOptions = {}): StateVector {
  const state = StateVector.zero(qubitCount(circuit), options);
  applyCircuit(state, circuit, options);
  return state;
}
