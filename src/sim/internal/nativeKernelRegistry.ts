/**
 * The process-wide table of native block kernels (id → kernel), filled by registerNativeKernel
 * and by the built-in kernels below; `registryChanges` counts registrations so compiled programs
 * made before a registration are not reused after it.
 */
import { FAST_INVERSE_KERNEL } from '../../inversion/fastInverse.js';
import type { NativeKernel } from '../registerNativeKernel.js';
import type { NativeKernelSpec } from '../NativeKernelSpec.js';
import { phaseByValueKernel, PHASE_BY_VALUE_KERNEL } from '../kernels/phaseByValueKernel.js';
import { ARITHMETIC_KERNELS } from '../kernels/arithmeticKernelTable.js';
import { fastInverseKernel } from '../kernels/fastInverseKernel.js';

export const nativeKernels = new Map<string, NativeKernel | NativeKernelSpec>([
  [PHASE_BY_VALUE_KERNEL, phaseByValueKernel],
  ...ARITHMETIC_KERNELS,
  [FAST_INVERSE_KERNEL, fastInverseKernel],
]);

export const registryChanges = { count: 0 };
