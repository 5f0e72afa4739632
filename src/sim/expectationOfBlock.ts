/**
 * expectationOfBlock: <ψ|U|ψ> for a block U applied to chosen qubits of a state ψ (the state is
 * left unchanged; the product is computed on a copy).
 */
import { call } from '../circuit/ops.js';
import type { Block } from '../circuit/types.js';
import type { SimulationOptions } from './SimulationOptions.js';
import type { StateVector } from './StateVector.js';
import { applyUnitaryOps } from './applyUnitaryOps.js';

/** Returns <ψ|U|ψ> as { re, im }, U = `block`(args) on the state's `qubits` (local qubit k → qubits[k]). */
export function expectationOfBlock(
  state: StateVector,
  block: Block,
  qubits: readonly number[],
  args: readonly number[] = [],
  options: SimulationOptions = {},
): { re: number; im: number } {
  const image = state.clone(options);
  applyUnitaryOps(image, [call(block, qubits, args)], options);
  let re = 0;
  let im = 0;
  const a = state;
  for (let i = 0; i < a.re.length; i++) {
    // conj(ψ_i) · (Uψ)_i
    re += a.re[i]! * image.re[i]! + a.im[i]! * image.im[i]!;
    im += a.re[i]! * image.im[i]! - a.im[i]! * image.re[i]!;
  }
  return { re, im };
}
