/**
 * InitialState: a state of the system register that a readout averages over (one ground vector of a possibly
 * degenerate level): the circuit that prepares it from |0…0>, and its amplitudes when known, so a simulator may load
 * them directly instead.
 */
import type { Block } from '../circuit/types.js';

export interface StateAmplitudes {
  /** Real parts over the full 2^n basis (qubit q = bit q of the index). */
  readonly re: Float64Array;
  /** Imaginary parts, same length. */
  readonly im: Float64Array;
}

export interface InitialState {
  /** Short label for reports and file names, e.g. "ground state 0". */
  readonly label: string;
  /** Prepares the state on the system register (local qubit k = mode k) from |0…0>. */
  readonly preparation: Block;
  /** The prepared amplitudes, when known (required to load the state directly). */
  readonly amplitudes?: StateAmplitudes;
}
