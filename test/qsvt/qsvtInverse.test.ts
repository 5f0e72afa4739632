import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { pauliLcu } from '../../src/blocks/builders/pauliLcu.js';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { singularValueDecomposition } from '../../src/linalg/singularValues.js';
import { qsvtInverse } from '../../src/qsvt/qsvtInverse.js';
import { inverseDegreeBound } from '../../src/qsvt/inverseDegreeBound.js';
import { pauliSumArb } from '../helpers/operatorArbitraries.js';
import { projectedBlock } from './projectedBlock.js';
import { inv, matrix, complex, type Matrix, type Complex } from 'mathjs';

/** M⁻¹ by mathjs's dense inverse (an outside implementation). */
function mathjsInverse(M: ComplexMatrix): ComplexMatrix {
  const n = M.n;
  const rows = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => complex(M.re[i * n + j]!, M.im[i * n + j]!)));
  const result = (inv(matrix(rows)) as Matrix).toArray() as Complex[][];
  return { n, re: Float64Array.from(result.flat(), (c) => c.re), im: Float64Array.from(result.flat(), (c) => c.im) };
}

function maxEntryGap(a: ComplexMatrix, b: ComplexMatrix, scaleB: number): number {
  let gap = 0;
  for (let e = 0; e < a.re.length; e++) gap = Math.max(gap, Math.hypot(a.re[e]! - b.re[e]! * scaleB, a.im[e]! - b.im[e]! * scaleB));
  return gap;
}

/** Random non-Hermitian Pauli sums made well conditioned by a dominant identity term. */
const conditionedLcu = pauliSumArb(2, 3).map((s) => {
  const small = s.terms.map((t) => ({ ...t, re: 0.3 * Math.tanh(t.re), im: 0.3 * Math.tanh(t.im) }));
  return pauliLcu({ qubits: 2, terms: [{ x: 0n, z: 0n, re: 1.5, im: 0.4 }, ...small] }, 'conditioned sum');
});

describe('qsvtInverse', () => {
  it('encodes M⁻¹ within its reported bound, with α = 1/(s α_M), for random non-Hermitian M', () => {
    fc.assert(
      fc.property(conditionedLcu, (M) => {
        const sigmaMin = singularValueDecomposition(M.exact()).sigma.at(-1)!;
        const inverse = qsvtInverse(M, { conditionBound: 1 / sigmaMin, polynomialError: 1e-3 });
        expect(inverse.alpha).toBeCloseTo(1 / (inverse.scale * M.alpha), 10);
        expect(inverse.errorBound).toBeLessThan(2e-3);
        const reference = mathjsInverse(M.exact());
        expect(maxEntryGap(inverse.exact(), reference, 1)).toBeLessThan(1e-9);
        expect(maxEntryGap(projectedBlock(inverse), reference, 1 / inverse.alpha)).toBeLessThanOrEqual(inverse.errorBound + 1e-9);
        expect(inverse.queries.forward + inverse.queries.adjoint).toBe(inverse.degree);
        expect(inverse.degree).toBeLessThanOrEqual(inverseDegreeBound(inverse.delta, Math.min(0.5, 1e-3 / inverse.delta)));
      }),
      { numRuns: 6 },
    );
  });

  it('refuses δ ≤ 0 and a degree beyond the cap with RangeErrors naming the value', () => {
    const M = pauliLcu({ qubits: 1, terms: [{ x: 0n, z: 0n, re: 1, im: 0 }, { x: 0n, z: 1n, re: 0.5, im: 0 }] }, 'I + Z/2');
    expect(() => qsvtInverse({ ...M, errorBound: 0.9 }, { conditionBound: 2, polynomialError: 1e-3 })).toThrow(/δ = .* ≤ 0/);
    expect(() => qsvtInverse(M, { conditionBound: 2, polynomialError: 1e-3, maxDegree: 5 })).toThrow(/beyond the cap 5/);
    expect(() => qsvtInverse(M, { conditionBound: 2, polynomialError: 1 })).toThrow(/polynomial error 1 /);
  });
});
