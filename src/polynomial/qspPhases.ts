/**
 * qspPhases: symmetric phase factors φ_0 … φ_d (φ_k = φ_{d−k}) with Re⟨0|U(x)|0⟩ = p(x) on [−1, 1], for a
 * real target p of definite parity and degree d with sup-norm below 1, in the Wx convention
 * U(x) = e^{iφ_0 Z} Π_{k=1..d} [W(x) e^{iφ_k Z}], W(x) = [[x, i√(1−x²)], [i√(1−x²), x]].
 *
 * Unknowns: the reduced phases ψ_k = φ_k − φ⁰_k, k = 0 … ⌊d/2⌋, around φ⁰ = (π/4, 0, …, 0, π/4), where
 * Re⟨0|U|0⟩ = 0 and ψ_k moves mostly the coefficient of T_{d−2k} (slope −2, or −1 for T_0).
 * Equations: Re⟨0|U(x_l)|0⟩ = p(x_l) at the ⌊d/2⌋+1 positive points of 2(⌊d/2⌋+1) first-kind
 * Chebyshev points, which fix a polynomial of p's parity and degree.
 * - Up to degree 2·NEWTON_WIDTH: Newton's method with the exact Jacobian (Dong, Lin, Ni & Wang, "Robust
 *   iterative method for symmetric quantum signal processing in all parameter regimes", SIAM J. Sci.
 *   Comput. 46, A2951 (2024)).
 * - Above: the fixed-point iteration ψ ← ψ + ½(F(ψ) − c) on Chebyshev coefficients (Dong, Lin, Ni &
 *   Wang, "Infinite quantum signal processing", Quantum 8, 1558 (2024), arXiv:2209.10162), O(d²) per
 *   step; should it stall, Newton takes over while the degree allows a dense Jacobian.
 * The residual max |Re⟨0|U(x)|0⟩ − p(x)| is then measured on 2(d+1) first-kind Chebyshev points.
 */
import { ensureFits } from '../core/memoryBudget.js';
import type { ChebyshevSeries } from './ChebyshevSeries.js';
import { evaluateChebyshev } from './evaluateChebyshev.js';
import { solveDenseSystem } from './internal/solveDenseSystem.js';
import { symmetricQspJacobian, symmetricQspValues } from './internal/symmetricQspKernels.js';
import { measureSupNorm } from './measureSupNorm.js';

export { qspMatrixElement } from './qspMatrixElement.js';

export interface QspPhases {
  /** φ_0 … φ_d, symmetric. */
  readonly phases: Float64Array;
  readonly convention: 'wx';
  /** max over 2(d+1) first-kind Chebyshev points of |Re⟨0|U(x)|0⟩ − p(x)|, measured. */
  readonly residual: number;
  /** Iterations used (Newton and fixed-point steps together). */
  readonly iterations: number;
}

export interface QspPhasesOptions {
  /** Largest accepted residual; default 1e-12. */
  readonly tolerance?: number;
  /** Cap on the iterations of each method; default 200. */
  readonly maxIterations?: number;
}

/** Targets with a measured sup-norm at or above this are refused. */
export const MAX_TARGET_SUP_NORM = 0.9999;
/** Reduced-phase counts up to which Newton's method is the first choice / the fallback. */
const NEWTON_WIDTH = 300;
const NEWTON_FALLBACK_WIDTH = 1000;

/**
 * @throws RangeError for a target without definite parity, with coefficients of the wrong parity, with
 *   non-finite coefficients or a sup-norm ≥ MAX_TARGET_SUP_NORM (the message names it), or when the
 *   iterations do not reach the tolerance.
 */
