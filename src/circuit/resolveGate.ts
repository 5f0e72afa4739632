/**
 * resolveGate: turns a flat gate (name, parameters, modifiers) into what a simulator applies —
 * one target with a 2×2 unitary, a (powered) swap of two targets, or a phase — plus all controls.
 * Powers use the principal branch (eigenvalue arguments in (−π, π]), as OpenQASM 3 specifies.
 * Integer powers are exact: reduced by the gate's order (x² = I, t⁸ = I), or by the exact angle
 * k·θ modulo the period for rotation gates, or (any other unitary) computed from its rotation
 * angles reduced exactly modulo 2π, so that huge exponents neither overflow nor drift.
 */
import type { FlatGate } from './flatten.js';
import { reduceAngle } from './internal/reduceAngle.js';
import { standardGate, type Matrix2, type StandardGate } from './standardGates.js';

export type ResolvedGate =
  | { readonly kind: 'unitary'; readonly target: number; readonly matrix: Matrix2; readonly controls: readonly number[]; readonly negControls: readonly number[] }
  /** Swap to the power: on span{|01>,|10>} of (a, b) the 2×2 [[(1+e)/2, (1−e)/2], [(1−e)/2, (1+e)/2]], e = phase. */
  | { readonly kind: 'swap'; readonly a: number; readonly b: number; readonly phaseRe: number; readonly phaseIm: number; readonly controls: readonly number[]; readonly negControls: readonly number[] }
  | { readonly kind: 'phase'; readonly angle: number; readonly controls: readonly number[]; readonly negControls: readonly number[] };

/** Largest |k| of a gate power pow(k) @ g (integers beyond 2^53 are not all representable). */
export const MAX_GATE_POWER = 2 ** 53;

const IDENTITY: Matrix2 = [1, 0, 0, 0, 0, 0, 1, 0];

/** Principal argument in (−π, π], treating a tiny negative imaginary part on the negative axis as +π. */
function principalArg(re: number, im: number): number {
  if (re < 0 && Math.abs(im) <= 1e-15 * Math.abs(re)) return Math.PI;
  return Math.atan2(im, re);
}

function multiply(a: Matrix2, b: Matrix2): Matrix2 {
  const [a0, a1, a2, a3, a4, a5, a6, a7] = a;
  const [b0, b1, b2, b3, b4, b5, b6, b7] = b;
  return [
    a0 * b0 - a1 * b1 + a2 * b4 - a3 * b5, a0 * b1 + a1 * b0 + a2 * b5 + a3 * b4,
    a0 * b2 - a1 * b3 + a2 * b6 - a3 * b7, a0 * b3 + a1 * b2 + a2 * b7 + a3 * b6,
    a4 * b0 - a5 * b1 + a6 * b4 - a7 * b5, a4 * b1 + a5 * b0 + a6 * b5 + a7 * b4,
    a4 * b2 - a5 * b3 + a6 * b6 - a7 * b7, a4 * b3 + a5 * b2 + a6 * b7 + a7 * b6,
  ];
}

/** Conjugate transpose of a 2×2 matrix. */
export function adjoint2(m: Matrix2): Matrix2 {
  return [m[0], -m[1], m[4], -m[5], m[2], -m[3], m[6], -m[7]];
}

/** m^r by repeated multiplication (r ≥ 0, small). */
function repeat(m: Matrix2, r: number): Matrix2 {
  let result = IDENTITY;
  for (let j = 0; j < r; j++) result = multiply(result, m);
  return result;
}

/**
 * m^k for an integer k, m a 2×2 unitary written as e^{iα}(cos ω I + i sin ω n̂·σ) (α = arg(det m)/2):
 * m^k = e^{ikα}(cos kω I + i sin kω n̂·σ), with kα and kω reduced exactly modulo 2π. The angles come
 * from atan2 of the Pauli components, so nearly degenerate eigenvalues lose no accuracy.
 */
