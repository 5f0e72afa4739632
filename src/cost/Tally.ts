/**
 * Tally: logical resources of a circuit after decomposition into Clifford + T — Toffolis (each a logical AND or a
 * Toffoli), lone T gates, arbitrary-angle rotations (synthesised later), Clifford gates, and the most extra clean
 * ancillas any one decomposition needs at a time.
 */
export interface Tally {
  readonly toffoli: number;
  readonly tGates: number;
  readonly rotations: number;
  readonly cliffords: number;
  /** Peak extra qubits the decompositions borrow (they are released after each gate, so this is a maximum, not a sum). */
  readonly extraAncillas: number;
}

export const ZERO_TALLY: Tally = { toffoli: 0, tGates: 0, rotations: 0, cliffords: 0, extraAncillas: 0 };

/** A tally with the given fields, the rest zero. */
export function tally(fields: Partial<Tally>): Tally {
  return { ...ZERO_TALLY, ...fields };
}

/** a + factor·b; extra ancillas are a maximum, not scaled. */
export function addTally(a: Tally, b: Tally, factor = 1): Tally {
  return {
    toffoli: a.toffoli + factor * b.toffoli,
    tGates: a.tGates + factor * b.tGates,
    rotations: a.rotations + factor * b.rotations,
    cliffords: a.cliffords + factor * b.cliffords,
    extraAncillas: factor === 0 ? a.extraAncillas : Math.max(a.extraAncillas, b.extraAncillas),
  };
}