export function qspPhases(target: ChebyshevSeries, options: QspPhasesOptions = {}): QspPhases {
  const tolerance = options.tolerance ?? 1e-12;
  const maxIterations = options.maxIterations ?? 200;
  if (!(tolerance > 0)) throw new RangeError(`qspPhases: tolerance must be positive, got ${tolerance}`);
  if (!Number.isInteger(maxIterations) || maxIterations < 1) throw new RangeError(`qspPhases: maxIterations must be a positive integer, got ${maxIterations}`);
  const degree = checkedDegree(target);
  const supNorm = measureSupNorm(target);
  if (!(supNorm < MAX_TARGET_SUP_NORM)) {
    throw new RangeError(`qspPhases: target sup-norm ${supNorm} is too close to 1 (must be < ${MAX_TARGET_SUP_NORM})`);
  }
  const width = (degree >> 1) + 1;
  const nodes = new Float64Array(width);
  for (let l = 0; l < width; l++) nodes[l] = Math.sin((Math.PI * (2 * width - 2 * l - 1)) / (4 * width));
  const targetValues = nodes.map((x) => evaluateChebyshev(target, x));
  const state: SolverState = { degree, width, nodes, targetValues, reduced: new Float64Array(width), iterations: 0 };
  const goal = tolerance / 16;
  let converged = width <= NEWTON_WIDTH ? newton(state, goal, maxIterations) : fixedPoint(state, goal, maxIterations);
  if (!converged && width > NEWTON_WIDTH && width <= NEWTON_FALLBACK_WIDTH) {
    state.reduced.fill(0);
    converged = newton(state, goal, maxIterations);
  }
  const phases = fullPhases(state.reduced, degree);
  const residual = measuredResidual(target, phases, degree);
  if (!(residual <= tolerance)) {
    throw new RangeError(
      `qspPhases: no phases within tolerance ${tolerance} (residual ${residual} after ${state.iterations} iterations); ` +
        `target sup-norm ${supNorm}, degree ${degree}`,
    );
  }
  return { phases, convention: 'wx', residual, iterations: state.iterations };
}

interface SolverState {
  readonly degree: number;
  readonly width: number;
  readonly nodes: Float64Array;
  readonly targetValues: Float64Array;
  readonly reduced: Float64Array;
  iterations: number;
}

/** The degree d of the phase list: the largest index of the target's parity below its length. */
function checkedDegree(target: ChebyshevSeries): number {
  const c = target.coefficients;
  if (target.parity === 'none') throw new RangeError('qspPhases: target parity must be even or odd, got none');
  const wrong = target.parity === 'even' ? 1 : 0;
  for (let k = 0; k < c.length; k++) {
    if (!Number.isFinite(c[k]!)) throw new RangeError(`qspPhases: coefficient ${k} is not finite (${c[k]})`);
    if (k % 2 === wrong && c[k] !== 0) throw new RangeError(`qspPhases: ${target.parity} target has nonzero coefficient ${c[k]} of T_${k}`);
  }
  const top = Math.max(c.length - 1, wrong === 0 ? 1 : 0);
  return top % 2 === wrong ? top - 1 : top;
}

function fullPhases(reduced: Float64Array, degree: number): Float64Array {
  const phases = new Float64Array(degree + 1);
  for (let k = 0; k < reduced.length; k++) {
    const offset = k === 0 ? (degree === 0 ? Math.PI / 2 : Math.PI / 4) : 0;
    phases[k] = reduced[k]! + offset;
    phases[degree - k] = phases[k]!;
  }
  return phases;
}

/** cos φ_k, sin φ_k for k = 0 … ⌊d/2⌋. */
function halfTrig(reduced: Float64Array, degree: number): { cosines: Float64Array; sines: Float64Array } {
  const phases = fullPhases(reduced, degree);
  const cosines = new Float64Array(reduced.length);
  const sines = new Float64Array(reduced.length);
  for (let k = 0; k < reduced.length; k++) {
    cosines[k] = Math.cos(phases[k]!);
    sines[k] = Math.sin(phases[k]!);
  }
  return { cosines, sines };
}

/** Residual values g(x_l) − p(x_l) at the nodes into out; returns their largest magnitude. */
function nodeResidual(state: SolverState, out: Float64Array): number {
  const { cosines, sines } = halfTrig(state.reduced, state.degree);
  symmetricQspValues(state.degree, cosines, sines, state.nodes, out);
  let largest = 0;
  for (let l = 0; l < state.width; l++) {
    out[l] = out[l]! - state.targetValues[l]!;
    largest = Math.max(largest, Math.abs(out[l]!));
  }
  return Number.isNaN(largest) ? Number.POSITIVE_INFINITY : largest;
}

