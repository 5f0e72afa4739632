import { describe, expect, it } from 'vitest';
import { fourierConstantAdder } from '../../src/arithmetic/fourierConstantAdder.js';
import { blockCounts } from '../../src/circuit/gateCounts.js';
import { call } from '../../src/circuit/ops.js';
import { nativeKernelAgreement } from '../../src/sim/nativeKernelAgreement.js';
import { basisImage } from './helpers/basisImage.js';

const range = (n: number): number[] => Array.from({ length: n }, (_, k) => k);

describe('fourierConstantAdder(width, controls)', () => {
  for (const native of [false, true]) {
    it(`adds every constant modulo 2^m on every basis state, controlled and not (m ≤ 4, native kernels ${native})`, () => {
      for (let m = 1; m <= 4; m++) {
        const size = 2 ** m;
        const adder = fourierConstantAdder(m, 1);
        for (let a = 0; a < size; a++) {
          for (let x = 0; x < size; x++) {
            for (const c of [0, 1]) {
              const input = x | (c << m);
              // Uncontrolled: the offset argument; controlled by qubit m: the weight argument.
              expect(basisImage(m + 1, input, [call(adder, range(m + 1), [a, 0])], native).index).toBe(((x + a) % size) | (c << m));
              expect(basisImage(m + 1, input, [call(adder, range(m + 1), [0, a])], native).index).toBe(((x + c * a) % size) | (c << m));
              // An external control on the call (qubit m + 1) controls the whole addition.
              const external = basisImage(m + 2, input | (c << (m + 1)), [call(adder, range(m + 1), [a, 0], { controls: [m + 1] })], native);
              expect(external.index).toBe(((x + c * a) % size) | (c << m) | (c << (m + 1)));
            }
          }
        }
      }
    });
  }

  it('adds offset + Σ w_k c_k for several weights, negative ones modulo 2^m', () => {
    const adder = fourierConstantAdder(3, 2);
    for (let input = 0; input < 32; input++) {
      const x = input & 7;
      const c0 = (input >> 3) & 1;
      const c1 = (input >> 4) & 1;
      const expected = (((x + 5 - 3 * c0 + 6 * c1) % 8) + 8) % 8;
      expect(basisImage(5, input, [call(adder, range(5), [5, -3, 6])], false).index).toBe(expected | (input & 24));
    }
  });

  it('a controlled call controls only the Fourier-space phases', () => {
    const counts = blockCounts(fourierConstantAdder(4, 2), 1);
    // The unswapped QFT and its inverse: 2·4 Hadamards and 6 + 6 cp, all uncontrolled; the 4 offset phases gain the
    // control (ctrl @ p), the 2·4 weight phases (already controlled by their c_k) a second one.
    expect(Object.fromEntries(counts)).toEqual({ h: 8, cp: 6, 'inv @ cp': 6, 'ctrl @ p': 4, 'ctrl(2) @ p': 8 });
  });

  it('its native kernel equals its decomposition on random states, with controls, inverse and powers', () => {
    for (const [width, controls] of [[1, 0], [2, 1], [3, 2], [4, 1]] as const) {
      const block = fourierConstantAdder(width, controls);
      const args = [3, ...range(controls).map((k) => 2 * k - 3)];
      for (const options of [{}, { controls: 1 }, { negControls: 1, inverse: true }, { power: 3 }, { power: -2, controls: 1 }]) {
        expect(nativeKernelAgreement(block, { args, spectators: 1, ...options })).toBeLessThan(1e-12);
      }
    }
  });
});

describe('fourierConstantAdder(width, controls, { pairs })', () => {
  // Register 3 bits (qubits 0–2), weighted controls c0, c1 (3, 4), a pair-only control c2 (5), the AND qubit t (6).
  const pairs = [[0, 1], [1, 2], [0, 2]] as const;
  const adder = fourierConstantAdder(3, 2, { pairOnlyControls: 1, pairs });
  const args = [5, -3, 2, 6, -1, 3];

  for (const native of [false, true]) {
    it(`adds offset + Σ w_k c_k + Σ v_j c_a c_b on every basis state, t back at 0 (and v_j(1 ⊕ c_a c_b) from t = 1; native kernels ${native})`, () => {
      for (let input = 0; input < 128; input++) {
        const x = input & 7;
        const c = [(input >> 3) & 1, (input >> 4) & 1, (input >> 5) & 1];
        const t = (input >> 6) & 1;
        const sum = 5 - 3 * c[0]! + 2 * c[1]! + pairs.reduce((s, [a, b], j) => s + args[3 + j]! * ((c[a]! & c[b]!) ^ t), 0);
        const expected = ((x + sum) % 8 + 8) % 8;
        expect(basisImage(7, input, [call(adder, range(7), args)], native).index).toBe(expected | (input & 0b1111000));
      }
    });
  }

  it('one AND qubit, a declared work qubit; per pair two ccx around t-controlled phases, a controlled call controlling only phases', () => {
    expect(adder.qubits).toBe(7);
    expect(adder.workQubits).toEqual([6]);
    const counts = Object.fromEntries(blockCounts(adder, 1));
    // QFT pair (2·3 h, 3 + 3 cp); 3 offset phases gain the control; 2·3 weight phases and, per pair, 3 phases already
    // controlled by t gain a second; each pair's ccx compute and uncompute stay uncontrolled.
    expect(counts).toEqual({ h: 6, cp: 3, 'inv @ cp': 3, 'ctrl @ p': 3, 'ctrl(2) @ p': 6 + 3 * 3, ccx: 6 });
  });

  it('its native kernel equals its decomposition on random states (t random too), with controls, inverse and powers', () => {
    for (const [width, controls, pairOnly, list] of [
      [1, 0, 2, [[0, 1]]],
      [2, 1, 1, [[0, 1]]],
      [3, 2, 1, [[0, 1], [1, 2], [2, 0]]],
      [2, 3, 0, [[2, 0], [1, 2]]],
    ] as const) {
      const block = fourierConstantAdder(width, controls, { pairOnlyControls: pairOnly, pairs: list });
      const blockArgs = [3, ...range(controls).map((k) => 2 * k - 3), ...list.map((_, j) => 5 - 3 * j)];
      for (const options of [{}, { controls: 1 }, { negControls: 1, inverse: true }, { power: 3 }, { power: -2, controls: 1 }]) {
        expect(nativeKernelAgreement(block, { args: blockArgs, spectators: 1, ...options })).toBeLessThan(1e-12);
      }
    }
  });

  it('rejects a pair that is not two distinct controls', () => {
    expect(() => fourierConstantAdder(2, 1, { pairs: [[0, 0]] })).toThrow(RangeError);
    expect(() => fourierConstantAdder(2, 1, { pairOnlyControls: 1, pairs: [[0, 2]] })).toThrow(RangeError);
  });
});
