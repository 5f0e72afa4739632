/**
 * ladderSumArb: a fast-check arbitrary of random fermion ladder sums on a few modes, for property tests of operator
 * code and of block-encoding builders. Reproducible through fast-check's own seed (`fc.assert(…, { seed })`).
 */
import fc from 'fast-check';
import type { LadderSum } from '../operators/LadderSum.js';

/** Coefficients of the random sums: real and imaginary parts in [−2, 2]. */
export const coefficientArb = fc.double({ min: -2, max: 2, noNaN: true, noDefaultInfinity: true });

/** Sums of 1 … `maxTerms` products of up to `maxLength` ladder factors on modes 0 … modes−1, complex coefficients. */
export function ladderSumArb(modes: number, maxTerms = 4, maxLength = 4): fc.Arbitrary<LadderSum> {
  if (!Number.isInteger(modes) || modes < 1) throw new RangeError(`ladderSumArb: modes must be a positive integer, got ${modes}`);
  const op = fc.record({ mode: fc.integer({ min: 0, max: modes - 1 }), dagger: fc.boolean() });
  const term = fc.record({ ops: fc.array(op, { maxLength }), re: coefficientArb, im: coefficientArb });
  return fc.array(term, { minLength: 1, maxLength: maxTerms }).map((terms) => ({ terms }));
}
