/**
 * outcomeDistribution: the exact probabilities of a circuit's classical outcomes, from the final
 * state when every measurement is terminal, else by following mid-circuit measurement branches.
 */
import { bitCount, qubitCount } from '../circuit/CircuitBuilder.js';
import type { Circuit } from '../circuit/types.js';
import type { SimulationOptions } from './SimulationOptions.js';
import { NEGLIGIBLE_PROBABILITY, sortedOutcomes, type OutcomeDistribution } from './outcomeTypes.js';
import { branchOutcomes } from './internal/branchOutcomes.js';
import { directOutcomes } from './internal/directOutcomes.js';
import { measurementPlan } from './internal/measurementPlan.js';

export interface OutcomeOptions extends SimulationOptions {
  /** Most measurement branches exact enumeration may follow (default 4096). */
  readonly maxBranches?: number;
}

/** Default cap on live measurement branches. */
export const DEFAULT_MAX_BRANCHES = 4096;

/**
 * Exact outcome distribution of `circuit` run from |0…0>. Classical bit k is bit k of the outcome
 * (keys written most-significant first); a bit never measured stays 0; a reset is a measurement
 * whose result is dropped, followed by a flip to |0> when it was 1. Outcomes of probability below
 * NEGLIGIBLE_PROBABILITY are left out. Throws InputError (a TooManyBranchesError) before simulating
 * when the mid-circuit measurements and resets may give more branches than allowed (`maxBranches`,
 * at most 2^26 amplitudes in all branch states, the planned memory limit), or when a state does not
 * fit in memory.
 */
export function outcomeDistribution(circuit: Circuit, options: OutcomeOptions = {}): OutcomeDistribution {
  const qubits = qubitCount(circuit);
  const bits = bitCount(circuit);
  const plan = measurementPlan(circuit, bits);
  const raw = plan.direct
    ? directOutcomes(circuit, qubits, plan.bitSources, options)
    : branchOutcomes(circuit, qubits, bits, plan.splits, options.maxBranches ?? DEFAULT_MAX_BRANCHES, options);
  return { qubits, bits, outcomes: sortedOutcomes(raw, NEGLIGIBLE_PROBABILITY) };
}
