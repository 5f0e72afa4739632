// fast-check arbitraries for random hierarchical circuits: registers, standard gates with random
// parameters and modifiers, nested plain and conjugated blocks with parameters, and calls of them.
import fc from 'fast-check';
import type { Angle, AngleExpr } from '../../src/circuit/angle.js';
import { param } from '../../src/circuit/angle.js';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { defineBlock, defineConjugatedBlock } from '../../src/circuit/defineBlock.js';
import { STANDARD_GATES } from '../../src/circuit/standardGates.js';
import type { Block, Circuit, Op, UnitaryOp } from '../../src/circuit/types.js';

export interface CircuitShape {
  /** Most qubits in all registers together (default 6). */
  readonly maxQubits?: number;
  /** How many blocks the pool holds before the top-level ops are drawn (default 4). */
  readonly blocks?: number;
  /** Most top-level operations (default 8). */
  readonly maxOps?: number;
  /** Also draw measurements, resets and barriers (default false: a unitary circuit). */
  readonly measurements?: boolean;
}

const range = (n: number): number[] => Array.from({ length: n }, (_, k) => k);

/** Numbers that stress number printing: signed zero, tiny, huge, subnormal, exponents. */
const SPECIAL_NUMBERS = [0, -0, 1e-7, -3.5e-8, 5e-324, 1e21, -2.5e21, Math.PI, 123456.789, 0.1];

const smallNumber = fc.oneof(
  fc.double({ min: -2, max: 2, noNaN: true }),
  fc.constantFrom(0, -0, 1e-7, 0.5, -1.25, 2),
);

/**
 * An angle expression over `params` parameters whose value stays finite whenever every parameter
 * lies in [−2, 2]. `bounded` values stay within ±16; the unbounded tier adds tan, exp, pow, /, *.
 */
function boundedAngle(params: number, depth: number): fc.Arbitrary<Angle> {
  const leaf: fc.Arbitrary<Angle> = params > 0 ? fc.oneof(fc.integer({ min: 0, max: params - 1 }).map(param), smallNumber) : smallNumber;
  if (depth === 0) return leaf;
  const sub = boundedAngle(params, depth - 1);
  const any = anyAngle(params, depth - 1);
  const call = (fn: 'sin' | 'cos' | 'arctan' | 'arcsin' | 'arccos', arg: Angle): AngleExpr => ({ op: 'call', fn, arg });
  return fc.oneof(
    { weight: 3, arbitrary: leaf },
    sub.map((arg): Angle => ({ op: 'neg', arg })),
    fc.tuple(fc.constantFrom('add' as const, 'sub' as const), sub, sub).map(([op, left, right]): Angle => ({ op, left, right })),
    fc.tuple(fc.constantFrom('sin' as const, 'cos' as const, 'arctan' as const), any).map(([fn, arg]) => call(fn, arg)),
    sub.map((arg) => call('arcsin', call('sin', arg))),
    sub.map((arg) => call('arccos', call('cos', arg))),
  );
}

function anyAngle(params: number, depth: number): fc.Arbitrary<Angle> {
  const bounded = boundedAngle(params, depth);
  if (depth === 0) return bounded;
  const sub = boundedAngle(params, depth - 1);
  const fn = (name: 'tan' | 'exp' | 'sqrt' | 'log', arg: Angle): AngleExpr => ({ op: 'call', fn: name, arg });
  return fc.oneof(
    { weight: 3, arbitrary: bounded },
    fc.tuple(sub, sub).map(([left, right]): Angle => ({ op: 'mul', left, right })),
    fc.tuple(sub, fc.double({ min: 0.5, max: 3, noNaN: true })).map(([left, right]): Angle => ({ op: 'div', left, right })),
    fc.tuple(fc.double({ min: 0.5, max: 2, noNaN: true }), sub).map(([left, right]): Angle => ({ op: 'pow', left, right })),
    fc.tuple(fc.constantFrom('tan' as const, 'exp' as const), sub).map(([name, arg]) => fn(name, arg)),
    fc.tuple(fc.constantFrom('sqrt' as const, 'log' as const), sub).map(([name, arg]) => fn(name, fn('exp', arg))),
  );
}

