/**
 * applyUnitaryStream: applies a stream of flat unitary operations (gates and whole native blocks)
 * to a state; barriers are skipped, measurements and resets are refused (they are not unitary).
 */
import type { FlatOp } from '../../circuit/flatten.js';
import { InputError } from '../../core/InputError.js';
import type { StateVector } from '../StateVector.js';
import { applyFlatGate } from './applyFlatGate.js';
import { nativeKernels } from './nativeKernelRegistry.js';

export function applyUnitaryStream(state: StateVector, ops: Iterable<FlatOp>, what: string): void {
  for (const op of ops) {
    switch (op.kind) {
      case 'gate':
        applyFlatGate(state, op);
        break;
      case 'native': {
        const kernel = nativeKernels.get(op.block.nativeKernel ?? '');
        if (!kernel) throw new RangeError(`${what}: no native kernel "${op.block.nativeKernel}" for block ${op.block.name}`);
        kernel(state, op.qubits, op.args, op.controls, op.negControls, op.inverse, op.power);
        break;
      }
      case 'barrier':
        break;
      default:
        throw new InputError(`${what}: the circuit has a ${op.kind} (qubit ${op.qubit}); simulate it with outcomeDistribution`);
    }
  }
}
