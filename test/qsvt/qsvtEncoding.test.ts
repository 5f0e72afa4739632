import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { pauliLcu } from '../../src/blocks/builders/pauliLcu.js';
import { productEncoding } from '../../src/blocks/combine/productEncoding.js';
import { ancillaQubits, type BlockEncoding } from '../../src/blocks/BlockEncoding.js';
import { blockCounts, totalGates, gateCounts } from '../../src/circuit/gateCounts.js';
import { call } from '../../src/circuit/ops.js';
import { fastInverse } from '../../src/inversion/fastInverse.js';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { matrixFunctionOfSingularValues } from '../../src/linalg/singularValueTransform.js';
import { singularValueDecomposition } from '../../src/linalg/singularValues.js';
import { qspMatrixElement } from '../../src/polynomial/qspMatrixElement.js';
import { qsvtEncoding } from '../../src/qsvt/qsvtEncoding.js';
import { cleanRegisterLeak } from '../../src/verify/cleanRegisterLeak.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { conjTranspose, matAdd, matMul } from '../helpers/complexMatrixOps.js';
import { pauliSumArb } from '../helpers/operatorArbitraries.js';
import { projectedBlock } from './projectedBlock.js';

const sumArb = (qubits: number, maxTerms: number) =>
  pauliSumArb(qubits, maxTerms).map((s) => ({
    ...s,
    terms: s.terms.map((t) => ({ ...t, re: Math.abs(t.re) < 1e-3 ? 0 : t.re, im: Math.abs(t.im) < 1e-3 ? 0 : t.im })),
  }));
const lcuArb = (qubits: number, maxTerms = 3) => sumArb(qubits, maxTerms).map((s) => pauliLcu(s, 'random Pauli sum'));

function scaled(M: ComplexMatrix, factor: number): ComplexMatrix {
  return { n: M.n, re: M.re.map((x) => x * factor), im: M.im.map((x) => x * factor) };
}

/** V f(Σ) V† from the linear-algebra stage's SVD: the even singular-value transform (GSLW 2019, Def. 16). */
function evenTransform(M: ComplexMatrix, f: (s: number) => number): ComplexMatrix {
  const { sigma, V } = singularValueDecomposition(M);
  const n = M.n;
  const diag: ComplexMatrix = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  sigma.forEach((s, k) => (diag.re[k * n + k] = f(s)));
  return matMul(matMul(V, diag), conjTranspose(V));
}

/** The singular-value transform of the encoded block M/α, computed from the SVD of the linear-algebra stage. */
function reference(encoding: BlockEncoding, f: (s: number) => number, degree: number): ComplexMatrix {
  const A = scaled(encoding.exact(), 1 / encoding.alpha);
  return degree % 2 === 1 ? matrixFunctionOfSingularValues(A, f) : evenTransform(A, f);
}

const chebyshevT = (d: number) => (x: number) => Math.cos(d * Math.acos(Math.max(-1, Math.min(1, x))));

