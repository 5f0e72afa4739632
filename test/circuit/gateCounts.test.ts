import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { call, gate } from '../../src/circuit/ops.js';
import { defineBlock, defineConjugatedBlock } from '../../src/circuit/defineBlock.js';
import { blockCounts, blockGateTotal, countsToObject, gateCounts, totalGates } from '../../src/circuit/gateCounts.js';
import { arbitraryBlockPool } from '../helpers/arbitraryCircuit.js';
import { depthBound } from '../../src/circuit/depthBound.js';
import { flatten } from '../../src/circuit/flatten.js';

function thousandGateBlock() {
  const ops = [];
  for (let k = 0; k < 1000; k++) ops.push(k % 2 === 0 ? gate('h', [k % 3]) : gate('cx', [k % 3, (k + 1) % 3]));
  return defineBlock({ name: 'layer', role: 'test layer', qubits: 3 }, ops);
}

describe('gateCounts(circuit)', () => {
  it('counts a 1,000-gate block repeated 1,000,000 times exactly (arithmetically, never flattening)', () => {
    const b = new CircuitBuilder();
    const q = b.qubits('q', 3);
    b.add(call(thousandGateBlock(), q, [], { power: 1_000_000 }));
    const circuit = b.build();
    const counts = gateCounts(circuit);
    expect(countsToObject(counts)).toEqual({ cx: 500_000_000, h: 500_000_000 });
    expect(totalGates(counts)).toBe(1_000_000_000);
  });

  it('adds controls to every gate of a plain block and only to the action of a conjugated one', () => {
    const inner = defineBlock({ name: 'inner', role: 't', qubits: 2 }, [gate('t', [0]), gate('cx', [0, 1])]);
    const conj = defineConjugatedBlock(
      { name: 'conj', role: 't', qubits: 2 },
      [gate('h', [0]), gate('s', [1])],
      [gate('z', [0]), call(inner, [0, 1])],
    );
    const b = new CircuitBuilder();
    const q = b.qubits('q', 3);
    b.add(call(conj, [q[1]!, q[2]!], [], { controls: [q[0]!], power: 3 }));
    expect(countsToObject(gateCounts(b.build()))).toEqual({
      h: 2,
      s: 1,
      'inv @ s': 1,
      'ctrl @ z': 3,
      'ctrl @ t': 3,
      'ctrl @ cx': 3,
    });
  });

  it('agrees with counting the flattened stream on nested calls with inverse and negative powers', () => {
    const leaf = defineBlock({ name: 'leaf', role: 't', qubits: 1 }, [gate('t', [0]), gate('rx', [0], [0.3])]);
    const mid = defineBlock({ name: 'mid', role: 't', qubits: 2 }, [call(leaf, [1], [], { power: -2 }), gate('cz', [0, 1])]);
    const top = defineConjugatedBlock({ name: 'top', role: 't', qubits: 3 }, [call(mid, [0, 1])], [call(mid, [1, 2], [], { inverse: true })]);
    const b = new CircuitBuilder();
    const q = b.qubits('q', 4);
    b.add(call(top, [q[0]!, q[1]!, q[2]!], [], { negControls: [q[3]!], power: 2 }));
    const circuit = b.build();
    let streamed = 0;
    for (const op of flatten(circuit)) if (op.kind === 'gate') streamed++;
    expect(totalGates(gateCounts(circuit))).toBe(streamed);
    // compute = mid (leaf⁻² then cz), uncompute = mid†, action = mid† repeated twice under the negctrl.
    expect(countsToObject(blockCounts(top, 0, 1, false, 2))).toEqual({
      cz: 2,
      'inv @ rx': 2,
      'inv @ t': 2,
      rx: 2,
      t: 2,
      'negctrl @ cz': 2,
      'negctrl @ rx': 4,
      'negctrl @ t': 4,
    });
  });
});

