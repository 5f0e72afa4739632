// rippleConstantAddition: register += constant (mod 2^width), optionally under one control qubit, by loading the constant
// into a zeroed scratch register (CNOTs from the control, or X gates), a Cuccaro ripple-carry addition, and unloading;
// ripplePairAddition: the same under the AND of two controls, computed into one work qubit and uncomputed.
import { defineConjugatedBlock } from '../circuit/defineBlock.js';
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

/**
 * Ops for register ← register + constant·a·b mod 2^width: one call of a conjugated block `ripple_pair_addition_<width>` on
 * [a, b, and, register, scratch (width), carry] whose compute is ccx(a, b, and) and whose action is rippleConstantAddition
 * controlled by `and` — so a controlled call controls only the addition, and `and` (a work qubit) returns to |0>; on
 * and = 1 at the input it adds constant·(1 ⊕ ab). Returns [] for a constant ≡ 0.
 * @throws RangeError as rippleConstantAddition.
 */
export function ripplePairAddition(constant: number, qubits: Omit<RippleAdditionQubits, 'control'> & { readonly pair: readonly [number, number]; readonly and: number }): UnitaryOp[] {
  const width = qubits.register.length;
  const local = (start: number, size: number): number[] => Array.from({ length: size }, (_, k) => start + k);
  const register = local(3, width);
  const scratch = local(3 + width, width);
  const carry = 3 + 2 * width;
  const addition = rippleConstantAddition(constant, { register, scratch, carry, control: 2 });
  if (addition.length === 0) return [];
  const block = defineConjugatedBlock(
    {
      name: `ripple_pair_addition_${width}`,
      role: `add a constant modulo 2^${width} under the AND of two controls, computed into a work qubit (Cuccaro adder)`,
      qubits: carry + 1,
      workQubits: [2],
    },
    [gate('ccx', [0, 1, 2])],
    addition,
  );
  return [call(block, [...qubits.pair, qubits.and, ...qubits.register, ...qubits.scratch.slice(0, width), qubits.carry])];
}
