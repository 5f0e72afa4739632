// verifyCircuit on hand-written OpenQASM 3 block-encodings (test/fixtures/verify): known encodings pass with their α,
// one-gate mutations fail at the column worked out by hand; probe mode, clean registers, register roles, bad circuits.
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { gate } from '../../src/circuit/ops.js';
import type { Circuit } from '../../src/circuit/types.js';
import { InputError } from '../../src/core/InputError.js';
import { loadOperatorFile } from '../../src/operatorFile/loadOperatorFile.js';
import type { TargetOperator } from '../../src/operatorFile/TargetOperator.js';
import { pauliSumArb } from '../../src/testing/pauliSumArb.js';
import { unitaryQasmCircuit } from '../../src/verify/unitaryQasmCircuit.js';
import { verifyCircuit } from '../../src/verify/verifyCircuit.js';
import { expectClose } from '../helpers/close.js';

const FIXTURES = new URL('../fixtures/verify/', import.meta.url);
const fixture = (name: string): Circuit => unitaryQasmCircuit(readFileSync(new URL(`${name}.qasm`, FIXTURES), 'utf8'), `${name}.qasm`).circuit;
const operator = (name: string): TargetOperator => loadOperatorFile(new URL(`${name}.json`, FIXTURES).pathname, { name: 'q', qubits: 2 });

// Hand-derived figures, beside each fixture's comment:
// - lcu-two-paulis: M = X0 Z1 + 3 Y1, α = 1 + 3 = 4 (Childs & Wiebe, Quantum Inf. Comput. 12, 901, 2012). Mutant without
//   the Z1 factor encodes (X0 + 3 Y1)/4: E e_j = X0 (Z1 − I) e_j / 4, norm 2/4 = 0.5 when qubit 1 of j is set, first j = 2.
// - ladder-annihilate-1: a_1 = Z0 (X1 + iY1)/2 under Jordan–Wigner (CONVENTIONS.md), α = 1. Mutant without Z0:
//   E = (I − Z0) ⊗ |0><1|_1, nonzero only on column j = 3 (|11>), where |E e_3| = 2.
// - controlled-hadamard: a unitary encodes itself with α = 1 (common practice). Mutant with control and target swapped:
//   column 3 gives s(e2 − e3) against s(e1 − e3), s = 1/√2, error 1; columns 1 and 2 give √(2 − √2) ≈ 0.765.
const CASES = [
  { name: 'lcu-two-paulis', alpha: 4, mutantError: 0.5, mutantColumn: 2 },
  { name: 'ladder-annihilate-1', alpha: 1, mutantError: 2, mutantColumn: 3 },
  { name: 'controlled-hadamard', alpha: 1, mutantError: 1, mutantColumn: 3 },
] as const;

describe('verifyCircuit(circuit, operator) on textbook encodings', () => {
  for (const c of CASES) {
    it(`${c.name}: passes exhaustively with the fitted α equal to the textbook α = ${c.alpha}`, () => {
      const result = verifyCircuit(fixture(c.name), operator(c.name));
      expect(result.ok).toBe(true);
      expect(result.mode).toBe('exhaustive');
      expect(result.alphaFitted).toBe(true);
      expectClose(result.alpha!, c.alpha, 1e-12, 'fitted alpha');
      expect(result.maxError).toBeLessThan(1e-12);
    });

    it(`${c.name}: a one-gate mutation fails at column ${c.mutantColumn} with error ${c.mutantError} (α given)`, () => {
      const result = verifyCircuit(fixture(`${c.name}.mutated`), operator(c.name), { alpha: c.alpha });
      expect(result.ok).toBe(false);
      expect(result.worstColumn).toBe(c.mutantColumn);
      expectClose(result.maxError, c.mutantError, 1e-12, 'max error');
    });

    it(`${c.name}: probe mode passes the encoding and catches the mutation, as a lower bound`, () => {
      const good = verifyCircuit(fixture(c.name), operator(c.name), { alpha: c.alpha, exhaustiveLimit: 0, probes: 4, seed: 5 });
      const bad = verifyCircuit(fixture(`${c.name}.mutated`), operator(c.name), { alpha: c.alpha, exhaustiveLimit: 0, probes: 4, seed: 5 });
      expect(good.mode).toBe('probe');
      expect(good.ok).toBe(true);
      expect(good.worstColumn).toBeNull();
      expect(bad.ok).toBe(false);
      // For a unit probe x, ‖E x‖ ≤ ‖E‖ ≤ √(2^n) · (largest column norm) = 2 · mutantError for n = 2 system qubits.
      expect(bad.maxError).toBeGreaterThan(1e-3);
      expect(bad.maxError).toBeLessThanOrEqual(2 * c.mutantError + 1e-12);
      expect(good.notes.join(' ')).toMatch(/lower bound/);
    });
  }

  it('the ladder-operator mutation admits no positive α: ok is false and α is null', () => {
    // The mutant's block |0><1|_1 is orthogonal (trace inner product) to Z0 |0><1|_1, so the least-squares factor is 0.
    const result = verifyCircuit(fixture('ladder-annihilate-1.mutated'), operator('ladder-annihilate-1'));
    expect(result.ok).toBe(false);
    expect(result.alpha).toBeNull();
    expect(result.notes.join(' ')).toMatch(/no positive α fits/);
  });

  it('a Pauli-string circuit encodes its own Pauli string with α = 1, and c·P with fitted α = |c| (property)', () => {
    // Law: the unitary P is a block-encoding of P with α = 1, hence of c·P with α = c for c > 0.
    fc.assert(
      fc.property(pauliSumArb(3, 1), fc.double({ min: 0.1, max: 10, noNaN: true }), (sum, c) => {
        const { x, z } = sum.terms[0]!;
        const builder = new CircuitBuilder();
        const q = builder.qubits('q', 3);
        q.forEach((qubit, k) => {
          const hasX = ((x >> BigInt(k)) & 1n) === 1n;
          const hasZ = ((z >> BigInt(k)) & 1n) === 1n;
          if (hasX || hasZ) builder.add(gate(hasX && hasZ ? 'y' : hasX ? 'x' : 'z', [qubit]));
        });
        const result = verifyCircuit(builder.build(), { pauli: { qubits: 3, terms: [{ x, z, re: c, im: 0 }] } });
        expect(result.ok).toBe(true);
        expectClose(result.alpha!, c, 1e-12, 'alpha');
      }),
      { seed: 17, numRuns: 25 },
    );
  });
});

