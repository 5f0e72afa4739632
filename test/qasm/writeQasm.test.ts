// writeQasm: golden-file output for hand-built circuits (reviewed by hand), determinism, number
// printing that reads back bit-exactly, and rejection of malformed IR.
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { gate } from '../../src/circuit/ops.js';
import type { Circuit, GateOp } from '../../src/circuit/types.js';
import { parseQasm } from '../../src/qasm/parseQasm.js';
import { writeQasm, writeQasmNamed } from '../../src/qasm/writeQasm.js';
import { GOLDEN_CIRCUITS } from './goldenCircuits.js';

const golden = (name: string): string => readFileSync(new URL(`../../circuits/golden/${name}.qasm`, import.meta.url), 'utf8');

function singleGate(op: GateOp): Circuit {
  const b = new CircuitBuilder();
  b.qubits('q', 2);
  return b.add(op).build();
}

describe('writeQasm(circuit)', () => {
  for (const [name, make] of Object.entries(GOLDEN_CIRCUITS)) {
    it(`writes the ${name} circuit exactly as circuits/golden/${name}.qasm`, () => {
      expect(writeQasm(make())).toBe(golden(name));
    });
    it(`writes the ${name} circuit to identical bytes twice, also from a fresh build`, () => {
      const circuit = make();
      expect(writeQasm(circuit)).toBe(writeQasm(circuit));
      expect(writeQasm(make())).toBe(writeQasm(circuit));
    });
  }

  it('prints every finite angle so that the reader gets the same double back (−0 included)', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        const back = parseQasm(writeQasm(singleGate(gate('rz', [0], [x]))), 'number.qasm');
        const op = back.ops[0] as GateOp;
        expect(Object.is(op.params[0], x)).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it('prints every gate power of magnitude up to 2^53 (the reader limit) so that it reads back bit-exactly', () => {
    fc.assert(
      fc.property(fc.double({ min: -(2 ** 53), max: 2 ** 53, noNaN: true }), (power) => {
        const back = parseQasm(writeQasm(singleGate(gate('x', [0], [], { power }))), 'power.qasm');
        expect(Object.is((back.ops[0] as GateOp).power, power)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it('writes powers beyond 2^53 that the reader then refuses with a QasmParseError (its limit)', () => {
    expect(() => parseQasm(writeQasm(singleGate(gate('x', [0], [], { power: 2 ** 60 }))), 'power.qasm')).toThrow(/magnitude at most 2\^53/);
  });

  it('renames registers that clash with standard gates or OpenQASM words', () => {
    const b = new CircuitBuilder();
    const x = b.qubits('x', 1);
    const pi = b.qubits('pi', 1);
    b.add(gate('cx', [x[0]!, pi[0]!]));
    const text = writeQasm(b.build());
    expect(text).toContain('qubit[1] x_2;\nqubit[1] pi_2;\n');
    expect(text).toContain('cx x_2[0], pi_2[0];');
    const named = writeQasmNamed(b.build());
    expect(named.text).toBe(text);
    expect(named.qubitRegisterNames).toEqual(parseQasm(text, 'clash.qasm').qubitRegisters.map((r) => r.name));
  });

  it('throws RangeError for a NaN or infinite angle (a programming error, not input)', () => {
    const nan: GateOp = { ...gate('rz', [0], [0]), params: [Number.NaN] };
    const infinite: GateOp = { ...gate('rz', [0], [0]), params: [{ op: 'neg', arg: Number.POSITIVE_INFINITY }] };
    const circuit = (op: GateOp): Circuit => ({ qubitRegisters: [{ name: 'q', size: 1, offset: 0 }], bitRegisters: [], ops: [op] });
    expect(() => writeQasm(circuit(nan))).toThrow(RangeError);
    expect(() => writeQasm(circuit(infinite))).toThrow(RangeError);
  });
});
