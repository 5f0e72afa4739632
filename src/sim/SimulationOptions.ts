/**
 * SimulationOptions: the options every simulator entry point takes.
 */

export interface SimulationOptions {
  /** Apply registered native kernels to blocks that name one (default true); false expands every block. */
  readonly useNativeKernels?: boolean;
  /** Byte limit for state allocations; default: POLEWRIGHT_MEMORY_LIMIT or the machine's available memory. */
  readonly memoryLimitBytes?: number;
}
