/**
 * BlockEncoding: a circuit block U with (<0|_anc ⊗ I) U (|0>_anc ⊗ I) = M / α (../shared/CONVENTIONS.md), up to a
 * rigorous error bound. The block's local qubits are the system register first (0 … n−1), then the ancilla registers in
 * order.
 */
import type { Block } from '../circuit/types.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';

/**
 * `signal`: part of the projector |0><0| that defines the encoding (QSVT reflects about these qubits).
 * `clean`: a work register that the block returns to |0> whenever it starts in |0>, whatever the system and signal
 * qubits hold (a compute/uncompute pair); projecting on it is automatic, so a reflection may leave it out.
 * Marking a clean register `signal` is always correct, only costlier; the converse is a bug that verification catches.
 */
export type AncillaRole = 'signal' | 'clean';

export interface AncillaRegister {
  readonly name: string;
  readonly size: number;
  readonly role: AncillaRole;
}

/** Cost figures a builder knows beyond plain gate counts (e.g. a cheaper SELECT construction). */
export interface CostNote {
  readonly label: string;
  readonly toffoli: number;
  readonly source: string;
}

export interface BlockEncoding {
  readonly label: string;
  readonly block: Block;
  readonly systemQubits: number;
  readonly ancillas: readonly AncillaRegister[];
  /** Normalisation factor α (≥ ‖M‖ for an exact encoding). */
  readonly alpha: number;
  /** The exact encoded operator M (2^n × 2^n, little-endian), for small n; memoised. */
  readonly exact: () => ComplexMatrix;
  readonly costNotes: readonly CostNote[];
  /**
   * Rigorous bound on ‖(<0|_anc ⊗ I) U (|0>_anc ⊗ I) − M/α‖ in operator norm: 0 when the construction is exact up to
   * floating-point rounding, positive when it approximates (energies rounded to a register grid, a polynomial, …).
   */
  readonly errorBound: number;
}

/** Total ancilla qubits of an encoding. */
export function ancillaQubits(encoding: BlockEncoding): number {
  return encoding.ancillas.reduce((sum, r) => sum + r.size, 0);
}

/** Local qubit indices of the system register (0 … n−1). */
export function systemIndices(encoding: BlockEncoding): number[] {
  return Array.from({ length: encoding.systemQubits }, (_, k) => k);
}

/** Local qubit indices of all ancillas (n … n+a−1). */
export function ancillaIndices(encoding: BlockEncoding): number[] {
  return Array.from({ length: ancillaQubits(encoding) }, (_, k) => encoding.systemQubits + k);
}

/** The role of every ancilla qubit, in local order (index k is qubit n + k). */
export function ancillaRoles(encoding: BlockEncoding): AncillaRole[] {
  return encoding.ancillas.flatMap((r) => Array.from({ length: r.size }, () => r.role));
}

/** Local qubit indices of the ancillas with the given role. */
export function ancillaIndicesWithRole(encoding: BlockEncoding, role: AncillaRole): number[] {
  return ancillaRoles(encoding).flatMap((r, k) => (r === role ? [encoding.systemQubits + k] : []));
}

/** Wraps a matrix producer so it runs at most once. */
export function memoiseMatrix(produce: () => ComplexMatrix): () => ComplexMatrix {
  let cached: ComplexMatrix | undefined;
  return () => (cached ??= produce());
}