describe('depthBound(circuit)', () => {
  it('is the layered depth of a flat circuit', () => {
    const b = new CircuitBuilder();
    const q = b.qubits('q', 3);
    b.add(gate('h', [q[0]!]), gate('h', [q[1]!]), gate('cx', [q[0]!, q[1]!]), gate('x', [q[2]!]));
    expect(depthBound(b.build())).toBe(2);
  });

  it('bounds a repeated block by repeats times its depth, without flattening', () => {
    const b = new CircuitBuilder();
    const q = b.qubits('q', 3);
    const layer = thousandGateBlock();
    b.add(call(layer, q, [], { power: 1_000_000 }));
    const depth = depthBound(b.build());
    expect(depth).toBeGreaterThanOrEqual(1_000_000);
    expect(depth).toBeLessThanOrEqual(1_000_000_000);
  });

  it('serialises a controlled block on its control qubit', () => {
    const par = defineBlock({ name: 'par', role: 't', qubits: 2 }, [gate('h', [0]), gate('h', [1])]);
    const b = new CircuitBuilder();
    const q = b.qubits('q', 3);
    b.add(call(par, [q[1]!, q[2]!]));
    b.add(call(par, [q[1]!, q[2]!], [], { controls: [q[0]!] }));
    expect(depthBound(b.build())).toBe(3);
  });
});

describe('flatten(circuit)', () => {
  it('streams lazily: the first gate of a 10^9-gate circuit arrives at once', () => {
    const b = new CircuitBuilder();
    const q = b.qubits('q', 3);
    b.add(call(thousandGateBlock(), q, [], { power: 1_000_000 }));
    const stream = flatten(b.build());
    const first = stream.next();
    expect(first.done).toBe(false);
    expect(first.value).toMatchObject({ kind: 'gate', name: 'h', qubits: [0] });
  });

  it('expands an inverted call in reverse order with inverted gates', () => {
    const blk = defineBlock({ name: 'pair', role: 't', qubits: 1 }, [gate('s', [0]), gate('h', [0])]);
    const b = new CircuitBuilder();
    const q = b.qubits('q', 1);
    b.add(call(blk, q, [], { inverse: true }));
    const ops = [...flatten(b.build())];
    expect(ops.map((o) => (o.kind === 'gate' ? [o.name, o.inverse] : null))).toEqual([
      ['h', true],
      ['s', true],
    ]);
  });

  it('keeps a block whole when asked', () => {
    const blk = defineBlock({ name: 'kept', role: 't', qubits: 1, nativeKernel: 'demo' }, [gate('x', [0])]);
    const b = new CircuitBuilder();
    const q = b.qubits('q', 2);
    b.add(call(blk, [q[1]!], [], { controls: [q[0]!], power: -3 }));
    const ops = [...flatten(b.build(), { keepWhole: (x) => x.nativeKernel === 'demo' })];
    expect(ops).toHaveLength(1);
    expect(ops[0]).toMatchObject({ kind: 'native', qubits: [1], controls: [0], inverse: true, power: 3 });
  });
});

describe('defineBlock(options, ops)', () => {
  it('rejects operands out of range, repeated operands and standard-gate names', () => {
    expect(() => defineBlock({ name: 'bad', role: '', qubits: 1 }, [gate('cx', [0, 1])])).toThrow(RangeError);
    expect(() => defineBlock({ name: 'bad', role: '', qubits: 2 }, [gate('cx', [1, 1])])).toThrow(RangeError);
    expect(() => defineBlock({ name: 'cx', role: '', qubits: 2 }, [])).toThrow(RangeError);
    expect(() => defineBlock({ name: 'ok', role: '', qubits: 1 }, [gate('rx', [0])])).toThrow(/parameters/);
  });
});

describe('blockGateTotal(block)', () => {
  it('equals the sum of blockCounts over every kind for random block hierarchies', () => {
    fc.assert(
      fc.property(arbitraryBlockPool(4, 4), (pool) => {
        for (const block of pool) expect(blockGateTotal(block)).toBe(totalGates(blockCounts(block)));
      }),
      { numRuns: 100 },
    );
  });
});
