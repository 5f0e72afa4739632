// Every stdgates.inc gate's matrix, as the simulator applies it (circuitMatrix on 1–3 qubits), against
// matrices written in the test from the OpenQASM 3.0.0 specification (U of the "Built-in gates"
// section and the stdgates.inc bodies, see test/sim/referenceGates.ts), global phase included; and
// the spec's ctrl @, negctrl @, inv @ and pow(k) @ rules.
import { describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { gate, type ModifierOptions } from '../../src/circuit/ops.js';
import { STANDARD_GATES } from '../../src/circuit/standardGates.js';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { circuitMatrix } from '../../src/sim/circuitMatrix.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';
import { REFERENCE_GATES, U, toComplexMatrix } from '../sim/referenceGates.js';

const ANGLES = [0.3, -1.1, 2.7, 0.9];

/** The simulator's matrix of one gate on qubits 0 … k−1 of a k-qubit circuit (k ≥ 1). */
function simulated(name: string, qubits: readonly number[], params: readonly number[], options: ModifierOptions = {}, width?: number): ComplexMatrix {
  const b = new CircuitBuilder();
  const all = [...qubits, ...(options.controls ?? []), ...(options.negControls ?? [])];
  b.qubits('q', width ?? Math.max(1, ...all.map((q) => q + 1)));
  b.add(gate(name, qubits, params, options));
  const m = circuitMatrix(b.build());
  return { n: m.dim, re: m.re, im: m.im };
}

function expectMatrixClose(actual: ComplexMatrix, expected: ComplexMatrix, label: string, tol = 1e-14): void {
  expect(actual.n, label).toBe(expected.n);
  let worst = 0;
  for (let e = 0; e < actual.re.length; e++) worst = Math.max(worst, Math.hypot(actual.re[e]! - expected.re[e]!, actual.im[e]! - expected.im[e]!));
  expect(worst, label).toBeLessThanOrEqual(tol);
}

/** The matrix times e^{-i·arg(first nonzero entry)}: equal results mean equal up to a global phase. */
function phaseFixed(m: ComplexMatrix): ComplexMatrix {
  const e = m.re.findIndex((v, k) => Math.hypot(v, m.im[k]!) > 1e-9);
  const angle = Math.atan2(m.im[e]!, m.re[e]!);
  const [c, s] = [Math.cos(angle), Math.sin(angle)];
  return { n: m.n, re: m.re.map((v, k) => v * c + m.im[k]! * s), im: m.im.map((v, k) => v * c - m.re[k]! * s) };
}

const i = (v = 1): [number, number] => [0, v];
const r = Math.SQRT1_2;

describe('standard gate matrices (OpenQASM 3.0.0 stdgates.inc)', () => {
  it('covers every gate of the library', () => {
    const names = STANDARD_GATES.map((g) => g.name).sort();
    expect(names).toEqual(Object.keys(REFERENCE_GATES).sort());
  });

  for (const [name, reference] of Object.entries(REFERENCE_GATES)) {
    if (name === 'gphase') continue;
    it(`${name} has the matrix of its stdgates.inc definition, global phase included`, () => {
      const params = ANGLES.slice(0, reference.params);
      const qubits = Array.from({ length: reference.qubits }, (_, k) => k);
      expectMatrixClose(simulated(name, qubits, params), toComplexMatrix(reference.matrix(params)), name);
    });
  }

  it('reference matrices match the textbook forms of x, y, h, cx, swap, ccx (little-endian: qubit 0 is bit 0)', () => {
    // Nielsen & Chuang §1.3 / §4.2 (from memory), rewritten for qubit 0 = least significant bit.
    expectMatrixClose(toComplexMatrix(REFERENCE_GATES.x!.matrix([])), matrixFromRows([[0, 1], [1, 0]]), 'x', 1e-15);
    expectMatrixClose(toComplexMatrix(REFERENCE_GATES.y!.matrix([])), matrixFromRows([[0, i(-1)], [i(1), 0]]), 'y', 1e-15);
    expectMatrixClose(toComplexMatrix(REFERENCE_GATES.h!.matrix([])), matrixFromRows([[r, r], [r, -r]]), 'h', 1e-15);
    // cx q[0], q[1]: |q1 q0> = |01> (index 1) ↔ |11> (index 3).
    expectMatrixClose(simulated('cx', [0, 1], []), matrixFromRows([[1, 0, 0, 0], [0, 0, 0, 1], [0, 0, 1, 0], [0, 1, 0, 0]]), 'cx', 1e-15);
    expectMatrixClose(simulated('swap', [0, 1], []), matrixFromRows([[1, 0, 0, 0], [0, 0, 1, 0], [0, 1, 0, 0], [0, 0, 0, 1]]), 'swap', 0);
    // ccx q[0], q[1], q[2]: flips qubit 2 when qubits 0 and 1 are 1: index 3 ↔ 7.
    const ccx = Array.from({ length: 8 }, (_, row) => Array.from({ length: 8 }, (_, col) => ((col === 3 ? 7 : col === 7 ? 3 : col) === row ? 1 : 0)));
    expectMatrixClose(simulated('ccx', [0, 1, 2], []), matrixFromRows(ccx), 'ccx', 1e-15);
  });

  it('u2 and u3 equal e^{−i(φ+λ)/2} times the earlier-draft U (the OpenQASM 2 U), as 3.0.0 intends', () => {
    // OpenQASM 3.0.0 standard library, "OpenQASM 2.0 compatibility": u3 is identical to the U of OpenQASM 2,
    // u3(θ, φ, λ) = e^{−i(θ+φ+λ)/2} U(θ, φ, λ); u2(φ, λ) = u3(π/2, φ, λ). The OpenQASM 2 U is
    // e^{−i(φ+λ)/2}·[[cos θ/2, −e^{iλ} sin θ/2], [e^{iφ} sin θ/2, e^{i(φ+λ)} cos θ/2]] (OpenQASM 2 paper, from memory).
    const [t, f, l] = [1.3, 0.4, -0.8];
    const old = (theta: number): ComplexMatrix => {
      const [co, si] = [Math.cos(theta / 2), Math.sin(theta / 2)];
      const g = -(f + l) / 2;
      return matrixFromRows([
        [[co * Math.cos(g), co * Math.sin(g)], [-si * Math.cos(l + g), -si * Math.sin(l + g)]],
        [[si * Math.cos(f + g), si * Math.sin(f + g)], [co * Math.cos(f + l + g), co * Math.sin(f + l + g)]],
      ]);
    };
    expectMatrixClose(simulated('u3', [0], [t, f, l]), old(t), 'u3');
    expectMatrixClose(simulated('u2', [0], [f, l]), old(Math.PI / 2), 'u2');
    expectMatrixClose(phaseFixed(simulated('u3', [0], [t, f, l])), phaseFixed(toComplexMatrix(U(t, f, l))), 'u3 up to phase');
  });

  it('gphase(θ) multiplies the whole state by e^{iθ}', () => {
    const c = Math.cos(0.7);
    const s = Math.sin(0.7);
    expectMatrixClose(simulated('gphase', [], [0.7], {}, 1), matrixFromRows([[[c, s], 0], [0, [c, s]]]), 'gphase');
  });
});

describe('modifiers (OpenQASM 3.0 specification, gate modifiers section, from memory)', () => {
  it('ctrl @ gphase(θ) = p(θ): the control carries the global phase', () => {
    expectMatrixClose(simulated('gphase', [], [0.7], { controls: [0] }), simulated('p', [0], [0.7]), 'ctrl @ gphase');
  });

  it('ctrl(2) @ gphase(θ) multiplies only |11> by e^{iθ}', () => {
    const e: [number, number] = [Math.cos(0.7), Math.sin(0.7)];
    expectMatrixClose(simulated('gphase', [], [0.7], { controls: [0, 1] }), matrixFromRows([[1, 0, 0, 0], [0, 1, 0, 0], [0, 0, 1, 0], [0, 0, 0, e]]), 'ctrl(2) @ gphase');
  });

  it('ctrl @ g = |0><0| ⊗ I + |1><1| ⊗ g with g’s global phase (ctrl @ rz differs from ctrl @ U(0,0,λ))', () => {
    const l = 1.3;
    const m: [number, number] = [Math.cos(-l / 2), Math.sin(-l / 2)];
    const p: [number, number] = [Math.cos(l / 2), Math.sin(l / 2)];
    // control q[0], target q[1]: rz acts on indices 1 (target 0) and 3 (target 1).
    expectMatrixClose(simulated('rz', [1], [l], { controls: [0] }), matrixFromRows([[1, 0, 0, 0], [0, m, 0, 0], [0, 0, 1, 0], [0, 0, 0, p]]), 'ctrl @ rz');
    const u: [number, number] = [Math.cos(l), Math.sin(l)];
    expectMatrixClose(simulated('U', [1], [0, 0, l], { controls: [0] }), matrixFromRows([[1, 0, 0, 0], [0, 1, 0, 0], [0, 0, 1, 0], [0, 0, 0, u]]), 'ctrl @ U(0,0,λ)');
  });

  it('negctrl @ x flips the target when the control is |0>', () => {
    // negctrl q[0], target q[1]: index 0 ↔ 2, indices 1 and 3 fixed.
    expectMatrixClose(simulated('x', [1], [], { negControls: [0] }), matrixFromRows([[0, 0, 1, 0], [0, 1, 0, 0], [1, 0, 0, 0], [0, 0, 0, 1]]), 'negctrl @ x', 0);
  });

  it('ctrl @ cx = ccx and ctrl @ swap = cswap', () => {
    expectMatrixClose(simulated('cx', [1, 2], [], { controls: [0] }), simulated('ccx', [0, 1, 2], []), 'ctrl @ cx');
    expectMatrixClose(simulated('swap', [1, 2], [], { controls: [0] }), simulated('cswap', [0, 1, 2], []), 'ctrl @ swap');
  });

  it('inv @ s = sdg, inv @ t = tdg, inv @ U(θ,φ,λ) = U(−θ,−λ,−φ)', () => {
    expectMatrixClose(simulated('s', [0], [], { inverse: true }), simulated('sdg', [0], []), 'inv @ s');
    expectMatrixClose(simulated('t', [0], [], { inverse: true }), simulated('tdg', [0], []), 'inv @ t');
    expectMatrixClose(simulated('U', [0], [0.5, 1.2, -0.4], { inverse: true }), toComplexMatrix(U(-0.5, 0.4, -1.2)), 'inv @ U');
  });

  it('pow(1/2) @ x = sx, pow(1/2) @ z = s, pow(1/2) @ s = t, inv @ pow(1/2) @ z = sdg (principal branch)', () => {
    expectMatrixClose(simulated('x', [0], [], { power: 0.5 }), toComplexMatrix(REFERENCE_GATES.sx!.matrix([])), 'pow(0.5) @ x');
    expectMatrixClose(simulated('z', [0], [], { power: 0.5 }), toComplexMatrix(REFERENCE_GATES.s!.matrix([])), 'pow(0.5) @ z');
    expectMatrixClose(simulated('s', [0], [], { power: 0.5 }), toComplexMatrix(REFERENCE_GATES.t!.matrix([])), 'pow(0.5) @ s');
    expectMatrixClose(simulated('z', [0], [], { power: 0.5, inverse: true }), toComplexMatrix(REFERENCE_GATES.sdg!.matrix([])), 'inv @ pow(0.5) @ z');
  });

  it('pow(k) @ g for integers is repetition: pow(2) @ t = s, pow(3) @ sx = inv @ sx, pow(−1) @ s = sdg', () => {
    expectMatrixClose(simulated('t', [0], [], { power: 2 }), simulated('s', [0], []), 'pow(2) @ t');
    expectMatrixClose(simulated('sx', [0], [], { power: 3 }), simulated('sx', [0], [], { inverse: true }), 'pow(3) @ sx');
    expectMatrixClose(simulated('s', [0], [], { power: -1 }), simulated('sdg', [0], []), 'pow(-1) @ s');
  });

  it('pow(1/2) @ swap is the square root of swap: [[1, 0, 0, 0], [0, (1+i)/2, (1−i)/2, 0], …]', () => {
    // √SWAP, the principal root: eigenvalue −1 of the antisymmetric state becomes i (common practice).
    const a: [number, number] = [0.5, 0.5];
    const b: [number, number] = [0.5, -0.5];
    expectMatrixClose(simulated('swap', [0, 1], [], { power: 0.5 }), matrixFromRows([[1, 0, 0, 0], [0, a, b, 0], [0, b, a, 0], [0, 0, 0, 1]]), 'pow(0.5) @ swap');
  });
});
