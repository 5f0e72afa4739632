/**
 * resolveGate: turns a flat gate (name, parameters, modifiers) into what a simulator applies —
 * one target with a 2×2 unitary, a (powered) swap of two targets, or a phase — plus all controls.
 * Powers use the principal branch (eigenvalue arguments in (−π, π]), as OpenQASM 3 specifies.
 */
import type { FlatGate } from './flatten.js';
import { standardGate, type Matrix2 } from './standardGates.js';

export type ResolvedGate =
  | { readonly kind: 'unitary'; readonly target: number; readonly matrix: Matrix2; readonly controls: readonly number[]; readonly negControls: readonly number[] }
  /** Swap to the power: on span{|01>,|10>} of (a, b) the 2×2 [[(1+e)/2, (1−e)/2], [(1−e)/2, (1+e)/2]], e = phase. */
  | { readonly kind: 'swap'; readonly a: number; readonly b: number; readonly phaseRe: number; readonly phaseIm: number; readonly controls: readonly number[]; readonly negControls: readonly number[] }
  | { readonly kind: 'phase'; readonly angle: number; readonly controls: readonly number[]; readonly negControls: readonly number[] };

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

/** Principal power of a 2×2 unitary: Σ λ^k P_λ over its eigenvalues. */
export function unitaryPower(m: Matrix2, k: number): Matrix2 {
  if (k === 1) return m;
  if (Number.isInteger(k) && Math.abs(k) <= 64) {
    let result: Matrix2 = [1, 0, 0, 0, 0, 0, 1, 0];
    const base = k < 0 ? adjoint2(m) : m;
    for (let r = 0; r < Math.abs(k); r++) result = multiply(result, base);
    return result;
  }
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

/** The simulator-level action of a flat gate. */
export function resolveGate(g: FlatGate): ResolvedGate {
  const definition = standardGate(g.name);
  if (!definition) throw new RangeError(`unknown gate "${g.name}"`);
  const builtIn = g.qubits.slice(0, definition.controls);
  const operands = g.qubits.slice(definition.controls);
  const controls = [...g.controls, ...builtIn];
  const negControls = g.negControls;
  const exponent = g.inverse ? -g.power : g.power;
  const base = definition.base(g.params);
  if (base.kind === 'phase') {
    const angle = exponent * (Number.isInteger(exponent) ? base.angle : principalArg(Math.cos(base.angle), Math.sin(base.angle)));
    return { kind: 'phase', angle, controls, negControls };
  }
  if (base.kind === 'swap') {
    // Swap has eigenvalues +1 (symmetric) and −1 (antisymmetric); (−1)^k = e^{iπk} on the principal branch.
    // Integer powers are exact (sin(πk) is not exactly 0 in floating point).
    const odd = Math.abs(exponent) % 2 === 1;
    const [phaseRe, phaseIm] = Number.isInteger(exponent) ? [odd ? -1 : 1, 0] : [Math.cos(Math.PI * exponent), Math.sin(Math.PI * exponent)];
    return { kind: 'swap', a: operands[0] as number, b: operands[1] as number, phaseRe, phaseIm, controls, negControls };
  }
  return { kind: 'unitary', target: operands[0] as number, matrix: unitaryPower(base.matrix, exponent), controls, negControls };
}
