import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addFermion } from '../../src/operators/addFermion.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { fermionProduct } from '../../src/operators/fermionProduct.js';
import { multiplyFermion } from '../../src/operators/multiplyFermion.js';
import { scaleFermion } from '../../src/operators/scaleFermion.js';
import { simplifyFermion } from '../../src/operators/simplifyFermion.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { matAdd, matMul } from '../helpers/complexMatrixOps.js';
import { ladderSumArb } from '../helpers/operatorArbitraries.js';

const m = (op: Parameters<typeof ladderSumMatrix>[0]) => ladderSumMatrix(op, 3);

describe('addFermion, scaleFermion, multiplyFermion', () => {
  it('addFermion(a, b) has the matrix A + B', () => {
    fc.assert(fc.property(ladderSumArb(3), ladderSumArb(3), (a, b) => {
      expectComplexArrayClose(m(addFermion(a, b)), matAdd(m(a), m(b)), 1e-12);
    }));
  });

  it('scaleFermion(op, re, im) multiplies every coefficient by re + i·im', () => {
    expect(scaleFermion(fermionProduct([{ mode: 0, dagger: true }], 1, 2), 3, -1).terms[0]).toMatchObject({ re: 5, im: 5 });
  });

  it('multiplyFermion(a, b) has the matrix AB', () => {
    fc.assert(fc.property(ladderSumArb(3, 3, 3), ladderSumArb(3, 3, 3), (a, b) => {
      expectComplexArrayClose(m(multiplyFermion(a, b)), matMul(m(a), m(b)), 1e-12);
    }));
  });
});

describe('simplifyFermion(op, options)', () => {
  it('combines identical factor lists without reordering and removes exact zeros', () => {
    const ab = [{ mode: 0, dagger: true }, { mode: 1, dagger: false }];
    const ba = [{ mode: 1, dagger: false }, { mode: 0, dagger: true }];
    const op = addFermion(fermionProduct(ab, 1), fermionProduct(ba, 2), fermionProduct(ab, -1));
    expect(simplifyFermion(op).terms).toEqual([{ ops: ba, re: 2, im: 0 }]);
  });

  it('drops terms at or below the tolerance', () => {
    const op = addFermion(fermionProduct([{ mode: 0, dagger: true }], 1e-13), fermionProduct([], 1));
    expect(simplifyFermion(op, { tolerance: 1e-12 }).terms).toEqual([{ ops: [], re: 1, im: 0 }]);
  });
});
