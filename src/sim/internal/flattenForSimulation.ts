/**
 * flattenForSimulation: the circuit's flat op stream, keeping whole every block that has a native
 * kernel (in the options' table or the process-wide registry) unless the options turn native
 * kernels off.
 */
import { flatten, type FlatOp } from '../../circuit/flatten.js';
import type { Circuit } from '../../circuit/types.js';
import type { SimulationOptions } from '../SimulationOptions.js';
import { kernelLookup } from './kernelLookup.js';

export function flattenForSimulation(circuit: Circuit, options: SimulationOptions): Generator<FlatOp> {
  if (options.useNativeKernels === false) return flatten(circuit);
  const kernels = kernelLookup(options);
  return flatten(circuit, { keepWhole: (b) => kernels.find(b) !== undefined });
}
