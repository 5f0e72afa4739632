/**
 * fockReference: a sum of fermion terms as a reference operator for verifyEncoding, applied by bit operations and sign
 * counting on the Fock basis (no Pauli algebra, never formed densely).
 */
import { applyFockOperator, adjointFockTerms, type FockTerm } from './internal/fockOperatorMatrix.js';
import type { ReferenceOperator } from './verifyEncoding.js';

export function fockReference(terms: readonly FockTerm[], modes: number): ReferenceOperator {
  const adjoint = adjointFockTerms(terms);
  return {
    dimension: 2 ** modes,
    apply: (re, im) => applyFockOperator(terms, modes, re, im),
    applyAdjoint: (re, im) => applyFockOperator(adjoint, modes, re, im),
  };
}
