// Error bounds through the combinators: for approximate inputs (fast inverses on non-dyadic energies, coarse register,
// pruned flag rotation) every combined encoding's verified error stays within its propagated bound, and results are
// plain encodings (no subtype fields of the inputs).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ladderEncoding } from '../../src/blocks/builders/ladderEncoding.js';
import { adjointEncoding } from '../../src/blocks/combine/adjointEncoding.js';
import { controlledEncoding } from '../../src/blocks/combine/controlledEncoding.js';
import { linearCombination } from '../../src/blocks/combine/linearCombination.js';
import { phasedEncoding } from '../../src/blocks/combine/phasedEncoding.js';
import { productEncoding } from '../../src/blocks/combine/productEncoding.js';
import { shiftedEncoding } from '../../src/blocks/combine/shiftedEncoding.js';
import { tensorEncoding } from '../../src/blocks/combine/tensorEncoding.js';
import { productErrorBound } from '../../src/blocks/internal/productErrorBound.js';
import type { BlockEncoding } from '../../src/blocks/BlockEncoding.js';
import { fastInverse } from '../../src/inversion/fastInverse.js';
import { verifyEncoding } from '../../src/verify/verifyEncoding.js';
import { hermitianArb } from '../inversion/helpers/referenceResolvent.js';

/** A deliberately coarse fast inverse on one or two modes: non-dyadic energies, 3-bit register, pruned flag rotation. */
const approximateArb = fc
  .record({
    T: fc.integer({ min: 1, max: 2 }).chain((n) => hermitianArb(n)),
    re: fc.double({ min: -1.5, max: 1.5, noNaN: true }),
    im: fc.double({ min: 0.2, max: 0.8, noNaN: true }),
  })
  .map(({ T, re, im }) => fastInverse(T, { re, im }, { precision: 0.3, maxBits: 3, flagRotation: 'pruned' }));

const ROUNDING = 1e-12;

function expectWithinBound(encoding: BlockEncoding): void {
  const { maxError } = verifyEncoding(encoding);
  expect(maxError).toBeLessThanOrEqual(encoding.errorBound + ROUNDING);
}

describe('error bounds through combinators', () => {
  it('productErrorBound(e) is the telescoping sum Σ e_k Π_{j>k}(1 + e_j) (common practice)', () => {
    expect(productErrorBound([])).toBe(0);
    expect(productErrorBound([0.1])).toBeCloseTo(0.1, 15);
    expect(productErrorBound([0.1, 0.2])).toBeCloseTo(0.1 * 1.2 + 0.2, 15);
    expect(productErrorBound([0.1, 0.2, 0.3])).toBeCloseTo(0.1 * 1.2 * 1.3 + 0.2 * 1.3 + 0.3, 15);
  });

  it('the coarse fast inverse really is approximate, so the laws below are not vacuous', () => {
    // Three incommensurate levels give 8 occupation energies, more than a 2-bit register has values, so some share one.
    const T = { n: 3, re: new Float64Array([0.3141, 0, 0, 0, -0.5772, 0, 0, 0, 0.1414]), im: new Float64Array(9) };
    const f = fastInverse(T, { re: 0.2, im: 0.3 }, { precision: 0.3, maxBits: 2, flagRotation: 'pruned' });
    expect(f.errorBound).toBeGreaterThan(0);
    expect(verifyEncoding(f).maxError).toBeGreaterThan(1e-6);
  });

  it('product, LCU, shift, adjoint, control, phase and tensor of approximate encodings stay within their propagated bounds', () => {
    let approximate = 0;
    fc.assert(
      fc.property(approximateArb, approximateArb, fc.double({ min: -2, max: 2, noNaN: true }), (a, b, phase) => {
        fc.pre(a.systemQubits === b.systemQubits);
        const n = a.systemQubits;
        const ladder = ladderEncoding(0, true, n);
        const combos: BlockEncoding[] = [
          productEncoding([a, b]),
          productEncoding([ladder, a, b]),
          linearCombination([{ coefficient: { re: 0.7, im: -0.2 }, encoding: a }, { coefficient: { re: -1.1, im: 0 }, encoding: b }], 'lcu'),
          shiftedEncoding(a, { re: 0.5, im: 0.1 }),
          adjointEncoding(a),
          controlledEncoding(a),
          phasedEncoding(b, phase),
        ];
        if (n === 1) combos.push(tensorEncoding(a, b));
        for (const e of combos) expectWithinBound(e);
        if (combos[0]!.errorBound > 0) approximate++;
      }),
      { numRuns: 8, seed: 20261202 },
    );
    expect(approximate).toBeGreaterThan(0);
  });

  it('combinators return plain encodings: no subtype field such as w or c leaks into the result', () => {
    const T = { n: 1, re: new Float64Array([0.25]), im: new Float64Array(1) };
    const f = fastInverse(T, { re: 0.1, im: 0.5 });
    for (const e of [adjointEncoding(f), controlledEncoding(f), phasedEncoding(f, 0.3), productEncoding([f]), shiftedEncoding(f, { re: 1, im: 0 })]) {
      expect(Object.keys(e).sort()).toEqual(['alpha', 'ancillas', 'block', 'costNotes', 'errorBound', 'exact', 'label', 'systemQubits']);
    }
  });
});
