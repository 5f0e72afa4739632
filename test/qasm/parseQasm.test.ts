// parseQasm on hand-written programs: declarations, broadcast, both measure forms, comments, gate
// definitions with parameters, modifiers, constants, functions, literals and operator precedence.
import { describe, expect, it } from 'vitest';
import { evaluateAngle } from '../../src/circuit/angle.js';
import { countsToObject, gateCounts } from '../../src/circuit/gateCounts.js';
import type { CallOp, Circuit, GateOp, Op } from '../../src/circuit/types.js';
import { parseQasm } from '../../src/qasm/parseQasm.js';
import { simulateState } from '../../src/sim/simulateState.js';
import { expectClose } from '../helpers/close.js';

const HEADER = 'OPENQASM 3.0;\ninclude "stdgates.inc";\n';
const read = (body: string): Circuit => parseQasm(HEADER + body, 'test.qasm');
const gates = (c: Circuit): GateOp[] => c.ops.filter((op): op is GateOp => op.kind === 'gate');
/** The single numeric parameter of `rz(<expression>) q;`. */
const angleOf = (expression: string): number => gates(read(`qubit q;\nrz(${expression}) q;`))[0]!.params[0] as number;

describe('parseQasm(text, source)', () => {
  it('reads sized and single qubit and bit declarations as registers in declaration order', () => {
    const c = read('qubit[3] q;\nqubit a;\nbit[2] c;\nbit flag;\n');
    expect(c.qubitRegisters).toEqual([
      { name: 'q', size: 3, offset: 0 },
      { name: 'a', size: 1, offset: 3 },
    ]);
    expect(c.bitRegisters).toEqual([
      { name: 'c', size: 2, offset: 0 },
      { name: 'flag', size: 1, offset: 2 },
    ]);
  });

  it('accepts programs without the OPENQASM line, and `OPENQASM 3;`', () => {
    expect(parseQasm('include "stdgates.inc";\nqubit q;\nx q;', 'a.qasm').ops).toHaveLength(1);
    expect(parseQasm('OPENQASM 3;\nqubit q;\nU(0, 0, 0) q;', 'b.qasm').ops).toHaveLength(1);
  });

  it('broadcasts a gate over a whole register and a two-qubit gate over equal-size registers', () => {
    const c = read('qubit[3] a;\nqubit[3] b;\nqubit solo;\nh a;\ncx a, b;\ncx solo, b;\nx solo;\n');
    const operands = gates(c).map((g) => [g.name, ...g.qubits]);
    expect(operands).toEqual([
      ['h', 0], ['h', 1], ['h', 2],
      ['cx', 0, 3], ['cx', 1, 4], ['cx', 2, 5],
      ['cx', 6, 3], ['cx', 6, 4], ['cx', 6, 5],
      ['x', 6],
    ]);
  });

  it('reads both measure forms, register-wide measure, reset and barrier with and without operands', () => {
    const c = read('qubit[2] q;\nbit[2] c;\nc[1] = measure q[0];\nmeasure q[1] -> c[0];\nc = measure q;\nmeasure q -> c;\nreset q;\nbarrier q[1], q[0];\nbarrier;\n');
    const expected: Op[] = [
      { kind: 'measure', qubit: 0, bit: 1 },
      { kind: 'measure', qubit: 1, bit: 0 },
      { kind: 'measure', qubit: 0, bit: 0 },
      { kind: 'measure', qubit: 1, bit: 1 },
      { kind: 'measure', qubit: 0, bit: 0 },
      { kind: 'measure', qubit: 1, bit: 1 },
      { kind: 'reset', qubit: 0 },
      { kind: 'reset', qubit: 1 },
      { kind: 'barrier', qubits: [1, 0] },
      { kind: 'barrier', qubits: [] },
    ];
    expect(c.ops).toEqual(expected);
  });

  it('skips line and block comments anywhere, including inside statements', () => {
    const c = read('// a comment\nqubit[2] /* size */ q; /* multi\nline */ h q[0]; // trailing\ncx q[0], /* control first */ q[1];');
    expect(gates(c).map((g) => g.name)).toEqual(['h', 'cx']);
  });

  it('folds the constants pi, π, tau, τ, euler and ℇ', () => {
    expect(angleOf('pi')).toBe(Math.PI);
    expect(angleOf('π')).toBe(Math.PI);
    expect(angleOf('tau')).toBe(2 * Math.PI);
    expect(angleOf('τ')).toBe(2 * Math.PI);
    expect(angleOf('euler')).toBe(Math.E);
    expect(angleOf('ℇ')).toBe(Math.E);
  });

  it('reads integer and float literals in every form: 1., .5, 1e-7, 2.5E+3, 3', () => {
    expect(angleOf('1.')).toBe(1);
    expect(angleOf('.5')).toBe(0.5);
    expect(angleOf('1e-7')).toBe(1e-7);
    expect(angleOf('2.5E+3')).toBe(2500);
    expect(angleOf('3')).toBe(3);
  });

  it('applies the standard math functions', () => {
    // Values of the elementary functions (common practice), compared through the JS Math library.
    expectClose(angleOf('sin(pi/6)'), 0.5, 1e-15);
    expectClose(angleOf('cos(pi/3)'), 0.5, 1e-15);
    expectClose(angleOf('tan(pi/4)'), 1, 1e-15);
    expectClose(angleOf('arcsin(1)'), Math.PI / 2, 1e-15);
    expectClose(angleOf('arccos(0)'), Math.PI / 2, 1e-15);
    expectClose(angleOf('arctan(1)'), Math.PI / 4, 1e-15);
    expectClose(angleOf('exp(1)'), Math.E, 1e-15);
    expectClose(angleOf('log(euler)'), 1, 1e-15);
    expectClose(angleOf('sqrt(2.25)'), 1.5, 1e-15);
  });

  it('gives * and / precedence over + and −, ** over unary minus, and groups ** to the right', () => {
    // OpenQASM 3 specification, expression grammar: ** binds tighter than unary minus and is right-associative.
    expect(angleOf('1 + 2 * 3')).toBe(7);
    expect(angleOf('8 - 4 - 2')).toBe(2);
    expect(angleOf('8 / 4 / 2')).toBe(1);
    expect(angleOf('-2 ** 2')).toBe(-4);
    expect(angleOf('2 ** 3 ** 2')).toBe(512);
    expect(angleOf('2 ** -1')).toBe(0.5);
    expect(angleOf('(1 + 2) * -3')).toBe(-9);
    expect(angleOf('- -1.5')).toBe(1.5);
    expect(Object.is(angleOf('-0'), -0)).toBe(true);
  });

  it('turns a parameterised gate definition into a Block whose angles are expressions of its parameters', () => {
    const c = read('// spin: rotate about an axis\ngate spin(theta, phi) a, b {\n  rz(theta / 2 + phi) a;\n  ctrl @ rx(-theta ** 2) a, b;\n}\nqubit[2] q;\nspin(0.5, pi) q[1], q[0];\n');
    const callOp = c.ops[0] as CallOp;
    expect(callOp.kind).toBe('call');
    expect(callOp.block.name).toBe('spin');
    expect(callOp.block.role).toBe('rotate about an axis');
    expect(callOp.block.params).toEqual(['theta', 'phi']);
    expect(callOp.args).toEqual([0.5, Math.PI]);
    expect(callOp.qubits).toEqual([1, 0]);
    const body = callOp.block.body.kind === 'plain' ? callOp.block.body.ops : [];
    const [first, second] = body as GateOp[];
    expect(evaluateAngle(first!.params[0]!, [3, 0.25])).toBe(1.75);
    expect(evaluateAngle(second!.params[0]!, [3, 0.25])).toBe(-9);
    expect(second!.controls).toEqual([0]);
    expect(second!.qubits).toEqual([1]);
  });

  it('uses the default role for a gate without a comment directly above', () => {
    const c = read('// far away\n\ngate g a { x a; }\nqubit q;\ng q;\n');
    expect((c.ops[0] as CallOp).block.role).toBe('user-defined gate');
  });

  it('lets gate bodies call earlier gates and gphase, with modifiers', () => {
    const c = read('gate inner a { h a; }\ngate outer a, b { inv @ inner a; ctrl @ inner a, b; gphase(pi); }\nqubit[3] q;\nctrl @ outer q[2], q[0], q[1];\n');
    expect(countsToObject(gateCounts(c))).toEqual({ 'ctrl @ gphase': 1, 'ctrl @ h': 1, 'ctrl(2) @ h': 1 });
  });

  it('reads ctrl(n) and negctrl(n) in any order, taking control operands left to right', () => {
    const c = read('qubit[5] q;\nnegctrl @ ctrl(2) @ cx q[0], q[1], q[2], q[3], q[4];\nctrl @ negctrl(2) @ x q[4], q[3], q[2], q[1];\n');
    const [a, b] = gates(c);
    expect([a!.negControls, a!.controls, a!.qubits]).toEqual([[0], [1, 2], [3, 4]]);
    expect([b!.controls, b!.negControls, b!.qubits]).toEqual([[4], [3, 2], [1]]);
  });

  it('reduces inv and pow chains to the IR form inv @ pow(k) @ g', () => {
    const c = read('qubit q;\ninv @ pow(0.5) @ s q;\npow(2) @ inv @ pow(3) @ t q;\npow(0.5) @ inv @ x q;\ninv @ inv @ h q;\n');
    expect(gates(c).map((g) => [g.inverse, g.power])).toEqual([
      [true, 0.5],
      [true, 6],
      [false, 0.5],
      [false, 1],
    ]);
  });

  it('applies a controlled gate the way the OpenQASM ctrl @ modifier defines it (Bell amplitudes)', () => {
    // Nielsen & Chuang, §1.3.6: H then CNOT maps |00> to (|00> + |11>)/√2.
    const state = simulateState(read('qubit[2] q;\nh q[0];\nctrl @ x q[0], q[1];\n'));
    expectClose(state.re[0]!, Math.SQRT1_2, 1e-15);
    expectClose(state.re[3]!, Math.SQRT1_2, 1e-15);
    expectClose(state.re[1]! ** 2 + state.re[2]! ** 2, 0, 1e-15);
  });
});
