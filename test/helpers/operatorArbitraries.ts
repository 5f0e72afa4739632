// fast-check arbitraries of random fermion operators and Pauli sums on small registers.
import fc from 'fast-check';
import type { LadderSum } from '../../src/operators/LadderSum.js';
import type { PauliSum } from '../../src/operators/PauliSum.js';

const coefficient = fc.double({ min: -2, max: 2, noNaN: true, noDefaultInfinity: true });

/** Sums of up to `maxTerms` products of up to `maxLength` ladder factors on `modes` modes. */
export function ladderSumArb(modes: number, maxTerms = 4, maxLength = 4): fc.Arbitrary<LadderSum> {
  const op = fc.record({ mode: fc.integer({ min: 0, max: modes - 1 }), dagger: fc.boolean() });
  const term = fc.record({ ops: fc.array(op, { maxLength }), re: coefficient, im: coefficient });
  return fc.array(term, { minLength: 1, maxLength: maxTerms }).map((terms) => ({ terms }));
}

/** Sums of up to `maxTerms` random Pauli strings on `qubits` qubits (≤ 30) with random complex coefficients. */
export function pauliSumArb(qubits: number, maxTerms = 4): fc.Arbitrary<PauliSum> {
  const mask = fc.integer({ min: 0, max: 2 ** qubits - 1 }).map(BigInt);
  const term = fc.record({ x: mask, z: mask, re: coefficient, im: coefficient });
  return fc.array(term, { minLength: 1, maxLength: maxTerms }).map((terms) => ({ qubits, terms }));
}
