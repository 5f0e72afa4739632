// probabilities(state, qubits): marginals of qubit subsets, index bit k = qubits[k].
import { describe, expect, it } from 'vitest';
import { StateVector } from '../../src/sim/StateVector.js';
import { probabilities } from '../../src/sim/probabilities.js';
import { expectClose } from '../helpers/close.js';

// (|000> + |011> + |110> + |111>)/2 with a phase on one term: qubit 0 marginal (1/2, 1/2) etc.
const half = 0.5;
const state = StateVector.fromAmplitudes([half, 0, 0, half, 0, 0, 0, half], [0, 0, 0, 0, 0, 0, half, 0]);

describe('probabilities(state, qubits)', () => {
  it('gives the full distribution for all qubits in order', () => {
    expect([...probabilities(state, [0, 1, 2])]).toEqual([0.25, 0, 0, 0.25, 0, 0, 0.25, 0.25]);
  });

  it('marginalises the other qubits and orders outcome bits as the qubit list', () => {
    // Hand count: qubit 2 = 1 in |110>, |111> → 1/2; (q2, q0): |000>→00, |011>→01, |110>→10, |111>→11.
    expect([...probabilities(state, [2])]).toEqual([0.5, 0.5]);
    expect([...probabilities(state, [2, 0])]).toEqual([0.25, 0.25, 0.25, 0.25]);
    // (q1, q2): |000>→00, |011>→ q1=1,q2=0 → 1, |110> → 11, |111> → 11.
    const p = probabilities(state, [1, 2]);
    [0.25, 0.25, 0, 0.5].forEach((v, x) => expectClose(p[x]!, v, 1e-15, `p[${x}]`));
  });

  it('gives [Σ|a|²] for the empty subset and refuses repeated or out-of-range qubits', () => {
    expectClose(probabilities(state, [])[0]!, 1, 1e-15);
    expect(() => probabilities(state, [1, 1])).toThrow(RangeError);
    expect(() => probabilities(state, [3])).toThrow(RangeError);
  });
});
