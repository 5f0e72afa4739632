/**
 * IndexPattern: the basis indices whose bits at some fixed positions have given values, enumerated
 * without scanning: the free bits count up, zeros are deposited at the fixed positions and the
 * fixed values ORed in. Below the lowest fixed position the indices form contiguous runs. Kernels
 * over a pattern take a range [from, to) of the free-bit counter (default all outer · run of them),
 * so one pass can be split between threads.
 */

export interface IndexPattern {
  /** Fixed bit positions, ascending. */
  readonly positions: Int32Array;
  /** The fixed bits' values as a mask (bits outside `positions` are 0). */
  readonly value: number;
  /** Number of runs. */
  readonly outer: number;
  /** Length of each contiguous run: 2^(lowest fixed position), or 2^n with nothing fixed. */
  readonly run: number;
}

/** The n-qubit indices whose bits at the `fixed` positions equal those of the `value` mask. */
export function indexPattern(qubits: number, fixed: readonly number[], value: number): IndexPattern {
  const positions = Int32Array.from(fixed).sort();
  for (let k = 1; k < positions.length; k++) {
    if (positions[k] === positions[k - 1]) throw new RangeError(`qubit ${positions[k]} is used twice by one operation`);
  }
  for (const p of positions) if (p < 0 || p >= qubits) throw new RangeError(`qubit ${p} out of range 0..${qubits - 1}`);
  const low = positions.length > 0 ? positions[0]! : qubits;
  return { positions, value, run: 2 ** low, outer: 2 ** (qubits - positions.length - low) };
}

/** Inserts a zero bit at each fixed position (ascending) into the free-bit counter x. */
export function deposit(x: number, positions: Int32Array): number {
  let y = x;
  for (let k = 0; k < positions.length; k++) {
    const low = y & ((1 << positions[k]!) - 1);
    y = ((y - low) << 1) | low;
  }
  return y;
}

/** The mask with bit q set for each q in `qubits`. */
export function maskOf(qubits: readonly number[]): number {
  let mask = 0;
  for (const q of qubits) mask |= 1 << q;
  return mask;
}
