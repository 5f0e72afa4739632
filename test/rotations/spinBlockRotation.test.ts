import { describe, expect, it } from 'vitest';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { orbitalRotation } from '../../src/rotations/orbitalRotation.js';
import { spinBlockRotation } from '../../src/rotations/spinBlockRotation.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { randomUnitary } from './helpers/randomMatrices.js';
import { blockUnitary } from './helpers/simulateBlock.js';

function directSum(V: ComplexMatrix): ComplexMatrix {
  const L = V.n;
  const n = 2 * L;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (const b of [0, L]) {
    for (let i = 0; i < L; i++) {
      for (let j = 0; j < L; j++) [re[(b + i) * n + b + j], im[(b + i) * n + b + j]] = [V.re[i * L + j]!, V.im[i * L + j]!];
    }
  }
  return { n, re, im };
}

describe('spinBlockRotation(rotation, blocks)', () => {
  it('applied to the up modes then the down modes equals U(V ⊕ V) on the whole register', () => {
    const V = randomUnitary(3, 4);
    const block = spinBlockRotation(orbitalRotation(V), { up: [0, 1, 2], down: [3, 4, 5] });
    expectComplexArrayClose(blockUnitary(block), blockUnitary(orbitalRotation(directSum(V))), 1e-10);
  });

  it('throws a RangeError for non-consecutive, wrongly sized or overlapping blocks', () => {
    const rotation = orbitalRotation(randomUnitary(2, 1));
    expect(() => spinBlockRotation(rotation, { up: [0, 2], down: [1, 3] })).toThrow(/spinBlockRotation: the up block/);
    expect(() => spinBlockRotation(rotation, { up: [0, 1, 2], down: [3, 4] })).toThrow(RangeError);
    expect(() => spinBlockRotation(rotation, { up: [0, 1], down: [1, 2] }, { modes: 4 })).toThrow(/overlap/);
  });
});
