/**
 * The OpenQASM 3 standard gate library (stdgates.inc) plus the built-ins U and gphase, each reduced
 * to a canonical form: some leading control qubits and a base action (a 2×2 unitary, a swap, or a
 * global phase), global phases exactly as the OpenQASM 3.0.0 definitions give them: the built-in U
 * of the specification's "Built-in gates" section (which carries e^{iθ/2}) and the stdgates.inc
 * bodies written in terms of it, with their gphase and p(γ − θ/2) compensations.
 */
import { reduceAngle } from './internal/reduceAngle.js';

/** A 2×2 complex matrix [[a, b], [c, d]] as [aRe, aIm, bRe, bIm, cRe, cIm, dRe, dIm]. */
export type Matrix2 = readonly [number, number, number, number, number, number, number, number];

export type BaseAction =
  | { readonly kind: 'unitary'; readonly matrix: Matrix2 }
  | { readonly kind: 'swap' }
  | { readonly kind: 'phase'; readonly angle: number };

export interface StandardGate {
  readonly name: string;
  readonly params: number;
  /** Qubit operands, built-in controls first. */
  readonly qubits: number;
  /** How many leading operands are controls (cx: 1, ccx: 2, cswap: 1). */
  readonly controls: number;
  /** True when the gate is its own inverse for every parameter value. */
  readonly selfInverse: boolean;
  readonly base: (params: readonly number[]) => BaseAction;
  /** For a parameterless gate: the smallest n ≥ 1 with gⁿ = I (x: 2, s: 4, t: 8), so integer powers reduce mod n. */
  readonly order?: number;
  /** For a rotation-type gate: the matrix of its exact integer power g^k (k·θ reduced modulo the gate's period). */
  readonly integerPower?: (params: readonly number[], k: number) => Matrix2;
}

/**
 * e^{i·globalPhase}·U(θ, φ, λ), U the OpenQASM 3.0.0 built-in gate (specification, "Gates" chapter,
 * "Built-in gates"): ½[[1+e^{iθ}, −ie^{iλ}(1−e^{iθ})], [ie^{iφ}(1−e^{iθ}), e^{i(φ+λ)}(1+e^{iθ})]]
 * = e^{iθ/2}·[[cos θ/2, −e^{iλ} sin θ/2], [e^{iφ} sin θ/2, e^{i(φ+λ)} cos θ/2]].
 */
export function uMatrix(theta: number, phi: number, lambda: number, globalPhase = 0): Matrix2 {
  const c = Math.cos(theta / 2);
  const s = Math.sin(theta / 2);
  const shift = globalPhase + theta / 2;
  const cis = (angle: number): [number, number] => [Math.cos(angle + shift), Math.sin(angle + shift)];
  const [g0, g1] = cis(0);
  const [l0, l1] = cis(lambda);
  const [p0, p1] = cis(phi);
  const [pl0, pl1] = cis(phi + lambda);
  return [c * g0, c * g1, -s * l0, -s * l1, s * p0, s * p1, c * pl0, c * pl1];
}

function diagonal(phase: number): Matrix2 {
  return [1, 0, 0, 0, 0, 0, Math.cos(phase), Math.sin(phase)];
}

const unitary = (matrix: Matrix2): BaseAction => ({ kind: 'unitary', matrix });
const HALF = Math.SQRT1_2;
const X: Matrix2 = [0, 0, 1, 0, 1, 0, 0, 0];
const Y: Matrix2 = [0, 0, 0, -1, 0, 1, 0, 0];
const Z: Matrix2 = [1, 0, 0, 0, 0, 0, -1, 0];
const H: Matrix2 = [HALF, 0, HALF, 0, HALF, 0, -HALF, 0];
const IDENTITY: Matrix2 = [1, 0, 0, 0, 0, 0, 1, 0];
const SX: Matrix2 = [0.5, 0.5, 0.5, -0.5, 0.5, -0.5, 0.5, 0.5];

function gate(
  name: string,
  params: number,
  qubits: number,
  controls: number,
  selfInverse: boolean,
  action: ((p: readonly number[]) => BaseAction) | Pick<StandardGate, 'base' | 'integerPower'>,
  order: number | undefined = selfInverse && params === 0 ? 2 : undefined,
): StandardGate {
  const powers = typeof action === 'function' ? { base: action } : action;
  return { name, params, qubits, controls, selfInverse, ...powers, ...(order !== undefined ? { order } : {}) };
}

const p0 = (p: readonly number[]): number => p[0] as number;
const p1 = (p: readonly number[]): number => p[1] as number;
const p2 = (p: readonly number[]): number => p[2] as number;
const p3 = (p: readonly number[]): number => p[3] as number;

// stdgates.inc (3.0.0): rx(θ) = U(θ, −π/2, π/2); gphase(−θ/2), ry(θ) = U(θ, 0, 0); gphase(−θ/2),
// rz(λ) = gphase(−λ/2); U(0, 0, λ); p(λ) = ctrl @ gphase(λ) = diag(1, e^{iλ}).
const rxMatrix = (theta: number): Matrix2 => uMatrix(theta, -Math.PI / 2, Math.PI / 2, -theta / 2);
const ryMatrix = (theta: number): Matrix2 => uMatrix(theta, 0, 0, -theta / 2);
const rzMatrix = (lambda: number): Matrix2 => uMatrix(0, 0, lambda, -lambda / 2);

