// fast-check arbitraries of random fermion operators and Pauli sums on small registers: the user-facing ones in
// src/testing, re-exported for the test suite.
export { ladderSumArb } from '../../src/testing/ladderSumArb.js';
export { pauliSumArb } from '../../src/testing/pauliSumArb.js';
