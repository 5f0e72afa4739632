/**
 * The process-wide table of native block kernels (id → kernel), filled by registerNativeKernel
 * and by the built-in kernels below.
 */
import type { NativeKernel } from '../registerNativeKernel.js';
import { phaseByValueKernel, PHASE_BY_VALUE_KERNEL } from '../kernels/phaseByValueKernel.js';
import { ARITHMETIC_KERNELS } from '../kernels/arithmeticKernelTable.js';

export const nativeKernels = new Map<string, NativeKernel>([[PHASE_BY_VALUE_KERNEL, phaseByValueKernel], ...ARITHMETIC_KERNELS]);
