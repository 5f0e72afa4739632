// fuseSteps (through applyCircuit's fuse option): fused programs give the amplitudes of unfused ones to 1e-12 on
// random hierarchical circuits (nested plain and conjugated blocks, controlled, inverted and powered calls, native
// kernels on and off), on small states and on states large enough for the memory-weighted cost model and tiling, and
// runs of gates really become 2×2, 4×4, diagonal and tiled passes; the uncompiled reference path (compile: false) agrees.
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
import { compileCircuit, compileTarget } from '../../../src/sim/internal/compileProgram.js';
import { DENSE, DIAGONAL_TABLE, STRIDE, TILE } from '../../../src/sim/internal/Program.js';
import { TILE_BITS } from '../../../src/sim/internal/tileSteps.js';
import { arbitraryCircuit, arbitraryGateOp } from '../../helpers/arbitraryCircuit.js';
import { expectComplexArrayClose } from '../../helpers/close.js';

function randomState(n: number, seed: number): StateVector {
  const re = Array.from({ length: 2 ** n }, (_, i) => Math.sin(seed + 1.3 * i));
  const im = Array.from({ length: 2 ** n }, (_, i) => Math.cos(seed * 0.7 + 2.1 * i));
  return StateVector.fromAmplitudes(re, im);
}

function fusedAndPlain(circuit: Circuit, useNativeKernels: boolean, qubits = qubitCount(circuit)): [StateVector, StateVector] {
  const fused = randomState(qubits, 5);
  const plain = randomState(qubits, 5);
  applyCircuit(fused, circuit, { useNativeKernels, fuse: true });
  applyCircuit(plain, circuit, { useNativeKernels, fuse: false });
  // The uncompiled reference path (flat gates resolved one by one) must give the same amplitudes too.
  const streamed = randomState(qubits, 5);
  applyCircuit(streamed, circuit, { useNativeKernels, compile: false });
  expectComplexArrayClose(streamed, plain, 1e-12, 'streamed against compiled unfused amplitudes');
  return [fused, plain];
}

function circuitOf(n: number, ops: Parameters<CircuitBuilder['add']>): Circuit {
  const builder = new CircuitBuilder();
  builder.qubits('q', n);
  return builder.add(...ops).build();
}

