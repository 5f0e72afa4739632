// The two-mode fermionic Fourier gate F2: one-particle (1/√2)[[1, 1], [1, −1]] on adjacent modes, |11> → −|11>.
import { defineBlock } from '../circuit/defineBlock.js';
import { call, gate } from '../circuit/ops.js';
import type { Block } from '../circuit/types.js';
import { givensRotation } from './givensRotation.js';

/**
 * `two_mode_fourier` on qubits (mode p, mode p+1): z on mode p+1 then R(π/4), so
 * |p> → (|p> + |p+1>)/√2, |p+1> → (|p> − |p+1>)/√2, |11> → −|11> (determinant −1), vacuum fixed
 * (Verstraete, Cirac & Latorre, Phys. Rev. A 79, 032316, 2009).
 */
export const twoModeFourier: Block = defineBlock(
  { name: 'two_mode_fourier', role: 'two-mode fermionic Fourier gate F2 (z on the upper mode, then R(pi/4))', qubits: 2 },
  [gate('z', [1]), call(givensRotation, [0, 1], [Math.PI / 4])],
);
