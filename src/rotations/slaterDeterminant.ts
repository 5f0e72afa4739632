/**
 * slaterDeterminant: the circuit preparing Π_{k∈occ} b_k† |vac>, b_k† = Σ_j V_jk a_j†, from the vacuum:
 * X on the occupied qubits, then the inverse orbital rotation U(V)†.
 */
import { defineBlock } from '../circuit/defineBlock.js';
import { call, gate } from '../circuit/ops.js';
import type { Block } from '../circuit/types.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { oneBodyRotation, type OneBodyRotationOptions } from './oneBodyRotation.js';
import { orbitalRotation } from './orbitalRotation.js';

/** The orbitals: from a Hermitian one-body matrix (its eigenbasis via oneBodyRotation) or given as a unitary V. */
export type SlaterSource = { readonly oneBody: ComplexMatrix } | { readonly orbitals: ComplexMatrix };

export interface SlaterDeterminantOptions {
  /** Block name. Default `slater_determinant`. */
  readonly name?: string;
  /** Passed to oneBodyRotation for a `oneBody` source (method, Fourier blocks, tolerance). */
  readonly rotation?: Omit<OneBodyRotationOptions, 'name'>;
}

/**
 * Prepares b_{k_1}† ⋯ b_{k_m}† |vac> (k_1 < … < k_m the occupied orbitals; the Jordan–Wigner order of the basis
 * state with those qubits set, a_{k_1}† ⋯ a_{k_m}† |vac>) as X on qubits k_1 … k_m, then inv @ U(V), using
 * U(V)† a_k† U(V) = b_k† and U(V)|vac> = |vac> (Kivlichan et al., Phys. Rev. Lett. 120, 110501, 2018). `occupation` lists orbital indices (columns of V, i.e.
 * qubits of the rotated frame), or gives an electron count: then the lowest-energy orbitals of T (ties by orbital
 * index), or the first columns of a given V.
 * @throws RangeError on a bad occupation (repeated, out of range, count outside 0…n) or a bad source matrix.
 */
export function slaterDeterminant(source: SlaterSource, occupation: readonly number[] | number, options: SlaterDeterminantOptions = {}): Block {
  // Orbitals in the order of the rotated frame's qubits, lowest energy first (a given V: its column order).
  let block: Block;
  let byEnergy: readonly number[];
  if ('oneBody' in source) {
    const rotation = oneBodyRotation(source.oneBody, options.rotation ?? {});
    block = rotation.block;
    byEnergy = [...rotation.sortedOrder];
  } else {
    block = orbitalRotation(source.orbitals);
    byEnergy = Array.from({ length: block.qubits }, (_, k) => k);
  }
  const n = block.qubits;
  let occupied: number[];
  if (typeof occupation === 'number') {
    if (!Number.isInteger(occupation) || occupation < 0 || occupation > n) {
      throw new RangeError(`slaterDeterminant: electron count ${occupation} is outside 0…${n}`);
    }
    occupied = byEnergy.slice(0, occupation);
  } else {
    occupied = [...occupation];
    if (occupied.some((k) => !Number.isInteger(k) || k < 0 || k >= n) || new Set(occupied).size !== occupied.length) {
      throw new RangeError(`slaterDeterminant: occupied orbitals ${JSON.stringify(occupation)} must be distinct integers in 0…${n - 1}`);
    }
  }
  occupied.sort((a, b) => a - b);
  const qubits = Array.from({ length: n }, (_, q) => q);
  return defineBlock(
    { name: options.name ?? 'slater_determinant', role: `Slater determinant of orbitals [${occupied.join(', ')}] of ${n} modes`, qubits: n },
    [...occupied.map((k) => gate('x', [k])), call(block, qubits, [], { inverse: true })],
  );
}
