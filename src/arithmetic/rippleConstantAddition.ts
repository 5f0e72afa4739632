// rippleConstantAddition: register += constant (mod 2^width), optionally under one control qubit, by loading the constant
// into a zeroed scratch register (CNOTs from the control, or X gates), a Cuccaro ripple-carry addition, and unloading.
import { call, gate } from '../circuit/ops.js';
import type { GateOp, UnitaryOp } from '../circuit/types.js';
import { cuccaroAdder } from './cuccaroAdder.js';

export interface RippleAdditionQubits {
  /** The target register, little-endian (its length is the width). */
  readonly register: readonly number[];
  /** At least as many scratch qubits as the register; must hold 0 and are returned to 0. */
  readonly scratch: readonly number[];
  /** The adder's carry qubit; must hold 0 and is returned to 0. */
  readonly carry: number;
  /** Control qubit: the addition happens only when it is 1 (omit for an unconditional addition). */
  readonly control?: number;
}

/**
 * Ops for register ← register + constant mod 2^width: for each set bit j of constant mod 2^width, cx(control → scratch_j)
 * (x without a control), then cuccaroAdder(width) on [scratch, register, carry], then the same loads again. With the
 * control at 0 the scratch stays 0 and the adder adds nothing, so only the loads are controlled (Cuccaro et al.,
 * arXiv:quant-ph/0410184, 2004). Returns [] for a constant ≡ 0.
 * @throws RangeError when the constant is not an integer or the scratch register is too short.
 */
export function rippleConstantAddition(constant: number, qubits: RippleAdditionQubits): UnitaryOp[] {
  const width = qubits.register.length;
  if (!Number.isSafeInteger(constant)) throw new RangeError(`rippleConstantAddition: constant ${constant} is not an integer`);
  if (qubits.scratch.length < width) throw new RangeError('rippleConstantAddition: scratch register shorter than the target');
  const size = 2 ** width;
  const value = ((constant % size) + size) % size;
  if (value === 0) return [];
  const loads: GateOp[] = [];
  for (let j = 0; j < width; j++) {
    if (Math.floor(value / 2 ** j) % 2 === 1) {
      const s = qubits.scratch[j] as number;
      loads.push(qubits.control === undefined ? gate('x', [s]) : gate('cx', [qubits.control, s]));
    }
  }
  const adder = call(cuccaroAdder(width), [...qubits.scratch.slice(0, width), ...qubits.register, qubits.carry]);
  return [...loads, adder, ...loads];
}