function newton(state: SolverState, goal: number, maxIterations: number): boolean {
  const { width, degree, nodes } = state;
  ensureFits(8 * width * width, `the QSP Jacobian (degree ${degree})`);
  const residual = new Float64Array(width);
  const jacobian = new Float64Array(width * width);
  let previous = Number.POSITIVE_INFINITY;
  for (let step = 0; step < maxIterations; step++) {
    const size = nodeResidual(state, residual);
    if (size <= goal) return true;
    // Quadratic convergence ends at rounding level: stop once a step no longer halves the residual.
    if (size > previous / 2 && size < 1e3 * goal) return true;
    if (!Number.isFinite(size)) return false;
    previous = size;
    const { cosines, sines } = halfTrig(state.reduced, degree);
    symmetricQspJacobian(degree, cosines, sines, nodes, jacobian);
    const delta = solveDenseSystem(jacobian, residual, width);
    for (let k = 0; k < width; k++) state.reduced[k] = state.reduced[k]! - delta[k]!;
    state.iterations++;
  }
  return nodeResidual(state, residual) <= goal;
}

function fixedPoint(state: SolverState, goal: number, maxIterations: number): boolean {
  const { width, degree } = state;
  const residual = new Float64Array(width);
  // cos(π q / (4·width)) for q = 0 … 8·width−1: cos(j θ_l) with θ_l = π(2l+1)/(4·width) is entry j(2l+1) mod 8·width.
  const period = 8 * width;
  const cosTable = new Float64Array(period);
  for (let q = 0; q < period; q++) cosTable[q] = Math.cos((Math.PI * q) / (4 * width));
  let best = Number.POSITIVE_INFINITY;
  let stalled = 0;
  for (let step = 0; step < maxIterations; step++) {
    const size = nodeResidual(state, residual);
    if (size <= goal) return true;
    if (!Number.isFinite(size)) return false;
    if (size < 0.9 * best) {
      best = size;
      stalled = 0;
    } else if (++stalled >= 5) {
      return size < 1e3 * goal;
    }
    // Chebyshev coefficient of T_j (j = d − 2k) of the residual: (2/width) Σ_l r_l cos(j θ_l), halved for j = 0.
    for (let k = 0; k < width; k++) {
      const j = degree - 2 * k;
      const stride = (2 * j) % period;
      let index = j % period;
      let sum = 0;
      for (let l = 0; l < width; l++) {
        sum += residual[l]! * cosTable[index]!;
        index += stride;
        if (index >= period) index -= period;
      }
      const coefficient = ((j === 0 ? 1 : 2) / width) * sum;
      state.reduced[k] = state.reduced[k]! + (j === 0 ? coefficient : coefficient / 2);
    }
    state.iterations++;
  }
  return false;
}

/** max |Re⟨0|U(x)|0⟩ − p(x)| over the positive half of 2(d+1) first-kind Chebyshev points (parity gives the rest). */
function measuredResidual(target: ChebyshevSeries, phases: Float64Array, degree: number): number {
  const count = degree + 1;
  const points = new Float64Array(count);
  for (let l = 0; l < count; l++) points[l] = Math.sin((Math.PI * (2 * count - 2 * l - 1)) / (4 * count));
  const half = (degree >> 1) + 1;
  const cosines = new Float64Array(half);
  const sines = new Float64Array(half);
  for (let k = 0; k < half; k++) {
    cosines[k] = Math.cos(phases[k]!);
    sines[k] = Math.sin(phases[k]!);
  }
  const values = new Float64Array(count);
  symmetricQspValues(degree, cosines, sines, points, values);
  let largest = 0;
  for (let l = 0; l < count; l++) largest = Math.max(largest, Math.abs(values[l]! - evaluateChebyshev(target, points[l]!)));
  return Number.isNaN(largest) ? Number.POSITIVE_INFINITY : largest;
}
