/**
 * resolventCheckRows: the four QSVT inverse rows of `polewright check` ((w − H)⁻¹ by the preconditioned and the direct
 * route, at the particle and the hole shift; resolventCheckPlans), each verified against a reference built independently of
 * the circuit — the sector's block of w − H, with H applied from the model's fermion terms, inverted by Gauss–Jordan
 * elimination — on the basis columns of the Green's-function sector (N + 1 or N − 1 electrons), where the readout uses
 * them; H conserves the electron number, so those columns of (w − H)⁻¹ lie inside the sector. The preconditioned rows are
 * built on that sector's electron window with K = ‖M⁻¹‖ computed exactly there (sectorConditionNumber, padded by 1e-9
 * relative against rounding) when it is below the a-priori 1 + ‖B'‖/|Im w|: on a small model the check can afford the exact
 * norm, which keeps the polynomial degree to what the instance needs. A row whose encoding cannot be built (its degree beyond
 * the cap, an unreachable precision) is skipped with the reason. A row whose whole sequence is too costly to simulate column
 * by column is checked by the qubitized method instead (qubitizedResolventRow), or skipped when that too is beyond the limits.
 */
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import { identityShiftOfB } from '../resolvent/planResolvent.js';
import { resolventCheckPlans } from '../resolvent/resolventCheckEncodings.js';
import { checkItem, type CheckLimits } from './checkModelBlocks.js';
import { unbuiltRow, type CheckRow } from './encodingCheck.js';
import { fockOperatorMatrix, MAX_DENSE_FOCK_MODES, modelFockTerms } from './internal/fockOperatorMatrix.js';
import { sectorConditionNumber } from './internal/sectorConditionNumber.js';
import { sectorResolvent } from './internal/sectorResolvent.js';
import { sectorStates } from './inversionCheckItems.js';
import { qubitizedResolventRow } from './qubitizedResolventRow.js';
import { denseReference, type ReferenceOperator } from './verifyEncoding.js';

export interface ResolventCheckRowOptions {
  readonly E0: number;
  readonly z: ComplexScalar;
}

/** The rows in the order of resolventCheckPlans, each encoding built with ε = thresholds.precision. */
export function resolventCheckRows(model: FermionModel, options: ResolventCheckRowOptions, thresholds: CheckLimits): CheckRow[] {
  const n = model.modes;
  const plans = resolventCheckPlans(model, { E0: options.E0, z: options.z, precision: thresholds.precision });
  if (n > MAX_DENSE_FOCK_MODES) return plans.map((p) => unbuiltRow(p.label, n, `no dense reference above ${MAX_DENSE_FOCK_MODES} modes`));
  let hamiltonian: ReturnType<typeof fockOperatorMatrix> | undefined;
  let oneBody: ReturnType<typeof fockOperatorMatrix> | undefined;
  const denseH = () => (hamiltonian ??= fockOperatorMatrix(modelFockTerms(model, 'all'), n));
  const denseA = () => (oneBody ??= fockOperatorMatrix(modelFockTerms(model, 'A'), n));
  return plans.map((plan) => {
    const states = sectorStates(n, plan.electrons);
    let encoding;
    try {
      if (plan.route === 'preconditioned') {
        const exact = sectorConditionNumber(denseH(), denseA(), plan.w, identityShiftOfB(model), plan.electrons, states);
        encoding = plan.build({ electrons: plan.electrons, conditionBound: Math.max(1, exact * (1 + 1e-9)) });
      } else {
        encoding = plan.build();
      }
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      return unbuiltRow(plan.label, n, `not built: ${error.message}`);
    }
    let referenceOperator: ReferenceOperator | undefined;
    const reference = () => (referenceOperator ??= denseReference(sectorResolvent(denseH(), plan.w, { min: plan.electrons, max: plan.electrons })));
    const whole = checkItem({ encoding, reference, columns: states }, thresholds);
    return whole.verdict === 'skipped' ? qubitizedResolventRow(encoding, reference, states, thresholds, whole.reason ?? 'not simulated whole') : whole;
  });
}
