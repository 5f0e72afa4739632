/**
 * prepareAmplitudes: a block taking |0…0> to Σ_k a_k |k> exactly, by a cascade of uniformly
 * controlled y-rotations (magnitudes) and z-rotations (phases) plus one global phase
 * (Möttönen et al., Quantum Inf. Comput. 5, 467, 2005). Real non-negative amplitudes need no phases,
 * and then the CNOT count is 2^m − 2.
 */
import { defineBlock } from '../circuit/defineBlock.js';
import { gate } from '../circuit/ops.js';
import type { Block, UnitaryOp } from '../circuit/types.js';
import { uniformlyControlledRotation } from './uniformlyControlledRotation.js';

export interface PrepareOptions {
  readonly name?: string;
  readonly role?: string;
  /** Relative tolerance on the norm (default 1e-10). */
  readonly normTolerance?: number;
  /** Largest register accepted (default MAX_PREPARED_QUBITS; an LCU's PREPARE allows MAX_LCU_INDEX_QUBITS). */
  readonly maxQubits?: number;
}

/** Largest register prepareAmplitudes accepts by default (the exact preparation of a simulated state). */
export const MAX_PREPARED_QUBITS = 14;
/** Largest index register of an LCU's PREPARE: 2^22 terms, built in O(22·2^22) for costing, far beyond simulation. */
export const MAX_LCU_INDEX_QUBITS = 22;

/**
 * @param re real parts, length 2^m (1 ≤ m ≤ options.maxQubits, default 14); qubit q is bit q of the index.
 * @param im imaginary parts (omit for a real state).
 * @throws RangeError when the length is not a power of two or the vector is not normalised.
 */
export function prepareAmplitudes(re: ArrayLike<number>, im?: ArrayLike<number>, options: PrepareOptions = {}): Block {
  const size = re.length;
  const m = Math.log2(size);
  const maxQubits = options.maxQubits ?? MAX_PREPARED_QUBITS;
  if (!Number.isInteger(m) || m < 1 || m > maxQubits) {
    throw new RangeError(`prepareAmplitudes: length ${size} is not 2^m with 1 ≤ m ≤ ${maxQubits}`);
  }
  if (im && im.length !== size) throw new RangeError('prepareAmplitudes: re and im lengths differ');
  const weights = new Float64Array(size);
  const phases = new Float64Array(size);
  let norm = 0;
  for (let k = 0; k < size; k++) {
    const r = re[k] as number;
    const i = im ? (im[k] as number) : 0;
    weights[k] = r * r + i * i;
    phases[k] = weights[k] === 0 ? 0 : Math.atan2(i, r);
    norm += weights[k] as number;
  }
  if (!(Math.abs(norm - 1) <= (options.normTolerance ?? 1e-10))) {
    throw new RangeError(`prepareAmplitudes: squared norm is ${norm}, not 1`);
  }
  const ops: UnitaryOp[] = [];
  // Magnitudes: qubit q (from the top) rotated under control of qubits q+1 … m−1.
  for (let q = m - 1; q >= 0; q--) {
    const controls = Array.from({ length: m - 1 - q }, (_, b) => q + 1 + b);
    const alphas: number[] = [];
    for (let h = 0; h < 1 << controls.length; h++) {
      let p0 = 0;
      let p1 = 0;
      for (let low = 0; low < 1 << q; low++) {
        p0 += weights[(h << (q + 1)) | low] as number;
        p1 += weights[(h << (q + 1)) | (1 << q) | low] as number;
      }
      alphas.push(2 * Math.atan2(Math.sqrt(p1), Math.sqrt(p0)));
    }
    ops.push(...uniformlyControlledRotation('y', alphas, controls, q));
  }
  // Phases: relative phase of each pair by rz, the pair's mean phase passed up one level.
  let level: Float64Array = phases;
  for (let q = 0; q < m; q++) {
    const controls = Array.from({ length: m - 1 - q }, (_, b) => q + 1 + b);
    const half = level.length / 2;
    const differences: number[] = [];
    const means = new Float64Array(half);
    for (let h = 0; h < half; h++) {
      differences.push((level[2 * h + 1] as number) - (level[2 * h] as number));
      means[h] = ((level[2 * h] as number) + (level[2 * h + 1] as number)) / 2;
    }
    ops.push(...uniformlyControlledRotation('z', differences, controls, q));
    level = means;
  }
  const globalPhase = level[0] as number;
  if (globalPhase !== 0) ops.push(gate('gphase', [], [globalPhase]));
  return defineBlock(
    { name: options.name ?? 'prepare_amplitudes', role: options.role ?? `prepare a given ${m}-qubit state from |0>`, qubits: m },
    ops,
  );
}
