/**
 * nativeKernelAgreement: how far a block's native kernel is from the block's own decomposition,
 * measured on a seeded random state with the block's qubits scattered among controls and spectators.
 */
import { call } from '../circuit/ops.js';
import type { Block } from '../circuit/types.js';
import { seededRandom } from '../core/seededRandom.js';
import { StateVector } from './StateVector.js';
import { applyUnitaryOps } from './applyUnitaryOps.js';
import type { NativeKernelTable } from './NativeKernelSpec.js';
import { kernelLookup } from './internal/kernelLookup.js';

export interface NativeKernelAgreementOptions {
  /** Angle arguments of the call (default: none). */
  readonly args?: readonly number[];
  /** Number of positive controls (default 0). */
  readonly controls?: number;
  /** Number of negative controls (default 0). */
  readonly negControls?: number;
  /** Call inverted (default false). */
  readonly inverse?: boolean;
  /** Integer power of the call (default 1; negative means inverted). */
  readonly power?: number;
  /** Extra qubits touched by nothing (default 1). */
  readonly spectators?: number;
  /** Seed of the random state and the qubit placement (default 1). */
  readonly seed?: number;
  /** Kernel table consulted before the process-wide registry (as SimulationOptions.nativeKernels). */
  readonly nativeKernels?: NativeKernelTable;
}

/**
 * Returns max_i |(K ψ)_i − (D ψ)_i| where K applies the call with the native kernel and D with the
 * block's decomposition. Throws RangeError when the block names no kernel in the table or the registry.
 */
export function nativeKernelAgreement(block: Block, options: NativeKernelAgreementOptions = {}): number {
  const table = options.nativeKernels === undefined ? {} : { nativeKernels: options.nativeKernels };
  if (kernelLookup(table).find(block) === undefined) {
    throw new RangeError(`nativeKernelAgreement: block ${block.name} has no registered native kernel`);
  }
  const controls = options.controls ?? 0;
  const negControls = options.negControls ?? 0;
  const n = block.qubits + controls + negControls + (options.spectators ?? 1);
  const random = seededRandom(options.seed ?? 1);
  const order = Array.from({ length: n }, (_, k) => k);
  for (let k = n - 1; k > 0; k--) {
    const r = Math.floor(random.next() * (k + 1));
    [order[k], order[r]] = [order[r] as number, order[k] as number];
  }
  const re = Array.from({ length: 2 ** n }, () => random.next() - 0.5);
  const im = Array.from({ length: 2 ** n }, () => random.next() - 0.5);
  const native = StateVector.fromAmplitudes(re, im);
  const decomposed = StateVector.fromAmplitudes(re, im);
  const op = call(block, order.slice(0, block.qubits), options.args ?? [], {
    controls: order.slice(block.qubits, block.qubits + controls),
    negControls: order.slice(block.qubits + controls, block.qubits + controls + negControls),
    inverse: options.inverse ?? false,
    power: options.power ?? 1,
  });
  applyUnitaryOps(native, [op], { ...table, useNativeKernels: true });
  applyUnitaryOps(decomposed, [op], { useNativeKernels: false });
  let worst = 0;
  for (let i = 0; i < native.re.length; i++) {
    worst = Math.max(worst, Math.hypot(native.re[i]! - decomposed.re[i]!, native.im[i]! - decomposed.im[i]!));
  }
  return worst;
}
