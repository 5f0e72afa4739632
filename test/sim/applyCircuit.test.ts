// applyCircuit: controlled kernels leave every non-matching amplitude bit-identical; measurements
// are refused; barriers are ignored; a state wider than the circuit is acted on in its low qubits.
import { describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { gate } from '../../src/circuit/ops.js';
import type { UnitaryOp } from '../../src/circuit/types.js';
import { InputError } from '../../src/core/InputError.js';
import { seededRandom } from '../../src/core/seededRandom.js';
import { StateVector } from '../../src/sim/StateVector.js';
import { applyCircuit } from '../../src/sim/applyCircuit.js';
import { applyUnitaryOps } from '../../src/sim/applyUnitaryOps.js';

function randomState(n: number, seed: number): StateVector {
  const random = seededRandom(seed);
  const re = Array.from({ length: 2 ** n }, () => random.next() - 0.5);
  const im = Array.from({ length: 2 ** n }, () => random.next() - 0.5);
  return StateVector.fromAmplitudes(re, im);
}

const n = 7;
// Each case: an op and its control and negative-control qubits.
const CASES: [string, UnitaryOp, number[], number[]][] = [
  ['ctrl(2) @ negctrl @ h (general)', gate('h', [3], [], { controls: [0, 5], negControls: [6] }), [0, 5], [6]],
  ['ccx (multi-controlled X)', gate('ccx', [6, 1, 2]), [6, 1], []],
  ['ctrl(3) @ z (multi-controlled Z)', gate('z', [0], [], { controls: [2, 3, 4] }), [2, 3, 4], []],
  ['negctrl @ crz (diagonal)', gate('crz', [1, 4], [0.7], { negControls: [0] }), [1], [0]],
  ['ctrl @ ry^0.5 (general, fractional)', gate('ry', [5], [1.1], { controls: [2], power: 0.5 }), [2], []],
  ['negctrl @ cswap', gate('cswap', [3, 0, 6], [], { negControls: [1] }), [3], [1]],
  ['ctrl @ swap^0.3', gate('swap', [2, 5], [], { controls: [4], power: 0.3 }), [4], []],
  ['ctrl(2) @ gphase', gate('gphase', [], [0.9], { controls: [1, 6] }), [1, 6], []],
  ['ctrl @ y (anti-diagonal)', gate('y', [0], [], { controls: [6] }), [6], []],
];

describe('applyUnitaryOps(state, [controlled op])', () => {
  for (const [label, op, controls, negControls] of CASES) {
    it(`${label}: amplitudes outside the control pattern stay bit-identical, inside they change`, () => {
      const before = randomState(n, 3);
      const after = before.clone();
      applyUnitaryOps(after, [op]);
      let changedInside = 0;
      for (let i = 0; i < 2 ** n; i++) {
        const matches = controls.every((q) => ((i >> q) & 1) === 1) && negControls.every((q) => ((i >> q) & 1) === 0);
        const same = Object.is(before.re[i], after.re[i]) && Object.is(before.im[i], after.im[i]);
        if (!matches) expect(same, `index ${i}`).toBe(true);
        else if (!same) changedInside += 1;
      }
      expect(changedInside).toBeGreaterThan(0);
    });
  }
});

describe('applyCircuit(state, circuit)', () => {
  it('refuses a circuit with a measurement or reset with an InputError', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 1);
    b.bits('c', 1);
    b.add(gate('h', [0])).measure(0, 0);
    expect(() => applyCircuit(StateVector.zero(1), b.build())).toThrow(InputError);
  });

  it('ignores barriers and acts on the low qubits of a wider state', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 1);
    b.add(gate('x', [0]), { kind: 'barrier', qubits: [0] });
    const state = StateVector.zero(2);
    applyCircuit(state, b.build());
    expect([...state.re]).toEqual([0, 1, 0, 0]);
  });
});
