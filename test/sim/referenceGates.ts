// Matrices of the OpenQASM 3 standard gates written independently of src/, with mathjs, from the
// OpenQASM 3.0.0 specification: U(θ,φ,λ) as defined in the "Gates" chapter, section "Built-in gates",
// and the stdgates.inc bodies of 3.0.0 (looked up, not from memory), global phases included.
import * as math from 'mathjs';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';

type M = math.Matrix;
const c = (re: number, im = 0): math.Complex => math.complex(re, im);
const cis = (angle: number): math.Complex => math.complex(Math.cos(angle), Math.sin(angle));
const mat = (rows: math.Complex[][]): M => math.matrix(rows as unknown as math.MathNumericType[][]);
const I2 = mat([[c(1), c(0)], [c(0), c(1)]]);
const P0 = mat([[c(1), c(0)], [c(0), c(0)]]);
const P1 = mat([[c(0), c(0)], [c(0), c(1)]]);

/**
 * OpenQASM 3.0.0, "Gates" chapter, section "Built-in gates":
 * U(θ,φ,λ) := ½[[1+e^{iθ}, −ie^{iλ}(1−e^{iθ})], [ie^{iφ}(1−e^{iθ}), e^{i(φ+λ)}(1+e^{iθ})]]
 * (= e^{iθ/2}·[[cos θ/2, −e^{iλ} sin θ/2], [e^{iφ} sin θ/2, e^{i(φ+λ)} cos θ/2]]; earlier drafts had no e^{iθ/2}).
 */
export function U(theta: number, phi: number, lambda: number): M {
  const e = cis(theta);
  const plus = math.add(c(1), e) as math.Complex;
  const minus = math.subtract(c(1), e) as math.Complex;
  const half = (z: math.Complex): math.Complex => math.multiply(z, 0.5) as math.Complex;
  return mat([
    [half(plus), half(math.multiply(math.multiply(c(0, -1), cis(lambda)), minus) as math.Complex)],
    [half(math.multiply(math.multiply(c(0, 1), cis(phi)), minus) as math.Complex), half(math.multiply(cis(phi + lambda), plus) as math.Complex)],
  ]);
}

/** gphase(γ) in a gate body: the body's matrix times e^{iγ} (same section, "gphase"). */
export function gphased(gamma: number, m: M): M {
  return scaled(cis(gamma), m);
}

export function scaled(factor: math.Complex, m: M): M {
  return math.multiply(m, factor) as M;
}

export function identity(dim: number): M {
  return math.matrix(Array.from({ length: dim }, (_, i) => Array.from({ length: dim }, (_, j) => c(i === j ? 1 : 0))) as unknown as math.MathNumericType[][]);
}

/** ctrl @ g with the control as local bit 0 and g on the bits above: |0><0| ⊗ I + |1><1| ⊗ g (kron puts higher bits left). */
export function controlled(g: M): M {
  const dim = (g.size()[0] as number);
  return math.add(math.kron(identity(dim), P0), math.kron(g, P1)) as M;
}

/** negctrl @ g with the negative control as local bit 0. */
export function negControlled(g: M): M {
  const dim = (g.size()[0] as number);
  return math.add(math.kron(g, P0), math.kron(identity(dim), P1)) as M;
}

const p = (lambda: number): M => mat([[c(1), c(0)], [c(0), cis(lambda)]]);
// stdgates.inc (3.0.0): x = U(π, 0, π); gphase(−π/2), y = U(π, π/2, π/2); gphase(−π/2), h = U(π/2, 0, π); gphase(−π/4),
// rx(θ) = U(θ, −π/2, π/2); gphase(−θ/2), ry(θ) = U(θ, 0, 0); gphase(−θ/2), rz(λ) = gphase(−λ/2); U(0, 0, λ).
const x = gphased(-Math.PI / 2, U(Math.PI, 0, Math.PI));
const y = gphased(-Math.PI / 2, U(Math.PI, Math.PI / 2, Math.PI / 2));
const h = gphased(-Math.PI / 4, U(Math.PI / 2, 0, Math.PI));
const rx = (t: number): M => gphased(-t / 2, U(t, -Math.PI / 2, Math.PI / 2));
const ry = (t: number): M => gphased(-t / 2, U(t, 0, 0));
const rz = (l: number): M => gphased(-l / 2, U(0, 0, l));
const swap = mat([
  [c(1), c(0), c(0), c(0)],
  [c(0), c(0), c(1), c(0)],
  [c(0), c(1), c(0), c(0)],
  [c(0), c(0), c(0), c(1)],
]);

/** One standard gate: its matrix with local bit k = operand k, and its operand count. */
export interface ReferenceGate {
  readonly params: number;
  readonly qubits: number;
  readonly matrix: (a: readonly number[]) => M;
}

const g = (params: number, qubits: number, matrix: (a: readonly number[]) => M): ReferenceGate => ({ params, qubits, matrix });
const a0 = (a: readonly number[]): number => a[0] as number;

