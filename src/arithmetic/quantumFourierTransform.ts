// quantumFourierTransform: the QFT on a little-endian register as Hadamards and controlled phases
// (Nielsen & Chuang, Quantum Computation and Quantum Information, §5.1), with or without the final swaps.
import { defineBlock } from '../circuit/defineBlock.js';
import { gate } from '../circuit/ops.js';
import type { Block, GateOp } from '../circuit/types.js';

export interface QftOptions {
  /** Append the ⌊width/2⌋ swaps that restore the qubit order (default true). */
  readonly swaps?: boolean;
}

/**
 * The QFT on `width` ≥ 1 qubits: for q = width−1 down to 0, h on q, then cp(2π/2^{q−c+1}) for each lower c —
 * width Hadamards and width(width−1)/2 controlled phases (Nielsen & Chuang §5.1). With swaps it maps
 * |x> ↦ 2^{−width/2} Σ_y e^{2πi xy/2^width} |y>; without them qubit q ends in (|0> + e^{2πi x/2^{q+1}}|1>)/√2,
 * the form the Fourier-space adder (Draper, arXiv:quant-ph/0008033) works in.
 * @throws RangeError when width is not a positive integer.
 */
export function quantumFourierTransform(width: number, options: QftOptions = {}): Block {
  if (!Number.isInteger(width) || width < 1) throw new RangeError(`quantumFourierTransform: width ${width} is not a positive integer`);
  const swaps = options.swaps ?? true;
  const ops: GateOp[] = [];
  for (let q = width - 1; q >= 0; q--) {
    ops.push(gate('h', [q]));
    for (let c = q - 1; c >= 0; c--) ops.push(gate('cp', [c, q], [(2 * Math.PI) / 2 ** (q - c + 1)]));
  }
  if (swaps) for (let q = 0; q < width - 1 - q; q++) ops.push(gate('swap', [q, width - 1 - q]));
  return defineBlock(
    {
      name: swaps ? `qft_${width}` : `qft_unswapped_${width}`,
      role: `quantum Fourier transform of a ${width}-qubit register${swaps ? '' : ' without the final swaps'}`,
      qubits: width,
    },
    ops,
  );
}
