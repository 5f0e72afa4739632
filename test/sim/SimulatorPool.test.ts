// SimulatorPool: gate passes split over two threads give the same amplitudes bit for bit as one thread on states of
// 2^18 amplitudes (random hierarchical circuits and random gates on all 18 qubits, fused and unfused), small states
// stay on the calling thread, and a closed pool is refused.
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import type { Circuit, UnitaryOp } from '../../src/circuit/types.js';
import { PARALLEL_MIN_AMPLITUDES, createSimulatorPool, type SimulatorPool } from '../../src/sim/SimulatorPool.js';
import { StateVector } from '../../src/sim/StateVector.js';
import { applyCircuit } from '../../src/sim/applyCircuit.js';
import { arbitraryCircuit, arbitraryGateOp } from '../helpers/arbitraryCircuit.js';
import { expectComplexArrayClose } from '../helpers/close.js';

const QUBITS = 18;
let pool: SimulatorPool;

beforeAll(() => {
  pool = createSimulatorPool(2);
});
afterAll(async () => {
  await pool.close();
});

function randomState(n: number, seed: number): StateVector {
  const state = StateVector.zero(n);
  for (let i = 0; i < state.re.length; i++) {
    state.re[i] = Math.sin(seed + 1.3 * i);
    state.im[i] = Math.cos(seed * 0.7 + 2.1 * i);
  }
  return state;
}

function circuitOf(ops: readonly UnitaryOp[]): Circuit {
  const builder = new CircuitBuilder();
  builder.qubits('q', QUBITS);
  return builder.add(...ops).build();
}

function expectSameBits(actual: StateVector, expected: StateVector): void {
  expect(Buffer.compare(Buffer.from(actual.re.buffer, actual.re.byteOffset, actual.re.byteLength), Buffer.from(expected.re.buffer, expected.re.byteOffset, expected.re.byteLength))).toBe(0);
  expect(Buffer.compare(Buffer.from(actual.im.buffer, actual.im.byteOffset, actual.im.byteLength), Buffer.from(expected.im.buffer, expected.im.byteOffset, expected.im.byteLength))).toBe(0);
}

describe('applyCircuit with a SimulatorPool', () => {
  it('holds states of PARALLEL_MIN_AMPLITUDES amplitudes in SharedArrayBuffers', () => {
    expect(2 ** QUBITS).toBe(PARALLEL_MIN_AMPLITUDES);
    const state = StateVector.zero(QUBITS);
    expect(state.re.buffer).toBeInstanceOf(SharedArrayBuffer);
    expect(state.im.buffer).toBeInstanceOf(SharedArrayBuffer);
    expect(StateVector.zero(10).re.buffer).toBeInstanceOf(ArrayBuffer);
  });

  it('gives the single-thread amplitudes bit for bit on random gates over all qubits, fused or not', () => {
    fc.assert(
      fc.property(fc.array(arbitraryGateOp(QUBITS, 0), { minLength: 1, maxLength: 12 }), fc.boolean(), (ops, fuse) => {
        const circuit = circuitOf(ops);
        const split = randomState(QUBITS, 3);
        const single = randomState(QUBITS, 3);
        applyCircuit(split, circuit, { pool, fuse });
        applyCircuit(single, circuit, { fuse });
        expectSameBits(split, single);
      }),
      { numRuns: 6, seed: 31 },
    );
  });

  it('gives the single-thread amplitudes bit for bit on random hierarchical circuits, and the unfused ones to 1e-12', () => {
    fc.assert(
      fc.property(arbitraryCircuit({ maxQubits: 7, blocks: 3, maxOps: 8 }), (circuit) => {
        const split = randomState(QUBITS, 4);
        const single = randomState(QUBITS, 4);
        const plain = randomState(QUBITS, 4);
        applyCircuit(split, circuit, { pool });
        applyCircuit(single, circuit, {});
        applyCircuit(plain, circuit, { fuse: false });
        expectSameBits(split, single);
        expectComplexArrayClose(split, plain, 1e-12, 'amplitudes');
      }),
      { numRuns: 5, seed: 32 },
    );
  });

  it('is refused after close, and createSimulatorPool refuses fewer than two threads', async () => {
    const own = createSimulatorPool(2);
    await own.close();
    expect(own.workers.closed).toBe(true);
    expect(() => applyCircuit(StateVector.zero(QUBITS), circuitOf([]), { pool: own })).toThrow(/closed/);
    expect(() => createSimulatorPool(1)).toThrow(RangeError);
  });
});
