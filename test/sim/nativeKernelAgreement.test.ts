// Native kernels equal their blocks' decompositions (nativeKernelAgreement), a wrong kernel is
// detected, the registry refuses a second kernel under the same id, and kernels passed in the options are used.
import { describe, expect, it } from 'vitest';
import { defineBlock } from '../../src/circuit/defineBlock.js';
import { gate } from '../../src/circuit/ops.js';
import { nativeKernelAgreement } from '../../src/sim/nativeKernelAgreement.js';
import { phaseByValueBlock } from '../../src/sim/phaseByValueBlock.js';
import type { NativeKernelSpec } from '../../src/sim/NativeKernelSpec.js';
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

describe('native kernels passed in SimulationOptions.nativeKernels', () => {
  // s = diag(1, i) (OpenQASM 3 stdgates.inc, common practice): the kernel multiplies the |1> amplitudes by i^power (i^−power inverted).
  const sKernel: NativeKernelSpec = {
    prepare: (c) => (state) => {
      const turns = (((c.inverse ? -c.power : c.power) % 4) + 4) % 4;
      const bit = 1 << c.qubits[0]!;
      const ok = (i: number): boolean => c.controls.every((q) => (i >> q) & 1) && c.negControls.every((q) => !((i >> q) & 1));
      for (let i = 0; i < state.re.length; i++) {
        if (!(i & bit) || !ok(i)) continue;
        for (let t = 0; t < turns; t++) [state.re[i], state.im[i]] = [-state.im[i]!, state.re[i]!];
      }
    },
  };
  const block = defineBlock({ name: 'table_s', role: 'test', qubits: 1, nativeKernel: 'test-table-s' }, [gate('s', [0])]);

  it('are used without registering them, and agree with the decomposition', () => {
    const nativeKernels = new Map([['test-table-s', sKernel]]);
    for (const c of [{}, { controls: 1, inverse: true }, { negControls: 1, power: 3 }]) {
      expect(nativeKernelAgreement(block, { ...c, nativeKernels, seed: 6 })).toBeLessThanOrEqual(1e-15);
    }
    expect(() => nativeKernelAgreement(block)).toThrow(/no registered native kernel/);
  });

  it('take precedence over the registry', () => {
    const forgetful: NativeKernelSpec = { prepare: () => () => undefined };
    const phase = phaseByValueBlock(2);
    expect(nativeKernelAgreement(phase, { args: [0.4], nativeKernels: new Map([['phase-by-value', forgetful]]) })).toBeGreaterThan(0.01);
  });
});
