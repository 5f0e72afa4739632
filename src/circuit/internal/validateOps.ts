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

/** Throws a RangeError when `op` is malformed in a scope of `qubitCount` qubits and `paramCount` parameters. */
export function validateUnitaryOp(op: UnitaryOp, qubitCount: number, paramCount: number, where: string): void {
  const all = [...op.controls, ...op.negControls, ...op.qubits];
  for (const q of all) {
    if (!Number.isInteger(q) || q < 0 || q >= qubitCount) throw new RangeError(`${where}: qubit ${q} out of range 0..${qubitCount - 1}`);
  }
  if (new Set(all).size !== all.length) throw new RangeError(`${where}: repeated qubit operand in ${JSON.stringify(all)}`);
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
