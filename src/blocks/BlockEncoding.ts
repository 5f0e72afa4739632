/**
 * BlockEncoding: a circuit block U with (<0|_anc ⊗ I) U (|0>_anc ⊗ I) = M / α (../shared/CONVENTIONS.md).
 * The block's local qubits are the system register first (0 … n−1), then the ancilla registers in order.
 */
import type { Block } from '../circuit/types.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';

export interface AncillaRegister {
  readonly name: string;
  readonly size: number;
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
  /** Normalisation factor α ≥ ‖M‖. */
  readonly alpha: number;
  /** The exact encoded operator M (2^n × 2^n, little-endian), for small n; memoised. */
  readonly exact: () => ComplexMatrix;
  readonly costNotes: readonly CostNote[];
  /**
   * Rigorous bound on ‖(<0|_anc ⊗ I) U (|0>_anc ⊗ I) − M/α‖ when the circuit is an approximation
   * (e.g. energies rounded to a register grid); absent when it is exact up to rounding.
   */
  readonly errorBound?: number;
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

/** Wraps a matrix producer so it runs at most once. */
export function memoiseMatrix(produce: () => ComplexMatrix): () => ComplexMatrix {
  let cached: ComplexMatrix | undefined;
  return () => (cached ??= produce());
}
