// energyArithmetic: the compute ops writing v = Σ_k a_k n_k − sumMin into the energy register and (with a window) N = Σ_k n_k
// into the counter, by the Draper Fourier adder or by Cuccaro ripple-carry additions of constants loaded under control.
import { fourierConstantAdder } from '../../arithmetic/fourierConstantAdder.js';
import { rippleConstantAddition } from '../../arithmetic/rippleConstantAddition.js';
import { call } from '../../circuit/ops.js';
import type { UnitaryOp } from '../../circuit/types.js';

export interface ArithmeticQubits {
  readonly system: readonly number[];
  readonly register: readonly number[];
  /** Ripple route only: scratch (≥ register width) and carry qubits. */
  readonly scratch: readonly number[];
  readonly carry: number;
}

/** The constant reduced modulo 2^width into [−2^{width−1}, 2^{width−1}) (smaller Fourier phases, same addition). */
function reduced(value: number, width: number): number {
  const size = 2 ** width;
  const r = ((value % size) + size) % size;
  return r >= size / 2 ? r - size : r;
}

/** register += offset + Σ_k weights[k]·n_k (mod 2^width), n_k = system[k]. */
export function weightedSumOps(adder: 'qft' | 'ripple', weights: readonly number[], offset: number, q: ArithmeticQubits): UnitaryOp[] {
  const width = q.register.length;
  if (adder === 'qft') {
    const block = fourierConstantAdder(width, weights.length);
    return [call(block, [...q.register, ...q.system], [reduced(offset, width), ...weights.map((a) => reduced(a, width))])];
  }
  const ops: UnitaryOp[] = [];
  const target = { register: q.register, scratch: q.scratch, carry: q.carry };
  weights.forEach((a, k) => ops.push(...rippleConstantAddition(a, { ...target, control: q.system[k]! })));
  ops.push(...rippleConstantAddition(offset, target));
  return ops;
}
