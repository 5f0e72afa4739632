// symmetricEigen: A v = λ v and orthonormal eigenvectors for random symmetric matrices (property test;
// subnormal entries are excluded: the EISPACK scaling loses orthogonality on them).
import fc from 'fast-check';
import { describe, it } from 'vitest';
import { symmetricEigen } from '../../../src/exact/internal/symmetricEigen.js';
import { expectClose } from '../../helpers/close.js';

describe('symmetricEigen(a, n)', () => {
  it('returns ascending eigenvalues with orthonormal eigenvectors satisfying A v = λ v', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 12 }).chain((n) => fc.tuple(fc.constant(n), fc.array(fc.double({ min: -1, max: 1, noNaN: true }).map((x) => (Math.abs(x) < 1e-150 ? 0 : x)), { minLength: n * n, maxLength: n * n }))), ([n, raw]) => {
        const a = new Float64Array(n * n);
        for (let i = 0; i < n; i++) for (let j = 0; j <= i; j++) a[i * n + j] = a[j * n + i] = raw[i * n + j]!;
        const { values, vectors } = symmetricEigen(a, n);
        for (let k = 0; k + 1 < n; k++) if (values[k]! > values[k + 1]!) throw new Error('not ascending');
        for (let k = 0; k < n; k++) {
          for (let i = 0; i < n; i++) {
            let s = 0;
            for (let j = 0; j < n; j++) s += a[i * n + j]! * vectors[j * n + k]!;
            expectClose(s, values[k]! * vectors[i * n + k]!, 1e-12, `(Av − λv)_${i}`);
          }
          for (let l = 0; l < n; l++) {
            let d = 0;
            for (let i = 0; i < n; i++) d += vectors[i * n + k]! * vectors[i * n + l]!;
            expectClose(d, k === l ? 1 : 0, 1e-12, `v_${k}·v_${l}`);
          }
        }
      }),
      { numRuns: 60, seed: 7 },
    );
  });
});