describe('qsvtEncoding', () => {
  it('with all phases zero encodes the Chebyshev polynomial T_d of the singular values', () => {
    // With φ = 0, U_W(x) = W(x)^d = e^{i d arccos(x) X}, so ⟨0|U|0⟩ = T_d(x) (Gilyén, Su, Low & Wiebe, STOC 2019; Martyn et al., PRX Quantum 2, 040203, 2021).
    fc.assert(
      fc.property(lcuArb(2), fc.integer({ min: 1, max: 6 }), (U, d) => {
        const q = qsvtEncoding(U, { phases: new Float64Array(d + 1), transform: chebyshevT(d) });
        expectComplexArrayClose(projectedBlock(q), reference(U, chebyshevT(d), d), 1e-9);
      }),
      { numRuns: 12 },
    );
  });

  it('with zero phases gives T_2 = 2A†A − I and T_3 = 4AA†A − 3A (closed forms of GSLW 2019, Def. 16)', () => {
    fc.assert(
      fc.property(lcuArb(2), (U) => {
        const A = scaled(U.exact(), 1 / U.alpha);
        const identity = matAdd(matMul(conjTranspose(A), A), matMul(conjTranspose(A), A), -1);
        for (let k = 0; k < A.n; k++) identity.re[k * A.n + k] = 1;
        const t2 = matAdd(scaled(matMul(conjTranspose(A), A), 2), identity, -1);
        const t3 = matAdd(scaled(matMul(matMul(A, conjTranspose(A)), A), 4), scaled(A, 3), -1);
        expectComplexArrayClose(projectedBlock(qsvtEncoding(U, { phases: new Float64Array(3), transform: chebyshevT(2) })), t2, 1e-9);
        expectComplexArrayClose(projectedBlock(qsvtEncoding(U, { phases: new Float64Array(4), transform: chebyshevT(3) })), t3, 1e-9);
      }),
      { numRuns: 8 },
    );
  });

  it('with random phases equals Re⟨0|U_W|0⟩ (direct 2×2 product) applied to the singular values, for Hermitian and non-Hermitian blocks', () => {
    fc.assert(
      fc.property(
        fc.oneof(lcuArb(2), lcuArb(3, 2), fc.tuple(lcuArb(2, 2), lcuArb(2, 2)).map(([a, b]) => productEncoding([a, b]))),
        fc.array(fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), { minLength: 2, maxLength: 8 }),
        (U, phaseList) => {
          const phases = Float64Array.from(phaseList);
          const p = (x: number) => qspMatrixElement(phases, Math.max(-1, Math.min(1, x))).re;
          const q = qsvtEncoding(U, { phases, transform: p });
          const expected = reference(U, p, phases.length - 1);
          expectComplexArrayClose(q.exact(), expected, 1e-9, 'exact()');
          expectComplexArrayClose(projectedBlock(q), expected, 1e-9, 'circuit');
        },
      ),
      { numRuns: 20 },
    );
  });

  it('keeps the input clean registers clean and, in action-only form, equals the plain sequence', () => {
    // A fast inverse: compute (orbital rotation, energy arithmetic) touches only system and clean qubits.
    const T: ComplexMatrix = { n: 2, re: Float64Array.from([0.5, 0.25, 0.25, -0.5]), im: new Float64Array(4) };
    const F = fastInverse(T, { re: 0.3, im: 0.7 }, { precision: 1e-2, maxBits: 4 });
    const phases = Float64Array.from([0.3, -0.2, 0.9, 0.4]);
    const p = (x: number) => qspMatrixElement(phases, Math.max(-1, Math.min(1, x))).re;
    const actionOnly = qsvtEncoding(F, { phases, transform: p });
    const plain = qsvtEncoding(F, { phases, transform: p, actionOnly: false });
    expect(actionOnly.actionOnly).toBe(true);
    expect(plain.actionOnly).toBe(false);
    expect(ancillaQubits(actionOnly)).toBe(ancillaQubits(F) + 1);
    expectComplexArrayClose(projectedBlock(actionOnly), projectedBlock(plain), 1e-10);
    expect(cleanRegisterLeak(actionOnly)).toBeLessThan(1e-10);
    expect(totalGates(blockCounts(actionOnly.block))).toBeLessThan(totalGates(blockCounts(plain.block)));
  });

  it('counts a degree-10,000 sequence through the hierarchy: d queries of U or U†, d + 1 phases, two Hadamards', () => {
    const U = pauliLcu({ qubits: 2, terms: [{ x: 1n, z: 0n, re: 0.5, im: 0 }, { x: 0n, z: 3n, re: -0.25, im: 0 }] }, 'small sum');
    const d = 10_000;
    const q = qsvtEncoding(U, { phases: new Float64Array(d + 1), transform: chebyshevT(d) });
    const counts = gateCounts({ qubitRegisters: [], bitRegisters: [], ops: [call(q.block, Array.from({ length: q.block.qubits }, (_, k) => k))] });
    const perQuery = totalGates(blockCounts(U.block));
    // Each phase is X (negatively controlled by the signal qubits), rz, X.
    expect(totalGates(counts)).toBe(d * perQuery + 3 * (d + 1) + 2);
    expect(counts.get('rz')).toBe(d + 1 + d * (blockCounts(U.block).get('rz') ?? 0));
    expect(q.queries).toEqual({ forward: d / 2, adjoint: d / 2 });
  });
});
