/**
 * cleanRegisterLeak: checks that an encoding's `clean` ancilla registers really come back to |0>. The block runs on
 * seeded random states of the system and signal qubits (clean qubits |0>); the leak is the largest norm found outside
 * the clean-|0> subspace (0 up to rounding for a correct compute/uncompute pair).
 */
import { call } from '../circuit/ops.js';
import { randomUnitVector } from '../core/randomUnitVector.js';
import { seededRandom } from '../core/seededRandom.js';
import { ancillaIndicesWithRole, type BlockEncoding } from '../blocks/BlockEncoding.js';
import { StateVector } from '../sim/StateVector.js';
import { applyUnitaryOps } from '../sim/applyUnitaryOps.js';
import type { SimulationOptions } from '../sim/SimulationOptions.js';

export interface CleanLeakOptions extends SimulationOptions {
  /** Number of random input states (default 4). */
  readonly probes?: number;
  readonly seed?: number;
}

export function cleanRegisterLeak(encoding: BlockEncoding, options: CleanLeakOptions = {}): number {
  const clean = ancillaIndicesWithRole(encoding, 'clean');
  if (clean.length === 0) return 0;
  const width = encoding.block.qubits;
  let cleanMask = 0;
  for (const q of clean) cleanMask |= 1 << q;
  const random = seededRandom(options.seed ?? 11);
  let leak = 0;
  for (let p = 0; p < (options.probes ?? 4); p++) {
    const state = StateVector.zero(width, options);
    randomUnitVector(state.re.length, random, cleanMask, state);
    applyUnitaryOps(state, [call(encoding.block, Array.from({ length: width }, (_, k) => k))], options);
    let outside = 0;
    for (let k = 0; k < state.re.length; k++) if ((k & cleanMask) !== 0) outside += state.re[k]! ** 2 + state.im[k]! ** 2;
    leak = Math.max(leak, Math.sqrt(outside));
  }
  return leak;
}
