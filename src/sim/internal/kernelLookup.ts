/**
 * kernelLookup: which native kernel (as a NativeKernelSpec) the simulator uses for a block under
 * given options — the options' table first, then the process-wide registry; none when native
 * kernels are off — and a key naming that choice, so compiled programs are cached per choice.
 */
import type { Block } from '../../circuit/types.js';
import type { NativeKernelSpec, NativeKernelTable } from '../NativeKernelSpec.js';
import type { NativeKernel } from '../registerNativeKernel.js';
import type { SimulationOptions } from '../SimulationOptions.js';
import { nativeKernels, registryChanges } from './nativeKernelRegistry.js';

export interface KernelLookup {
  /** Distinguishes lookups that may choose differently (table identity, registry state, on/off). */
  readonly key: string;
  readonly find: (block: Block) => NativeKernelSpec | undefined;
}

const specs = new WeakMap<NativeKernel, NativeKernelSpec>();
const tableIds = new WeakMap<NativeKernelTable, number>();
let nextTableId = 1;

/** A plain kernel function as a spec whose pass calls it with the call's fixed operands. */
function asSpec(kernel: NativeKernel | NativeKernelSpec): NativeKernelSpec {
  if (typeof kernel !== 'function') return kernel;
  let spec = specs.get(kernel);
  if (!spec) {
    spec = {
      prepare: (c) => {
        if (c.qubits.some((q) => q < 0)) throw new RangeError(`native kernel of ${c.block.name}: cannot run with absent qubits`);
        return (state) => kernel(state, c.qubits, c.args, c.controls, c.negControls, c.inverse, c.power);
      },
    };
    specs.set(kernel, spec);
  }
  return spec;
}

const NONE: KernelLookup = { key: 'none', find: () => undefined };

export function kernelLookup(options: SimulationOptions): KernelLookup {
  if (options.useNativeKernels === false) return NONE;
  const table = options.nativeKernels;
  let tableId = 0;
  if (table) {
    tableId = tableIds.get(table) ?? nextTableId++;
    tableIds.set(table, tableId);
  }
  return {
    key: `${tableId}:${registryChanges.count}`,
    find: (block) => {
      const id = block.nativeKernel;
      if (id === undefined) return undefined;
      const kernel = table?.get(id) ?? nativeKernels.get(id);
      return kernel === undefined ? undefined : asSpec(kernel);
    },
  };
}
