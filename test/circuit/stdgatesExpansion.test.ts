// Every standard gate's matrix, global phase included, equals the matrix obtained by expanding its
// stdgates.inc definition (OpenQASM 3.0.0) down to the built-ins U and gphase of the specification's
// "Gates" chapter, section "Built-in gates" — here by a small interpreter of the definition text —
// alone and under ctrl @ (which controls the global phase); plus the ctrl @ U(2π, 0, 0) example.
import { describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { gate } from '../../src/circuit/ops.js';
import { STANDARD_GATES } from '../../src/circuit/standardGates.js';
import { parseQasm } from '../../src/qasm/parseQasm.js';
import { circuitMatrix } from '../../src/sim/circuitMatrix.js';
import { outcomeDistribution } from '../../src/sim/outcomeDistribution.js';
import { expectClose } from '../helpers/close.js';

// stdgates.inc of OpenQASM 3.0.0 (looked up), one definition per line. CX is written as in the
// "Built-in gates" section (`gate CX c, t { ctrl @ X c, t; }` with X = U(π, 0, π); gphase(−π/2)); the
// stdgates.inc line `ctrl @ U(π, 0, π) a, b` predates the e^{iθ/2} of U, and the standard-library
// page calls CX an alias of cx.
const STDGATES = `
gate p(λ) a { ctrl @ gphase(λ) a; }
gate x a { U(π, 0, π) a; gphase(-π/2); }
gate y a { U(π, π/2, π/2) a; gphase(-π/2); }
gate z a { p(π) a; }
gate h a { U(π/2, 0, π) a; gphase(-π/4); }
gate s a { pow(1/2) @ z a; }
gate sdg a { inv @ pow(1/2) @ z a; }
gate t a { pow(1/2) @ s a; }
gate tdg a { inv @ pow(1/2) @ s a; }
gate sx a { pow(1/2) @ x a; }
gate rx(θ) a { U(θ, -π/2, π/2) a; gphase(-θ/2); }
gate ry(θ) a { U(θ, 0, 0) a; gphase(-θ/2); }
gate rz(λ) a { gphase(-λ/2); U(0, 0, λ) a; }
gate cx a, b { ctrl @ x a, b; }
gate cy a, b { ctrl @ y a, b; }
gate cz a, b { ctrl @ z a, b; }
gate cp(λ) a, b { ctrl @ p(λ) a, b; }
gate crx(θ) a, b { ctrl @ rx(θ) a, b; }
gate cry(θ) a, b { ctrl @ ry(θ) a, b; }
gate crz(θ) a, b { ctrl @ rz(θ) a, b; }
gate ch a, b { ctrl @ h a, b; }
gate swap a, b { cx a, b; cx b, a; cx a, b; }
gate ccx a, b, c { ctrl @ ctrl @ x a, b, c; }
gate cswap a, b, c { ctrl @ swap a, b, c; }
gate cu(θ, φ, λ, γ) a, b { p(γ-θ/2) a; ctrl @ U(θ, φ, λ) a, b; }
gate CX a, b { ctrl @ x a, b; }
gate phase(λ) q { U(0, 0, λ) q; }
gate cphase(λ) a, b { ctrl @ phase(λ) a, b; }
gate id a { U(0, 0, 0) a; }
gate u1(λ) q { U(0, 0, λ) q; }
gate u2(φ, λ) q { gphase(-(φ+λ+π/2)/2); U(π/2, φ, λ) q; }
gate u3(θ, φ, λ) q { gphase(-(φ+λ+θ)/2); U(θ, φ, λ) q; }
`;

/** Dense complex matrix, row-major, dim × dim, entries [re, im]. */
type Dense = { dim: number; re: Float64Array; im: Float64Array };

function identity(dim: number): Dense {
  const m = { dim, re: new Float64Array(dim * dim), im: new Float64Array(dim * dim) };
  for (let i = 0; i < dim; i++) m.re[i * dim + i] = 1;
  return m;
}

function product(a: Dense, b: Dense): Dense {
  const n = a.dim;
  const out = { dim: n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const [ar, ai] = [a.re[i * n + k]!, a.im[i * n + k]!];
      for (let j = 0; j < n; j++) {
        out.re[i * n + j] += ar * b.re[k * n + j]! - ai * b.im[k * n + j]!;
        out.im[i * n + j] += ar * b.im[k * n + j]! + ai * b.re[k * n + j]!;
      }
    }
  }
  return out;
}

function adjoint(a: Dense): Dense {
  const n = a.dim;
  const out = { dim: n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) [out.re[j * n + i], out.im[j * n + i]] = [a.re[i * n + j]!, -a.im[i * n + j]!];
  return out;
}

