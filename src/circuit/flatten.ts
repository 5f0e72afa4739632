/**
 * flatten: a lazy stream (generator) of primitive operations on global qubits, expanding calls,
 * repeats, inverses, controls and compute/uncompute pairs on the fly, never building a list.
 * Blocks with a native kernel can be kept whole when the caller asks for it.
 */
import { evaluateAngle } from './angle.js';
import type { Block, Circuit, MeasureOp, ResetOp, BarrierOp, UnitaryOp } from './types.js';

/** Operands and modifiers after expansion: global qubits and every control gathered on the way down. */
interface FlatOperands {
  readonly qubits: readonly number[];
  readonly controls: readonly number[];
  readonly negControls: readonly number[];
  readonly inverse: boolean;
  readonly power: number;
}

/** A standard gate with everything resolved: global qubits, numeric parameters, all controls. */
export interface FlatGate extends FlatOperands {
  readonly kind: 'gate';
  readonly name: string;
  readonly params: readonly number[];
}

/** A whole block kept for a native kernel: block applied `power` (≥ 1) times, inverted or not. */
export interface FlatNative extends FlatOperands {
  readonly kind: 'native';
  readonly block: Block;
  readonly args: readonly number[];
}

export type FlatOp = FlatGate | FlatNative | MeasureOp | ResetOp | BarrierOp;

export interface FlattenOptions {
  /** Return true to keep a call of this block whole (as a FlatNative) instead of expanding it. */
  readonly keepWhole?: (block: Block) => boolean;
}

interface Context {
  readonly qubitMap: readonly number[] | null;
  readonly params: readonly number[];
  readonly controls: readonly number[];
  readonly negControls: readonly number[];
  readonly inverse: boolean;
}

const ROOT: Context = { qubitMap: null, params: [], controls: [], negControls: [], inverse: false };

function mapQubits(qubits: readonly number[], map: readonly number[] | null): number[] {
  return map ? qubits.map((q) => map[q] as number) : [...qubits];
}

function* expandOps(ops: readonly UnitaryOp[], ctx: Context, options: FlattenOptions): Generator<FlatGate | FlatNative> {
  if (ctx.inverse) {
    for (let k = ops.length - 1; k >= 0; k--) yield* expandOp(ops[k] as UnitaryOp, ctx, options);
  } else {
    for (const op of ops) yield* expandOp(op, ctx, options);
  }
}

function* expandOp(op: UnitaryOp, ctx: Context, options: FlattenOptions): Generator<FlatGate | FlatNative> {
  const qubits = mapQubits(op.qubits, ctx.qubitMap);
  const controls = [...ctx.controls, ...mapQubits(op.controls, ctx.qubitMap)];
  const negControls = [...ctx.negControls, ...mapQubits(op.negControls, ctx.qubitMap)];
  let inverse = ctx.inverse !== op.inverse;
  if (op.kind === 'gate') {
    const params = op.params.map((a) => evaluateAngle(a, ctx.params));
    yield { kind: 'gate', name: op.name, params, qubits, controls, negControls, inverse, power: op.power };
    return;
  }
  if (op.power < 0) inverse = !inverse;
  const times = Math.abs(op.power);
  if (times === 0) return;
  const args = op.args.map((a) => evaluateAngle(a, ctx.params));
  if (options.keepWhole?.(op.block)) {
    yield { kind: 'native', block: op.block, args, qubits, controls, negControls, inverse, power: times };
    return;
  }
  const inner: Context = { qubitMap: qubits, params: args, controls, negControls, inverse };
  const body = op.block.body;
  if (body.kind === 'plain') {
    for (let r = 0; r < times; r++) yield* expandOps(body.ops, inner, options);
    return;
  }
  const bare: Context = { qubitMap: qubits, params: args, controls: [], negControls: [], inverse: false };
  yield* expandOps(body.compute, bare, options);
  for (let r = 0; r < times; r++) yield* expandOps(body.action, inner, options);
  yield* expandOps(body.compute, { ...bare, inverse: true }, options);
}

/** Streams the primitive operations of `circuit` in execution order. */
export function* flatten(circuit: Circuit, options: FlattenOptions = {}): Generator<FlatOp> {
  for (const op of circuit.ops) {
    if (op.kind === 'gate' || op.kind === 'call') yield* expandOp(op, ROOT, options);
    else yield op;
  }
}

/** Streams the primitive operations of one block applied to qubits 0 … block.qubits−1. */
export function* flattenBlock(block: Block, args: readonly number[] = [], options: FlattenOptions = {}): Generator<FlatGate | FlatNative> {
  const qubits = Array.from({ length: block.qubits }, (_, k) => k);
  yield* expandOp({ kind: 'call', block, args, qubits, controls: [], negControls: [], inverse: false, power: 1 }, ROOT, options);
}
