/**
 * resolventEncoding: a block-encoding of the resolvent (w − H)⁻¹ of a model, by one of two routes, with a report of its
 * cost and a rigorous error bound (planResolvent explains the routes, K and the split of the precision):
 * - preconditioned: productEncoding([QSVT inverse of M = I − (w − A)⁻¹B, fastInverse (w − A)⁻¹]) = M⁻¹(w − A)⁻¹ = (w − H)⁻¹;
 * - direct: the QSVT inverse of directShift (w − H).
 * `exact()` is computed independently of the circuit (denseResolvent); with an electron window it is P (w − H)⁻¹ P.
 */
import { ancillaQubits, memoiseMatrix, type BlockEncoding } from '../blocks/BlockEncoding.js';
import { productEncoding } from '../blocks/combine/productEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import { qsvtInverse, type QsvtInverseEncoding } from '../qsvt/qsvtInverse.js';
import { denseResolvent } from './internal/denseResolvent.js';
import { planResolvent, type ResolventOptions } from './planResolvent.js';
import type { ResolventReport } from './ResolventReport.js';

export type { ResolventOptions } from './planResolvent.js';

export interface ResolventEncoding extends BlockEncoding {
  readonly report: ResolventReport;
  /** The factors: the block is `inverse` alone (direct) or `inverse` after `fastInverse` (preconditioned). */
  readonly parts: { readonly inverse: QsvtInverseEncoding; readonly fastInverse: BlockEncoding | null };
}

/**
 * @throws RangeError naming the value for Im w = 0, a precision ε outside (0, 1), δ ≤ 0, a degree beyond the cap
 *   (options.maxDegree, default 20,000), or a precision the fast inverse cannot reach.
 */
export function resolventEncoding(model: FermionModel, w: ComplexScalar, options: ResolventOptions): ResolventEncoding {
  const plan = planResolvent(model, w, options, 'resolventEncoding');
  const inverse = qsvtInverse(plan.M, {
    conditionBound: plan.conditionBound,
    polynomialError: plan.polynomialError,
    ...(options.supTarget !== undefined ? { supTarget: options.supTarget } : {}),
    ...(options.maxDegree !== undefined ? { maxDegree: options.maxDegree } : {}),
    label: `(${plan.M.label})^-1`,
  });
  const whole = plan.F ? productEncoding([inverse, plan.F]) : inverse;
  const label = options.label ?? `(w - H)^-1, ${options.route}`;
  const queriesM = inverse.queries.forward + inverse.queries.adjoint;
  const fastInverseError = plan.F?.errorBound ?? 0;
  const report: ResolventReport = {
    route: options.route,
    w,
    window: plan.window,
    precision: plan.precision,
    requestedPrecision: options.precision,
    split: plan.split,
    conditionBound: plan.conditionBound,
    conditionSource: plan.conditionSource,
    aPrioriConditionBound: plan.aPrioriConditionBound,
    bShift: plan.shift,
    bEncoding: plan.bEncoding,
    normBoundM: plan.normBoundM,
    normBoundB: plan.B?.alpha ?? null,
    alphas: { fastInverse: plan.F?.alpha ?? null, B: plan.B?.alpha ?? null, M: plan.M.alpha, inverse: inverse.alpha, total: whole.alpha },
    delta: inverse.delta,
    scale: inverse.scale,
    degree: inverse.degree,
    degreeSource: 'measured',
    queries: { M: queriesM, fastInverse: plan.F ? queriesM + 1 : 0, B: plan.B ? queriesM : 0, H: plan.H ? queriesM : 0 },
    errorParts: { ...inverse.errorParts, fastInverse: fastInverseError },
    errorBound: whole.errorBound,
    errorBoundOperator: whole.errorBound * whole.alpha,
    qubits: { system: whole.systemQubits, ancilla: ancillaQubits(whole), total: whole.block.qubits },
    fastInverseBits: plan.F?.registerBits ?? null,
    estimated: false,
  };
  return {
    ...whole,
    label,
    exact: memoiseMatrix(() => denseResolvent(model, w, plan.window)),
    report,
    parts: { inverse, fastInverse: plan.F },
  };
}
