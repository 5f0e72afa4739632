/**
 * Example: testing your own block-encodings with polewright (copy this file into your project's tests).
 *
 * In your project, import from the package instead of the repository's sources:
 *   import { CircuitBuilder, gate, type Circuit, type PauliSum } from 'polewright';
 *   import { assertBlockEncodes, hermitianPauliSumArb, isBlockEncodingMismatch } from 'polewright/testing';
 * `polewright/testing` needs fast-check in your devDependencies.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CircuitBuilder, gate, type Circuit, type PauliSum } from '../src/index.js';
import { assertBlockEncodes, hermitianPauliSumArb, isBlockEncodingMismatch } from '../src/testing/index.js';

/**
 * Your builder: the LCU block-encoding of c0·P0 + c1·P1 with real coefficients (Childs & Wiebe, Quantum Inf. Comput. 12,
 * 901, 2012) — PREPARE ry(θ)|0> = √(|c0|/α)|0> + √(|c1|/α)|1>, SELECT (the sign of c_k as a phase on branch k, then
 * P_k controlled by the ancilla), PREPARE†; α = |c0| + |c1|. System register `q`, one signal qubit `anc`.
 */
function twoTermLcu(sum: PauliSum): Circuit {
  const builder = new CircuitBuilder();
  const q = builder.qubits('q', sum.qubits);
  const [anc] = builder.qubits('anc', 1) as [number];
  const [t0, t1] = sum.terms as [PauliSum['terms'][0], PauliSum['terms'][0]];
  const theta = 2 * Math.atan2(Math.sqrt(Math.abs(t1.re)), Math.sqrt(Math.abs(t0.re)));
  builder.add(gate('ry', [anc], [theta]));
  [t0, t1].forEach((term, branch) => {
    const onBranch = branch === 0 ? { negControls: [anc] } : { controls: [anc] };
    // −1 on branch 1 is z on the ancilla; −1 on branch 0 is z conjugated by x.
    if (term.re < 0) builder.add(...(branch === 1 ? [gate('z', [anc])] : [gate('x', [anc]), gate('z', [anc]), gate('x', [anc])]));
    q.forEach((qubit, k) => {
      const hasX = ((term.x >> BigInt(k)) & 1n) === 1n;
      const hasZ = ((term.z >> BigInt(k)) & 1n) === 1n;
      if (hasX || hasZ) builder.add(gate(hasX && hasZ ? 'y' : hasX ? 'x' : 'z', [qubit], [], onBranch));
    });
  });
  builder.add(gate('ry', [anc], [-theta]));
  return builder.build();
}

describe('my two-term LCU builder', () => {
  it('encodes c0·P0 + c1·P1 with α = |c0| + |c1| for random Pauli strings and real coefficients', () => {
    const twoTerms = hermitianPauliSumArb(2, 2).filter((s) => s.terms.length === 2 && Math.abs(s.terms[0]!.re) + Math.abs(s.terms[1]!.re) > 1e-3);
    fc.assert(
      fc.property(twoTerms, (sum) => {
        const alpha = Math.abs(sum.terms[0]!.re) + Math.abs(sum.terms[1]!.re);
        assertBlockEncodes(twoTermLcu(sum), { pauli: sum }, { alpha, tolerance: 1e-10 });
      }),
      { seed: 2024, numRuns: 40 },
    );
  });

  it('a handwritten OpenQASM 3 version passes too, with α fitted', () => {
    const qasm = `OPENQASM 3;
include "stdgates.inc";
qubit q;
qubit anc;
h anc;
negctrl @ x anc, q;
cz anc, q;
h anc;
`;
    // (X + Z)/2 by LCU: PREPARE = h, α = 2.
    const result = assertBlockEncodes(qasm, { pauli: { qubits: 1, terms: [{ x: 1n, z: 0n, re: 1, im: 0 }, { x: 0n, z: 1n, re: 1, im: 0 }] } });
    expect(result.alpha).toBeCloseTo(2, 10);
  });

  it('a wrong circuit fails with a message naming α, the error and the worst column', () => {
    const sum: PauliSum = { qubits: 2, terms: [{ x: 1n, z: 2n, re: 1, im: 0 }, { x: 0n, z: 1n, re: -0.5, im: 0 }] };
    const wrong = twoTermLcu({ ...sum, terms: [sum.terms[0]!, { ...sum.terms[1]!, re: 0.5 }] });
    let caught: unknown;
    try {
      assertBlockEncodes(wrong, { pauli: sum }, { alpha: 1.5 });
    } catch (error) {
      caught = error;
    }
    expect(isBlockEncodingMismatch(caught)).toBe(true);
    expect(String((caught as Error).message)).toMatch(/α = 1\.5 \(given\); max error .* worst column \d+ = \|\d\d>_q/);
  });
});
