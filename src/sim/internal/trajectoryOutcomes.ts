/**
 * trajectoryOutcomes: counts of `shots` simulated runs of a circuit, each drawing its mid-circuit
 * measurement and reset outcomes from the seeded generator (Born rule, renormalising after each).
 */
import type { Circuit } from '../../circuit/types.js';
import { seededRandom } from '../../core/seededRandom.js';
import { StateVector } from '../StateVector.js';
import type { SimulationOptions } from '../SimulationOptions.js';
import { applyUnitaryStream } from './applyFlatOps.js';
import { moveOneToZero, project, scale, weightOfOne } from './collapse.js';
import { flattenForSimulation } from './flattenForSimulation.js';
import { outcomeKey } from './outcomeKey.js';

/** `onProgress(done, shots)` is called after every shot. */
export function trajectoryOutcomes(
  circuit: Circuit,
  qubits: number,
  bits: number,
  shots: number,
  seed: number,
  options: SimulationOptions,
  onProgress?: (done: number, total: number) => void,
): Map<string, number> {
  const random = seededRandom(seed);
  const counts = new Map<string, number>();
  for (let shot = 0; shot < shots; shot++) {
    const state = StateVector.zero(qubits, options);
    const record = new Uint8Array(bits);
    for (const op of flattenForSimulation(circuit, options)) {
      if (op.kind !== 'measure' && op.kind !== 'reset') {
        applyUnitaryStream(state, [op], 'outcomeDistribution', options);
        continue;
      }
      const one = weightOfOne(state, op.qubit);
      const value = random.next() < one ? 1 : 0;
      project(state, op.qubit, value);
      scale(state, 1 / Math.sqrt(value === 1 ? one : 1 - one));
      if (op.kind === 'measure') record[op.bit] = value;
      else if (value === 1) moveOneToZero(state, op.qubit);
    }
    const key = outcomeKey(record);
    counts.set(key, (counts.get(key) ?? 0) + 1);
    onProgress?.(shot + 1, shots);
  }
  return counts;
}