/** Principal square root of a 2×2 diagonal or of X-type unitaries used by stdgates.inc (z, s, x): via the spectral projectors. */
function principalSqrt(a: Dense): Dense {
  // Eigenvalues of a 2×2 unitary with trace t and determinant d: (t ± √(t² − 4d))/2.
  const [ar, ai, br, bi, cr, ci, dr, di] = [a.re[0]!, a.im[0]!, a.re[1]!, a.im[1]!, a.re[2]!, a.im[2]!, a.re[3]!, a.im[3]!];
  const mul = (x: [number, number], y: [number, number]): [number, number] => [x[0] * y[0] - x[1] * y[1], x[0] * y[1] + x[1] * y[0]];
  const tr: [number, number] = [ar + dr, ai + di];
  const det = [mul([ar, ai], [dr, di])[0] - mul([br, bi], [cr, ci])[0], mul([ar, ai], [dr, di])[1] - mul([br, bi], [cr, ci])[1]] as [number, number];
  const disc: [number, number] = [mul(tr, tr)[0] - 4 * det[0], mul(tr, tr)[1] - 4 * det[1]];
  const r = Math.hypot(disc[0], disc[1]);
  const root: [number, number] = [Math.sqrt((r + disc[0]) / 2), Math.sign(disc[1] || 1) * Math.sqrt(Math.max(0, (r - disc[0]) / 2))];
  const l1: [number, number] = [(tr[0] + root[0]) / 2, (tr[1] + root[1]) / 2];
  const l2: [number, number] = [(tr[0] - root[0]) / 2, (tr[1] - root[1]) / 2];
  const half = (l: [number, number]): [number, number] => {
    const angle = Math.atan2(l[1], l[0]) / 2; // arguments in (−π, π]: the principal branch of pow(1/2)
    return [Math.cos(angle), Math.sin(angle)];
  };
  if (br === 0 && bi === 0 && cr === 0 && ci === 0) {
    const [p, q] = [half([ar, ai]), half([dr, di])];
    return { dim: 2, re: Float64Array.from([p[0], 0, 0, q[0]]), im: Float64Array.from([p[1], 0, 0, q[1]]) };
  }
  // P1 = (A − λ2)/(λ1 − λ2); √A = √λ1 P1 + √λ2 (I − P1).
  const gap = [l1[0] - l2[0], l1[1] - l2[1]] as [number, number];
  const inv = 1 / (gap[0] ** 2 + gap[1] ** 2);
  const div = (z: [number, number]): [number, number] => [(z[0] * gap[0] + z[1] * gap[1]) * inv, (z[1] * gap[0] - z[0] * gap[1]) * inv];
  const P1 = [div([ar - l2[0], ai - l2[1]]), div([br, bi]), div([cr, ci]), div([dr - l2[0], di - l2[1]])];
  const [s1, s2] = [half(l1), half(l2)];
  const out = { dim: 2, re: new Float64Array(4), im: new Float64Array(4) };
  P1.forEach((p, e) => {
    const q: [number, number] = [(e === 0 || e === 3 ? 1 : 0) - p[0], -p[1]];
    const v = [mul(s1, p)[0] + mul(s2, q)[0], mul(s1, p)[1] + mul(s2, q)[1]];
    [out.re[e], out.im[e]] = [v[0]!, v[1]!];
  });
  return out;
}

/** U(θ,φ,λ) := ½[[1+e^{iθ}, −ie^{iλ}(1−e^{iθ})], [ie^{iφ}(1−e^{iθ}), e^{i(φ+λ)}(1+e^{iθ})]] ("Built-in gates", 3.0.0). */
function builtinU(t: number, f: number, l: number): Dense {
  const cis = (a: number): [number, number] => [Math.cos(a), Math.sin(a)];
  const mul = (x: [number, number], y: [number, number]): [number, number] => [x[0] * y[0] - x[1] * y[1], x[0] * y[1] + x[1] * y[0]];
  const e = cis(t);
  const plus: [number, number] = [1 + e[0], e[1]];
  const minus: [number, number] = [1 - e[0], -e[1]];
  const entries = [plus, mul(mul([0, -1], cis(l)), minus), mul(mul([0, 1], cis(f)), minus), mul(cis(f + l), plus)];
  return { dim: 2, re: Float64Array.from(entries.map((z) => z[0] / 2)), im: Float64Array.from(entries.map((z) => z[1] / 2)) };
}

