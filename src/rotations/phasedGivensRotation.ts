/**
 * The general SU(2) two-mode rotation g = D(ψ) R(θ) D(χ) on adjacent modes (p, p+1), D(x) = diag(e^{ix}, e^{−ix}):
 * the element of a Givens network (Reck et al. 1994; Clements et al. 2016).
 */
import { param } from '../circuit/angle.js';
import { defineBlock } from '../circuit/defineBlock.js';
import { call, gate } from '../circuit/ops.js';
import type { Block } from '../circuit/types.js';
import { givensRotation } from './givensRotation.js';

const neg = (index: number) => ({ op: 'neg' as const, arg: param(index) });

/**
 * `phased_givens_rotation(theta, psi, chi)` on qubits (mode p, mode p+1): D(χ) = p(χ)⊗p(−χ), then R(θ), then
 * D(ψ). One-particle matrix [[cos θ e^{i(ψ+χ)}, −sin θ e^{i(ψ−χ)}], [sin θ e^{i(χ−ψ)}, cos θ e^{−i(ψ+χ)}]];
 * |11> is fixed (determinant 1).
 */
export const phasedGivensRotation: Block = defineBlock(
  {
    name: 'phased_givens_rotation',
    role: 'SU(2) rotation D(psi) R(theta) D(chi) of two adjacent fermionic modes (one Givens-network element)',
    qubits: 2,
    params: ['theta', 'psi', 'chi'],
  },
  [
    gate('p', [0], [param(2)]),
    gate('p', [1], [neg(2)]),
    call(givensRotation, [0, 1], [param(0)]),
    gate('p', [0], [param(1)]),
    gate('p', [1], [neg(1)]),
  ],
);
