/**
 * SimulationOptions: the options every simulator entry point takes.
 */
import type { NativeKernelTable } from './NativeKernelSpec.js';
import type { SimulatorPool } from './SimulatorPool.js';

export interface SimulationOptions {
  /** Apply native kernels to blocks that name one (default true); false expands every block. */
  readonly useNativeKernels?: boolean;
  /** Kernels by id, consulted before the process-wide registry (built-ins plus registerNativeKernel). */
  readonly nativeKernels?: NativeKernelTable;
  /** Byte limit for state allocations; default: POLEWRIGHT_MEMORY_LIMIT or the machine's available memory. */
  readonly memoryLimitBytes?: number;
  /** Merge runs of gates into dense or diagonal passes on a few qubits (default true; exact to rounding). */
  readonly fuse?: boolean;
  /**
   * Compile block calls once into replayable programs (default true). false is the reference path the benchmarks
   * measure against: every run streams the lazily flattened gates and resolves each gate as it comes (native kernels
   * still apply unless useNativeKernels is false), never fused, never split between threads, and no idle work qubit is
   * left out of the state.
   */
  readonly compile?: boolean;
  /** Worker threads to split gate passes of large states over (see SimulatorPool); default: this thread only. */
  readonly pool?: SimulatorPool;
}
