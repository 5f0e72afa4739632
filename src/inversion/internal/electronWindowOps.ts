// electronWindowOps: the compute ops of an electron-number window — N = Σ_k n_k into a counter, then the window qubit set
// to 1 when Nmin ≤ N ≤ Nmax (one multi-controlled X per electron number in the window).
import { gate } from '../../circuit/ops.js';
import type { UnitaryOp } from '../../circuit/types.js';
import { weightedSumOps } from './energyArithmetic.js';
import type { Window } from './energyGrid.js';

export interface WindowQubits {
  readonly system: readonly number[];
  readonly counter: readonly number[];
  readonly windowQubit: number;
  /** Ripple route only: scratch (≥ counter width) and carry qubits. */
  readonly scratch: readonly number[];
  readonly carry: number;
}

export function electronWindowOps(adder: 'qft' | 'ripple', window: Window, q: WindowQubits): UnitaryOp[] {
  const ops = weightedSumOps(adder, q.system.map(() => 1), 0, { system: q.system, register: q.counter, scratch: q.scratch, carry: q.carry });
  for (let N = window.min; N <= window.max; N++) {
    const controls = q.counter.filter((_, b) => Math.floor(N / 2 ** b) % 2 === 1);
    const negControls = q.counter.filter((_, b) => Math.floor(N / 2 ** b) % 2 === 0);
    ops.push(gate('x', [q.windowQubit], [], { controls, negControls }));
  }
  return ops;
}