/** `m` (on `operands.length` qubits, local bit k = operand k) applied to global bits `operands` of an n-qubit space. */
function embed(m: Dense, operands: readonly number[], n: number): Dense {
  const dim = 2 ** n;
  const out = { dim, re: new Float64Array(dim * dim), im: new Float64Array(dim * dim) };
  const local = (index: number): number => operands.reduce((acc, q, k) => acc | (((index >> q) & 1) << k), 0);
  const rest = (index: number): number => operands.reduce((acc, q) => acc & ~(1 << q), index);
  for (let row = 0; row < dim; row++) {
    for (let col = 0; col < dim; col++) {
      if (rest(row) !== rest(col)) continue;
      const e = local(row) * m.dim + local(col);
      out.re[row * dim + col] = m.re[e]!;
      out.im[row * dim + col] = m.im[e]!;
    }
  }
  return out;
}

/** ctrl @ g: |0><0| ⊗ I + |1><1| ⊗ G with the control as local bit 0 and g on the bits above ("gate modifiers"). */
function controlled(g: Dense): Dense {
  const dim = 2 * g.dim;
  const out = identity(dim);
  for (let i = 0; i < g.dim; i++) {
    out.re[(2 * i + 1) * dim + 2 * i + 1] = 0;
    for (let j = 0; j < g.dim; j++) {
      out.re[(2 * i + 1) * dim + 2 * j + 1] = g.re[i * g.dim + j]!;
      out.im[(2 * i + 1) * dim + 2 * j + 1] = g.im[i * g.dim + j]!;
    }
  }
  return out;
}

interface Definition {
  readonly params: readonly string[];
  readonly qubits: readonly string[];
  readonly body: readonly string[];
}

const DEFINITIONS = new Map<string, Definition>(
  STDGATES.trim().split('\n').map((line) => {
    const match = /^gate (\w+)(?:\(([^)]*)\))? ([^{]*)\{(.*)\}$/u.exec(line.trim())!;
    const list = (text: string | undefined): string[] => (text ?? '').split(',').map((w) => w.trim()).filter((w) => w !== '');
    return [match[1]!, { params: list(match[2]), qubits: list(match[3]), body: match[4]!.split(';').map((st) => st.trim()).filter((st) => st !== '') }];
  }),
);

/** Evaluates an angle expression of the definitions (numbers, π, parameters, + − * / and parentheses). */
function evaluate(expression: string, scope: ReadonlyMap<string, number>): number {
  const js = expression.replace(/π/gu, `(${Math.PI})`).replace(/[θφλγ]/gu, (name) => `(${scope.get(name)!})`);
  if (!/^[-+*/().\d\se]+$/u.test(js)) throw new Error(`unexpected expression ${expression}`);
  return Function(`"use strict"; return (${js});`)() as number;
}

/** "(args) operands" → [args, operands], matching nested parentheses; no "(" → ["", text]. */
function splitArguments(text: string): [string, string] {
  const trimmed = text.trim();
  if (!trimmed.startsWith('(')) return ['', trimmed];
  let depth = 0;
  for (let k = 0; k < trimmed.length; k++) {
    depth += trimmed[k] === '(' ? 1 : trimmed[k] === ')' ? -1 : 0;
    if (depth === 0) return [trimmed.slice(1, k), trimmed.slice(k + 1)];
  }
  throw new Error(`unbalanced parentheses in ${text}`);
}

/** Splits at commas outside parentheses. */
function topLevelCommas(text: string): string[] {
  const parts: string[] = [];
  let depth = 0;
  let start = 0;
  for (let k = 0; k < text.length; k++) {
    depth += text[k] === '(' ? 1 : text[k] === ')' ? -1 : 0;
    if (text[k] === ',' && depth === 0) {
      parts.push(text.slice(start, k));
      start = k + 1;
    }
  }
  parts.push(text.slice(start));
  return parts;
}

/** The matrix of gate `name` with `args` on its own qubits (local bit k = qubit k), expanded from the definitions. */
function expand(name: string, args: readonly number[]): Dense {
  if (name === 'U') return builtinU(args[0]!, args[1]!, args[2]!);
  if (name === 'gphase') return { dim: 1, re: Float64Array.of(Math.cos(args[0]!)), im: Float64Array.of(Math.sin(args[0]!)) };
  const definition = DEFINITIONS.get(name)!;
  const scope = new Map(definition.params.map((p, k) => [p, args[k]!]));
  const n = definition.qubits.length;
  let total = identity(2 ** n);
  for (const statement of definition.body) {
    const match = /^((?:(?:ctrl|inv|pow\([^)]*\)) @ )*)(\w+)(.*)$/u.exec(statement)!;
    const modifiers = match[1]!.split('@').map((m) => m.trim()).filter((m) => m !== '');
    const [argText, operandText] = splitArguments(match[3]!);
    const callArgs = topLevelCommas(argText).filter((a) => a.trim() !== '').map((a) => evaluate(a, scope));
    const operands = operandText.split(',').map((q) => q.trim()).filter((q) => q !== '').map((q) => definition.qubits.indexOf(q));
    let g = expand(match[2]!, callArgs);
    for (const m of [...modifiers].reverse()) {
      if (m === 'ctrl') g = controlled(g);
      else if (m === 'inv') g = adjoint(g);
      else if (m === 'pow(1/2)') g = principalSqrt(g);
      else throw new Error(`unexpected modifier ${m}`);
    }
    const step = g.dim === 1 ? { dim: 2 ** n, re: identity(2 ** n).re.map((v) => v * g.re[0]!), im: identity(2 ** n).re.map((v) => v * g.im[0]!) } : embed(g, operands, n);
    total = product(step, total);
  }
  return total;
}

