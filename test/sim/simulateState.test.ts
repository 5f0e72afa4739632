// simulateState and circuitMatrix against the dense mathjs reference (test/sim/denseReference.ts)
// on fast-check random circuits of up to 6 qubits with modifiers and nested blocks.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { param, type Angle } from '../../src/circuit/angle.js';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { defineBlock, defineConjugatedBlock } from '../../src/circuit/defineBlock.js';
import { call, gate } from '../../src/circuit/ops.js';
import type { Block, UnitaryOp } from '../../src/circuit/types.js';
import { circuitMatrix } from '../../src/sim/circuitMatrix.js';
import { phaseByValueBlock } from '../../src/sim/phaseByValueBlock.js';
import { simulateState } from '../../src/sim/simulateState.js';
import { referenceMatrix } from './denseReference.js';
import { REFERENCE_GATES } from './referenceGates.js';

type Gen = fc.GeneratorValue;
const NAMES = Object.keys(REFERENCE_GATES);
/** 1-qubit gates whose eigenvalues stay off −1 for angles in [−3, 3]: safe for fractional powers. */
const FRACTIONAL_OK = new Set(['rx', 'ry', 'rz', 'p', 'phase', 'u1', 'gphase']);

function pick<T>(g: Gen, items: readonly T[]): T {
  return items[g(fc.integer, { min: 0, max: items.length - 1 })] as T;
}

function angle(g: Gen, params: number): Angle {
  const value = g(fc.double, { min: -3, max: 3, noNaN: true });
  if (params === 0 || !g(fc.boolean)) return value;
  // An expression over a block parameter: value + 0.5·θ.
  return { op: 'add', left: value, right: { op: 'mul', left: 0.5, right: param(0) } };
}

function randomGate(g: Gen, scope: number, params: number): UnitaryOp | undefined {
  const name = pick(g, NAMES);
  const definition = REFERENCE_GATES[name]!;
  if (definition.qubits > scope) return undefined;
  const order = g(fc.shuffledSubarray, Array.from({ length: scope }, (_, k) => k), { minLength: scope, maxLength: scope });
  const qubits = order.slice(0, definition.qubits);
  const rest = order.slice(definition.qubits);
  const nControls = g(fc.integer, { min: 0, max: Math.min(2, rest.length) });
  const nNeg = g(fc.integer, { min: 0, max: Math.min(1, rest.length - nControls) });
  const fractional = FRACTIONAL_OK.has(name) && g(fc.boolean);
  const power = fractional ? pick(g, [0.5, -0.5, 0.25, 1.5]) : pick(g, [1, 1, 1, -1, 2, 3, -2, 0]);
  const params_ = Array.from({ length: definition.params }, () => angle(g, params));
  return gate(name, qubits, params_, {
    controls: rest.slice(0, nControls),
    negControls: rest.slice(nControls, nControls + nNeg),
    inverse: g(fc.boolean),
    power,
  });
}

let blockId = 0;

function randomOps(g: Gen, scope: number, params: number, depth: number, count: number): UnitaryOp[] {
  const ops: UnitaryOp[] = [];
  while (ops.length < count) {
    const op = depth > 0 && g(fc.integer, { min: 0, max: 3 }) === 0 ? randomCall(g, scope, params, depth - 1) : randomGate(g, scope, params);
    if (op) ops.push(op);
  }
  return ops;
}

function randomBlock(g: Gen, depth: number): Block {
  const qubits = g(fc.integer, { min: 1, max: 3 });
  if (g(fc.integer, { min: 0, max: 4 }) === 0) return phaseByValueBlock(qubits);
  const options = { name: `b${blockId++}`, role: 'random test block', qubits, params: ['theta'] };
  const length = (): number => g(fc.integer, { min: 1, max: 3 });
  return g(fc.boolean)
    ? defineBlock(options, randomOps(g, qubits, 1, depth, length()))
    : defineConjugatedBlock(options, randomOps(g, qubits, 1, depth, length()), randomOps(g, qubits, 1, depth, length()));
}

function randomCall(g: Gen, scope: number, params: number, depth: number): UnitaryOp | undefined {
  const block = randomBlock(g, depth);
  if (block.qubits > scope) return undefined;
  const order = g(fc.shuffledSubarray, Array.from({ length: scope }, (_, k) => k), { minLength: scope, maxLength: scope });
  const rest = order.slice(block.qubits);
  const nControls = g(fc.integer, { min: 0, max: Math.min(2, rest.length) });
  const nNeg = g(fc.integer, { min: 0, max: Math.min(1, rest.length - nControls) });
  return call(block, order.slice(0, block.qubits), [angle(g, params)], {
    controls: rest.slice(0, nControls),
    negControls: rest.slice(nControls, nControls + nNeg),
    inverse: g(fc.boolean),
    power: pick(g, [1, 1, -1, 2, 0, -2]),
  });
}

function randomCircuit(g: Gen) {
  const n = g(fc.integer, { min: 1, max: 6 });
  const b = new CircuitBuilder();
  b.qubits('q', n);
  b.add(...randomOps(g, n, 0, 2, g(fc.integer, { min: 1, max: 10 })));
  return b.build();
}

function maxDifference(a: { re: ArrayLike<number>; im: ArrayLike<number> }, b: { re: ArrayLike<number>; im: ArrayLike<number> }): number {
  let worst = 0;
  for (let e = 0; e < a.re.length; e++) worst = Math.max(worst, Math.hypot(a.re[e]! - b.re[e]!, a.im[e]! - b.im[e]!));
  return worst;
}

describe('simulateState(circuit) and circuitMatrix(circuit)', () => {
  it('agree with the dense mathjs reference on random hierarchical circuits to 1e-12', () => {
    fc.assert(
      fc.property(fc.gen(), (g) => {
        const circuit = randomCircuit(g);
        const reference = referenceMatrix(circuit);
        const matrix = circuitMatrix(circuit);
        expect(maxDifference(matrix, reference)).toBeLessThanOrEqual(1e-12);
        const dim = reference.n;
        const column = { re: Array.from({ length: dim }, (_, i) => reference.re[i * dim]!), im: Array.from({ length: dim }, (_, i) => reference.im[i * dim]!) };
        expect(maxDifference(simulateState(circuit), column)).toBeLessThanOrEqual(1e-12);
        expect(maxDifference(simulateState(circuit, { useNativeKernels: false }), column)).toBeLessThanOrEqual(1e-12);
      }),
      { numRuns: 100, seed: 20260 },
    );
  });
});