function integerUnitaryPower(m: Matrix2, k: number): Matrix2 {
  if (Math.abs(k) <= 64) return repeat(k < 0 ? adjoint2(m) : m, Math.abs(k));
  const [a0, a1, b0, b1, c0, c1, d0, d1] = m;
  const alpha = Math.atan2(a0 * d1 + a1 * d0 - (b0 * c1 + b1 * c0), a0 * d0 - a1 * d1 - (b0 * c0 - b1 * c1)) / 2;
  const [ca, sa] = [Math.cos(alpha), Math.sin(alpha)];
  // N = e^{−iα} m = n0 I + i(n1 X + n2 Y + n3 Z).
  const rot = (x: number, y: number): [number, number] => [x * ca + y * sa, y * ca - x * sa];
  const [A0, A1] = rot(a0, a1);
  const [B0, B1] = rot(b0, b1);
  const [C0, C1] = rot(c0, c1);
  const [D0, D1] = rot(d0, d1);
  const n0 = (A0 + D0) / 2;
  const n3 = (A1 - D1) / 2;
  const n1 = (B1 + C1) / 2;
  const n2 = (B0 - C0) / 2;
  const size = Math.hypot(n1, n2, n3);
  const omega = Math.atan2(size, n0);
  const kOmega = reduceAngle(k, omega, 2);
  const [cw, sw] = [Math.cos(kOmega), size === 0 ? 0 : Math.sin(kOmega) / size];
  const kAlpha = reduceAngle(k, alpha, 2);
  const [pc, ps] = [Math.cos(kAlpha), Math.sin(kAlpha)];
  const phase = (x: number, y: number): [number, number] => [x * pc - y * ps, x * ps + y * pc];
  return [
    ...phase(cw, sw * n3), ...phase(sw * n2, sw * n1),
    ...phase(-sw * n2, sw * n1), ...phase(cw, -sw * n3),
  ] as unknown as Matrix2;
}

/** Principal power of a 2×2 unitary: Σ λ^k P_λ over its eigenvalues, arguments in (−π, π]; integer k exactly. */
export function unitaryPower(m: Matrix2, k: number): Matrix2 {
  if (k === 1) return m;
  if (Number.isInteger(k)) return integerUnitaryPower(m, k);
  const [a0, a1, b0, b1, c0, c1, d0, d1] = m;
  // Eigenvalues of [[a, b], [c, d]]: (tr ± √(tr² − 4 det)) / 2.
  const tr0 = a0 + d0;
  const tr1 = a1 + d1;
  const det0 = a0 * d0 - a1 * d1 - (b0 * c0 - b1 * c1);
  const det1 = a0 * d1 + a1 * d0 - (b0 * c1 + b1 * c0);
  const disc0 = tr0 * tr0 - tr1 * tr1 - 4 * det0;
  const disc1 = 2 * tr0 * tr1 - 4 * det1;
  const r = Math.hypot(disc0, disc1);
  let s0 = Math.sqrt((r + disc0) / 2);
  let s1 = Math.sqrt(Math.max(0, (r - disc0) / 2));
  if (disc1 < 0) s1 = -s1;
  const offDiagonal = Math.hypot(b0, b1, c0, c1);
  const l1: [number, number] = offDiagonal === 0 ? [a0, a1] : [(tr0 + s0) / 2, (tr1 + s1) / 2];
  const l2: [number, number] = offDiagonal === 0 ? [d0, d1] : [(tr0 - s0) / 2, (tr1 - s1) / 2];
  const pow = (l: [number, number]): [number, number] => {
    const angle = k * principalArg(l[0], l[1]);
    return [Math.cos(angle), Math.sin(angle)];
  };
  if (offDiagonal === 0) {
    const [p0, p1] = pow(l1);
    const [q0, q1] = pow(l2);
    return [p0, p1, 0, 0, 0, 0, q0, q1];
  }
  const gap0 = l1[0] - l2[0];
  const gap1 = l1[1] - l2[1];
  if (Math.hypot(gap0, gap1) < 1e-14) {
    const [p0, p1] = pow(l1);
    return [p0, p1, 0, 0, 0, 0, p0, p1];
  }
  // P1 = (M − λ2 I)/(λ1 − λ2), P2 = I − P1.
  const invNorm = 1 / (gap0 * gap0 + gap1 * gap1);
  const div = (x0: number, x1: number): [number, number] => [(x0 * gap0 + x1 * gap1) * invNorm, (x1 * gap0 - x0 * gap1) * invNorm];
  const P1: Matrix2 = [...div(a0 - l2[0], a1 - l2[1]), ...div(b0, b1), ...div(c0, c1), ...div(d0 - l2[0], d1 - l2[1])] as unknown as Matrix2;
  const [p0, p1] = pow(l1);
  const [q0, q1] = pow(l2);
  const out: number[] = [];
  const identity = [1, 0, 0, 0, 0, 0, 1, 0];
  for (let e = 0; e < 8; e += 2) {
    const x0 = P1[e] as number;
    const x1 = P1[e + 1] as number;
    const y0 = (identity[e] as number) - x0;
    const y1 = (identity[e + 1] as number) - x1;
    out.push(p0 * x0 - p1 * x1 + q0 * y0 - q1 * y1, p0 * x1 + p1 * x0 + q0 * y1 + q1 * y0);
  }
  return out as unknown as Matrix2;
}

