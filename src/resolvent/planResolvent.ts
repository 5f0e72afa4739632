/**
 * planResolvent: everything of an inverse block-encoding of (w − H)⁻¹ except the polynomial: the encoding M to invert,
 * its condition bound K, the split of the precision ε and the polynomial's share.
 *
 * Preconditioned (w − H = (w − A)(I − (w − A)⁻¹B)): F = fastInverse (w − A)⁻¹, M = I − F·B as the linear combination of
 * the identity and productEncoding([F, B]) (α_M = 1 + α_F α_B), K = 1 + α_B/|Im w| ≥ 1 + ‖B‖/|Im w| ≥ ‖M⁻¹‖ since
 * M⁻¹ = I + (w − H)⁻¹B and ‖(w − H)⁻¹‖ ≤ 1/|Im w| (on the whole Fock space and on any electron window), ‖M‖ ≤ 1 + ‖F‖‖B‖
 * ≤ 1 + α_B/|Im w|. Split: half of ε for the quantisation — F's error e_F and its effect through the inverse,
 * e_F + (1 + e_F) s e_M α_M K/δ with e_M = (α_F α_B/α_M) e_F and s < δ, α_F ≤ 1/|Im w|, so F is built with precision
 * (ε/2)/(1 + 2 K α_B/|Im w|) — and what remains, (ε − e_F)/(1 + e_F) − e_M α_M K, for the polynomial (99 %; 1 % for the
 * phase residual).
 * Direct: M = directShift (w − H, α = |w| + α_H, exact), K = 1/|Im w|, all of ε (99 %) for the polynomial.
 */
import type { BlockEncoding } from '../../blocks/BlockEncoding.js';
import { modelEncodings } from '../../blocks/builders/modelEncodings.js';
import { identityEncoding } from '../../blocks/combine/identityEncoding.js';
import { linearCombination } from '../../blocks/combine/linearCombination.js';
import { productEncoding } from '../../blocks/combine/productEncoding.js';
import { directShift } from '../../inversion/directShift.js';
import { fastInverse, type FastInverseEncoding, type FastInverseOptions } from '../../inversion/fastInverse.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import type { FermionModel } from '../../model/FermionModel.js';
import { inverseDelta } from '../../qsvt/qsvtInverse.js';
import type { ResolventRoute } from '../ResolventReport.js';
import { oneBodyA } from './oneBodyA.js';

export interface ResolventOptions {
  readonly route: ResolventRoute;
  /** ε in (0, 1): the target for the rigorous bound on the encoded operator, in projected-block units. */
  readonly precision: number;
  /**
   * Preconditioned route: electron-number window N or [Nmin, Nmax] of the fast inverse, so the encoding is
   * P (w − H)⁻¹ P (costs an electron counter and a window qubit). Default: none — the whole Fock space, fewer qubits;
   * the condition bound holds there too, and the Green's-function sector's columns are the same. Ignored by the direct
   * route, which always encodes the whole Fock space.
   */
  readonly electrons?: number | readonly [number, number];
  /** Passed to fastInverse (precision, window and label are set here). */
  readonly fastInverse?: Omit<FastInverseOptions, 'precision' | 'electrons' | 'label'>;
  /** sup |p| of the inverse polynomial (default 0.5). */
  readonly supTarget?: number;
  /** Cap on the polynomial degree (default MAX_INVERSE_DEGREE = 20,000). */
  readonly maxDegree?: number;
  readonly label?: string;
}

export interface ResolventPlan {
  readonly M: BlockEncoding;
  readonly F: FastInverseEncoding | null;
  readonly B: BlockEncoding | null;
  readonly H: BlockEncoding | null;
  readonly conditionBound: number;
  readonly normBoundM: number;
  readonly delta: number;
  readonly split: { readonly polynomial: number; readonly quantisation: number };
  /** Target for max |p(x) − s/x| on [δ, 1]. */
  readonly polynomialError: number;
  readonly window: { readonly min: number; readonly max: number } | null;
}

const POLYNOMIAL_SHARE = 0.99;

function windowOf(electrons: ResolventOptions['electrons'], modes: number): { min: number; max: number } | null {
  if (electrons === undefined) return null;
  const [min, max] = typeof electrons === 'number' ? [electrons, electrons] : electrons;
  return min === 0 && max === modes ? null : { min, max };
}

/** @throws RangeError naming the value for Im w = 0 (or non-finite w), ε outside (0, 1), an unknown route, δ ≤ 0, or a precision the fast inverse cannot reach. */
export function planResolvent(model: FermionModel, w: ComplexScalar, options: ResolventOptions, caller: string): ResolventPlan {
  const epsilon = options.precision;
  if (!Number.isFinite(w.re) || !Number.isFinite(w.im) || w.im === 0) {
    throw new RangeError(`${caller}: w = ${w.re}${w.im < 0 ? '' : '+'}${w.im}i must be finite with Im w ≠ 0`);
  }
  if (!(epsilon > 0 && epsilon < 1)) throw new RangeError(`${caller}: precision ε = ${epsilon} is not in (0, 1)`);
  const eta = Math.abs(w.im);
  if (options.route === 'direct') {
    const M = directShift(model, w, 'w - H');
    const K = 1 / eta;
    return {
      M, F: null, B: null, H: M, conditionBound: K, normBoundM: M.alpha, delta: inverseDelta(M.alpha, K, M.errorBound),
      split: { polynomial: epsilon, quantisation: 0 }, polynomialError: POLYNOMIAL_SHARE * epsilon, window: null,
    };
  }
  if (options.route !== 'preconditioned') throw new RangeError(`${caller}: unknown route "${String(options.route)}"`);
  const B = modelEncodings(model).B;
  const K = 1 + B.alpha / eta;
  const quantisation = epsilon / 2;
  const window = windowOf(options.electrons, model.modes);
  const F = fastInverse(oneBodyA(model), w, {
    ...options.fastInverse,
    precision: quantisation / (1 + (2 * K * B.alpha) / eta),
    ...(window ? { electrons: [window.min, window.max] as const } : {}),
    label: '(w - A)^-1',
  });
  const FB = productEncoding([F, B], '(w - A)^-1 B');
  const M = linearCombination([{ coefficient: { re: 1, im: 0 }, encoding: identityEncoding(model.modes) }, { coefficient: { re: -1, im: 0 }, encoding: FB }], 'I - (w - A)^-1 B');
  const eF = F.errorBound;
  const polynomialError = POLYNOMIAL_SHARE * ((epsilon - eF) / (1 + eF) - M.errorBound * M.alpha * K);
  if (!(polynomialError > 0)) {
    throw new RangeError(`${caller}: precision ε = ${epsilon} cannot be met: the fast inverse's error bound ${eF} (${F.registerBits}-bit energy register${F.bitsCapped ? ', capped' : ''}) leaves nothing for the polynomial`);
  }
  return {
    M, F, B, H: null, conditionBound: K, normBoundM: 1 + B.alpha / eta, delta: inverseDelta(M.alpha, K, M.errorBound),
    split: { polynomial: epsilon - quantisation, quantisation }, polynomialError: Math.min(polynomialError, 0.5), window,
  };
}
