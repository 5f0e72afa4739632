/**
 * decompositionTable: how each structured gate kind lowers to Toffolis, T gates, arbitrary rotations and Cliffords,
 * every rule with its published source. A negative control costs two X gates (Cliffords) around the positive form.
 *
 * | rule | cost | source |
 * |---|---|---|
 * | C^k X (k ≥ 3), `measured` (default) | k − 1 Toffolis, k − 2 clean ancillas: a ladder of temporary logical-ANDs, uncomputed by measurement and classically controlled Cliffords | Gidney, Quantum 2, 74 (2018) (4 T per AND, 0 T to erase, equivalent to Jones, PRA 87, 022328, 2013) |
 * | C^k X (k ≥ 3), `clean` | 2k − 3 Toffolis, k − 2 clean ancillas: compute ladder, Toffoli onto the target, uncompute ladder | Nielsen & Chuang §4.3, Fig. 4.10 (from memory) |
 * | C^k X (k ≥ 3), `dirty` | 4(k − 2) Toffolis with k − 2 borrowed (dirty) qubits | Barenco et al., PRA 52, 3457 (1995), Lemma 7.2 (from memory) |
 * | C^k Y, C^k Z | as C^k X (conjugated by Cliffords) | common practice |
 * | AND of k qubits into a fresh ancilla | k − 1 Toffolis (measured) or 2(k − 1) (clean, dirty), k − 1 ancillas | as the C^k X rows |
 * | phase p(θ) under k ≥ 1 controls | AND of the k + 1 qubits, then p(θ) on that ancilla | Gidney 2018 (controlled phases, §"other constructions") |
 * | rx/ry/rz(θ) under k ≥ 1 controls | AND of the k controls, then two rotations by ±θ/2 around two CNOTs | Barenco et al. 1995, Lemma 5.4 / Nielsen & Chuang §4.3 (from memory) |
 * | any other single-qubit U under k ≥ 1 controls | AND of the k controls, then A·X·B·X·C plus a phase: 6 rotations, 2 CNOTs | Nielsen & Chuang §4.3, Corollary 4.2 |
 * | uncontrolled U (U, u2, u3) | 3 rotations (Z–Y–Z Euler angles) | Nielsen & Chuang Theorem 4.1 |
 * | controlled Hadamard | AND of the k controls, then 2 T gates and Cliffords | common practice (from memory) |
 * | swap under k ≥ 1 controls | C^{k+1} X between two CNOTs (Fredkin) | common practice |
 * | phase or rotation angle a multiple of π/2 | Clifford; an odd multiple of π/4: one T | common practice |
 * | Toffoli | 4 T (`toffoliT: 4`, measurement-based uncomputation; Jones 2013, Gidney 2018) or 7 T (`toffoliT: 7`, Amy et al., IEEE TCAD 32, 818, 2013) | as stated |
 *
 * The Toffoli → T conversion is applied by resourceTotals.ts; this table stops at Toffolis.
 */
import type { KindCount } from './HierarchyCount.js';
import type { StructuredGateKind } from './structuredGateKind.js';
import type { AngleLevel } from './internal/angleLevel.js';
import { addTally, tally, ZERO_TALLY, type Tally } from './Tally.js';

export type MultiControlMethod = 'measured' | 'clean' | 'dirty';

export interface DecompositionOptions {
  /** How C^k X with k ≥ 3 is built (default 'measured'). */
  readonly multiControl?: MultiControlMethod;
}

/** C^k X on k controls. */
function multiControlledX(k: number, method: MultiControlMethod): Tally {
  if (k <= 1) return tally({ cliffords: 1 });
  if (k === 2) return tally({ toffoli: 1 });
  if (method === 'measured') return tally({ toffoli: k - 1, extraAncillas: k - 2 });
  if (method === 'clean') return tally({ toffoli: 2 * k - 3, extraAncillas: k - 2 });
  return tally({ toffoli: 4 * (k - 2) });
}

/** The AND of k qubits into one fresh ancilla (k = 1: the qubit itself). */
function logicalAnd(k: number, method: MultiControlMethod): Tally {
  if (k <= 1) return ZERO_TALLY;
  return tally({ toffoli: method === 'measured' ? k - 1 : 2 * (k - 1), extraAncillas: k - 1 });
}

/** One uncontrolled single-qubit phase or rotation at the given Clifford distance. */
function singleRotation(level: AngleLevel): Tally {
  if (level === 0) return ZERO_TALLY;
  if (level <= 2) return tally({ cliffords: 1 });
  if (level === 3) return tally({ tGates: 1 });
  return tally({ rotations: 1 });
}

function phaseUnder(k: number, level: AngleLevel, method: MultiControlMethod): Tally {
  if (k === 0 || level === 0) return singleRotation(level);
  if (level === 1) return multiControlledX(k, method);
  return addTally(logicalAnd(k + 1, method), singleRotation(level));
}

function positiveForm(kind: StructuredGateKind, method: MultiControlMethod): Tally {
  const k = kind.controls + kind.negControls;
  switch (kind.family) {
    case 'identity':
      return ZERO_TALLY;
    case 'pauli':
      return multiControlledX(k, method);
    case 'phase':
      return phaseUnder(k, kind.angle, method);
    case 'gphase':
      return k === 0 ? ZERO_TALLY : phaseUnder(k - 1, kind.angle, method);
    case 'rotation':
      if (k === 0) return kind.angle === 0 ? ZERO_TALLY : singleRotation(kind.angle);
      return addTally(addTally(logicalAnd(k, method), tally({ cliffords: 2 })), singleRotation(kind.halfAngle), 2);
    case 'hadamard':
      return k === 0 ? tally({ cliffords: 1 }) : addTally(logicalAnd(k, method), tally({ tGates: 2, cliffords: 4 }));
    case 'swap':
      return k === 0 ? tally({ cliffords: 3 }) : addTally(multiControlledX(k + 1, method), tally({ cliffords: 2 }));
    case 'swapPower':
      return addTally(tally({ cliffords: 2 }), addTally(logicalAnd(k + 1, method), tally({ rotations: 6, cliffords: 2 })));
    case 'generic':
      return k === 0 ? tally({ rotations: 3 }) : addTally(logicalAnd(k, method), tally({ rotations: 6, cliffords: 2 }));
  }
}

/** Resources of one gate of `kind`. */
export function lowerKind(kind: StructuredGateKind, options: DecompositionOptions = {}): Tally {
  const method = options.multiControl ?? 'measured';
  const base = positiveForm(kind, method);
  return kind.negControls === 0 || base === ZERO_TALLY ? base : addTally(base, tally({ cliffords: 2 * kind.negControls }));
}

/** Resources of every counted kind together. */
export function lowerKinds(kinds: Iterable<KindCount>, options: DecompositionOptions = {}): Tally {
  let total = ZERO_TALLY;
  for (const { kind, count } of kinds) total = addTally(total, lowerKind(kind, options), count);
  return total;
}
