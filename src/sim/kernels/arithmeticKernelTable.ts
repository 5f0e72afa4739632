/**
 * The native kernels of the fast-inversion stage (constant addition, multiplexed rotations), as registry entries
 * that nativeKernelRegistry.ts adds to the built-in table.
 */
import type { NativeKernel } from '../registerNativeKernel.js';
import type { NativeKernelSpec } from '../NativeKernelSpec.js';
import { CONSTANT_ADDITION_KERNEL } from '../../arithmetic/fourierConstantAdder.js';
import { MULTIPLEXED_RY_KERNEL, MULTIPLEXED_RZ_KERNEL } from '../../blocks/multiplexedRotation.js';
import { constantAdditionKernel } from './constantAdditionKernel.js';
import { multiplexedRyKernel, multiplexedRzKernel } from './multiplexedRotationKernel.js';

export const ARITHMETIC_KERNELS: readonly (readonly [string, NativeKernel | NativeKernelSpec])[] = [
  [CONSTANT_ADDITION_KERNEL, constantAdditionKernel],
  [MULTIPLEXED_RY_KERNEL, multiplexedRyKernel],
  [MULTIPLEXED_RZ_KERNEL, multiplexedRzKernel],
];
