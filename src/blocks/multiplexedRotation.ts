// multiplexedRotation: a call of a uniformly-controlled rotation block whose Gray-code angles are call arguments, so a
// native kernel can apply it in one pass (Möttönen et al., Phys. Rev. Lett. 93, 130502, 2004).
import { param } from '../circuit/angle.js';
import { defineBlock } from '../circuit/defineBlock.js';
import { call, gate, type ModifierOptions } from '../circuit/ops.js';
import type { Block, CallOp, GateOp } from '../circuit/types.js';
import { multiplexorAngles } from './uniformlyControlledRotation.js';

/** Simulator kernel ids of the multiplexed y- and z-rotation blocks (src/sim/kernels/multiplexedRotationKernel.ts). */
export const MULTIPLEXED_RY_KERNEL = 'multiplexed-ry';
export const MULTIPLEXED_RZ_KERNEL = 'multiplexed-rz';

const grayCode = (i: number): number => i ^ (i >> 1);

function multiplexedBlock(axis: 'y' | 'z', k: number): Block {
  const size = 2 ** k;
  const name = axis === 'y' ? 'ry' : 'rz';
  const ops: GateOp[] = [];
  for (let i = 0; i < size; i++) {
    ops.push(gate(name, [k], [param(i)]));
    if (k === 0) break;
    const changed = i === size - 1 ? 1 << (k - 1) : grayCode(i) ^ grayCode(i + 1);
    ops.push(gate('cx', [31 - Math.clz32(changed), k]));
  }
  return defineBlock(
    {
      name: `multiplexed_r${axis}_${k}`,
      role: `r${axis} on the target by an angle chosen by the value of ${k} selector qubits (Gray-code multiplexor)`,
      qubits: k + 1,
      params: Array.from({ length: size }, (_, i) => `t${i}`),
      nativeKernel: axis === 'y' ? MULTIPLEXED_RY_KERNEL : MULTIPLEXED_RZ_KERNEL,
    },
    ops,
  );
}

/**
 * For each value h of the `selector` qubits (bit b = selector[b]), R_axis(alphas[h]) on `target` — the same unitary as
 * uniformlyControlledRotation(axis, alphas, selector, target) — as one call of `multiplexed_r<axis>_<k>` on
 * [selector, target] with the Gray-code angles multiplexorAngles(alphas) as arguments. `modifiers` adds controls etc.
 * @throws RangeError when alphas.length ≠ 2^selector.length.
 */
export function multiplexedRotation(
  axis: 'y' | 'z',
  alphas: readonly number[],
  selector: readonly number[],
  target: number,
  modifiers: ModifierOptions = {},
): CallOp {
  const k = selector.length;
  if (alphas.length !== 2 ** k) throw new RangeError(`multiplexedRotation: need ${2 ** k} angles, got ${alphas.length}`);
  const thetas = k === 0 ? Float64Array.from(alphas) : multiplexorAngles(alphas);
  return call(multiplexedBlock(axis, k), [...selector, target], [...thetas], modifiers);
}
