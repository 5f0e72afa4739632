// expectationOfBlock(state, block, qubits, args): <ψ|U|ψ> against hand-computed values.
import { describe, expect, it } from 'vitest';
import { param } from '../../src/circuit/angle.js';
import { defineBlock } from '../../src/circuit/defineBlock.js';
import { gate } from '../../src/circuit/ops.js';
import { StateVector } from '../../src/sim/StateVector.js';
import { applyUnitaryOps } from '../../src/sim/applyUnitaryOps.js';
import { expectationOfBlock } from '../../src/sim/expectationOfBlock.js';
import { phaseByValueBlock } from '../../src/sim/phaseByValueBlock.js';
import { expectClose } from '../helpers/close.js';

describe('expectationOfBlock(state, block, qubits, args)', () => {
  it('<ψ|Z|ψ> = cos θ for ψ = ry(θ)|0> on qubit 1 of two, and the state is left unchanged', () => {
    // ry(θ)|0> = cos(θ/2)|0> + sin(θ/2)|1>, so <Z> = cos²(θ/2) − sin²(θ/2) = cos θ (textbook identity).
    const state = StateVector.zero(2);
    applyUnitaryOps(state, [gate('ry', [1], [0.8])]);
    const before = [...state.re];
    const zBlock = defineBlock({ name: 'zb', role: 'test Z', qubits: 1 }, [gate('z', [0])]);
    const value = expectationOfBlock(state, zBlock, [1]);
    expectClose(value.re, Math.cos(0.8), 1e-15, 're');
    expectClose(value.im, 0, 1e-15, 'im');
    expect([...state.re]).toEqual(before);
  });

  it('<++|e^{iθx}|++> = (1 + e^{iθ} + e^{2iθ} + e^{3iθ})/4 for the phase-by-value block with its parameter', () => {
    const state = StateVector.zero(2);
    applyUnitaryOps(state, [gate('h', [0]), gate('h', [1])]);
    const theta = 0.6;
    const value = expectationOfBlock(state, phaseByValueBlock(2), [0, 1], [theta]);
    const expected = [0, 1, 2, 3].reduce((s, x) => [s[0]! + Math.cos(theta * x) / 4, s[1]! + Math.sin(theta * x) / 4], [0, 0]);
    expectClose(value.re, expected[0]!, 1e-15, 're');
    expectClose(value.im, expected[1]!, 1e-15, 'im');
  });

  it('uses the block arguments: <0|rx(φ)|0> = cos(φ/2)', () => {
    // rx(φ) = [[cos φ/2, −i sin φ/2], …] (OpenQASM 3.0 stdgates.inc, from memory).
    const block = defineBlock({ name: 'rot', role: 'test rx', qubits: 1, params: ['phi'] }, [gate('rx', [0], [param(0)])]);
    const value = expectationOfBlock(StateVector.zero(1), block, [0], [1.4]);
    expectClose(value.re, Math.cos(0.7), 1e-15, 're');
    expectClose(value.im, 0, 1e-15, 'im');
  });
});
