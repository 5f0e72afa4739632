/**
 * encodedExpectation: <ψ,0_anc| U |ψ,0_anc> for a block-encoding U and an initial state ψ, by one uncontrolled
 * statevector run — both parts of the quantity a Hadamard test estimates, Re from its plain form, Im from its S† form.
 * ψ comes from simulating its preparation circuit on the system register, or from its amplitudes (`loadState`). The
 * run starts from ψ ⊗ |0_anc> and leaves out of the state every ancilla that only native kernels use as work space
 * (prepareBlockOnZeroAncillas), so it stays small.
 */
import { ancillaIndices, type BlockEncoding } from '../blocks/BlockEncoding.js';
import { call } from '../circuit/ops.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { SimulationOptions } from '../sim/SimulationOptions.js';
import { StateVector } from '../sim/StateVector.js';
import { applyUnitaryOps } from '../sim/applyUnitaryOps.js';
import { prepareBlockOnZeroAncillas } from '../sim/simulateBlockOnZeroAncillas.js';
import type { InitialState, StateAmplitudes } from './InitialState.js';

export interface EncodedExpectationOptions {
  /** Load ψ's amplitudes instead of simulating its preparation (default false). */
  readonly loadState?: boolean;
  readonly simulation?: SimulationOptions;
}

function systemAmplitudes(state: InitialState, qubits: number, options: EncodedExpectationOptions): StateAmplitudes {
  if (options.loadState === true) {
    const amplitudes = state.amplitudes;
    if (amplitudes === undefined) throw new RangeError(`encodedExpectation: ${state.label} has no amplitudes to load`);
    if (amplitudes.re.length !== 2 ** qubits || amplitudes.im.length !== 2 ** qubits) {
      throw new RangeError(`encodedExpectation: ${state.label} has ${amplitudes.re.length} amplitudes, the system needs ${2 ** qubits}`);
    }
    return amplitudes;
  }
  const prepared = StateVector.zero(qubits, options.simulation ?? {});
  applyUnitaryOps(prepared, [call(state.preparation, Array.from({ length: qubits }, (_, k) => k))], options.simulation ?? {});
  return prepared;
}

/**
 * @throws RangeError when `loadState` is set and the state carries no amplitudes, or the sizes disagree;
 *   InputError when the reduced state would not fit in memory.
 */
export function encodedExpectation(encoding: BlockEncoding, state: InitialState, options: EncodedExpectationOptions = {}): ComplexScalar {
  const n = encoding.systemQubits;
  const psi = systemAmplitudes(state, n, options);
  const run = prepareBlockOnZeroAncillas(encoding.block, { ...options.simulation, idleZero: ancillaIndices(encoding) });
  const image = run.run(psi.re, psi.im);
  let re = 0;
  let im = 0;
  for (let u = 0; u < psi.re.length; u++) {
    // conj(ψ_u) · (U|ψ,0>)_u: the system index u with every ancilla 0.
    const k = run.stateIndex(u);
    re += psi.re[u]! * image.re[k]! + psi.im[u]! * image.im[k]!;
    im += psi.re[u]! * image.im[k]! - psi.im[u]! * image.re[k]!;
  }
  return { re, im };
}
