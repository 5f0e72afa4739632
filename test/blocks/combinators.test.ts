import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ladderEncoding } from '../../src/blocks/builders/ladderEncoding.js';
import { pauliLcu } from '../../src/blocks/builders/pauliLcu.js';
import { adjointEncoding } from '../../src/blocks/combine/adjointEncoding.js';
import { controlledEncoding } from '../../src/blocks/combine/controlledEncoding.js';
import { linearCombination } from '../../src/blocks/combine/linearCombination.js';
import { phasedEncoding } from '../../src/blocks/combine/phasedEncoding.js';
import { productEncoding } from '../../src/blocks/combine/productEncoding.js';
import { shiftedEncoding } from '../../src/blocks/combine/shiftedEncoding.js';
import { tensorEncoding } from '../../src/blocks/combine/tensorEncoding.js';
import { ancillaQubits } from '../../src/blocks/BlockEncoding.js';
import { pauliSumMatrix } from '../../src/operators/pauliSumMatrix.js';
import { verifyEncoding } from '../../src/verify/verifyEncoding.js';
import { pauliSumArb } from '../helpers/operatorArbitraries.js';
import { matAdd, matMul, conjTranspose } from '../helpers/complexMatrixOps.js';
import { expectComplexArrayClose } from '../helpers/close.js';

const TOL = 1e-10;
/** Random Pauli sums with coefficients rounded away from the subnormal range (α must be representable). */
const sumArb = (qubits: number, maxTerms: number) =>
  pauliSumArb(qubits, maxTerms).map((s) => ({
    ...s,
    terms: s.terms.map((t) => ({ ...t, re: Math.abs(t.re) < 1e-6 ? 0 : t.re, im: Math.abs(t.im) < 1e-6 ? 0 : t.im })),
  }));
const lcuOf = (qubits: number, maxTerms = 3) => sumArb(qubits, maxTerms).map((s) => pauliLcu(s, 'random Pauli sum'));

describe('block-encoding combinators', () => {
  it('productEncoding(a, b) encodes M_a M_b with α_a α_b and both ancilla registers', () => {
    fc.assert(
      fc.property(lcuOf(2), lcuOf(2), (a, b) => {
        const p = productEncoding([a, b]);
        expect(p.alpha).toBeCloseTo(a.alpha * b.alpha, 12);
        expect(ancillaQubits(p)).toBe(ancillaQubits(a) + ancillaQubits(b));
        expectComplexArrayClose(p.exact(), matMul(a.exact(), b.exact()), TOL);
        expect(verifyEncoding(p).maxError).toBeLessThan(TOL);
      }),
      { numRuns: 15 },
    );
  });

  it('linearCombination encodes Σ c_k M_k with α = Σ |c_k| α_k', () => {
    fc.assert(
      fc.property(lcuOf(2), lcuOf(2), fc.double({ min: -2, max: 2, noNaN: true }), fc.double({ min: -2, max: 2, noNaN: true }), (a, b, re, im) => {
        fc.pre(Math.hypot(re, im) > 1e-3);
        const c = linearCombination([{ coefficient: { re, im }, encoding: a }, { coefficient: { re: 1, im: 0 }, encoding: b }], 'c');
        expect(c.alpha).toBeCloseTo(Math.hypot(re, im) * a.alpha + b.alpha, 12);
        const expected = matAdd(matMul(scalarMatrix(a.exact().n, re, im), a.exact()), b.exact());
        expectComplexArrayClose(c.exact(), expected, TOL);
        expect(verifyEncoding(c).maxError).toBeLessThan(TOL);
      }),
      { numRuns: 15 },
    );
  });

  it('adjointEncoding encodes M† and adjoint twice gives M back', () => {
    fc.assert(
      fc.property(lcuOf(2), (a) => {
        const d = adjointEncoding(a);
        expectComplexArrayClose(d.exact(), conjTranspose(a.exact()), TOL);
        expect(verifyEncoding(d).maxError).toBeLessThan(TOL);
        expect(verifyEncoding(adjointEncoding(d)).maxError).toBeLessThan(TOL);
      }),
      { numRuns: 10 },
    );
  });

  it('controlledEncoding encodes |0><0| ⊗ αI + |1><1| ⊗ M', () => {
    fc.assert(
      fc.property(lcuOf(2), (a) => {
        const c = controlledEncoding(a);
        expect(c.systemQubits).toBe(3);
        const report = verifyEncoding(c);
        expect(report.maxError).toBeLessThan(TOL);
        const M = a.exact();
        const C = c.exact();
        // The control-0 block is α·I and the control-1 block is M (control = top system qubit).
        for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) {
          expect(C.re[i * 8 + j]).toBeCloseTo(i === j ? a.alpha : 0, 12);
          expect(C.re[(i + 4) * 8 + j + 4]).toBeCloseTo(M.re[i * 4 + j]!, 12);
          expect(C.im[(i + 4) * 8 + j + 4]).toBeCloseTo(M.im[i * 4 + j]!, 12);
        }
      }),
      { numRuns: 10 },
    );
  });

  it('tensorEncoding, phasedEncoding and shiftedEncoding verify against their exact operators', () => {
    fc.assert(
      fc.property(lcuOf(1), lcuOf(2), fc.double({ min: -3, max: 3, noNaN: true }), (a, b, phase) => {
        expect(verifyEncoding(tensorEncoding(a, b)).maxError).toBeLessThan(TOL);
        const p = phasedEncoding(b, phase);
        expect(verifyEncoding(p).maxError).toBeLessThan(TOL);
        const s = shiftedEncoding(b, { re: phase, im: 0.5 });
        expect(s.alpha).toBeCloseTo(Math.hypot(phase, 0.5) + b.alpha, 12);
        expect(verifyEncoding(s).maxError).toBeLessThan(TOL);
      }),
      { numRuns: 10 },
    );
  });
});

