/**
 * SimulationOptions: the options every simulator entry point takes.
 */
import type { NativeKernelTable } from './NativeKernelSpec.js';

export interface SimulationOptions {
  /** Apply native kernels to blocks that name one (default true); false expands every block. */
  readonly useNativeKernels?: boolean;
  /** Kernels by id, consulted before the process-wide registry (built-ins plus registerNativeKernel). */
  readonly nativeKernels?: NativeKernelTable;
  /** Byte limit for state allocations; default: POLEWRIGHT_MEMORY_LIMIT or the machine's available memory. */
  readonly memoryLimitBytes?: number;
}
