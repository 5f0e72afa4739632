import fc from 'fast-check';
import { describe, it } from 'vitest';
import { phasedGivensRotation } from '../../src/rotations/phasedGivensRotation.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';
import { blockUnitary } from './helpers/simulateBlock.js';

const angle = fc.double({ min: -Math.PI, max: Math.PI, noNaN: true });
const cis = (x: number, r = 1): [number, number] => [r * Math.cos(x), r * Math.sin(x)];

describe('phasedGivensRotation (phased_givens_rotation(theta, psi, chi))', () => {
  it('has one-particle matrix D(ψ)R(θ)D(χ) on (|01>, |10>) and fixes |00> and |11> (determinant 1)', () => {
    fc.assert(
      fc.property(angle, angle, angle, (theta, psi, chi) => {
        const c = Math.cos(theta);
        const s = Math.sin(theta);
        const expected = matrixFromRows([
          [1, 0, 0, 0],
          [0, cis(psi + chi, c), cis(psi - chi, -s), 0],
          [0, cis(chi - psi, s), cis(-psi - chi, c), 0],
          [0, 0, 0, 1],
        ]);
        expectComplexArrayClose(blockUnitary(phasedGivensRotation, [theta, psi, chi]), expected, 1e-14);
      }),
      { numRuns: 30 },
    );
  });
});
