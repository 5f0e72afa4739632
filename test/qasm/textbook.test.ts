// Textbook worked examples read from circuits/*.qasm: Bell and GHZ amplitudes and outcome
// probabilities, and teleportation (deferred-measurement form) carrying a U-prepared state to q[2].
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Circuit } from '../../src/circuit/types.js';
import { parseQasm } from '../../src/qasm/parseQasm.js';
import { outcomeDistribution } from '../../src/sim/outcomeDistribution.js';
import { simulateState } from '../../src/sim/simulateState.js';
import { expectClose, expectComplexClose } from '../helpers/close.js';

const TOL = 1e-12;
const source = (name: string): string => readFileSync(new URL(`../../circuits/${name}`, import.meta.url), 'utf8');
const unitaryPart = (c: Circuit): Circuit => ({ ...c, ops: c.ops.filter((op) => op.kind !== 'measure') });

function expectAmplitudes(circuit: Circuit, expected: ReadonlyMap<number, number>): void {
  const state = simulateState(unitaryPart(circuit));
  for (let i = 0; i < state.re.length; i++) {
    expectComplexClose([state.re[i]!, state.im[i]!], [expected.get(i) ?? 0, 0], TOL, `amplitude ${i}`);
  }
}

describe('textbook examples in circuits/', () => {
  it('bell.qasm prepares (|00> + |11>)/√2 and measures 00 and 11 with probability 1/2 each', () => {
    const circuit = parseQasm(source('bell.qasm'), 'bell.qasm');
    // Nielsen & Chuang, §1.3.6 (Fig. 1.12, from memory): H on the first qubit then CNOT maps |00> to (|00> + |11>)/√2.
    expectAmplitudes(circuit, new Map([[0, Math.SQRT1_2], [3, Math.SQRT1_2]]));
    const outcomes = outcomeDistribution(circuit).outcomes;
    expect([...outcomes.keys()]).toEqual(['00', '11']);
    for (const p of outcomes.values()) expectClose(p, 0.5, TOL);
  });

  it('ghz.qasm prepares (|000> + |111>)/√2', () => {
    // GHZ state prepared by H and a CNOT chain (common practice; the Bell construction of Nielsen & Chuang §1.3.6 extended by one CNOT).
    const circuit = parseQasm(source('ghz.qasm'), 'ghz.qasm');
    expectAmplitudes(circuit, new Map([[0, Math.SQRT1_2], [7, Math.SQRT1_2]]));
    const outcomes = outcomeDistribution(circuit).outcomes;
    expect([...outcomes.keys()]).toEqual(['000', '111']);
  });

  it('teleport.qasm leaves q[0] and q[1] in |+> and the input state on q[2]', () => {
    const circuit = parseQasm(source('teleport.qasm'), 'teleport.qasm');
    expectTeleported(circuit, [1.1, 0.7, -0.4]);
  });

  it('teleportation carries random U(θ, φ, λ)|0> inputs to q[2] with Bob measuring |β|² for 1', () => {
    const text = source('teleport.qasm');
    fc.assert(
      fc.property(fc.tuple(...[0, 1, 2].map(() => fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }))), (angles) => {
        const program = text.replace('U(1.1, 0.7, -0.4) q[0];', `U(${angles.join(', ')}) q[0];`);
        expect(program).not.toBe(text);
        const circuit = parseQasm(program, 'teleport.qasm');
        expectTeleported(circuit, angles);
        // Nielsen & Chuang, §1.3.7: Alice's two results are uniformly random; Bob holds |ψ>, so
        // P(c[2] = 1) = |β|² with |ψ> = α|0> + β|1>, here β = e^{iφ} sin(θ/2).
        const pOne = Math.sin(angles[0]! / 2) ** 2;
        let measuredOne = 0;
        for (const [bits, p] of outcomeDistribution(circuit).outcomes) if (bits[0] === '1') measuredOne += p;
        expectClose(measuredOne, pOne, TOL);
      }),
      { numRuns: 25 },
    );
  });
});

/**
 * After the deferred-measurement circuit the state is |+>|+>|ψ> on (q[0], q[1], q[2]) with
 * |ψ> = U(θ, φ, λ)|0> (Nielsen & Chuang, §1.3.7 with the corrections of §4.4 moved before measurement):
 * the amplitude of basis index i is ψ_{bit 2 of i} / 2.
 */
function expectTeleported(circuit: Circuit, [theta, phi]: readonly number[]): void {
  // U(θ, φ, λ)|0> = e^{iθ/2}(cos(θ/2)|0> + e^{iφ} sin(θ/2)|1>): the first column of U in the OpenQASM 3.0.0
  // specification, "Built-in gates" (½(1 + e^{iθ}) and ½ie^{iφ}(1 − e^{iθ}); λ only enters the second column).
  const s = Math.sin(theta! / 2);
  const c = Math.cos(theta! / 2);
  const [gr, gi] = [Math.cos(theta! / 2), Math.sin(theta! / 2)];
  const psi: [number, number][] = [[c * gr, c * gi], [s * Math.cos(phi! + theta! / 2), s * Math.sin(phi! + theta! / 2)]];
  const state = simulateState(unitaryPart(circuit));
  for (let i = 0; i < 8; i++) {
    const amplitude = psi[(i >> 2) & 1]!;
    expectComplexClose([state.re[i]!, state.im[i]!], [amplitude[0] / 2, amplitude[1] / 2], TOL, `amplitude ${i}`);
  }
}
