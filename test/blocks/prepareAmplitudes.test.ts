import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { blockCounts } from '../../src/circuit/gateCounts.js';
import { call, gate } from '../../src/circuit/ops.js';
import { MAX_LCU_INDEX_QUBITS, prepareAmplitudes } from '../../src/blocks/prepareAmplitudes.js';
import { uniformlyControlledRotation } from '../../src/blocks/uniformlyControlledRotation.js';
import type { GateOp } from '../../src/circuit/types.js';
import { simulateState } from '../../src/sim/simulateState.js';
import { expectComplexArrayClose } from '../helpers/close.js';

function prepared(re: Float64Array, im?: Float64Array) {
  const block = prepareAmplitudes(re, im);
  const b = new CircuitBuilder();
  const q = b.qubits('q', block.qubits);
  b.add(call(block, q));
  return { block, state: simulateState(b.build()) };
}

function randomState(qubits: number, complex: boolean) {
  return fc
    .array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 2 ** (qubits + 1), maxLength: 2 ** (qubits + 1) })
    .filter((xs) => xs.reduce((s, x) => s + x * x, 0) > 1e-3)
    .map((xs) => {
      const size = 2 ** qubits;
      const re = new Float64Array(size);
      const im = new Float64Array(size);
      let norm = 0;
      for (let k = 0; k < size; k++) {
        re[k] = xs[2 * k]!;
        im[k] = complex ? xs[2 * k + 1]! : 0;
        norm += re[k]! ** 2 + im[k]! ** 2;
      }
      const s = 1 / Math.sqrt(norm);
      return { re: re.map((x) => x * s), im: im.map((x) => x * s) };
    });
}

describe('prepareAmplitudes(re, im)', () => {
  it('prepares random complex states of 1–6 qubits to 1e-12', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 6 }).chain((n) => randomState(n, true)), ({ re, im }) => {
        expectComplexArrayClose(prepared(re, im).state, { re, im }, 1e-12);
      }),
      { numRuns: 40 },
    );
  });

  it('uses 2^n − 2 CNOTs for a real non-negative state (Möttönen et al. 2005)', () => {
    for (let n = 1; n <= 8; n++) {
      const size = 2 ** n;
      const re = new Float64Array(size).map((_, k) => Math.sqrt((k + 1) / ((size * (size + 1)) / 2)));
      const { block, state } = prepared(re);
      expect(blockCounts(block).get('cx') ?? 0).toBe(2 ** n - 2);
      expectComplexArrayClose(state, { re, im: new Float64Array(size) }, 1e-12);
    }
  });

  it('rejects an unnormalised vector and a length that is not a power of two', () => {
    expect(() => prepareAmplitudes(new Float64Array([1, 1]))).toThrow(/norm/);
    expect(() => prepareAmplitudes(new Float64Array([1, 0, 0]))).toThrow(/2\^m/);
  });

  it('refuses 2^15 amplitudes by default and builds them under the larger limit of an LCU (MAX_LCU_INDEX_QUBITS)', () => {
    const uniform = new Float64Array(2 ** 15).fill(2 ** -7.5);
    expect(() => prepareAmplitudes(uniform)).toThrow(/1 ≤ m ≤ 14/);
    expect(prepareAmplitudes(uniform, undefined, { maxQubits: MAX_LCU_INDEX_QUBITS }).qubits).toBe(15);
  });
});

describe('uniformlyControlledRotation(axis, angles, controls, target)', () => {
  it('applies R(α_h) on the target for each control value h (Möttönen et al. 2004)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -6, max: 6, noNaN: true }), { minLength: 4, maxLength: 4 }), fc.constantFrom<'y' | 'z'>('y', 'z'), (alphas, axis) => {
        for (let h = 0; h < 4; h++) {
          const b = new CircuitBuilder();
          const q = b.qubits('q', 3);
          // Controls are qubits 1 and 2 set to h, target qubit 0 starts in |+> for rz, |0> for ry.
          const prep: GateOp[] = [];
          if (h & 1) prep.push(gate('x', [q[1]!]));
          if (h & 2) prep.push(gate('x', [q[2]!]));
          if (axis === 'z') prep.push(gate('h', [q[0]!]));
          b.add(...prep, ...uniformlyControlledRotation(axis, alphas, [q[1]!, q[2]!], q[0]!));
          const s = simulateState(b.build());
          const a = alphas[h]!;
          const base = h << 1;
          // ry(a)|0> = cos(a/2)|0> + sin(a/2)|1>; rz(a)|+> = (e^{-ia/2}|0> + e^{ia/2}|1>)/√2 (OpenQASM 3 rz).
          const expected = axis === 'y'
            ? [[Math.cos(a / 2), 0], [Math.sin(a / 2), 0]]
            : [[Math.cos(a / 2) / Math.SQRT2, -Math.sin(a / 2) / Math.SQRT2], [Math.cos(a / 2) / Math.SQRT2, Math.sin(a / 2) / Math.SQRT2]];
          expect(s.re[base]!).toBeCloseTo(expected[0]![0]!, 12);
          expect(s.im[base]!).toBeCloseTo(expected[0]![1]!, 12);
          expect(s.re[base + 1]!).toBeCloseTo(expected[1]![0]!, 12);
          expect(s.im[base + 1]!).toBeCloseTo(expected[1]![1]!, 12);
        }
      }),
      { numRuns: 20 },
    );
  });
});
