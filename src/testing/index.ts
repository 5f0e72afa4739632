/**
 * polewright/testing: helpers for a user's own test suite — fast-check arbitraries of small fermion models, ladder
 * sums, Pauli sums and states, and an assertion that a circuit block-encodes an operator. The arbitraries need
 * fast-check (an optional peer dependency); nothing in the CLI or the main entry imports this module.
 */
export { ladderSumArb, coefficientArb } from './ladderSumArb.js';
export { pauliSumArb, hermitianPauliSumArb } from './pauliSumArb.js';
export { fermionModelArb, type FermionModelArbOptions } from './fermionModelArb.js';
export { stateVectorArb } from './stateVectorArb.js';
export { assertBlockEncodes, BlockEncodingMismatch, isBlockEncodingMismatch } from './assertBlockEncodes.js';
export type { TargetOperator } from '../operatorFile/TargetOperator.js';
export type { CircuitVerification, VerifyCircuitOptions } from '../verify/verifyCircuit.js';