/** The simulator's matrix of gate `name` on qubits 0…k−1, with `controls` extra ctrl @ qubits put first (bits 0…). */
function simulated(name: string, args: readonly number[], qubits: number, controls: number): Dense {
  const b = new CircuitBuilder();
  b.qubits('q', Math.max(1, qubits + controls));
  const operands = Array.from({ length: qubits }, (_, k) => controls + k);
  b.add(gate(name, operands, args, { controls: Array.from({ length: controls }, (_, k) => k) }));
  const m = circuitMatrix(b.build());
  return { dim: m.dim, re: m.re, im: m.im };
}

function expectSame(actual: Dense, expected: Dense, label: string): void {
  expect(actual.dim, label).toBe(expected.dim);
  let worst = 0;
  for (let e = 0; e < actual.re.length; e++) worst = Math.max(worst, Math.hypot(actual.re[e]! - expected.re[e]!, actual.im[e]! - expected.im[e]!));
  expect(worst, label).toBeLessThanOrEqual(1e-13);
}

const ARGS = [0.7, -1.9, 2.4, 0.35];
/** Gates whose definition carries a gphase (directly or through p / ctrl @ gphase), plus U, u1, u2, u3 and cu. */
const PHASE_CARRYING = ['U', 'gphase', 'p', 'x', 'y', 'h', 'rx', 'ry', 'rz', 'u1', 'u2', 'u3', 'cu', 'sx', 'cx', 'ch', 'crx', 'cry', 'crz'];

describe('standard gates against their stdgates.inc (3.0.0) expansion in terms of U, gphase and ctrl @', () => {
  it('the interpreter knows every standard gate', () => {
    expect([...DEFINITIONS.keys(), 'U', 'gphase'].sort()).toEqual(STANDARD_GATES.map((g) => g.name).sort());
  });

  for (const definition of STANDARD_GATES) {
    const args = ARGS.slice(0, definition.params);
    it(`${definition.name}(${args.join(', ')}) equals its expansion, global phase included`, () => {
      if (definition.name === 'gphase') return; // a 0-qubit gate: covered controlled below
      expectSame(simulated(definition.name, args, definition.qubits, 0), embed(expand(definition.name, args), Array.from({ length: definition.qubits }, (_, k) => k), definition.qubits), definition.name);
    });
  }

  for (const name of PHASE_CARRYING) {
    const definition = STANDARD_GATES.find((g) => g.name === name)!;
    const args = ARGS.slice(0, definition.params);
    it(`ctrl @ ${name} controls the global phase of its expansion`, () => {
      expectSame(simulated(name, args, definition.qubits, 1), controlled(expand(name, args)), `ctrl @ ${name}`);
    });
  }

  it('U(2π, 0, 0) = I in 3.0.0, so h; ctrl @ U(2π, 0, 0); h gives outcome 0 with certainty', () => {
    // "Built-in gates" (3.0.0): U(2π, 0, 0) = ½[[1 + e^{2πi}, 0], [0, 1 + e^{2πi}]] = I. The earlier draft's
    // [[cos π, 0], [0, cos π]] = −I would put a Z on the control and give outcome 1.
    expectSame(simulated('U', [2 * Math.PI, 0, 0], 1, 0), identity(2), 'U(2π,0,0)');
    const circuit = parseQasm('OPENQASM 3;\ninclude "stdgates.inc";\nqubit[2] q;\nbit[1] c;\nh q[0];\nctrl @ U(2*pi,0,0) q[0],q[1];\nh q[0];\nc[0] = measure q[0];\n', 'example.qasm');
    const outcomes = outcomeDistribution(circuit).outcomes;
    expect([...outcomes.keys()]).toEqual(['0']);
    expectClose(outcomes.get('0')!, 1, 1e-12, 'P(0)');
  });
});