// Each line follows the gate's stdgates.inc (3.0.0) definition; comments give the definition.
export const REFERENCE_GATES: Readonly<Record<string, ReferenceGate>> = {
  U: g(3, 1, (a) => U(a0(a), a[1] as number, a[2] as number)),
  gphase: g(1, 0, (a) => mat([[cis(a0(a))]])),
  p: g(1, 1, (a) => p(a0(a))), // ctrl @ gphase(λ)
  x: g(0, 1, () => x), // U(π, 0, π); gphase(−π/2)
  y: g(0, 1, () => y), // U(π, π/2, π/2); gphase(−π/2)
  z: g(0, 1, () => p(Math.PI)), // p(π)
  h: g(0, 1, () => h), // U(π/2, 0, π); gphase(−π/4)
  s: g(0, 1, () => mat([[c(1), c(0)], [c(0), c(0, 1)]])), // pow(1/2) @ z
  sdg: g(0, 1, () => mat([[c(1), c(0)], [c(0), c(0, -1)]])), // inv @ pow(1/2) @ z
  t: g(0, 1, () => p(Math.PI / 4)), // pow(1/2) @ s
  tdg: g(0, 1, () => p(-Math.PI / 4)), // inv @ pow(1/2) @ s
  sx: g(0, 1, () => mat([[c(0.5, 0.5), c(0.5, -0.5)], [c(0.5, -0.5), c(0.5, 0.5)]])), // pow(1/2) @ x
  rx: g(1, 1, (a) => rx(a0(a))), // U(θ, −π/2, π/2); gphase(−θ/2)
  ry: g(1, 1, (a) => ry(a0(a))), // U(θ, 0, 0); gphase(−θ/2)
  rz: g(1, 1, (a) => rz(a0(a))), // gphase(−λ/2); U(0, 0, λ)
  cx: g(0, 2, () => controlled(x)),
  cy: g(0, 2, () => controlled(y)),
  cz: g(0, 2, () => controlled(p(Math.PI))),
  cp: g(1, 2, (a) => controlled(p(a0(a)))),
  crx: g(1, 2, (a) => controlled(rx(a0(a)))),
  cry: g(1, 2, (a) => controlled(ry(a0(a)))),
  crz: g(1, 2, (a) => controlled(rz(a0(a)))),
  ch: g(0, 2, () => controlled(h)),
  swap: g(0, 2, () => swap), // cx a,b; cx b,a; cx a,b — the permutation |01> ↔ |10>
  ccx: g(0, 3, () => controlled(controlled(x))),
  cswap: g(0, 3, () => controlled(swap)),
  // p(γ − θ/2) c; ctrl @ U(θ, φ, λ) c, t — applied right to left as matrices.
  cu: g(4, 2, (a) => math.multiply(controlled(U(a0(a), a[1] as number, a[2] as number)), math.kron(I2, p((a[3] as number) - a0(a) / 2))) as M),
  // The CNOT: "Built-in gates" defines CX as ctrl @ X with X = U(π, 0, π); gphase(−π/2), and the standard-library
  // page calls CX an alias of cx. (The 3.0.0 stdgates.inc body ctrl @ U(π, 0, π) predates the e^{iθ/2} in U.)
  CX: g(0, 2, () => controlled(x)),
  phase: g(1, 1, (a) => U(0, 0, a0(a))), // U(0, 0, λ)
  cphase: g(1, 2, (a) => controlled(U(0, 0, a0(a)))), // ctrl @ phase(λ)
  id: g(0, 1, () => U(0, 0, 0)), // U(0, 0, 0)
  u1: g(1, 1, (a) => U(0, 0, a0(a))), // U(0, 0, λ)
  u2: g(2, 1, (a) => gphased(-(a0(a) + (a[1] as number) + Math.PI / 2) / 2, U(Math.PI / 2, a0(a), a[1] as number))), // gphase(−(φ+λ+π/2)/2); U(π/2, φ, λ)
  u3: g(3, 1, (a) => gphased(-(a0(a) + (a[1] as number) + (a[2] as number)) / 2, U(a0(a), a[1] as number, a[2] as number))), // gphase(−(φ+λ+θ)/2); U(θ, φ, λ)
};

/** A mathjs complex matrix as a ComplexMatrix (row-major Float64Arrays). */
export function toComplexMatrix(m: M): ComplexMatrix {
  const rows = m.toArray() as unknown as (math.Complex | number)[][];
  const n = rows.length;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  rows.forEach((row, i) =>
    row.forEach((v, j) => {
      const z = typeof v === 'number' ? c(v) : v;
      re[i * n + j] = z.re;
      im[i * n + j] = z.im;
    }),
  );
  return { n, re, im };
}

/**
 * Principal power of a unitary via its eigendecomposition (mathjs eigs): Σ λ^k v w†, eigenvalue
 * arguments taken in (−π, π] as the OpenQASM 3 specification prescribes for pow(k) @.
 */
export function principalPower(m: M, k: number): M {
  const { values, eigenvectors } = math.eigs(m);
  const vectors = eigenvectors.map((e) => (e.vector as M).toArray() as unknown as math.MathNumericType[]);
  const V = math.transpose(math.matrix(vectors));
  const powered = (values as M).toArray().map((l) => {
    const z = typeof l === 'number' ? c(l) : (l as math.Complex);
    return cis(k * Math.atan2(z.im, z.re));
  });
  return math.multiply(math.multiply(V, math.diag(powered)), math.inv(V)) as M;
}
