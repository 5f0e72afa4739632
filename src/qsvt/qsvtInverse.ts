/**
 * qsvtInverse: a block-encoding of M⁻¹ from a block-encoding of M (α_M, error bound e_M) and a rigorous bound K ≥ ‖M⁻¹‖,
 * by QSVT with an odd polynomial p ≈ s/x on δ ≤ |x| ≤ 1 (inverseApproximation) applied to the adjoint encoding: for
 * M' = M/α_M = W Σ V†, p^{(SV)}(M'†) = V p(Σ) W† ≈ s M'⁻¹ (Gilyén, Su, Low & Wiebe, STOC 2019, Sec. 3.5; Martyn, Rossi,
 * Tan & Chuang, PRX Quantum 2, 040203, 2021, Sec. V.C), so the result encodes M⁻¹ with α = 1/(s α_M).
 *
 * Error bound (projected-block units). The circuit computes exactly p̃ applied to the actual projected block M̃' of the
 * input (‖M̃' − M'‖ ≤ e_M), where p̃ is the polynomial the phases realise (sup |p̃ − p| ≤ phaseErrorBound). With
 * δ = 1/(α_M K) − e_M > 0, σ_min(M̃') ≥ σ_min(M') − e_M ≥ δ, so ‖p(M̃'†) − s M̃'⁻¹‖ ≤ errorBound(p); and
 * s ‖M̃'⁻¹ − M'⁻¹‖ = s ‖M̃'⁻¹ (M' − M̃') M'⁻¹‖ ≤ s e_M (1/δ)(α_M K). Total: the polynomial's certified error bound
 * (inverseApproximation.errorBound) + phaseErrorBound + s e_M α_M K/δ.
 */
import { memoiseMatrix, type BlockEncoding } from '../blocks/BlockEncoding.js';
import { adjointEncoding } from '../blocks/combine/adjointEncoding.js';
import { adjointMatrix } from '../linalg/adjointMatrix.js';
import { matrixFunctionOfSingularValues } from '../linalg/singularValueTransform.js';
import { evaluateChebyshev } from '../polynomial/evaluateChebyshev.js';
import { inverseApproximation, type InverseApproximation } from '../polynomial/inverseApproximation.js';
import { qspPhases } from '../polynomial/qspPhases.js';
import { qsvtEncoding, type QsvtEncoding } from './qsvtEncoding.js';

/** Default cap on the degree of an inverse polynomial whose phases are computed (phase finding costs O(d²) per step). */
export const MAX_INVERSE_DEGREE = 20_000;

export interface QsvtInverseOptions {
  /** K ≥ ‖M⁻¹‖, rigorous. */
  readonly conditionBound: number;
  /** Target for max |p(x) − s/x| over δ ≤ |x| ≤ 1, in projected-block units (the polynomial's share of the error). */
  readonly polynomialError: number;
  /** sup |p| on [−1, 1] (default 0.5); α = 1/(s α_M) with s ≈ supTarget·δ. */
  readonly supTarget?: number;
  /** Cap on the degree (default MAX_INVERSE_DEGREE). */
  readonly maxDegree?: number;
  /** Tolerance of the phase finder's measured residual (default min(1e-8, polynomialError/100)). */
  readonly phaseTolerance?: number;
  readonly actionOnly?: boolean;
  readonly label?: string;
}

export interface QsvtInverseEncoding extends BlockEncoding {
  readonly degree: number;
  readonly delta: number;
  /** s: p(x) ≈ s/x. */
  readonly scale: number;
  readonly conditionBound: number;
  /** Calls of the input encoding's block and of its inverse. */
  readonly queries: { readonly forward: number; readonly adjoint: number };
  readonly errorParts: { readonly polynomial: number; readonly phases: number; readonly inputPropagation: number };
  readonly approximation: InverseApproximation;
  readonly qsvt: QsvtEncoding;
}

/**
 * δ = 1/(α_M K) − e_M, capped below 1 (the approximation then holds on a larger interval, still valid).
 * @throws RangeError naming δ when it is ≤ 0 (the input error swamps the smallest singular value), or for α_M, K or e_M
 *   that are not positive (e_M: non-negative) and finite.
 */
