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