describe('fused programs against unfused ones', () => {
  it('agree to 1e-12 on random hierarchical circuits', () => {
    fc.assert(
      fc.property(arbitraryCircuit({ maxQubits: 7, blocks: 3, maxOps: 10 }), fc.boolean(), (circuit, useNativeKernels) => {
        const [fused, plain] = fusedAndPlain(circuit, useNativeKernels);
        expectComplexArrayClose(fused, plain, 1e-12, 'amplitudes');
      }),
      { numRuns: 80, seed: 21 },
    );
  });

  it('agree to 1e-12 on long random gate runs on a 16-qubit state (large-state cost model)', () => {
    fc.assert(
      fc.property(fc.array(arbitraryGateOp(4, 0), { minLength: 8, maxLength: 30 }), fc.integer({ min: 0, max: 12 }), (ops, shift) => {
        const moved = ops.map((op) => ({ ...op, qubits: op.qubits.map((q) => q + shift), controls: op.controls.map((q) => q + shift), negControls: op.negControls.map((q) => q + shift) }));
        const [fused, plain] = fusedAndPlain(circuitOf(16, moved), true);
        expectComplexArrayClose(fused, plain, 1e-12, 'amplitudes');
      }),
      { numRuns: 12, seed: 22 },
    );
  });

  it('agree on controlled, inverted and powered calls of compute/action/uncompute blocks holding native-kernel blocks', () => {
    const adder = fourierConstantAdder(3, 1);
    const inner = defineConjugatedBlock(
      { name: 'adder_then_mux', role: 'test', qubits: 5, params: ['t'] },
      [gate('h', [3]), gate('cx', [3, 4]), call(adder, [0, 1, 2, 3], [3, -2]), gate('t', [0])],
      [multiplexedRotation('y', [0.1, 0.7, -0.4, 1.1], [0, 1], 4), gate('rz', [4], [{ op: 'mul', left: 2, right: { op: 'param', index: 0 } }]), gate('h', [2])],
    );
    const outer = defineBlock({ name: 'outer', role: 'test', qubits: 6 }, [
      call(inner, [0, 1, 2, 3, 4], [0.3], { controls: [5], power: 3 }),
      gate('rx', [5], [0.4]),
      call(inner, [4, 3, 2, 1, 0], [-0.8], { negControls: [5], inverse: true }),
    ]);
    for (const [power, inverse] of [[1, false], [2, true], [-3, false]] as const) {
      const circuit = circuitOf(7, [call(outer, [1, 2, 3, 4, 5, 6], [], { controls: [0], power, inverse })]);
      for (const useNativeKernels of [true, false]) {
        const [fused, plain] = fusedAndPlain(circuit, useNativeKernels);
        expectComplexArrayClose(fused, plain, 1e-12, `power ${power}, inverse ${inverse}, native ${useNativeKernels}`);
      }
    }
  });

  it('turns a run on one qubit into one 2×2 pass, on two qubits into one 4×4 pass, of phases into one diagonal pass', () => {
    const single = circuitOf(4, [gate('h', [2]), gate('rz', [2], [0.3]), gate('h', [2]), gate('ry', [2], [0.1])]);
    expect(compileCircuit(single, compileTarget(4, {}), 'test').steps.map((s) => s.code)).toEqual([STRIDE]);
    const run = circuitOf(4, [gate('h', [0]), gate('cx', [0, 1]), gate('ry', [1], [0.3]), gate('cz', [1, 0]), gate('h', [1])]);
    const dense = compileCircuit(run, compileTarget(4, {}), 'test');
    expect(dense.steps.map((s) => s.code)).toEqual([DENSE]);
    const phases = circuitOf(12, [gate('rz', [0], [0.1]), gate('cp', [3, 7], [0.2]), gate('t', [11]), gate('z', [5]), gate('crz', [2, 9], [0.3])]);
    const diagonal = compileCircuit(phases, compileTarget(12, {}), 'test');
    expect(diagonal.steps.map((s) => s.code)).toEqual([DIAGONAL_TABLE]);
    const unfused = compileCircuit(phases, compileTarget(12, { fuse: false }), 'test');
    expect(unfused.steps.length).toBe(5);
  });

  it('groups runs on bits below TILE_BITS into one tiled pass on states larger than a tile, with the same amplitudes', () => {
    const n = TILE_BITS + 2;
    const low = circuitOf(n, [gate('h', [0]), gate('cx', [0, 5]), gate('ry', [7], [0.3]), gate('h', [TILE_BITS - 1]), gate('cp', [3, 9], [0.4])]);
    const steps = compileCircuit(low, compileTarget(n, {}), 'test').steps;
    expect(steps.map((s) => s.code)).toEqual([TILE]);
    const high = circuitOf(n, [gate('h', [0]), gate('h', [3]), gate('h', [6]), gate('h', [n - 1]), gate('rx', [2], [0.2]), gate('h', [5]), gate('cx', [7, 8])]);
    const split = compileCircuit(high, compileTarget(n, {}), 'test').steps;
    expect(split.map((s) => s.code)).toContain(TILE);
    // The step on the top qubit stays outside every tile.
    expect(split.filter((s) => s.code === TILE).every((s) => s.program!.steps.every((sub) => !sub.targets.includes(n - 1)))).toBe(true);
    for (const circuit of [low, high]) {
      const [fused, plain] = fusedAndPlain(circuit, true);
      expectComplexArrayClose(fused, plain, 1e-12, 'amplitudes');
    }
  });

  it('keeps controls shared by a whole run as controls (the pass visits only the controlled half)', () => {
    const run = circuitOf(6, [gate('ch', [5, 0]), gate('crx', [5, 1], [0.2]), gate('cswap', [5, 0, 1]), gate('cry', [5, 1], [0.7])]);
    const [step] = compileCircuit(run, compileTarget(6, {}), 'test').steps;
    expect(step?.code).toBe(DENSE);
    expect(Array.from(step!.targets)).toEqual([0, 1]);
    expect(step!.pattern!.outer * step!.pattern!.run).toBe(2 ** (6 - 3));
    const [fused, plain] = fusedAndPlain(run, true);
    expectComplexArrayClose(fused, plain, 1e-12, 'amplitudes');
  });
});
