/**
 * Structural checks shared by block and circuit construction: operand indices in range and
 * distinct, parameter counts right, block-call powers integral. Violations are programming errors.
 */
import { maxParamIndex, type Angle } from '../angle.js';
import { standardGate } from '../standardGates.js';
import type { UnitaryOp } from '../types.js';

function checkAngles(angles: readonly Angle[], paramCount: number, where: string): void {
  for (const angle of angles) {
    if (typeof angle === 'number' && !Number.isFinite(angle)) throw new RangeError(`${where}: angle ${angle} is not finite`);
    if (maxParamIndex(angle) >= paramCount) throw new RangeError(`${where}: angle refers to an unbound parameter`);
  }
}

/** Per qubit, the number of the check that last saw it (grown as needed): a repeat is a qubit already stamped by this check. */
let stamps = new Int32Array(64);
let check = 0;

/** Scopes wider than this are checked with a Set instead of the stamps. */
const MAX_STAMPED_QUBITS = 2 ** 20;

/** Whether an operand occurs twice across the lists (all in range 0 … qubitCount − 1): one pass, no allocation. */
function hasRepeat(lists: readonly (readonly number[])[], qubitCount: number): boolean {
  if (qubitCount > MAX_STAMPED_QUBITS) {
    const all = lists.flat();
    return new Set(all).size !== all.length;
  }
  if (stamps.length < qubitCount) stamps = new Int32Array(Math.max(qubitCount, 2 * stamps.length));
  if (check === 2 ** 31 - 1) {
    stamps.fill(0);
    check = 0;
  }
  check += 1;
  for (const list of lists) {
    for (const q of list) {
      if (stamps[q] === check) return true;
      stamps[q] = check;
    }
  }
  return false;
}

/** Throws a RangeError when `op` is malformed in a scope of `qubitCount` qubits and `paramCount` parameters. */
export function validateUnitaryOp(op: UnitaryOp, qubitCount: number, paramCount: number, where: string): void {
  const lists = [op.controls, op.negControls, op.qubits];
  for (const list of lists) {
    for (const q of list) {
      if (!Number.isInteger(q) || q < 0 || q >= qubitCount) throw new RangeError(`${where}: qubit ${q} out of range 0..${qubitCount - 1}`);
    }
  }
  if (hasRepeat(lists, qubitCount)) throw new RangeError(`${where}: repeated qubit operand in ${JSON.stringify(lists.flat())}`);
  if (!Number.isFinite(op.power)) throw new RangeError(`${where}: power must be finite`);
  if (op.kind === 'gate') {
    const definition = standardGate(op.name);
    if (!definition) throw new RangeError(`${where}: unknown gate "${op.name}"`);
    if (op.params.length !== definition.params) throw new RangeError(`${where}: ${op.name} takes ${definition.params} parameters`);
    if (op.qubits.length !== definition.qubits) throw new RangeError(`${where}: ${op.name} takes ${definition.qubits} qubits`);
    checkAngles(op.params, paramCount, where);
  } else {
    if (!Number.isInteger(op.power)) throw new RangeError(`${where}: a block call's power must be an integer`);
    if (op.args.length !== op.block.params.length) throw new RangeError(`${where}: ${op.block.name} takes ${op.block.params.length} parameters`);
    if (op.qubits.length !== op.block.qubits) throw new RangeError(`${where}: ${op.block.name} takes ${op.block.qubits} qubits`);
    checkAngles(op.args, paramCount, where);
  }
}
