/**
 * orbitalRotation: the Givens-network circuit U(V) of an n×n unitary V on the mode register, with
 * U(V)† a_k† U(V) = Σ_j V_jk a_j† and U(V)|vac> = |vac>.
 */
import { defineBlock } from '../circuit/defineBlock.js';
import { call, gate } from '../circuit/ops.js';
import type { Block, UnitaryOp } from '../circuit/types.js';
import { adjointMatrix } from '../linalg/adjointMatrix.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { checkUnitary } from './internal/checkUnitary.js';
import { clementsDecomposition } from './internal/clementsDecomposition.js';
import { reckDecomposition } from './internal/reckDecomposition.js';
import { phasedGivensRotation } from './phasedGivensRotation.js';

export interface OrbitalRotationOptions {
  /** Block name. Default `orbital_rotation`. */
  readonly name?: string;
  /** Largest accepted max |(V†V − I)_ij|. Default 1e-9. */
  readonly tolerance?: number;
  /**
   * `rectangular` (default): the Clements mesh, n rotation layers. `triangular`: the Reck triangle, 2n − 3 layers.
   * Both use n(n−1)/2 rotations.
   */
  readonly arrangement?: 'rectangular' | 'triangular';
}

/**
 * The orbital rotation U(V): U(V)† a_k† U(V) = Σ_j V_jk a_j†, U(V)|vac> = |vac>; equivalently its
 * one-particle action is V† (|k> ↦ Σ_j (V†)_jk |j>) and on N particles it acts by N×N minors of V†.
 * Built from a factorisation V† = g_L ⋯ g_1 D: single-mode phases p(φ_k) (D) first, then exactly n(n−1)/2 calls of
 * `phased_givens_rotation` (g_1 … g_L) on adjacent modes, in the rectangular arrangement of Clements et al.
 * (Optica 3, 1460, 2016) or the triangular one of Reck et al. (Phys. Rev. Lett. 73, 58, 1994); as a fermionic
 * circuit after Kivlichan et al. (Phys. Rev. Lett. 120, 110501, 2018). Rotations that happen to be the identity
 * are kept, so the structure depends on n and the arrangement only.
 * @throws RangeError when V is not square or not unitary within the tolerance.
 */
export function orbitalRotation(V: ComplexMatrix, options: OrbitalRotationOptions = {}): Block {
  checkUnitary(V, options.tolerance ?? 1e-9, 'orbitalRotation');
  const n = V.n;
  const arrangement = options.arrangement ?? 'rectangular';
  const decompose = arrangement === 'rectangular' ? clementsDecomposition : reckDecomposition;
  const { phases, rotations } = decompose(adjointMatrix(V));
  const ops: UnitaryOp[] = [];
  phases.forEach((phi, k) => {
    if (phi !== 0) ops.push(gate('p', [k], [phi]));
  });
  for (const r of rotations) ops.push(call(phasedGivensRotation, [r.mode, r.mode + 1], [r.theta, r.psi, r.chi]));
  return defineBlock(
    {
      name: options.name ?? 'orbital_rotation',
      role: `orbital rotation U(V) on ${n} modes: phases, then ${(n * (n - 1)) / 2} adjacent Givens rotations (${arrangement} mesh)`,
      qubits: n,
    },
    ops,
  );
}
