// energyArithmetic: the compute ops writing v = Σ_k a_k n_k (+ Σ_j b_j n_p n_q) − sumMin into the energy register and (with
// a window) N = Σ_k n_k into the counter, by the Draper Fourier adder or by Cuccaro ripple-carry additions of constants
// loaded under control; pair terms go through one shared AND qubit.
import { fourierConstantAdder } from '../../arithmetic/fourierConstantAdder.js';
import { rippleConstantAddition, ripplePairAddition } from '../../arithmetic/rippleConstantAddition.js';
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

/** Pair terms b_j n_p n_q: the qubits (p, q) of each, their integer weights, and the one AND qubit they share (|0> in and out). */
export interface PairWeights {
  readonly pairs: readonly (readonly [number, number])[];
  readonly weights: readonly number[];
  readonly and: number;
}

/** register += offset + Σ_k weights[k]·n_k (+ Σ_j pairs.weights[j]·n_p n_q) (mod 2^width), n_k = system[k]. */
export function weightedSumOps(adder: 'qft' | 'ripple', weights: readonly number[], offset: number, q: ArithmeticQubits, pairs?: PairWeights): UnitaryOp[] {
  const width = q.register.length;
  const pairList = pairs?.pairs ?? [];
  if (adder === 'qft') {
    if (pairList.length === 0) {
      const block = fourierConstantAdder(width, weights.length);
      return [call(block, [...q.register, ...q.system], [reduced(offset, width), ...weights.map((a) => reduced(a, width))])];
    }
    // Qubits read only by pair terms follow the weighted ones among the adder's controls.
    const pairOnly = [...new Set(pairList.flat())].filter((p) => !q.system.includes(p));
    const controls = [...q.system, ...pairOnly];
    const index = new Map(controls.map((p, k) => [p, k]));
    const block = fourierConstantAdder(width, weights.length, { pairOnlyControls: pairOnly.length, pairs: pairList.map(([a, b]) => [index.get(a)!, index.get(b)!] as const) });
    const args = [reduced(offset, width), ...weights.map((a) => reduced(a, width)), ...pairs!.weights.map((b) => reduced(b, width))];
    return [call(block, [...q.register, ...controls, pairs!.and], args)];
  }
  const ops: UnitaryOp[] = [];
  const target = { register: q.register, scratch: q.scratch, carry: q.carry };
  weights.forEach((a, k) => ops.push(...rippleConstantAddition(a, { ...target, control: q.system[k]! })));
  pairList.forEach((pair, j) => ops.push(...ripplePairAddition(pairs!.weights[j]!, { ...target, pair, and: pairs!.and })));
  ops.push(...rippleConstantAddition(offset, target));
  return ops;
}
