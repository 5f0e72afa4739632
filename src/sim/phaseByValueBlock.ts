/**
 * phaseByValueBlock: the block e^{iθ·x} on a register of `width` qubits holding the unsigned value x
 * (little-endian), decomposed as p(θ·2^j) on qubit j and simulated by a native kernel in one pass.
 */
import { param } from '../circuit/angle.js';
import { defineBlock } from '../circuit/defineBlock.js';
import { gate } from '../circuit/ops.js';
import type { Block } from '../circuit/types.js';
import { PHASE_BY_VALUE_KERNEL } from './kernels/phaseByValueKernel.js';

/** The block `phase_by_value_<width>(theta)` on `width` ≥ 1 qubits. */
export function phaseByValueBlock(width: number): Block {
  if (!Number.isInteger(width) || width < 1) throw new RangeError(`phaseByValueBlock: width ${width} is not a positive integer`);
  const ops = Array.from({ length: width }, (_, j) => gate('p', [j], [{ op: 'mul', left: param(0), right: 2 ** j }]));
  return defineBlock(
    { name: `phase_by_value_${width}`, role: 'phase e^{i theta x} by the register value x', qubits: width, params: ['theta'], nativeKernel: PHASE_BY_VALUE_KERNEL },
    ops,
  );
}