describe('verifyCircuit clean registers', () => {
  // Block on q (2 qubits), signal s, work w: w ← q0 AND q1 (Toffoli), controlled-Z from w onto s-free system, uncompute.
  // The block is CZ on q (diag(1,1,1,−1)); w returns to |0> (compute/uncompute). Without the uncompute, w keeps q0 q1.
  const circuit = (uncompute: boolean): Circuit => {
    const builder = new CircuitBuilder();
    const [q0, q1] = builder.qubits('q', 2) as [number, number];
    const [w] = builder.qubits('w', 1) as [number];
    builder.add(gate('ccx', [q0, q1, w]), gate('z', [w]));
    if (uncompute) builder.add(gate('ccx', [q0, q1, w]));
    return builder.build();
  };
  const cz: TargetOperator = { pauli: { qubits: 2, terms: [
    // CZ = (I + Z0 + Z1 − Z0 Z1)/2 (common practice).
    { x: 0n, z: 0n, re: 0.5, im: 0 }, { x: 0n, z: 1n, re: 0.5, im: 0 }, { x: 0n, z: 2n, re: 0.5, im: 0 }, { x: 0n, z: 3n, re: -0.5, im: 0 },
  ] } };

  it('a compute/uncompute work register reports no leak and passes', () => {
    const result = verifyCircuit(circuit(true), cz, { clean: ['w'], alpha: 1 });
    expect(result.ok).toBe(true);
    expect(result.clean.w).toBeLessThan(1e-12);
    expect(result.registers.signal).toEqual([]);
  });

  it('a work register left set leaks: column |11> puts all its weight on w = 1, so the leak is 1', () => {
    const result = verifyCircuit(circuit(false), cz, { clean: ['w'], alpha: 1 });
    expect(result.ok).toBe(false);
    expectClose(result.clean.w!, 1, 1e-12, 'leak');
  });
});

describe('verifyCircuit input errors name the register or the line', () => {
  const lcu = () => fixture('lcu-two-paulis');
  const pauli = () => operator('lcu-two-paulis');

  it('an unknown register name lists the declared ones', () => {
    expect(() => verifyCircuit(lcu(), pauli(), { signal: ['ancilla'] })).toThrow(/signal register 'ancilla' is not declared in the circuit \(its qubit registers: 'q', 'anc'\)/);
  });

  it('a register given two roles, and a register given none, are refused', () => {
    expect(() => verifyCircuit(lcu(), pauli(), { clean: ['anc'], signal: ['anc'] })).toThrow(/register 'anc' is named both a clean and a signal register/);
    expect(() => verifyCircuit(lcu(), pauli(), { signal: [] })).toThrow(/register 'anc' is neither the system, a signal nor a clean register/);
  });

  it('an operator of the wrong size names the system register', () => {
    const error = (() => {
      try {
        verifyCircuit(lcu(), pauli(), { system: 'anc' });
      } catch (e) {
        return e;
      }
      return undefined;
    })();
    expect(error).toBeInstanceOf(InputError);
    expect((error as Error).message).toMatch(/system register 'anc' \(1 qubits\).*stated on 2 qubits/);
  });

  it('a mid-circuit measurement is refused with its line; final measurements are ignored with a note', () => {
    const head = 'OPENQASM 3;\ninclude "stdgates.inc";\nqubit[2] q;\nqubit anc;\nbit[2] cq;\nbit[3] c;\n';
    expect(() => unitaryQasmCircuit(`${head}h anc;\nc[0] = measure anc;\ncx anc, q[0];\n`, 'mid.qasm')).toThrow(/^mid\.qasm:8: mid-circuit measurement: qubit anc\[0\] is measured and then used again/);
    // The whole-register measurement on line 8 stands for two ops, and the commented one on line 7 for none.
    expect(() => unitaryQasmCircuit(`${head}// measure q;\nmeasure q -> cq;\nh anc;\nmeasure anc -> c[2];\nh anc;\n`, 'late.qasm')).toThrow(/^late\.qasm:10: mid-circuit/);
    const read = unitaryQasmCircuit(`${head}h anc;\nh anc;\nc[0] = measure anc;\ncq = measure q;\n`, 'end.qasm');
    expect(read.notes).toEqual(['3 final measurements ignored']);
    expect(read.circuit.ops).toHaveLength(2);
  });

  it('a reset of a system qubit is refused; a reset of a fresh ancilla is ignored', () => {
    const head = 'OPENQASM 3;\ninclude "stdgates.inc";\nqubit[2] q;\nqubit anc;\n';
    expect(() => unitaryQasmCircuit(`${head}reset q;\n`, 'r.qasm')).toThrow(/^r\.qasm:5: reset of qubit q\[0\] is not unitary/);
    expect(unitaryQasmCircuit(`${head}reset anc;\nh anc;\n`, 'r.qasm').notes).toEqual(['1 reset of fresh ancilla qubits ignored']);
  });
});
