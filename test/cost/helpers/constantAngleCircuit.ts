// fast-check arbitrary for hierarchical circuits whose gate angles are all numbers (so the angle class a hierarchical
// count sees equals the one a flattened count sees): standard gates with random modifiers, nested plain and conjugated
// blocks, calls with controls, inversion and integer powers.
import fc from 'fast-check';
import { CircuitBuilder } from '../../../src/circuit/CircuitBuilder.js';
import { defineBlock, defineConjugatedBlock } from '../../../src/circuit/defineBlock.js';
import { call, gate } from '../../../src/circuit/ops.js';
import { STANDARD_GATES } from '../../../src/circuit/standardGates.js';
import type { Block, Circuit, UnitaryOp } from '../../../src/circuit/types.js';

const ANGLES = [0, Math.PI, Math.PI / 2, -Math.PI / 4, 0.3, 2 * Math.PI, 1.1];
const GATE_POWERS = [1, 1, 1, 2, -1, 0.5, 3];
const CALL_POWERS = [1, 1, -1, 2, 3, 0];
const range = (n: number): number[] => Array.from({ length: n }, (_, k) => k);

function placement(n: number, arity: number): fc.Arbitrary<{ controls: number[]; negControls: number[]; qubits: number[] }> {
  return fc.integer({ min: 0, max: Math.min(3, n - arity) }).chain((extra) =>
    fc.tuple(fc.integer({ min: 0, max: extra }), fc.shuffledSubarray(range(n), { minLength: arity + extra, maxLength: arity + extra }))
      .map(([k, list]) => ({ controls: list.slice(0, k), negControls: list.slice(k, extra), qubits: list.slice(extra) })),
  );
}

function gateOp(n: number): fc.Arbitrary<UnitaryOp> {
  const gates = STANDARD_GATES.filter((g) => g.qubits <= n && g.qubits > 0);
  return fc.constantFrom(...gates).chain((g) =>
    fc.tuple(placement(n, g.qubits), fc.array(fc.constantFrom(...ANGLES), { minLength: g.params, maxLength: g.params }), fc.boolean(), fc.constantFrom(...GATE_POWERS))
      .map(([where, params, inverse, power]) => gate(g.name, where.qubits, params, { ...where, inverse, power })),
  );
}

function callOp(n: number, blocks: readonly Block[]): fc.Arbitrary<UnitaryOp> {
  return fc.constantFrom(...blocks.filter((b) => b.qubits <= n)).chain((block) =>
    fc.tuple(placement(n, block.qubits), fc.boolean(), fc.constantFrom(...CALL_POWERS))
      .map(([where, inverse, power]) => call(block, where.qubits, [], { ...where, inverse, power })),
  );
}

function op(n: number, blocks: readonly Block[]): fc.Arbitrary<UnitaryOp> {
  return blocks.some((b) => b.qubits <= n) ? fc.oneof(gateOp(n), callOp(n, blocks)) : gateOp(n);
}

/** A SELECT-shaped block: PREPARE on an index qubit pair, then items under every index pattern. */
export function selectBlock(items: number): Block {
  const index = [2, 3];
  const action: UnitaryOp[] = [];
  for (let k = 0; k < items; k++) {
    const controls = index.filter((_, b) => (k >> b) & 1);
    const negControls = index.filter((_, b) => !((k >> b) & 1));
    action.push(gate('x', [k % 2], [], { controls, negControls }), gate('gphase', [], [k % 2 ? Math.PI : 0.4], { controls, negControls }));
  }
  return defineConjugatedBlock({ name: 'select_test', role: 'test SELECT', qubits: 4 }, [gate('h', [2]), gate('ry', [3], [0.7])], action);
}

function blockPool(count: number, maxQubits: number): fc.Arbitrary<Block[]> {
  let pool: fc.Arbitrary<Block[]> = fc.constant([selectBlock(4)]);
  for (let k = 0; k < count; k++) {
    pool = pool.chain((blocks) =>
      fc.record({ qubits: fc.integer({ min: 1, max: maxQubits }), conjugated: fc.boolean(), seed: fc.nat() }).chain(({ qubits, conjugated }) => {
        const ops = fc.array(op(qubits, blocks), { maxLength: 4 });
        const options = { name: `b${blocks.length}`, role: 'random block', qubits };
        const block = conjugated
          ? fc.tuple(ops, ops).map(([compute, action]) => defineConjugatedBlock(options, compute, action))
          : ops.map((body) => defineBlock(options, body));
        return block.map((b) => [...blocks, b]);
      }),
    );
  }
  return pool;
}

/** A random unitary circuit on 5 or 6 qubits over a pool of blocks (one of them SELECT-shaped). */
export function constantAngleCircuit(): fc.Arbitrary<Circuit> {
  return fc.integer({ min: 5, max: 6 }).chain((n) =>
    blockPool(3, 4).chain((pool) =>
      fc.array(op(n, pool), { maxLength: 6 }).map((ops) => {
        const builder = new CircuitBuilder();
        builder.qubits('q', n);
        return builder.add(...ops).build();
      }),
    ),
  );
}
