/**
 * preparedStates: InitialStates from full-basis amplitude vectors, each prepared by the exact state-preparation
 * circuit (prepareAmplitudes), e.g. the vectors of a degenerate ground level.
 */
import { MAX_PREPARED_QUBITS, prepareAmplitudes } from '../blocks/prepareAmplitudes.js';
import type { InitialState, StateAmplitudes } from './InitialState.js';

/**
 * @param vectors normalised vectors of length 2^n (1 ≤ n ≤ 14), qubit q = bit q of the index.
 * @throws RangeError when a length is not 2^n with 1 ≤ n ≤ MAX_PREPARED_QUBITS or a vector is not normalised.
 */
export function preparedStates(vectors: readonly StateAmplitudes[], label = 'ground state'): InitialState[] {
  return vectors.map((amplitudes, index) => {
    const qubits = Math.log2(amplitudes.re.length);
    if (!Number.isInteger(qubits) || qubits < 1 || qubits > MAX_PREPARED_QUBITS) {
      throw new RangeError(`preparedStates: vector ${index} has length ${amplitudes.re.length}, not 2^n with 1 ≤ n ≤ ${MAX_PREPARED_QUBITS}`);
    }
    return {
      label: `${label} ${index}`,
      preparation: prepareAmplitudes(amplitudes.re, amplitudes.im, {
        name: `prepare_state_${index}`,
        role: `prepare ${label} ${index} exactly from |0…0>`,
      }),
      amplitudes,
    };
  });
}
