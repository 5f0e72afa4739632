/**
 * registerNativeKernel: adds a kernel to the registry the simulator consults for blocks that name
 * a `nativeKernel` id; such a block is then applied in one pass instead of gate by gate.
 */
import type { NativeKernelSpec } from './NativeKernelSpec.js';
import type { StateVector } from './StateVector.js';
import { nativeKernels, registryChanges } from './internal/nativeKernelRegistry.js';

/**
 * Applies a block to `state` on the global `qubits` (the block's local qubit k is qubits[k]), with
 * the evaluated angle `args`, only where all `controls` are 1 and all `negControls` are 0, inverted
 * when `inverse`, `power` (an integer ≥ 1) times. Must equal the block's decomposition exactly in
 * exact arithmetic (check with nativeKernelAgreement).
 */
export type NativeKernel = (
  state: StateVector,
  qubits: readonly number[],
  args: readonly number[],
  controls: readonly number[],
  negControls: readonly number[],
  inverse: boolean,
  power: number,
) => void;

/**
 * Registers `kernel` (a function, or a NativeKernelSpec prepared once per call site) under `id`
 * process-wide; throws RangeError when the id is already taken. Prefer passing a table through
 * SimulationOptions.nativeKernels, which needs no global state.
 */
export function registerNativeKernel(id: string, kernel: NativeKernel | NativeKernelSpec): void {
  if (nativeKernels.has(id)) throw new RangeError(`registerNativeKernel: kernel "${id}" is already registered`);
  nativeKernels.set(id, kernel);
  registryChanges.count += 1;
}
