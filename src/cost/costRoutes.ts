/**
 * costRoutes: the two routes to (w − H)⁻¹ as cost models built from the existing blocks, for sizes no simulator reaches.
 * `direct`: QSVT inversion of the LCU of w − H (α_D = |w| + α_H); σ_min(w − H) ≥ |Im w| = η, so δ = η/α_D.
 * `preconditioned`: (w − H)⁻¹ = M⁻¹ R_A with R_A = (w − A)⁻¹ (fastInverse, α_F = 1/c ≤ 1/η), K = R_A B, M = 1 − K
 * (α_M = 1 + α_F α_B); M⁻¹ = 1 + (w − H)⁻¹ B gives ‖M⁻¹‖ ≤ κ = 1 + ‖B‖/η with ‖B‖ ≤ α_B (B's Pauli 1-norm), so
 * δ = 1/(α_M κ) does not depend on ‖A‖. Degrees are the Childs–Kothari–Somma bound (qsvt/inverseDegreeBound); the QSVT is the
 * counting-only sequence (qsvtSequence). Errors: the polynomial gets half the precision; on the preconditioned route the
 * fast inverse's rigorous bound, carried through M⁻¹ to first order (κ(1 + κ α_B α_F) times α_F·its bound), the other half.
 */
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import { pauliLcu } from '../blocks/builders/pauliLcu.js';
import { productEncoding } from '../blocks/combine/productEncoding.js';
import { shiftedEncoding } from '../blocks/combine/shiftedEncoding.js';
import { directShift } from '../inversion/directShift.js';
import { fastInverse } from '../inversion/fastInverse.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import { jordanWigner } from '../operators/jordanWigner.js';
import { modelHamiltonian } from '../operators/modelHamiltonian.js';
import { inverseDegreeBound } from '../qsvt/inverseDegreeBound.js';
import type { RouteResolvent } from './greenCost.js';
import { qsvtSequence } from './internal/qsvtSequence.js';

export type RouteName = 'preconditioned' | 'direct';

export interface RouteOptions {
  /** Allowed operator-norm error of the encoded (w − H)⁻¹. */
  readonly precision: number;
  /** Electron number of the sector the resolvent acts on. */
  readonly electrons: number;
}

const FAST_INVERSE_PRECISION_RANGE: readonly [number, number] = [1e-12, 1e-3];

function inverted(encoding: BlockEncoding, delta: number, epsilon: number, outerAlpha: number, label: string): { sequence: BlockEncoding; degree: number } {
  const clampedEpsilon = Math.min(epsilon, 0.5);
  const degree = inverseDegreeBound(delta, clampedEpsilon);
  // p ≈ (δ/2)/x has |p| ≤ 1/2 on [−1, 1] (CKS scaling), so the sequence encodes M⁻¹ with α = 2/(α_M δ) (times outer factors).
  return { sequence: qsvtSequence(encoding, degree, outerAlpha, 0, label), degree };
}

export function directRoute(model: FermionModel, w: ComplexScalar, options: RouteOptions): RouteResolvent {
  const shift = directShift(model, w);
  const eta = Math.abs(w.im);
  const delta = eta / shift.alpha;
  const epsilon = options.precision * shift.alpha;
  const { sequence, degree } = inverted(shift, delta, epsilon, 2 / eta, '(w - H)^-1 by QSVT');
  const encoding = { ...sequence, errorBound: (Math.min(epsilon, 0.5) / shift.alpha) / sequence.alpha };
  return {
    encoding,
    degree,
    queries: { 'w - H': degree },
    registerBits: 0,
    notes: [
      `alpha(w - H) = |w| + ||H coefficients||_1 = ${shift.alpha.toPrecision(4)}; delta = eta/alpha = ${delta.toExponential(2)}`,
    ],
  };
}

export function preconditionedRoute(model: FermionModel, w: ComplexScalar, options: RouteOptions): RouteResolvent {
  const eta = Math.abs(w.im);
  const B = pauliLcu(jordanWigner(modelHamiltonian(model, { part: 'B' }), model.modes), 'B');
  const alphaB = B.alpha;
  const kappa = 1 + alphaB / eta;
  const alphaFBound = 1 / eta;
  const target = options.precision / 2 / (alphaFBound * kappa * (1 + kappa * alphaB * alphaFBound));
  const [low, high] = FAST_INVERSE_PRECISION_RANGE;
  const TA = subtract(model);
  const F = fastInverse(TA, w, { precision: Math.min(high, Math.max(low, target)), electrons: options.electrons, adder: 'qft' });
  const K = productEncoding([F, B], 'R_A B');
  const M = shiftedEncoding(K, { re: 1, im: 0 }, '1 - R_A B');
  const delta = 1 / (M.alpha * kappa);
  const epsilon = (options.precision * M.alpha) / (2 * F.alpha);
  const { sequence, degree } = inverted(M, delta, epsilon, 2 * kappa, '(1 - R_A B)^-1 by QSVT');
  const resolvent = productEncoding([sequence, F], '(w - H)^-1 preconditioned');
  const polynomialError = (F.alpha * Math.min(epsilon, 0.5)) / M.alpha;
  const fastInverseError = F.alpha * F.errorBound * kappa * (1 + kappa * alphaB * F.alpha);
  const errorBound = (polynomialError + fastInverseError) / resolvent.alpha;
  return {
    encoding: { ...resolvent, errorBound },
    degree,
    queries: { '1 - R_A B': degree, 'R_A (fast inverse)': degree + 1, B: degree },
    registerBits: F.registerBits,
    notes: [
      `||B|| <= alpha_B = ${alphaB.toPrecision(4)} (Pauli 1-norm of B); kappa = 1 + alpha_B/eta = ${kappa.toPrecision(4)}; delta = ${delta.toExponential(2)}`,
      `fast inverse: ${F.registerBits}-bit energy register${F.bitsCapped ? ' (capped)' : ''}, c = ${F.c.toPrecision(4)}, bound ${F.errorBound.toExponential(2)}`,
    ],
  };
}

/** T_A = T − (one-body part moved into B). */
function subtract(model: FermionModel): FermionModel['oneBody'] {
  const T = model.oneBody;
  const moved = model.oneBodyInB;
  return { n: T.n, re: T.re.map((x, k) => x - moved.re[k]!), im: T.im.map((x, k) => x - moved.im[k]!) };
}

/** The builder of one route, as greenCost takes it. */
export function routeBuilder(model: FermionModel, route: RouteName) {
  return (w: ComplexScalar, options: RouteOptions): RouteResolvent =>
    route === 'direct' ? directRoute(model, w, options) : preconditionedRoute(model, w, options);
}
