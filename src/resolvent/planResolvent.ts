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
 * Direct: M = w − H as directShift builds it (α = |w| + α_H, exact), K = 1/|Im w|, all of ε (99 %) for the polynomial.
 * When the fast inverse, at its register cap, leaves nothing of ε for the polynomial, the plan throws — or, with
 * `reachablePrecision`, plans for the smallest precision it allows instead, 2(e_F + (1 + e_F) e_M α_M K) (half for the
 * polynomial), and says so (`precision` ≠ `requestedPrecision`). When e_M ≥ 1/(α_M K) no precision is reachable:
 * UnreachablePrecisionError either way.
 */
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import { modelEncodings, type ModelEncodings } from '../blocks/builders/modelEncodings.js';
import { identityEncoding } from '../blocks/combine/identityEncoding.js';
import { linearCombination } from '../blocks/combine/linearCombination.js';
import { productEncoding } from '../blocks/combine/productEncoding.js';
import { shiftedEncoding } from '../blocks/combine/shiftedEncoding.js';
import { fastInverse, type FastInverseEncoding, type FastInverseOptions } from '../inversion/fastInverse.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import { inverseDelta } from '../qsvt/qsvtInverse.js';
import { oneBodyA } from './internal/oneBodyA.js';
import type { ResolventRoute } from './ResolventReport.js';
import { UnreachablePrecisionError } from './UnreachablePrecisionError.js';

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
  /**
   * When the capped fast inverse cannot meet ε, plan for the smallest precision it allows instead of throwing (for
   * costing; the report states both). Default false.
   */
  readonly reachablePrecision?: boolean;
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
  /** The ε planned for: the requested one, or the reachable one (`reachablePrecision`). */
  readonly precision: number;
  readonly split: { readonly polynomial: number; readonly quantisation: number };
  /** Target for max |p(x) − s/x| on [δ, 1]. */
  readonly polynomialError: number;
  readonly window: { readonly min: number; readonly max: number } | null;
}

const POLYNOMIAL_SHARE = 0.99;

/** The model's Pauli-LCU encodings (H, A, B) per model: they do not depend on w or ε, so repeated plans build them once. */
const encodingsPerModel = new WeakMap<FermionModel, ModelEncodings>();

function encodingsOf(model: FermionModel): ModelEncodings {
  let encodings = encodingsPerModel.get(model);
  if (!encodings) encodingsPerModel.set(model, (encodings = modelEncodings(model)));
  return encodings;
}

function windowOf(electrons: ResolventOptions['electrons'], modes: number): { min: number; max: number } | null {
  if (electrons === undefined) return null;
  const [min, max] = typeof electrons === 'number' ? [electrons, electrons] : electrons;
  return min === 0 && max === modes ? null : { min, max };
}

/**
 * @throws RangeError naming the value for Im w = 0 (or non-finite w), ε outside (0, 1) or an unknown route;
 *   UnreachablePrecisionError (a RangeError) when the fast inverse's error leaves δ ≤ 0, or leaves nothing of ε for the
 *   polynomial (unless `reachablePrecision`).
 */
export function planResolvent(model: FermionModel, w: ComplexScalar, options: ResolventOptions, caller: string): ResolventPlan {
  const epsilon = options.precision;
  if (!Number.isFinite(w.re) || !Number.isFinite(w.im) || w.im === 0) {
    throw new RangeError(`${caller}: w = ${w.re}${w.im < 0 ? '' : '+'}${w.im}i must be finite with Im w ≠ 0`);
  }
  if (!(epsilon > 0 && epsilon < 1)) throw new RangeError(`${caller}: precision ε = ${epsilon} is not in (0, 1)`);
  const eta = Math.abs(w.im);
  if (options.route === 'direct') {
    // directShift's construction (w·I − H by shiftedEncoding) on the model's H built once.
    const M = shiftedEncoding(encodingsOf(model).H, w, 'w - H');
    const K = 1 / eta;
    return {
      M, F: null, B: null, H: M, conditionBound: K, normBoundM: M.alpha, delta: inverseDelta(M.alpha, K, M.errorBound), precision: epsilon,
      split: { polynomial: epsilon, quantisation: 0 }, polynomialError: POLYNOMIAL_SHARE * epsilon, window: null,
    };
  }
  if (options.route !== 'preconditioned') throw new RangeError(`${caller}: unknown route "${String(options.route)}"`);
  const B = encodingsOf(model).B;
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
  const register = `${F.registerBits}-bit energy register${F.bitsCapped ? ', capped' : ''}`;
  if (!(1 / (M.alpha * K) - M.errorBound > 0)) {
    throw new UnreachablePrecisionError(
      `${caller}: no precision is reachable: the fast inverse's error bound ${eF.toExponential(3)} (${register}) makes M's error ${M.errorBound.toExponential(3)} reach 1/(α_M K): δ = 1/(α_M K) − e_M = ${(1 / (M.alpha * K) - M.errorBound).toExponential(3)} ≤ 0`,
      null,
    );
  }
  const propagated = M.errorBound * M.alpha * K;
  const share = (eps: number): number => POLYNOMIAL_SHARE * ((eps - eF) / (1 + eF) - propagated);
  let planned = epsilon;
  if (!(share(epsilon) > 0)) {
    const reachable = 2 * (eF + (1 + eF) * propagated);
    const message = `${caller}: precision ε = ${epsilon} cannot be met: the fast inverse's error bound ${eF} (${register}) leaves nothing for the polynomial`;
    if (!(reachable < 1)) throw new UnreachablePrecisionError(`${message}, nor at any ε < 1`, null);
    if (options.reachablePrecision !== true) throw new UnreachablePrecisionError(`${message}; ε = ${reachable.toExponential(3)} is reachable`, reachable);
    planned = reachable;
  }
  // Reachable precision: half for the quantisation (what F already costs), half for the polynomial.
  const quantisationShare = planned === epsilon ? quantisation : planned / 2;
  return {
    M, F, B, H: null, conditionBound: K, normBoundM: 1 + B.alpha / eta, delta: inverseDelta(M.alpha, K, M.errorBound), precision: planned,
    split: { polynomial: planned - quantisationShare, quantisation: quantisationShare }, polynomialError: Math.min(share(planned), 0.5), window,
  };
}