export function inverseDelta(alphaM: number, conditionBound: number, inputError: number): number {
  if (!(alphaM > 0 && Number.isFinite(alphaM))) throw new RangeError(`qsvtInverse: α_M = ${alphaM} is not positive and finite`);
  if (!(conditionBound > 0 && Number.isFinite(conditionBound))) throw new RangeError(`qsvtInverse: condition bound K = ${conditionBound} is not positive and finite`);
  if (!(inputError >= 0)) throw new RangeError(`qsvtInverse: input error bound ${inputError} is not ≥ 0`);
  const delta = 1 / (alphaM * conditionBound) - inputError;
  if (!(delta > 0)) {
    throw new RangeError(`qsvtInverse: δ = 1/(α_M K) − e_M = ${delta} ≤ 0 (α_M = ${alphaM}, K = ${conditionBound}, e_M = ${inputError}); make the input encoding more precise`);
  }
  return Math.min(delta, 0.5);
}

/** Relative ε for inverseApproximation such that its errorBound ≤ polynomialError (scale < δ there). */
export function relativeInverseError(delta: number, polynomialError: number): number {
  if (!(polynomialError > 0 && polynomialError < 1)) throw new RangeError(`qsvtInverse: polynomial error ${polynomialError} is not in (0, 1)`);
  return Math.min(0.5, polynomialError / delta);
}

/**
 * @throws RangeError for δ ≤ 0, a polynomial error outside (0, 1), or a degree beyond the cap (the message names both).
 */
export function qsvtInverse(encoding: BlockEncoding, options: QsvtInverseOptions): QsvtInverseEncoding {
  const K = options.conditionBound;
  const alphaM = encoding.alpha;
  const eM = encoding.errorBound;
  const delta = inverseDelta(alphaM, K, eM);
  const maxDegree = options.maxDegree ?? MAX_INVERSE_DEGREE;
  let approximation: InverseApproximation;
  try {
    approximation = inverseApproximation(delta, relativeInverseError(delta, options.polynomialError), {
      maxDegree,
      ...(options.supTarget !== undefined ? { supTarget: options.supTarget } : {}),
    });
  } catch (error) {
    if (error instanceof RangeError && /maxDegree/.test(error.message)) {
      throw new RangeError(`qsvtInverse: the inverse polynomial needs a degree beyond the cap ${maxDegree} (δ = ${delta}): ${error.message}`);
    }
    throw error;
  }
  const s = approximation.scale;
  const phases = qspPhases(approximation.polynomial, { tolerance: options.phaseTolerance ?? Math.min(1e-8, options.polynomialError / 100) });
  const inputPropagation = (e: number): number => (e === 0 ? 0 : (s * e * alphaM * K) / delta);
  const qsvt = qsvtEncoding(adjointEncoding(encoding), {
    phases: phases.phases,
    transform: (x) => evaluateChebyshev(approximation.polynomial, x),
    phaseResidual: phases.residual,
    inputErrorPropagation: inputPropagation,
    ...(options.actionOnly !== undefined ? { actionOnly: options.actionOnly } : {}),
    label: options.label ?? `(${encoding.label})^-1`,
  });
  const errorParts = { polynomial: approximation.errorBound, phases: qsvt.phaseErrorBound, inputPropagation: qsvt.propagatedInputError };
  return {
    ...qsvt,
    label: qsvt.label,
    alpha: 1 / (s * alphaM),
    // M⁻¹ = V Σ⁻¹ W† = the singular-value transform of M† by 1/σ.
    exact: memoiseMatrix(() => matrixFunctionOfSingularValues(adjointMatrix(encoding.exact()), (sigma) => 1 / sigma)),
    errorBound: errorParts.polynomial + errorParts.phases + errorParts.inputPropagation,
    degree: approximation.degree,
    delta,
    scale: s,
    conditionBound: K,
    // The sequence runs on the adjoint encoding, so its forward calls are calls of M's block inverted.
    queries: { forward: qsvt.queries.adjoint, adjoint: qsvt.queries.forward },
    errorParts,
    approximation,
    qsvt,
  };
}
