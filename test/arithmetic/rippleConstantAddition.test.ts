import { describe, expect, it } from 'vitest';
import { rippleConstantAddition, ripplePairAddition } from '../../src/arithmetic/rippleConstantAddition.js';
import { basisImage } from './helpers/basisImage.js';

const range = (start: number, n: number): number[] => Array.from({ length: n }, (_, k) => start + k);

describe('rippleConstantAddition(constant, qubits)', () => {
  it('adds every constant modulo 2^m under a control, returning scratch and carry to 0 (m ≤ 4)', () => {
    for (let m = 1; m <= 4; m++) {
      const size = 2 ** m;
      const register = range(0, m);
      const scratch = range(m, m);
      const carry = 2 * m;
      const control = 2 * m + 1;
      for (let a = -size; a < size; a++) {
        const controlled = rippleConstantAddition(a, { register, scratch, carry, control });
        const plain = rippleConstantAddition(a, { register, scratch, carry });
        for (let x = 0; x < size; x++) {
          for (const c of [0, 1]) {
            const input = x | (c << control);
            const sum = (((x + c * a) % size) + size) % size;
            expect(basisImage(2 * m + 2, input, controlled, false).index).toBe(sum | (c << control));
            expect(basisImage(2 * m + 2, input, plain, false).index).toBe(((((x + a) % size) + size) % size) | (c << control));
          }
        }
      }
    }
  });

  it('ripplePairAddition adds constant·a·b through one AND qubit, returning it, scratch and carry to 0 (and constant·(1 ⊕ ab) from t = 1; m ≤ 3)', () => {
    for (let m = 1; m <= 3; m++) {
      const size = 2 ** m;
      const register = range(0, m);
      const scratch = range(m, m);
      const carry = 2 * m;
      const [a, b, and] = [2 * m + 1, 2 * m + 2, 2 * m + 3];
      for (let v = -size; v < size; v++) {
        const ops = ripplePairAddition(v, { register, scratch, carry, pair: [a, b], and });
        for (let x = 0; x < size; x++) {
          for (let bits = 0; bits < 8; bits++) {
            const [ca, cb, t] = [bits & 1, (bits >> 1) & 1, (bits >> 2) & 1];
            const input = x | (ca << a) | (cb << b) | (t << and);
            const sum = (((x + v * ((ca & cb) ^ t)) % size) + size) % size;
            expect(basisImage(2 * m + 4, input, ops, false).index).toBe(sum | (input & ~(size - 1)));
          }
        }
      }
    }
  });
});
