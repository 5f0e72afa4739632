/**
 * sampleCircuitOutcomes: counts of `shots` runs of a circuit, drawn with a seeded generator from the
 * exact outcome distribution, or shot by shot along sampled trajectories when the exact
 * distribution would need too many measurement branches.
 */
import { bitCount, qubitCount } from '../circuit/CircuitBuilder.js';
import type { Circuit } from '../circuit/types.js';
import { sortedOutcomes, type OutcomeDistribution } from './outcomeTypes.js';
import { outcomeDistribution, type OutcomeOptions } from './outcomeDistribution.js';
import { sampleOutcomes } from './sampleOutcomes.js';
import { isTooManyBranchesError } from './internal/TooManyBranchesError.js';
import { trajectoryOutcomes } from './internal/trajectoryOutcomes.js';

export interface SamplingOptions extends OutcomeOptions {
  /** Called with (shots drawn, shots) as sampling proceeds, for a progress display. */
  readonly onProgress?: (done: number, total: number) => void;
}

/**
 * Returns outcome counts summing to `shots` (keys as in outcomeDistribution, zero counts left out).
 * The same circuit, shots and seed always give the same counts.
 */
export function sampleCircuitOutcomes(circuit: Circuit, shots: number, seed: number, options: SamplingOptions = {}): OutcomeDistribution {
  let exact: OutcomeDistribution;
  try {
    exact = outcomeDistribution(circuit, options);
  } catch (error) {
    if (!isTooManyBranchesError(error)) throw error;
    const counts = trajectoryOutcomes(circuit, qubitCount(circuit), bitCount(circuit), shots, seed, options, options.onProgress);
    return { qubits: qubitCount(circuit), bits: bitCount(circuit), outcomes: sortedOutcomes(counts, 0) };
  }
  const keys = [...exact.outcomes.keys()];
  const counts = sampleOutcomes([...exact.outcomes.values()], shots, seed, options.onProgress);
  return { ...exact, outcomes: sortedOutcomes(new Map(keys.map((key, x) => [key, counts[x]!])), 0) };
}
