/**
 * PauliSum: Σ_t c_t P_t over `qubits` qubits. A Pauli string is stored as bit masks (bigint, so any number of
 * qubits works): on qubit q, (x_q, z_q) = (0,0) I, (1,0) X, (0,1) Z, (1,1) Y.
 */

/** c · P(x, z), c = re + i·im. */
export interface PauliTerm {
  readonly x: bigint;
  readonly z: bigint;
  readonly re: number;
  readonly im: number;
}

export interface PauliSum {
  readonly qubits: number;
  readonly terms: readonly PauliTerm[];
}
