// compileProgram (through applyCircuit): a compiled, cached program gives the same amplitudes as the streamed path
// (flatten + one gate at a time) on random hierarchical circuits, with native kernels on and off, on repeated runs,
// and for controlled, inverted and powered calls of conjugated blocks that hold native-kernel blocks.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fourierConstantAdder } from '../../../src/arithmetic/fourierConstantAdder.js';
import { multiplexedRotation } from '../../../src/blocks/multiplexedRotation.js';
import { CircuitBuilder, qubitCount } from '../../../src/circuit/CircuitBuilder.js';
import { defineBlock, defineConjugatedBlock } from '../../../src/circuit/defineBlock.js';
import { call, gate } from '../../../src/circuit/ops.js';
import type { Circuit } from '../../../src/circuit/types.js';
import { StateVector } from '../../../src/sim/StateVector.js';
import { applyCircuit } from '../../../src/sim/applyCircuit.js';
import { applyUnitaryStream } from '../../../src/sim/internal/applyFlatOps.js';
import { flattenForSimulation } from '../../../src/sim/internal/flattenForSimulation.js';
import { arbitraryCircuit } from '../../helpers/arbitraryCircuit.js';
import { expectComplexArrayClose } from '../../helpers/close.js';

function randomState(n: number, seed: number): StateVector {
  const re = Array.from({ length: 2 ** n }, (_, i) => Math.sin(seed + 1.3 * i));
  const im = Array.from({ length: 2 ** n }, (_, i) => Math.cos(seed * 0.7 + 2.1 * i));
  return StateVector.fromAmplitudes(re, im);
}

function bothWays(circuit: Circuit, useNativeKernels: boolean, seed = 1): [StateVector, StateVector] {
  const n = qubitCount(circuit);
  const compiled = randomState(n, seed);
  const streamed = randomState(n, seed);
  applyCircuit(compiled, circuit, { useNativeKernels });
  applyUnitaryStream(streamed, flattenForSimulation(circuit, { useNativeKernels }), 'test');
  return [compiled, streamed];
}

describe('applyCircuit (compiled program) against the streamed gate-by-gate path', () => {
  it('agrees to 1e-12 on random hierarchical circuits (nested plain and conjugated blocks, modifiers)', () => {
    fc.assert(
      fc.property(arbitraryCircuit({ maxQubits: 5, blocks: 3, maxOps: 6 }), fc.boolean(), (circuit, useNativeKernels) => {
        const [compiled, streamed] = bothWays(circuit, useNativeKernels);
        expectComplexArrayClose(compiled, streamed, 1e-12, 'amplitudes');
      }),
      { numRuns: 60, seed: 11 },
    );
  });

  it('gives the same amplitudes when the cached program is replayed', () => {
    fc.assert(
      fc.property(arbitraryCircuit({ maxQubits: 4, blocks: 2, maxOps: 4 }), (circuit) => {
        const [first] = bothWays(circuit, true, 2);
        const [second] = bothWays(circuit, true, 2);
        expect(Array.from(second.re)).toEqual(Array.from(first.re));
        expect(Array.from(second.im)).toEqual(Array.from(first.im));
      }),
      { numRuns: 20, seed: 12 },
    );
  });

  it('agrees on controlled, inverted and powered calls of conjugated blocks holding native-kernel blocks', () => {
    const adder = fourierConstantAdder(3, 1);
    const inner = defineConjugatedBlock(
      { name: 'adder_then_mux', role: 'test', qubits: 5, params: ['t'] },
      [gate('h', [3]), call(adder, [0, 1, 2, 3], [3, -2])],
      [multiplexedRotation('y', [0.1, 0.7, -0.4, 1.1], [0, 1], 4), gate('rz', [4], [{ op: 'mul', left: 2, right: { op: 'param', index: 0 } }])],
    );
    const outer = defineBlock({ name: 'outer', role: 'test', qubits: 6 }, [
      call(inner, [0, 1, 2, 3, 4], [0.3], { controls: [5], power: 3 }),
      call(inner, [4, 3, 2, 1, 0], [-0.8], { negControls: [5], inverse: true }),
    ]);
    for (const [power, inverse] of [[1, false], [2, true], [-3, false]] as const) {
      const circuit = new CircuitBuilder();
      circuit.qubits('q', 7);
      circuit.add(call(outer, [1, 2, 3, 4, 5, 6], [], { controls: [0], power, inverse }));
      for (const useNativeKernels of [true, false]) {
        const [compiled, streamed] = bothWays(circuit.build(), useNativeKernels, 3);
        expectComplexArrayClose(compiled, streamed, 1e-12, `power ${power}, inverse ${inverse}, native ${useNativeKernels}`);
      }
    }
  });
});
