// unitaryOps: the unitary part of a circuit for verification — barriers dropped, final measurements dropped (counted),
// resets of an ancilla before anything touches it dropped (the qubit is |0> already); any other measurement or reset
// is a problem, reported by its index among the circuit's measure and reset ops.
import type { Circuit, Op, Register, UnitaryOp } from '../../circuit/types.js';

export interface NonUnitaryProblem {
  /** Index of the offending op among the circuit's measure and reset ops (0 = the first of them). */
  readonly nonUnitaryIndex: number;
  readonly qubit: number;
  readonly message: string;
}

export type UnitaryOpsResult =
  | { readonly ops: readonly UnitaryOp[]; readonly droppedMeasurements: number; readonly droppedResets: number }
  | { readonly problem: NonUnitaryProblem };

function qubitsOf(op: Op): readonly number[] {
  if (op.kind === 'gate' || op.kind === 'call') return [...op.controls, ...op.negControls, ...op.qubits];
  if (op.kind === 'barrier') return [];
  return [op.qubit];
}

/**
 * @param systemQubits qubits that carry the input state (a reset of one of them is never a no-op).
 * @param name         how a qubit is named in messages, e.g. `a[1]`.
 */
export function unitaryOps(circuit: Circuit, systemQubits: ReadonlySet<number>, name: (qubit: number) => string): UnitaryOpsResult {
  const ops = circuit.ops;
  const usedLater = new Set<number>();
  const laterUse: boolean[] = new Array<boolean>(ops.length).fill(false);
  for (let k = ops.length - 1; k >= 0; k--) {
    const op = ops[k]!;
    if (op.kind === 'measure') laterUse[k] = usedLater.has(op.qubit);
    else for (const q of qubitsOf(op)) usedLater.add(q);
  }
  const usedBefore = new Set<number>();
  const kept: UnitaryOp[] = [];
  let nonUnitaryIndex = -1;
  let droppedMeasurements = 0;
  let droppedResets = 0;
  for (let k = 0; k < ops.length; k++) {
    const op = ops[k]!;
    if (op.kind === 'measure' || op.kind === 'reset') nonUnitaryIndex++;
    if (op.kind === 'measure') {
      if (laterUse[k]) {
        return { problem: { nonUnitaryIndex, qubit: op.qubit, message: `mid-circuit measurement: qubit ${name(op.qubit)} is measured and then used again; only final measurements are allowed (they are ignored)` } };
      }
      droppedMeasurements++;
    } else if (op.kind === 'reset') {
      if (systemQubits.has(op.qubit) || usedBefore.has(op.qubit)) {
        return { problem: { nonUnitaryIndex, qubit: op.qubit, message: `reset of qubit ${name(op.qubit)} is not unitary; only a reset of an ancilla before any gate on it is allowed (it is ignored)` } };
      }
      droppedResets++;
    } else if (op.kind !== 'barrier') kept.push(op);
    for (const q of qubitsOf(op)) usedBefore.add(q);
  }
  return { ops: kept, droppedMeasurements, droppedResets };
}

/** `a[1]` for a global qubit index. */
export function qubitName(registers: readonly Register[], qubit: number): string {
  const register = registers.find((r) => qubit >= r.offset && qubit < r.offset + r.size);
  return register === undefined ? `qubit ${qubit}` : `${register.name}[${qubit - register.offset}]`;
}
