/**
 * branchOutcomes: the exact outcome distribution of a circuit with mid-circuit measurements or
 * resets, by following every outcome branch (unnormalised states, so a branch's weight is its
 * probability); branches of negligible weight are dropped, too many live branches are refused.
 */
import type { Circuit } from '../../circuit/types.js';
import { StateVector } from '../StateVector.js';
import type { SimulationOptions } from '../SimulationOptions.js';
import { NEGLIGIBLE_PROBABILITY } from '../outcomeTypes.js';
import { applyUnitaryStream } from './applyFlatOps.js';
import { moveOneToZero, project, weightOfOne } from './collapse.js';
import { flattenForSimulation } from './flattenForSimulation.js';
import { outcomeKey } from './outcomeKey.js';
import { TooManyBranchesError } from './TooManyBranchesError.js';

interface Branch {
  readonly state: StateVector;
  readonly bits: Uint8Array;
  weight: number;
}

/**
 * Splits `branch` on `qubit`: returns the branches for outcome 0 and 1 that carry weight
 * (reusing the branch's state for one of them); `record` sets `bit` to the outcome.
 */
function split(branch: Branch, qubit: number, bit: number, reset: boolean, options: SimulationOptions): Branch[] {
  const one = weightOfOne(branch.state, qubit);
  const zero = branch.weight - one;
  const out: Branch[] = [];
  if (one > NEGLIGIBLE_PROBABILITY && zero > NEGLIGIBLE_PROBABILITY) {
    const copy: Branch = { state: branch.state.clone(options), bits: branch.bits.slice(), weight: one };
    project(copy.state, qubit, 1);
    if (bit >= 0) copy.bits[bit] = 1;
    if (reset) moveOneToZero(copy.state, qubit);
    project(branch.state, qubit, 0);
    if (bit >= 0) branch.bits[bit] = 0;
    branch.weight = zero;
    out.push(branch, copy);
  } else if (one > NEGLIGIBLE_PROBABILITY) {
    project(branch.state, qubit, 1);
    if (bit >= 0) branch.bits[bit] = 1;
    if (reset) moveOneToZero(branch.state, qubit);
    branch.weight = one;
    out.push(branch);
  } else if (zero > NEGLIGIBLE_PROBABILITY) {
    project(branch.state, qubit, 0);
    if (bit >= 0) branch.bits[bit] = 0;
    branch.weight = zero;
    out.push(branch);
  }
  return out;
}

export function branchOutcomes(circuit: Circuit, qubits: number, bits: number, maxBranches: number, options: SimulationOptions): Map<string, number> {
  let branches: Branch[] = [{ state: StateVector.zero(qubits, options), bits: new Uint8Array(bits), weight: 1 }];
  for (const op of flattenForSimulation(circuit, options)) {
    if (op.kind === 'measure' || op.kind === 'reset') {
      const next: Branch[] = [];
      for (const branch of branches) {
        next.push(...split(branch, op.qubit, op.kind === 'measure' ? op.bit : -1, op.kind === 'reset', options));
        if (next.length > maxBranches) throw new TooManyBranchesError(maxBranches);
      }
      branches = next;
    } else {
      for (const branch of branches) applyUnitaryStream(branch.state, [op], 'outcomeDistribution');
    }
  }
  const outcomes = new Map<string, number>();
  for (const branch of branches) {
    const key = outcomeKey(branch.bits);
    outcomes.set(key, (outcomes.get(key) ?? 0) + branch.weight);
  }
  return outcomes;
}
