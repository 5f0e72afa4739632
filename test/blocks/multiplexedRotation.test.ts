import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { uniformlyControlledRotation } from '../../src/blocks/uniformlyControlledRotation.js';
import { multiplexedRotation } from '../../src/blocks/multiplexedRotation.js';
import { circuitMatrix } from '../../src/sim/circuitMatrix.js';
import { nativeKernelAgreement } from '../../src/sim/nativeKernelAgreement.js';
import { expectComplexArrayClose } from '../helpers/close.js';

const circuit = (qubits: number, ops: Parameters<typeof circuitMatrix>[0]['ops']) => ({ qubitRegisters: [{ name: 'q', size: qubits, offset: 0 }], bitRegisters: [], ops });

describe('multiplexedRotation(axis, alphas, selector, target)', () => {
  it('is the unitary of uniformlyControlledRotation with the same angles, with and without native kernels', () => {
    fc.assert(
      fc.property(fc.constantFrom('y' as const, 'z' as const), fc.integer({ min: 0, max: 3 }).chain((k) => fc.array(fc.double({ min: -7, max: 7, noNaN: true }), { minLength: 2 ** k, maxLength: 2 ** k })), (axis, alphas) => {
        const k = Math.log2(alphas.length);
        const selector = Array.from({ length: k }, (_, b) => (b + 1) % (k + 1));
        const reference = circuitMatrix(circuit(k + 1, uniformlyControlledRotation(axis, alphas, selector, 0)), { useNativeKernels: false });
        for (const useNativeKernels of [false, true]) {
          const matrix = circuitMatrix(circuit(k + 1, [multiplexedRotation(axis, alphas, selector, 0)]), { useNativeKernels });
          expectComplexArrayClose(matrix, reference, 1e-12);
        }
      }),
      { numRuns: 30 },
    );
  });

  it('its native kernel equals its decomposition under controls, inverse and powers', () => {
    for (const axis of ['y', 'z'] as const) {
      for (let k = 0; k <= 4; k++) {
        const op = multiplexedRotation(axis, Array.from({ length: 2 ** k }, (_, h) => 0.4 * h - 1.1), Array.from({ length: k }, (_, b) => b), k);
        for (const options of [{}, { controls: 1 }, { negControls: 2, inverse: true }, { power: 3 }, { power: -2, controls: 1 }]) {
          expect(nativeKernelAgreement(op.block, { args: op.args as number[], spectators: 1, ...options })).toBeLessThan(1e-12);
        }
      }
    }
  });
});
