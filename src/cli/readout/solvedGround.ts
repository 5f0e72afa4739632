/**
 * solvedGround: the exact solver's ground level turned into readout inputs — E0 and one InitialState per ground
 * vector (full-basis amplitudes plus their exact state-preparation circuit), refusing models whose Fock space the
 * preparation cannot hold.
 */
import { InputError } from '../../core/InputError.js';
import { MAX_PREPARED_QUBITS } from '../../blocks/prepareAmplitudes.js';
import { groundLevel, type GroundLevel } from '../../exact/groundLevel.js';
import type { FermionModel } from '../../model/FermionModel.js';
import type { InitialState } from '../../readout/InitialState.js';
import { preparedStates } from '../../readout/preparedStates.js';
import { groundStateVectors } from './groundStateVectors.js';

export interface SolvedGround {
  readonly level: GroundLevel;
  readonly energy: number;
  readonly states: readonly InitialState[];
  /** For reports: "exact ground state" or "exact ground level (d states, averaged with equal weights)". */
  readonly description: string;
}

/**
 * @param hint appended to the refusal of a model with more than 14 modes (e.g. how to build without solving).
 * @param solved the model's ground level when the caller has already solved it.
 * @throws InputError for more than 14 modes, or when the solver refuses (memory).
 */
export function solvedGround(model: FermionModel, hint = '', solved?: GroundLevel): SolvedGround {
  if (model.modes > MAX_PREPARED_QUBITS) {
    throw new InputError(
      `${model.name}: ${model.modes} modes, but the exact ground-state preparation handles at most ${MAX_PREPARED_QUBITS}${hint}`,
    );
  }
  const level = solved ?? groundLevel(model);
  const states = preparedStates(groundStateVectors(level, model.modes));
  const description = states.length === 1
    ? 'exact ground state'
    : `exact ground level (${states.length} states, averaged with equal weights)`;
  return { level, energy: level.energy, states, description };
}
