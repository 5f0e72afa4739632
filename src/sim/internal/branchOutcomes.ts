/**
 * branchOutcomes: the exact outcome distribution of a circuit with mid-circuit measurements or
 * resets, by following every outcome branch (unnormalised states, so a branch's weight is its
 * probability); branches of negligible weight are dropped. Before anything is simulated, the
 * measurement plan's bound 2^splits on the branches is held against the cap (maxBranches, at most
 * 2^26 amplitudes in all branch states, and the planned memory limit), and a circuit beyond it is
 * refused with a TooManyBranchesError; the machine's memory is checked before every copy.
 */
import type { Circuit } from '../../circuit/types.js';
import { ensureFits, formatBytes, plannedMemoryLimit } from '../../core/memoryBudget.js';
import { plural } from '../../core/plural.js';
import { StateVector, stateVectorBytes } from '../StateVector.js';
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

/** Outcome weights of `branch` on `qubit`: [weight of 0, weight of 1], each 0 when negligible. */
function outcomeWeights(branch: Branch, qubit: number): [number, number] {
  const one = weightOfOne(branch.state, qubit);
  const zero = branch.weight - one;
  return [zero > NEGLIGIBLE_PROBABILITY ? zero : 0, one > NEGLIGIBLE_PROBABILITY ? one : 0];
}

/**
 * Splits `branch` on `qubit` given its outcome weights: returns the branches for outcome 0 and 1 that
 * carry weight (reusing the branch's state for one of them); `bit` ≥ 0 records the outcome.
 */
function split(branch: Branch, [zero, one]: [number, number], qubit: number, bit: number, reset: boolean, options: SimulationOptions): Branch[] {
  const out: Branch[] = [];
  if (one > 0) {
    const target: Branch = zero > 0 ? { state: branch.state.clone(options), bits: branch.bits.slice(), weight: one } : branch;
    project(target.state, qubit, 1);
    if (bit >= 0) target.bits[bit] = 1;
    if (reset) moveOneToZero(target.state, qubit);
    target.weight = one;
    if (zero > 0) out.push(branch);
    out.push(target);
  }
  if (zero > 0) {
    project(branch.state, qubit, 0);
    if (bit >= 0) branch.bits[bit] = 0;
    branch.weight = zero;
    if (one === 0) out.push(branch);
  }
  return out;
}

/** Most amplitudes all live branch states may hold together (2^26: 1 GiB), which bounds the work per operation. */
export const MAX_BRANCH_AMPLITUDES = 2 ** 26;

/**
 * Most live branches: maxBranches, at most MAX_BRANCH_AMPLITUDES amplitudes in all, and no more
 * states than fit in the planned memory limit (never the machine's, so the choice is reproducible).
 */
function branchCap(qubits: number, maxBranches: number, options: SimulationOptions): { cap: number; reason: string } {
  const bytes = stateVectorBytes(qubits);
  const planned = plannedMemoryLimit(options.memoryLimitBytes);
  const byWork = Math.floor(MAX_BRANCH_AMPLITUDES / 2 ** qubits);
  const byMemory = Math.floor(planned / bytes);
  if (byMemory < Math.min(maxBranches, byWork)) {
    return { cap: Math.max(1, byMemory), reason: `${plural(byMemory, 'state')} of ${plural(qubits, 'qubit')} (${formatBytes(bytes)} each) fill the ${formatBytes(planned)} memory limit` };
  }
  if (byWork < maxBranches) return { cap: Math.max(1, byWork), reason: `branch states may hold 2^26 amplitudes in all: ${plural(byWork, 'state')} of ${plural(qubits, 'qubit')}` };
  return { cap: maxBranches, reason: `the limit of ${plural(maxBranches, 'branch', 'branches')}` };
}

/** `splits`: the measurement plan's count of measurements and resets that may split the state. */
export function branchOutcomes(circuit: Circuit, qubits: number, bits: number, splits: number, maxBranches: number, options: SimulationOptions): Map<string, number> {
  const { cap, reason } = branchCap(qubits, maxBranches, options);
  if (2 ** splits > cap) throw new TooManyBranchesError(cap, `${plural(splits, 'measurement or reset', 'measurements and resets')} may give 2^${splits} branches; ${reason}`);
  let branches: Branch[] = [{ state: StateVector.zero(qubits, options), bits: new Uint8Array(bits), weight: 1 }];
  for (const op of flattenForSimulation(circuit, options)) {
    if (op.kind === 'measure' || op.kind === 'reset') {
      const weights = branches.map((branch) => outcomeWeights(branch, op.qubit));
      const count = weights.reduce((sum, [zero, one]) => sum + (zero > 0 ? 1 : 0) + (one > 0 ? 1 : 0), 0);
      if (count > branches.length) ensureFits((count - branches.length) * stateVectorBytes(qubits), `${plural(count - branches.length, 'new measurement branch', 'new measurement branches')} of ${plural(qubits, 'qubit')}`, options.memoryLimitBytes);
      const bit = op.kind === 'measure' ? op.bit : -1;
      branches = branches.flatMap((branch, k) => split(branch, weights[k] as [number, number], op.qubit, bit, op.kind === 'reset', options));
    } else {
      for (const branch of branches) applyUnitaryStream(branch.state, [op], 'outcomeDistribution', options);
    }
  }
  const outcomes = new Map<string, number>();
  for (const branch of branches) {
    const key = outcomeKey(branch.bits);
    outcomes.set(key, (outcomes.get(key) ?? 0) + branch.weight);
  }
  return outcomes;
}
