// fourierConstantAdder: adds offset + Σ_k w_k·c_k (each constant w_k under its own control qubit c_k) modulo 2^width
// to a register, by phases in Fourier space between one QFT and its inverse (Draper, arXiv:quant-ph/0008033, 2000).
import { param } from '../circuit/angle.js';
import { defineConjugatedBlock } from '../circuit/defineBlock.js';
import { call, gate } from '../circuit/ops.js';
import type { Block, GateOp } from '../circuit/types.js';
import { quantumFourierTransform } from './quantumFourierTransform.js';

/** Simulator kernel id of the constant-addition block (src/sim/kernels/constantAdditionKernel.ts). */
export const CONSTANT_ADDITION_KERNEL = 'constant-addition';

/**
 * The block `fourier_adder_<width>_<controls>(offset, w0, …)` on qubits [register (width, little-endian), c_0 … c_{K−1}]:
 * |x>|c> ↦ |x + offset + Σ_k w_k c_k mod 2^width>|c>. Arguments must be integers. Compute = the QFT without swaps,
 * action = p(2π·a/2^{q+1}) on register qubit q for the offset and, controlled by c_k, for each w_k; so a controlled
 * call controls only the width·(K+1) phases. Simulated in one pass by a native kernel.
 * @throws RangeError when width < 1 or controls < 0.
 */
export function fourierConstantAdder(width: number, controls: number): Block {
  if (!Number.isInteger(controls) || controls < 0) throw new RangeError(`fourierConstantAdder: bad control count ${controls}`);
  const register = Array.from({ length: width }, (_, q) => q);
  const qft = quantumFourierTransform(width, { swaps: false });
  const phases = (index: number, control: number[]): GateOp[] =>
    register.map((q) => gate('p', [q], [{ op: 'mul', left: param(index), right: (2 * Math.PI) / 2 ** (q + 1) }], { controls: control }));
  const action: GateOp[] = [...phases(0, [])];
  for (let k = 0; k < controls; k++) action.push(...phases(k + 1, [width + k]));
  return defineConjugatedBlock(
    {
      name: `fourier_adder_${width}_${controls}`,
      role: `add offset + sum of ${controls} controlled constants modulo 2^${width} (Draper QFT adder)`,
      qubits: width + controls,
      params: ['offset', ...Array.from({ length: controls }, (_, k) => `w${k}`)],
      nativeKernel: CONSTANT_ADDITION_KERNEL,
    },
    [call(qft, register)],
    action,
  );
}
