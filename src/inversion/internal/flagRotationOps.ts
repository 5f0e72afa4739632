// flagRotationOps: the action of the fast inverse — the flag rotation over the energy register, either one multiplexed
// ry and rz over all 2^m values (exact) or one multi-controlled ry/rz pair per dyadic interval (pruned), gated by the
// window qubit (flag sent to |1> outside the electron-number window).
import { gate } from '../../circuit/ops.js';
import type { UnitaryOp } from '../../circuit/types.js';
import { multiplexedRotation } from '../../blocks/multiplexedRotation.js';
import { flagAngles, occupied, type RegisterEnergies } from './flagAmplitude.js';
import { flagIntervals } from './flagIntervals.js';
import { controlListsFor } from './flagControlLists.js';

export interface FlagRotation {
  readonly ops: UnitaryOp[];
  /** Number of rotation pairs (2^m for the multiplexor). */
  readonly rotations: number;
  /** Bound on max_v |amplitude(v) − f(v)| from merging values into intervals (0 for the multiplexor). */
  readonly piecewiseError: number;
}

export function flagRotationOps(
  mode: 'pruned' | 'multiplexed',
  energies: RegisterEnergies,
  register: readonly number[],
  flag: number,
  windowQubit: number | undefined,
  budget: number,
): FlagRotation {
  const gateControls = windowQubit === undefined ? [] : [windowQubit];
  const outside: UnitaryOp[] = windowQubit === undefined ? [] : [gate('x', [flag], [], { negControls: [windowQubit] })];
  const m = register.length;
  if (mode === 'multiplexed') {
    const thetas: number[] = [];
    const lambdas: number[] = [];
    for (let v = 0; v < 2 ** m; v++) {
      const { theta, lambda } = occupied(energies, v) ? flagAngles(energies, v) : { theta: 0, lambda: 0 };
      thetas.push(theta);
      lambdas.push(lambda);
    }
    const ops: UnitaryOp[] = [
      ...outside,
      multiplexedRotation('y', thetas, register, flag, { controls: gateControls }),
      multiplexedRotation('z', lambdas, register, flag, { controls: gateControls }),
    ];
    return { ops, rotations: 2 ** m, piecewiseError: 0 };
  }
  const intervals = flagIntervals(energies, m, budget);
  const ops: UnitaryOp[] = [...outside];
  // Every rotation acts on the flag alone: one operand list serves them all (ops are never changed after construction).
  const target = [flag];
  const controlLists = controlListsFor(energies, register, gateControls);
  let piecewiseError = 0;
  for (const interval of intervals) {
    const { controls, negControls } = controlLists(interval.start, interval.level);
    const { theta, lambda } = flagAngles(energies, interval.representative);
    if (theta !== 0) ops.push(gate('ry', target, [theta], { controls, negControls }));
    if (lambda !== 0) ops.push(gate('rz', target, [lambda], { controls, negControls }));
    piecewiseError = Math.max(piecewiseError, interval.error);
  }
  return { ops, rotations: intervals.length, piecewiseError };
}
