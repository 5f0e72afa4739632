import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addPauli } from '../../src/operators/addPauli.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { fermionProduct } from '../../src/operators/fermionProduct.js';
import { jordanWigner } from '../../src/operators/jordanWigner.js';
import { ladder } from '../../src/operators/ladder.js';
import { multiplyPauli } from '../../src/operators/multiplyPauli.js';
import { pauliProduct } from '../../src/operators/pauliProduct.js';
import type { PauliSum } from '../../src/operators/PauliSum.js';
import { pauliSumMatrix } from '../../src/operators/pauliSumMatrix.js';
import { simplifyPauli } from '../../src/operators/simplifyPauli.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { ladderSumArb } from '../helpers/operatorArbitraries.js';

const anticommutator = (p: PauliSum, q: PauliSum) => simplifyPauli(addPauli(multiplyPauli(p, q), multiplyPauli(q, p)));

describe('jordanWigner(op, modes)', () => {
  it('maps a_2 to Z_0 Z_1 (X_2 + iY_2)/2 as CONVENTIONS.md fixes', () => {
    const expected = addPauli(pauliProduct(3, [[0, 'Z'], [1, 'Z'], [2, 'X']], 0.5), pauliProduct(3, [[0, 'Z'], [1, 'Z'], [2, 'Y']], 0, 0.5));
    expect(jordanWigner(ladder(2, false), 3)).toEqual(expected);
  });

  it('maps the number operator a†_j a_j to (I − Z_j)/2', () => {
    // n_j = (1 − Z_j)/2 under Jordan–Wigner (common practice).
    const n1 = jordanWigner(fermionProduct([{ mode: 1, dagger: true }, { mode: 1, dagger: false }]), 4);
    expect(n1.terms).toEqual(addPauli(pauliProduct(4, [], 0.5), pauliProduct(4, [[1, 'Z']], -0.5)).terms);
  });

  it('gives Pauli sums with {a_i, a_j†} = δ_ij and {a_i, a_j} = 0 on up to 200 qubits', () => {
    // The canonical anticommutation relations (Jordan & Wigner 1928, Z. Phys. 47, 631).
    const arb = fc.integer({ min: 1, max: 200 }).chain((n) =>
      fc.tuple(fc.constant(n), fc.integer({ min: 0, max: n - 1 }), fc.integer({ min: 0, max: n - 1 })));
    fc.assert(
      fc.property(arb, ([n, i, j]) => {
        const ai = jordanWigner(ladder(i, false), n);
        const aj = jordanWigner(ladder(j, false), n);
        const ajDagger = jordanWigner(ladder(j, true), n);
        expect(anticommutator(ai, ajDagger).terms).toEqual(i === j ? [{ x: 0n, z: 0n, re: 1, im: 0 }] : []);
        expect(anticommutator(ai, aj).terms).toEqual([]);
      }),
      { numRuns: 200 },
    );
  });

  it('has the same matrix as the direct Fock-space construction', () => {
    fc.assert(
      fc.property(ladderSumArb(4, 4, 4), (op) => {
        expectComplexArrayClose(pauliSumMatrix(jordanWigner(op, 4)), ladderSumMatrix(op, 4), 1e-12);
      }),
      { numRuns: 200 },
    );
  });

  it('refuses a mode outside the register', () => {
    expect(() => jordanWigner(ladder(3, true), 3)).toThrow(RangeError);
  });
});
