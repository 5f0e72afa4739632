/**
 * applyUnitaryStream: applies a stream of flat unitary operations (gates and whole native blocks)
 * to a state without compiling the whole stream (the path of measured circuits, where every
 * branch sees the ops one at a time); barriers are skipped, measurements and resets are refused.
 * A native block is compiled as one call (cached), so its kernel is prepared once.
 */
import type { FlatOp } from '../../circuit/flatten.js';
import { InputError } from '../../core/InputError.js';
import type { SimulationOptions } from '../SimulationOptions.js';
import type { StateVector } from '../StateVector.js';
import { applyFlatGate } from './applyFlatGate.js';
import { compileCall, compileTarget } from './compileProgram.js';
import { kernelLookup } from './kernelLookup.js';
import { makeProgram, type Step } from './Program.js';
import { runProgram } from './runProgram.js';

export function applyUnitaryStream(state: StateVector, ops: Iterable<FlatOp>, what: string, options: SimulationOptions = {}): void {
  const kernels = kernelLookup(options);
  for (const op of ops) {
    switch (op.kind) {
      case 'gate':
        applyFlatGate(state, op);
        break;
      case 'native': {
        if (!kernels.find(op.block)) throw new RangeError(`${what}: no native kernel "${op.block.nativeKernel}" for block ${op.block.name}`);
        const steps: Step[] = [];
        const site = { bits: op.qubits, controls: op.controls, negControls: op.negControls, inverse: op.inverse, times: op.power };
        compileCall(op.block, op.args, site, compileTarget(state.qubits, options), steps);
        runProgram(makeProgram(steps, state.qubits), state);
        break;
      }
      case 'barrier':
        break;
      default:
        throw new InputError(`${what}: the circuit has a ${op.kind} (qubit ${op.qubit}); simulate it with outcomeDistribution`);
    }
  }
}
