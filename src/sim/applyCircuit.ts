/**
 * applyCircuit: applies every unitary operation of a circuit to a state in place, by compiling the
 * circuit once (cached per circuit, state size and kernel choice) and replaying the program
 * (barriers are ignored; measurements and resets are refused). With `compile: false` it streams the
 * flat gates instead (the benchmarks' reference path).
 */
import { qubitCount } from '../circuit/CircuitBuilder.js';
import type { Circuit } from '../circuit/types.js';
import type { SimulationOptions } from './SimulationOptions.js';
import type { StateVector } from './StateVector.js';
import { applyUnitaryStream } from './internal/applyFlatOps.js';
import { compileCircuit, compileTarget } from './internal/compileProgram.js';
import { flattenForSimulation } from './internal/flattenForSimulation.js';
import { runProgram } from './internal/runProgram.js';

/**
 * Applies `circuit` to `state` (which may have more qubits than the circuit; the circuit acts on
 * the low ones). Throws InputError when the circuit measures or resets (use outcomeDistribution),
 * RangeError when the state has too few qubits.
 */
export function applyCircuit(state: StateVector, circuit: Circuit, options: SimulationOptions = {}): void {
  const needed = qubitCount(circuit);
  if (state.qubits < needed) throw new RangeError(`applyCircuit: the circuit has ${needed} qubits, the state only ${state.qubits}`);
  if (options.compile === false) {
    applyUnitaryStream(state, flattenForSimulation(circuit, options), 'applyCircuit', options);
    return;
  }
  const program = compileCircuit(circuit, compileTarget(state.qubits, options), 'applyCircuit');
  runProgram(program, state, options.pool);
}