/** g^k for an integer k: by the gate's order, its rotation angle, or its eigenphases. */
function integerPower(definition: StandardGate, params: readonly number[], base: Matrix2, k: number): Matrix2 {
  if (definition.order !== undefined) {
    const r = ((k % definition.order) + definition.order) % definition.order;
    return repeat(base, r);
  }
  if (definition.integerPower !== undefined) return definition.integerPower(params, k);
  return unitaryPower(base, k);
}

/** The simulator-level action of a flat gate. */
export function resolveGate(g: FlatGate): ResolvedGate {
  const definition = standardGate(g.name);
  if (!definition) throw new RangeError(`unknown gate "${g.name}"`);
  const builtIn = g.qubits.slice(0, definition.controls);
  const operands = g.qubits.slice(definition.controls);
  const controls = [...g.controls, ...builtIn];
  const negControls = g.negControls;
  const exponent = g.inverse ? -g.power : g.power;
  if (!(Math.abs(exponent) <= MAX_GATE_POWER)) throw new RangeError(`gate ${g.name}: power ${g.power} is not a number of magnitude at most 2^53`);
  const integer = Number.isInteger(exponent);
  const base = definition.base(g.params);
  if (base.kind === 'phase') {
    const angle =
      exponent === 1 || exponent === -1 ? exponent * base.angle
      : integer ? reduceAngle(exponent, base.angle, 2)
      : exponent * principalArg(Math.cos(base.angle), Math.sin(base.angle));
    return { kind: 'phase', angle, controls, negControls };
  }
  if (base.kind === 'swap') {
    // Swap has eigenvalues +1 (symmetric) and −1 (antisymmetric); (−1)^k = e^{iπk} on the principal branch.
    // Integer powers are exact (sin(πk) is not exactly 0 in floating point).
    const odd = Math.abs(exponent) % 2 === 1;
    const [phaseRe, phaseIm] = integer ? [odd ? -1 : 1, 0] : [Math.cos(Math.PI * exponent), Math.sin(Math.PI * exponent)];
    return { kind: 'swap', a: operands[0] as number, b: operands[1] as number, phaseRe, phaseIm, controls, negControls };
  }
  const matrix = integer && exponent !== 1 ? (exponent === -1 ? adjoint2(base.matrix) : integerPower(definition, g.params, base.matrix, exponent)) : unitaryPower(base.matrix, exponent);
  return { kind: 'unitary', target: operands[0] as number, matrix, controls, negControls };
}
