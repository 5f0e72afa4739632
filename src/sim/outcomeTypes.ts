/**
 * The outcome types: outcomes of a circuit's classical bits with their probabilities (or counts),
 * keyed by bitstring and sorted by it; plus the threshold below which a probability counts as zero.
 */

/** Probabilities below this (amplitudes below 1e-12, the simulator's rounding level) are treated as zero. */
export const NEGLIGIBLE_PROBABILITY = 1e-24;

export interface OutcomeDistribution {
  /** Number of qubits of the circuit. */
  readonly qubits: number;
  /** Number of classical bits (the length of every key). */
  readonly bits: number;
  /** Bitstring (classical bit k at position bits−1−k) → probability or count; keys ascending, no zero entries. */
  readonly outcomes: ReadonlyMap<string, number>;
}

/** Sorts the entries by key and drops those at or below `floor`. */
export function sortedOutcomes(entries: Map<string, number>, floor: number): Map<string, number> {
  return new Map([...entries].filter(([, value]) => value > floor).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
}