/** A gate angle over `params` parameters (each assumed in [−2, 2]): expressions or special numbers. */
export function arbitraryAngle(params: number): fc.Arbitrary<Angle> {
  return fc.oneof({ weight: 4, arbitrary: anyAngle(params, 2) }, fc.constantFrom(...SPECIAL_NUMBERS));
}

/** A block-call argument: stays in [−2, 2] so the callee's own expressions stay finite. */
function callArgument(params: number): fc.Arbitrary<Angle> {
  const wrapped = fc.tuple(fc.constantFrom('sin' as const, 'cos' as const, 'arctan' as const), anyAngle(params, 1))
    .map(([fn, arg]): Angle => ({ op: 'call', fn, arg }));
  const leaf = params > 0 ? fc.oneof(fc.integer({ min: 0, max: params - 1 }).map(param), smallNumber) : smallNumber;
  return fc.oneof(leaf, wrapped);
}

interface Placement {
  readonly controls: number[];
  readonly negControls: number[];
  readonly qubits: number[];
}

/** Distinct operands on `n` qubits for an operation of `arity` qubits plus random extra controls. */
function placement(n: number, arity: number): fc.Arbitrary<Placement> {
  return fc.integer({ min: 0, max: Math.min(3, n - arity) }).chain((extra) =>
    fc.tuple(fc.integer({ min: 0, max: extra }), fc.shuffledSubarray(range(n), { minLength: arity + extra, maxLength: arity + extra }))
      .map(([k, list]) => ({ controls: list.slice(0, k), negControls: list.slice(k, extra), qubits: list.slice(extra) })),
  );
}

const GATE_POWERS = [1, 1, 1, 1, 2, -1, 0.5, -0.5, 1.5, 3, 0, -0];
const CALL_POWERS = [1, 1, 1, -1, 2, 3, -2, 0];

/** A standard-gate op on `n` local qubits in a scope of `params` parameters. */
export function arbitraryGateOp(n: number, params: number): fc.Arbitrary<UnitaryOp> {
  const gates = STANDARD_GATES.filter((g) => g.qubits <= n);
  return fc.constantFrom(...gates).chain((g) =>
    fc.record({
      where: placement(n, g.qubits),
      params: fc.array(arbitraryAngle(params), { minLength: g.params, maxLength: g.params }),
      inverse: fc.boolean(),
      power: fc.constantFrom(...GATE_POWERS),
    }).map(({ where, params: angles, inverse, power }): UnitaryOp => ({ kind: 'gate', name: g.name, params: angles, inverse, power, ...where })),
  );
}

/** A call of one of `blocks` (those that fit on `n` qubits) with random controls, inversion and integer power. */
export function arbitraryCallOp(n: number, params: number, blocks: readonly Block[]): fc.Arbitrary<UnitaryOp> {
  const fitting = blocks.filter((b) => b.qubits <= n);
  return fc.constantFrom(...fitting).chain((block) =>
    fc.record({
      where: placement(n, block.qubits),
      args: fc.array(callArgument(params), { minLength: block.params.length, maxLength: block.params.length }),
      inverse: fc.boolean(),
      power: fc.constantFrom(...CALL_POWERS),
    }).map(({ where, args, inverse, power }): UnitaryOp => ({ kind: 'call', block, args, inverse, power, ...where })),
  );
}

function arbitraryUnitaryOp(n: number, params: number, blocks: readonly Block[]): fc.Arbitrary<UnitaryOp> {
  const callable = blocks.some((b) => b.qubits <= n);
  return callable ? fc.oneof(arbitraryGateOp(n, params), { weight: 2, arbitrary: arbitraryCallOp(n, params, blocks) }) : arbitraryGateOp(n, params);
}

const BLOCK_NAMES = ['layer', 'rot', 'prep', 'layer_2', 'q', 'mix_compute'];
const PARAM_NAMES = ['theta', 'phi', 'q0', 'c0', 'a', 'default'];