describe('pauliLcu(sum)', () => {
  it('encodes the Pauli sum with α = Σ|c_t| of the simplified sum', () => {
    fc.assert(
      fc.property(sumArb(3, 5), (sum) => {
        const e = pauliLcu(sum, 'sum');
        const merged = new Map<string, [number, number]>();
        for (const t of sum.terms) {
          const key = `${t.x},${t.z}`;
          const [r, i] = merged.get(key) ?? [0, 0];
          merged.set(key, [r + t.re, i + t.im]);
        }
        const oneNorm = [...merged.values()].reduce((s, [r, i]) => s + Math.hypot(r, i), 0);
        expect(e.alpha).toBeCloseTo(oneNorm === 0 ? 1 : oneNorm, 12);
        expectComplexArrayClose(e.exact(), pauliSumMatrix(sum), TOL);
        expect(verifyEncoding(e).maxError).toBeLessThan(TOL);
      }),
      { numRuns: 20 },
    );
  });

  it('reports the unary-iteration SELECT cost L − 1 (Babbush et al. 2018, from memory)', () => {
    const sum = { qubits: 2, terms: [{ x: 1n, z: 0n, re: 1, im: 0 }, { x: 0n, z: 2n, re: 0.5, im: 0 }, { x: 3n, z: 3n, re: 0, im: 2 }] };
    expect(pauliLcu(sum, 's').costNotes[0]?.toffoli).toBe(2);
  });
});

describe('ladderEncoding(mode, dagger, modes)', () => {
  it('encodes a_j and a_j† exactly for every mode of registers up to 6 modes', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 6 }).chain((n) => fc.tuple(fc.constant(n), fc.integer({ min: 0, max: n - 1 }), fc.boolean())), ([n, j, dagger]) => {
        const e = ladderEncoding(j, dagger, n);
        expect(e.label).toBe(`${dagger ? 'creation' : 'annihilation'} ${j}`);
        expect(verifyEncoding(e).maxError).toBeLessThan(TOL);
      }),
      { numRuns: 25 },
    );
  });

  it('has α = 1 and one ancilla, and {a_i, a_j†} = δ_ij from the encoded operators (Jordan & Wigner 1928)', () => {
    const modes = 3;
    for (let i = 0; i < modes; i++) {
      for (let j = 0; j < modes; j++) {
        const a = ladderEncoding(i, false, modes);
        const ad = ladderEncoding(j, true, modes);
        expect(a.alpha).toBe(1);
        expect(ancillaQubits(a)).toBe(1);
        expect(verifyEncoding(a).maxError).toBeLessThan(TOL);
        expect(verifyEncoding(ad).maxError).toBeLessThan(TOL);
        const anti = matAdd(
          verifiedProduct(a, ad),
          verifiedProduct(ad, a),
        );
        const dim = 2 ** modes;
        for (let r = 0; r < dim; r++) for (let c = 0; c < dim; c++) {
          expect(anti.re[r * dim + c]).toBeCloseTo(i === j && r === c ? 1 : 0, 10);
          expect(anti.im[r * dim + c]).toBeCloseTo(0, 10);
        }
      }
    }
  });
});

/** The operator a product encoding actually implements, read off the simulated circuit (times α). */
function verifiedProduct(a: ReturnType<typeof ladderEncoding>, b: ReturnType<typeof ladderEncoding>) {
  const p = productEncoding([a, b]);
  expect(verifyEncoding(p).maxError).toBeLessThan(TOL);
  return p.exact();
}

function scalarMatrix(n: number, re: number, im: number) {
  const m = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  for (let k = 0; k < n; k++) {
    m.re[k * n + k] = re;
    m.im[k * n + k] = im;
  }
  return m;
}