/** A one-parameter gate g(θ) with g(θ)^k = g(kθ), periodic in θ with period periodInPi·π. */
function rotation(matrixAt: (angle: number) => Matrix2, periodInPi: 2 | 4): Pick<StandardGate, 'base' | 'integerPower'> {
  return {
    base: (p) => unitary(matrixAt(p0(p))),
    integerPower: (p, k) => matrixAt(reduceAngle(k, p0(p), periodInPi)),
  };
}
const RX = rotation(rxMatrix, 4);
const RY = rotation(ryMatrix, 4);
const RZ = rotation(rzMatrix, 4);
const PHASE = rotation(diagonal, 2);

// x, y, h are stored as their exact matrices: U(π, 0, π); gphase(−π/2) = X, U(π, π/2, π/2); gphase(−π/2) = Y
// and U(π/2, 0, π); gphase(−π/4) = H (stdgates.inc, 3.0.0); test/circuit/stdgatesExpansion.test.ts expands
// every definition from U, gphase and ctrl @ and compares.
const GATES: readonly StandardGate[] = [
  gate('U', 3, 1, 0, false, (p) => unitary(uMatrix(p0(p), p1(p), p2(p)))),
  gate('gphase', 1, 0, 0, false, (p) => ({ kind: 'phase', angle: p0(p) })),
  gate('p', 1, 1, 0, false, PHASE),
  gate('x', 0, 1, 0, true, () => unitary(X)),
  gate('y', 0, 1, 0, true, () => unitary(Y)),
  gate('z', 0, 1, 0, true, () => unitary(Z)),
  gate('h', 0, 1, 0, true, () => unitary(H)),
  gate('s', 0, 1, 0, false, () => unitary(diagonal(Math.PI / 2)), 4),
  gate('sdg', 0, 1, 0, false, () => unitary(diagonal(-Math.PI / 2)), 4),
  gate('t', 0, 1, 0, false, () => unitary(diagonal(Math.PI / 4)), 8),
  gate('tdg', 0, 1, 0, false, () => unitary(diagonal(-Math.PI / 4)), 8),
  gate('sx', 0, 1, 0, false, () => unitary(SX), 4),
  gate('rx', 1, 1, 0, false, RX),
  gate('ry', 1, 1, 0, false, RY),
  gate('rz', 1, 1, 0, false, RZ),
  gate('cx', 0, 2, 1, true, () => unitary(X)),
  gate('cy', 0, 2, 1, true, () => unitary(Y)),
  gate('cz', 0, 2, 1, true, () => unitary(Z)),
  gate('cp', 1, 2, 1, false, PHASE),
  gate('crx', 1, 2, 1, false, RX),
  gate('cry', 1, 2, 1, false, RY),
  gate('crz', 1, 2, 1, false, RZ),
  gate('ch', 0, 2, 1, true, () => unitary(H)),
  gate('swap', 0, 2, 0, true, () => ({ kind: 'swap' })),
  gate('ccx', 0, 3, 2, true, () => unitary(X)),
  gate('cswap', 0, 3, 1, true, () => ({ kind: 'swap' })),
  // cu = p(γ − θ/2) on the control, then ctrl @ U(θ, φ, λ): the control-1 branch carries e^{i(γ−θ/2)} U(θ, φ, λ).
  gate('cu', 4, 2, 1, false, (p) => unitary(uMatrix(p0(p), p1(p), p2(p), p3(p) - p0(p) / 2))),
  // CX is the CNOT: the specification's "Built-in gates" section defines CX as ctrl @ X with X = U(π, 0, π);
  // gphase(−π/2), and its standard-library page calls CX an alias of cx. (The 3.0.0 stdgates.inc body
  // `ctrl @ U(π, 0, π)` predates the e^{iθ/2} in U and would give ctrl @ iX.)
  gate('CX', 0, 2, 1, true, () => unitary(X)),
  gate('phase', 1, 1, 0, false, PHASE),
  gate('cphase', 1, 2, 1, false, PHASE),
  gate('id', 0, 1, 0, true, () => unitary(IDENTITY)),
  gate('u1', 1, 1, 0, false, PHASE),
  // stdgates.inc (3.0.0): u2(φ, λ) = gphase(−(φ+λ+π/2)/2); U(π/2, φ, λ) and u3(θ, φ, λ) = gphase(−(φ+λ+θ)/2); U(θ, φ, λ).
  gate('u2', 2, 1, 0, false, (p) => unitary(uMatrix(Math.PI / 2, p0(p), p1(p), -(p0(p) + p1(p) + Math.PI / 2) / 2))),
  gate('u3', 3, 1, 0, false, (p) => unitary(uMatrix(p0(p), p1(p), p2(p), -(p1(p) + p2(p) + p0(p)) / 2))),
];

const BY_NAME: ReadonlyMap<string, StandardGate> = new Map(GATES.map((g) => [g.name, g]));

/** All standard gates, in library order. */
export const STANDARD_GATES: readonly StandardGate[] = GATES;

/** The standard gate named `name`, or undefined. */
export function standardGate(name: string): StandardGate | undefined {
  return BY_NAME.get(name);
}