/** One block on at most `maxQubits` qubits that may call blocks of `pool`; plain or conjugated. */
export function arbitraryBlock(maxQubits: number, pool: readonly Block[]): fc.Arbitrary<Block> {
  return fc.record({
    name: fc.constantFrom(...BLOCK_NAMES),
    qubits: fc.integer({ min: 1, max: Math.min(4, maxQubits) }),
    params: fc.array(fc.constantFrom(...PARAM_NAMES), { maxLength: 2 }),
    conjugated: fc.boolean(),
  }).chain(({ name, qubits, params, conjugated }) => {
    const ops = fc.array(arbitraryUnitaryOp(qubits, params.length, pool), { maxLength: 4 });
    const options = { name, role: `random ${conjugated ? 'conjugated' : 'plain'} block`, qubits, params };
    return conjugated
      ? fc.tuple(ops, ops).map(([compute, action]) => defineConjugatedBlock(options, compute, action))
      : ops.map((body) => defineBlock(options, body));
  });
}

/** `count` blocks, each free to call the earlier ones; sometimes also a same-content copy (new identity). */
export function arbitraryBlockPool(count: number, maxQubits: number): fc.Arbitrary<Block[]> {
  let pool: fc.Arbitrary<Block[]> = fc.constant([]);
  for (let k = 0; k < count; k++) {
    pool = pool.chain((blocks) =>
      fc.tuple(arbitraryBlock(maxQubits, blocks), fc.boolean()).map(([block, copy]) => (copy ? [...blocks, block, { ...block }] : [...blocks, block])),
    );
  }
  return pool;
}

function arbitraryMeasurementOp(qubits: number, bits: number): fc.Arbitrary<Op> {
  const choices: fc.Arbitrary<Op>[] = [
    fc.integer({ min: 0, max: qubits - 1 }).map((qubit): Op => ({ kind: 'reset', qubit })),
    fc.subarray(range(qubits)).map((list): Op => ({ kind: 'barrier', qubits: list })),
  ];
  if (bits > 0) {
    choices.push(fc.tuple(fc.integer({ min: 0, max: qubits - 1 }), fc.integer({ min: 0, max: bits - 1 })).map(([qubit, bit]): Op => ({ kind: 'measure', qubit, bit })));
  }
  return fc.oneof(...choices);
}

/** A random hierarchical circuit (see CircuitShape for the knobs). */
export function arbitraryCircuit(shape: CircuitShape = {}): fc.Arbitrary<Circuit> {
  const maxQubits = shape.maxQubits ?? 6;
  const registers = fc.array(fc.tuple(fc.constantFrom('q', 'anc', 'sys', 'x', 'layer'), fc.integer({ min: 1, max: 3 })), { minLength: 1, maxLength: 3 })
    .map((list) => {
      const seen = new Set<string>();
      let total = 0;
      return list.filter(([name, size]) => {
        if (seen.has(name) || total + size > maxQubits) return false;
        seen.add(name);
        total += size;
        return true;
      });
    });
  const bitSizes = fc.array(fc.integer({ min: 1, max: 3 }), { maxLength: shape.measurements ? 2 : 1 });
  return fc.tuple(registers, bitSizes).chain(([qubitRegisters, bitRegisters]) => {
    const n = qubitRegisters.reduce((sum, [, size]) => sum + size, 0);
    const bits = bitRegisters.reduce((sum, size) => sum + size, 0);
    return arbitraryBlockPool(shape.blocks ?? 4, n).chain((pool) => {
      const op = shape.measurements ? fc.oneof(arbitraryUnitaryOp(n, 0, pool), arbitraryMeasurementOp(n, bits)) : arbitraryUnitaryOp(n, 0, pool);
      return fc.array(op, { maxLength: shape.maxOps ?? 8 }).map((ops) => {
        const builder = new CircuitBuilder();
        qubitRegisters.forEach(([name, size]) => builder.qubits(name, size));
        bitRegisters.forEach((size, k) => builder.bits(`c${k}`, size));
        return builder.add(...ops).build();
      });
    });
  });
}
