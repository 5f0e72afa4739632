/**
 * flattenForSimulation: the circuit's flat op stream, keeping whole every block whose native
 * kernel is registered unless the options turn native kernels off.
 */
import { flatten, type FlatOp } from '../../circuit/flatten.js';
import type { Circuit } from '../../circuit/types.js';
import type { SimulationOptions } from '../SimulationOptions.js';
import { nativeKernels } from './nativeKernelRegistry.js';

export function flattenForSimulation(circuit: Circuit, options: SimulationOptions): Generator<FlatOp> {
  if (options.useNativeKernels === false) return flatten(circuit);
  return flatten(circuit, { keepWhole: (b) => b.nativeKernel !== undefined && nativeKernels.has(b.nativeKernel) });
}
