/**
 * pauliSumArb, hermitianPauliSumArb: fast-check arbitraries of random Pauli sums on a few qubits (complex coefficients,
 * or real ones, which make the sum Hermitian). Reproducible through fast-check's own seed (`fc.assert(…, { seed })`).
 */
import fc from 'fast-check';
import type { PauliSum } from '../operators/PauliSum.js';
import { coefficientArb } from './ladderSumArb.js';

function checkQubits(what: string, qubits: number): void {
  if (!Number.isInteger(qubits) || qubits < 1 || qubits > 30) throw new RangeError(`${what}: qubits must be an integer in 1…30, got ${qubits}`);
}

/** Sums of 1 … `maxTerms` random Pauli strings on `qubits` qubits (≤ 30) with complex coefficients in [−2, 2]². */
export function pauliSumArb(qubits: number, maxTerms = 4): fc.Arbitrary<PauliSum> {
  checkQubits('pauliSumArb', qubits);
  const mask = fc.integer({ min: 0, max: 2 ** qubits - 1 }).map(BigInt);
  const term = fc.record({ x: mask, z: mask, re: coefficientArb, im: coefficientArb });
  return fc.array(term, { minLength: 1, maxLength: maxTerms }).map((terms) => ({ qubits, terms }));
}

/** Like pauliSumArb with real coefficients, so the sum is Hermitian (each Pauli string is). */
export function hermitianPauliSumArb(qubits: number, maxTerms = 4): fc.Arbitrary<PauliSum> {
  checkQubits('hermitianPauliSumArb', qubits);
  const mask = fc.integer({ min: 0, max: 2 ** qubits - 1 }).map(BigInt);
  const term = fc.record({ x: mask, z: mask, re: coefficientArb, im: fc.constant(0) });
  return fc.array(term, { minLength: 1, maxLength: maxTerms }).map((terms) => ({ qubits, terms }));
}
