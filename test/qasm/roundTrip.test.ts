// Round trip IR → writeQasm → parseQasm on random hierarchical circuits: same state (≤ 1e-12), same
// gate counts, byte-identical rewriting, and non-unitary operations preserved in order.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { countsToObject, gateCounts } from '../../src/circuit/gateCounts.js';
import type { Circuit } from '../../src/circuit/types.js';
import { parseQasm } from '../../src/qasm/parseQasm.js';
import { writeQasm } from '../../src/qasm/writeQasm.js';
import { simulateState } from '../../src/sim/simulateState.js';
import { arbitraryCircuit } from '../helpers/arbitraryCircuit.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { blocksCircuit, conjugatedCircuit } from './goldenCircuits.js';

function readBack(circuit: Circuit): Circuit {
  return parseQasm(writeQasm(circuit), 'round-trip.qasm');
}

function expectSameStateAndCounts(original: Circuit, back: Circuit): void {
  expect(countsToObject(gateCounts(back))).toEqual(countsToObject(gateCounts(original)));
  expectComplexArrayClose(simulateState(back), simulateState(original), 1e-12, 'amplitude');
}

const nonUnitary = (c: Circuit): unknown[] => c.ops.filter((op) => op.kind !== 'gate' && op.kind !== 'call');

describe('parseQasm(writeQasm(circuit))', () => {
  it('gives the same state and gate counts for 200 random hierarchical circuits on ≤ 6 qubits', () => {
    fc.assert(
      fc.property(arbitraryCircuit({ maxQubits: 6 }), (circuit) => {
        const text = writeQasm(circuit);
        expect(writeQasm(circuit)).toBe(text);
        expectSameStateAndCounts(circuit, parseQasm(text, 'round-trip.qasm'));
      }),
      { numRuns: 200 },
    );
  });

  it('gives the same state and gate counts for the hand-built block and conjugated-block circuits', () => {
    expectSameStateAndCounts(blocksCircuit(), readBack(blocksCircuit()));
    expectSameStateAndCounts(conjugatedCircuit(), readBack(conjugatedCircuit()));
  });

  it('keeps registers and the measure / reset / barrier operations in order', () => {
    fc.assert(
      fc.property(arbitraryCircuit({ maxQubits: 4, blocks: 2, measurements: true }), (circuit) => {
        const back = readBack(circuit);
        expect(back.qubitRegisters.map((r) => [r.size, r.offset])).toEqual(circuit.qubitRegisters.map((r) => [r.size, r.offset]));
        expect(back.bitRegisters).toEqual(circuit.bitRegisters);
        expect(nonUnitary(back)).toEqual(nonUnitary(circuit));
      }),
      { numRuns: 100 },
    );
  });

  it('reaches a fixpoint after one pass: writing what was read back reproduces the text', () => {
    fc.assert(
      fc.property(arbitraryCircuit({ maxQubits: 5, measurements: true }), (circuit) => {
        const once = writeQasm(readBack(circuit));
        expect(writeQasm(parseQasm(once, 'fixpoint.qasm'))).toBe(once);
      }),
      { numRuns: 100 },
    );
  });
});
