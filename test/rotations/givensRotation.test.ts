import fc from 'fast-check';
import { describe, it } from 'vitest';
import { givensRotation } from '../../src/rotations/givensRotation.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';
import { blockUnitary } from './helpers/simulateBlock.js';

describe('givensRotation (givens_rotation(theta))', () => {
  it('acts on the four basis states |n_{p+1} n_p> as |00>, cos θ|01> + sin θ|10>, −sin θ|01> + cos θ|10>, |11>', () => {
    fc.assert(
      fc.property(fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), (theta) => {
        const c = Math.cos(theta);
        const s = Math.sin(theta);
        // Columns: images of |00>, |01> (mode p), |10> (mode p+1), |11>; derived in the block's doc comment.
        const expected = matrixFromRows([
          [1, 0, 0, 0],
          [0, c, -s, 0],
          [0, s, c, 0],
          [0, 0, 0, 1],
        ]);
        expectComplexArrayClose(blockUnitary(givensRotation, [theta]), expected, 1e-14);
      }),
      { numRuns: 30 },
    );
  });
});
