// fourierConstantAdder: adds offset + Σ_k w_k·c_k (each constant w_k under its own control qubit c_k) and, optionally,
// Σ_j v_j·c_{a_j} c_{b_j} (each pair constant under two controls, through one shared AND qubit) modulo 2^width to a
// register, by phases in Fourier space between one QFT and its inverse (Draper, arXiv:quant-ph/0008033, 2000).
import { param } from '../circuit/angle.js';
import { defineConjugatedBlock } from '../circuit/defineBlock.js';
import { call, gate } from '../circuit/ops.js';
import type { Block, GateOp, UnitaryOp } from '../circuit/types.js';
import { quantumFourierTransform } from './quantumFourierTransform.js';

/** Simulator kernel id of the constant-addition block (src/sim/kernels/constantAdditionKernel.ts). */
export const CONSTANT_ADDITION_KERNEL = 'constant-addition';

/** Pair terms of the adder: constants added when two controls are both 1. */
export interface FourierPairTerms {
  /** Control qubits read only by pair terms, placed after the K weighted controls (default 0). */
  readonly pairOnlyControls?: number;
  /** Each pair (i, j), i ≠ j, indexes the controls c_0 … c_{K+E−1}. */
  readonly pairs: readonly (readonly [number, number])[];
}

/** p(2π·a/2^{q+1}) on each register qubit q, a = parameter `index`, under `controls`. */
function fourierPhases(width: number, index: number, controls: readonly number[]): GateOp[] {
  return Array.from({ length: width }, (_, q) => gate('p', [q], [{ op: 'mul', left: param(index), right: (2 * Math.PI) / 2 ** (q + 1) }], { controls }));
}

/**
 * The block `fourier_pair_phases_<width>(v)` on [register (width), a, b, t]: compute = ccx(a, b, t), action = the Fourier
 * phases of v controlled by t; so with t at |0> it adds v·a·b in Fourier space and leaves t at |0>, and a controlled call
 * controls only the phases.
 */
function fourierPairPhases(width: number): Block {
  const and = width + 2;
  return defineConjugatedBlock(
    {
      name: `fourier_pair_phases_${width}`,
      role: `Fourier-space phases of a constant under the AND of two controls, computed into a work qubit (Draper QFT adder)`,
      qubits: width + 3,
      params: ['v'],
      workQubits: [and],
    },
    [gate('ccx', [width, width + 1, and])],
    fourierPhases(width, 0, [and]),
  );
}

/**
 * The block `fourier_adder_<width>_<controls>(offset, w0, …)` on qubits [register (width, little-endian), c_0 … c_{K−1}]:
 * |x>|c> ↦ |x + offset + Σ_k w_k c_k mod 2^width>|c>. Arguments must be integers. Compute = the QFT without swaps,
 * action = p(2π·a/2^{q+1}) on register qubit q for the offset and, controlled by c_k, for each w_k; so a controlled
 * call controls only the width·(K+1) phases. Simulated in one pass by a native kernel.
 *
 * With `pairTerms` (J ≥ 1 pairs), the block `fourier_pair_adder_<width>_<K>_<E>_<J>(offset, w0, …, v0, …)` on
 * [register, c_0 … c_{K+E−1}, t] also adds Σ_j v_j c_{a_j} c_{b_j}: per pair, inside Fourier space, ccx(c_a, c_b, t), the
 * phases of v_j controlled by t, ccx(c_a, c_b, t) (a fourier_pair_phases call), so one AND qubit t (a work qubit, |0> in
 * and out) serves every pair. On t = 1 at the input each pair adds v_j·(1 ⊕ c_a c_b) instead.
 * @throws RangeError when width < 1, controls < 0 or a pair is not two distinct controls.
 */
export function fourierConstantAdder(width: number, controls: number, pairTerms?: FourierPairTerms): Block {
  if (!Number.isInteger(controls) || controls < 0) throw new RangeError(`fourierConstantAdder: bad control count ${controls}`);
  const register = Array.from({ length: width }, (_, q) => q);
  const qft = quantumFourierTransform(width, { swaps: false });
  const action: UnitaryOp[] = [...fourierPhases(width, 0, [])];
  for (let k = 0; k < controls; k++) action.push(...fourierPhases(width, k + 1, [width + k]));
  const pairs = pairTerms?.pairs ?? [];
  const pairOnly = pairTerms?.pairOnlyControls ?? 0;
  if (pairs.length === 0 && pairOnly === 0) {
    return defineConjugatedBlock(
      {
        name: `fourier_adder_${width}_${controls}`,
        role: `add offset + sum of ${controls} controlled constants modulo 2^${width} (Draper QFT adder)`,
        qubits: width + controls,
        params: ['offset', ...Array.from({ length: controls }, (_, k) => `w${k}`)],
        nativeKernel: CONSTANT_ADDITION_KERNEL,
      },
      [call(qft, register)],
      action,
    );
  }
  if (!Number.isInteger(pairOnly) || pairOnly < 0) throw new RangeError(`fourierConstantAdder: bad pair-only control count ${pairOnly}`);
  const allControls = controls + pairOnly;
  for (const [i, j] of pairs) {
    if (!(Number.isInteger(i) && Number.isInteger(j) && i >= 0 && j >= 0 && i < allControls && j < allControls && i !== j)) {
      throw new RangeError(`fourierConstantAdder: pair (${i}, ${j}) is not two distinct controls of 0…${allControls - 1}`);
    }
  }
  const and = width + allControls;
  const pairBlock = fourierPairPhases(width);
  pairs.forEach(([i, j], k) => action.push(call(pairBlock, [...register, width + i, width + j, and], [param(1 + controls + k)])));
  return defineConjugatedBlock(
    {
      name: `fourier_pair_adder_${width}_${controls}_${pairOnly}_${pairs.length}`,
      role: `add offset + sum of ${controls} controlled and ${pairs.length} pair-controlled constants modulo 2^${width} (Draper QFT adder, one AND qubit)`,
      qubits: and + 1,
      params: ['offset', ...Array.from({ length: controls }, (_, k) => `w${k}`), ...pairs.map((_, k) => `v${k}`)],
      nativeKernel: CONSTANT_ADDITION_KERNEL,
      kernelData: { width: [width], pairs: pairs.flatMap(([i, j]) => [width + i, width + j]), and: [and] },
      workQubits: [and],
    },
    [call(qft, register)],
    action,
  );
}
