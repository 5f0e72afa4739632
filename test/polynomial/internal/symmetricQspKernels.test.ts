import fc from 'fast-check';
import { describe, it } from 'vitest';
import { symmetricQspJacobian, symmetricQspValues } from '../../../src/polynomial/internal/symmetricQspKernels.js';
import { qspMatrixElement } from '../../../src/polynomial/qspMatrixElement.js';
import { expectClose } from '../../helpers/close.js';

/** The full symmetric list from φ_0 … φ_m. */
function symmetric(half: readonly number[], degree: number): Float64Array {
  const phases = new Float64Array(degree + 1);
  half.forEach((phi, k) => {
    phases[k] = phi;
    phases[degree - k] = phi;
  });
  return phases;
}

const halfAndDegree = fc.integer({ min: 0, max: 30 }).chain((degree) =>
  fc.tuple(fc.constant(degree), fc.array(fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), { minLength: (degree >> 1) + 1, maxLength: (degree >> 1) + 1 })),
);

describe('symmetricQspValues / symmetricQspJacobian', () => {
  it('agree with the direct product for random symmetric phases', () => {
    fc.assert(
      fc.property(halfAndDegree, fc.double({ min: -1, max: 1, noNaN: true }), ([degree, half], x) => {
        const out = new Float64Array(1);
        symmetricQspValues(degree, Float64Array.from(half, Math.cos), Float64Array.from(half, Math.sin), Float64Array.of(x), out);
        expectClose(out[0]!, qspMatrixElement(symmetric(half, degree), x).re, 1e-13);
      }),
    );
  });

  it('give derivatives matching central differences of the direct product', () => {
    fc.assert(
      fc.property(halfAndDegree, fc.double({ min: -1, max: 1, noNaN: true }), ([degree, half], x) => {
        const width = half.length;
        const jacobian = new Float64Array(width);
        symmetricQspJacobian(degree, Float64Array.from(half, Math.cos), Float64Array.from(half, Math.sin), Float64Array.of(x), jacobian);
        const h = 1e-6;
        for (let k = 0; k < width; k++) {
          const up = half.map((phi, j) => (j === k ? phi + h : phi));
          const down = half.map((phi, j) => (j === k ? phi - h : phi));
          const difference = (qspMatrixElement(symmetric(up, degree), x).re - qspMatrixElement(symmetric(down, degree), x).re) / (2 * h);
          expectClose(jacobian[k]!, difference, 1e-7, `∂/∂ψ_${k}`);
        }
      }),
      { numRuns: 60 },
    );
  });
});
