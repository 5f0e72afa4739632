/**
 * The real two-mode Givens rotation R(θ) on adjacent modes (p, p+1) = local qubits (0, 1): one-particle
 * matrix [[cos θ, −sin θ], [sin θ, cos θ]] on (|p>, |p+1>), vacuum and |11> fixed (Kivlichan et al. 2018).
 */
import { param } from '../circuit/angle.js';
import { defineBlock } from '../circuit/defineBlock.js';
import { gate } from '../circuit/ops.js';
import type { Block } from '../circuit/types.js';

/**
 * `givens_rotation(theta)` on qubits (A = mode p, B = mode p+1): cx(B→A), cry(2θ) controlled by A on B,
 * cx(B→A). In the basis |n_B n_A>: |01> → cos θ|01> + sin θ|10>, |10> → −sin θ|01> + cos θ|10>,
 * |00> and |11> unchanged (Kivlichan et al., Phys. Rev. Lett. 120, 110501, 2018).
 */
export const givensRotation: Block = defineBlock(
  {
    name: 'givens_rotation',
    role: 'real Givens rotation R(theta) of two adjacent fermionic modes (number-conserving, no JW string between them)',
    qubits: 2,
    params: ['theta'],
  },
  [gate('cx', [1, 0]), gate('cry', [0, 1], [{ op: 'mul', left: 2, right: param(0) }]), gate('cx', [1, 0])],
);
