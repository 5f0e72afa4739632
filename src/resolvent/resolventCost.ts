/**
 * resolventCost: the report of resolventEncoding without building the polynomial, its phases or the QSVT circuit, for
 * costing models and shifts whose degree is too high to build: the factor encodings are built (no dense matrices), the
 * degree is Childs–Kothari–Somma's truncation bound at the same δ and ε (inverseDegreeBound, an upper bound on the built
 * degree), α of the inverse is 1/(s α_M) with s ≈ supTarget·δ, and the error bound uses s < δ.
 */
import { ancillaQubits, ancillaRoles, type BlockEncoding } from '../blocks/BlockEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import { inverseDegreeBound } from '../qsvt/inverseDegreeBound.js';
import { relativeInverseError } from '../qsvt/qsvtInverse.js';
import { planResolvent, type ResolventOptions } from './internal/planResolvent.js';
import type { ResolventReport } from './ResolventReport.js';

function roleCount(encoding: BlockEncoding, role: 'signal' | 'clean'): number {
  return ancillaRoles(encoding).filter((r) => r === role).length;
}

/** @throws RangeError as resolventEncoding, except for the degree cap. */
export function resolventCost(model: FermionModel, w: ComplexScalar, options: ResolventOptions): ResolventReport {
  const plan = planResolvent(model, w, options, 'resolventCost');
  const { M, F } = plan;
  const K = plan.conditionBound;
  const degree = inverseDegreeBound(plan.delta, relativeInverseError(plan.delta, plan.polynomialError));
  const alphaInverse = 1 / ((options.supTarget ?? 0.5) * plan.delta * M.alpha);
  const inputPropagation = M.errorBound * M.alpha * K;
  const inverseError = plan.polynomialError + inputPropagation;
  const eF = F?.errorBound ?? 0;
  const errorBound = F ? eF + (1 + eF) * inverseError : inverseError;
  const total = F ? alphaInverse * F.alpha : alphaInverse;
  // Ancillas: M's and the QSVT qubit; with F, the product keeps both signal parts and shares one clean pool.
  const inverseSignal = roleCount(M, 'signal') + 1;
  const ancilla = F ? inverseSignal + roleCount(F, 'signal') + Math.max(roleCount(M, 'clean'), roleCount(F, 'clean')) : ancillaQubits(M) + 1;
  return {
    route: options.route,
    w,
    window: plan.window,
    precision: options.precision,
    split: plan.split,
    conditionBound: K,
    normBoundM: plan.normBoundM,
    normBoundB: plan.B?.alpha ?? null,
    alphas: { fastInverse: F?.alpha ?? null, B: plan.B?.alpha ?? null, M: M.alpha, inverse: alphaInverse, total },
    delta: plan.delta,
    scale: null,
    degree,
    degreeSource: 'truncation bound',
    queries: { M: degree, fastInverse: F ? degree + 1 : 0, B: plan.B ? degree : 0, H: plan.H ? degree : 0 },
    errorParts: { polynomial: plan.polynomialError, phases: 0, inputPropagation, fastInverse: eF },
    errorBound,
    errorBoundOperator: errorBound * total,
    qubits: { system: model.modes, ancilla, total: model.modes + ancilla },
    fastInverseBits: F?.registerBits ?? null,
    estimated: true,
  };
}
