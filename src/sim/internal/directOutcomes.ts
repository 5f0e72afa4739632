/**
 * directOutcomes: the outcome distribution of a circuit whose measurements are all terminal — run
 * the unitary part once, then read the marginal of the measured qubits.
 */
import type { Circuit } from '../../circuit/types.js';
import type { FlatOp } from '../../circuit/flatten.js';
import { ensureFits } from '../../core/memoryBudget.js';
import type { SimulationOptions } from '../SimulationOptions.js';
import { StateVector } from '../StateVector.js';
import { probabilities } from '../probabilities.js';
import { applyUnitaryStream } from './applyFlatOps.js';
import { flattenForSimulation } from './flattenForSimulation.js';
import { outcomeKey } from './outcomeKey.js';

function* unitaryPart(ops: Iterable<FlatOp>): Generator<FlatOp> {
  for (const op of ops) if (op.kind !== 'measure' && op.kind !== 'reset') yield op;
}

export function directOutcomes(circuit: Circuit, qubits: number, bitSources: Int32Array, options: SimulationOptions): Map<string, number> {
  const state = StateVector.zero(qubits, options);
  applyUnitaryStream(state, unitaryPart(flattenForSimulation(circuit, options)), 'outcomeDistribution', options);
  const measured = [...new Set([...bitSources].filter((q) => q >= 0))].sort((a, b) => a - b);
  ensureFits(8 * 2 ** measured.length, `the distribution of ${measured.length} measured qubits`, options.memoryLimitBytes);
  const marginal = probabilities(state, measured);
  const slot = bitSources.map((q) => measured.indexOf(q));
  const bits = new Uint8Array(bitSources.length);
  const outcomes = new Map<string, number>();
  for (let x = 0; x < marginal.length; x++) {
    const p = marginal[x]!;
    if (p === 0) continue;
    for (let b = 0; b < bits.length; b++) bits[b] = slot[b]! >= 0 ? (x >>> slot[b]!) & 1 : 0;
    const key = outcomeKey(bits);
    outcomes.set(key, (outcomes.get(key) ?? 0) + p);
  }
  return outcomes;
}
