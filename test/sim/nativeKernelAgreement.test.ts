// Native kernels equal their blocks' decompositions (nativeKernelAgreement), a wrong kernel is
// detected, and the registry refuses a second kernel under the same id.
import { describe, expect, it } from 'vitest';
import { defineBlock } from '../../src/circuit/defineBlock.js';
import { gate } from '../../src/circuit/ops.js';
import { nativeKernelAgreement } from '../../src/sim/nativeKernelAgreement.js';
import { phaseByValueBlock } from '../../src/sim/phaseByValueBlock.js';
import { registerNativeKernel } from '../../src/sim/registerNativeKernel.js';

describe('nativeKernelAgreement(block, options) for the phase-by-value kernel', () => {
  const cases = [
    { width: 1, controls: 0, negControls: 0, inverse: false, power: 1 },
    { width: 3, controls: 1, negControls: 0, inverse: false, power: 1 },
    { width: 3, controls: 0, negControls: 1, inverse: true, power: 1 },
    { width: 2, controls: 2, negControls: 1, inverse: false, power: 3 },
    { width: 4, controls: 1, negControls: 1, inverse: true, power: -2 },
  ];
  for (const c of cases) {
    it(`agrees to 1e-13 for width ${c.width}, ${c.controls} ctrl, ${c.negControls} negctrl, inverse ${c.inverse}, power ${c.power}`, () => {
      for (const seed of [1, 2, 3]) {
        expect(nativeKernelAgreement(phaseByValueBlock(c.width), { ...c, args: [0.37 * seed], spectators: 2, seed })).toBeLessThanOrEqual(1e-13);
      }
    });
  }
});

describe('nativeKernelAgreement(block) on a wrong kernel', () => {
  it('reports the disagreement', () => {
    // A kernel that forgets the block's s gate: it does nothing.
    registerNativeKernel('test-forgets-s', () => undefined);
    const block = defineBlock({ name: 'just_s', role: 'test', qubits: 1, nativeKernel: 'test-forgets-s' }, [gate('s', [0])]);
    expect(nativeKernelAgreement(block, { seed: 4 })).toBeGreaterThan(0.01);
  });

  it('refuses a block without a registered kernel and a duplicate registration', () => {
    const plain = defineBlock({ name: 'plain_s', role: 'test', qubits: 1 }, [gate('s', [0])]);
    expect(() => nativeKernelAgreement(plain)).toThrow(/no registered native kernel/);
    expect(() => registerNativeKernel('phase-by-value', () => undefined)).toThrow(/already registered/);
  });
});
