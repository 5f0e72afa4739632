/**
 * compileProgram: compiles block calls and circuits once into replayable Programs on the bits of a
 * state of fixed size. It walks the block tree directly (the same expansion as circuit/flatten.ts:
 * calls, integer powers as repeats, inverses, controls reaching only the action of a conjugated
 * block), resolves every gate to its kernel and index pattern once, and prepares native-kernel
 * passes once. Bodies and calls are cached per block and per (arguments, state bits, modifiers,
 * state size, kernel choice, fusion), so repeated calls, powers and later runs reuse them. With
 * fusion on, every program's runs of gates are merged by fuseSteps into dense or diagonal passes and
 * runs on low bits grouped by tileSteps into cache-sized tiles.
 */
import { evaluateAngle, type Angle } from '../../circuit/angle.js';
import { resolveGate } from '../../circuit/resolveGate.js';
import type { Block, Circuit, UnitaryOp } from '../../circuit/types.js';
import { InputError } from '../../core/InputError.js';
import type { SimulationOptions } from '../SimulationOptions.js';
import { fuseSteps } from './fuseSteps.js';
import { gateStep } from './gateStep.js';
import { tileSteps } from './tileSteps.js';
import { kernelLookup, type KernelLookup } from './kernelLookup.js';
import { makeProgram, makeStep, NATIVE, REPEAT, TILE, type Program, type Step } from './Program.js';
import { runProgram } from './runProgram.js';

/** What a program is compiled for: the state size, the native kernels in use and whether gate runs are fused. */
export interface CompileTarget {
  readonly stateQubits: number;
  readonly kernels: KernelLookup;
  readonly fuse: boolean;
}

/** The compile target of a state of `stateQubits` qubits under `options`. */
export function compileTarget(stateQubits: number, options: SimulationOptions): CompileTarget {
  return { stateQubits, kernels: kernelLookup(options), fuse: options.fuse !== false };
}

/** The program of `steps`, fused and tiled when the target asks for it. */
function finish(steps: readonly Step[], target: CompileTarget): Program {
  const n = target.stateQubits;
  if (!target.fuse) return makeProgram(steps, n);
  // Tiles of inlined sub-programs are opened again, so their steps fuse and tile with their neighbours.
  const open = steps.flatMap((step) => (step.code === TILE ? (step.program as Program).steps : [step]));
  return makeProgram(tileSteps(fuseSteps(open, n), n), n);
}

/** Sub-programs with at most this many steps are copied into their caller instead of referenced. */
const INLINE_STEPS = 32;

interface Context {
  /** State bit of each local qubit (−1: absent from the state, known to be |0>). */
  readonly bits: readonly number[];
  readonly params: readonly number[];
  readonly controls: readonly number[];
  readonly negControls: readonly number[];
  readonly inverse: boolean;
}

const blockCache = new WeakMap<Block, Map<string, Program>>();
const circuitCache = new WeakMap<Circuit, Map<string, Program>>();

function cached<K extends object>(cache: WeakMap<K, Map<string, Program>>, owner: K, key: string, build: () => Program): Program {
  let table = cache.get(owner);
  if (!table) {
    table = new Map();
    cache.set(owner, table);
  }
  let program = table.get(key);
  if (!program) {
    program = build();
    table.set(key, program);
  }
  return program;
}

function targetKey(target: CompileTarget): string {
  return `${target.stateQubits}|${target.kernels.key}|${target.fuse ? 'fused' : 'plain'}`;
}

function mapBits(qubits: readonly number[], bits: readonly number[]): number[] {
  return qubits.map((q) => {
    const bit = bits[q];
    if (bit === undefined) throw new RangeError(`qubit ${q} out of range 0..${bits.length - 1}`);
    return bit;
  });
}

function emit(out: Step[], program: Program, times: number): void {
  if (times === 1 && program.steps.length <= INLINE_STEPS) out.push(...program.steps);
  else if (program.steps.length > 0) out.push(makeStep({ code: REPEAT, program, times }));
}

function compileGate(op: UnitaryOp & { kind: 'gate' }, ctx: Context, target: CompileTarget, out: Step[]): void {
  const qubits = mapBits(op.qubits, ctx.bits);
  const controls = [...ctx.controls, ...mapBits(op.controls, ctx.bits)];
  const negControls = [...ctx.negControls, ...mapBits(op.negControls, ctx.bits)];
  if ([...qubits, ...controls, ...negControls].some((b) => b < 0)) {
    throw new RangeError(`gate ${op.name} acts on a qubit left out of the state (a work qubit assumed |0>)`);
  }
  const params = op.params.map((a) => evaluateAngle(a, ctx.params));
  const resolved = resolveGate({ kind: 'gate', name: op.name, params, qubits, controls, negControls, inverse: ctx.inverse !== op.inverse, power: op.power });
  const step = gateStep(resolved, target.stateQubits);
  if (step) out.push(step);
}

function compileOps(ops: readonly UnitaryOp[], ctx: Context, target: CompileTarget, out: Step[]): void {
  const count = ops.length;
  for (let k = 0; k < count; k++) {
    const op = ops[ctx.inverse ? count - 1 - k : k] as UnitaryOp;
    if (op.kind === 'gate') compileGate(op, ctx, target, out);
    else compileCall(op.block, op.args.map((a: Angle) => evaluateAngle(a, ctx.params)), {
      bits: mapBits(op.qubits, ctx.bits),
      controls: [...ctx.controls, ...mapBits(op.controls, ctx.bits)],
      negControls: [...ctx.negControls, ...mapBits(op.negControls, ctx.bits)],
      inverse: (ctx.inverse !== op.inverse) !== op.power < 0,
      times: Math.abs(op.power),
    }, target, out);
  }
}

/** A call after modifiers are folded in: state bits of the block's qubits, all controls, direction and repeats. */
export interface CallSite {
  readonly bits: readonly number[];
  readonly controls: readonly number[];
  readonly negControls: readonly number[];
  readonly inverse: boolean;
  readonly times: number;
}

function siteKey(args: readonly number[], site: Omit<CallSite, 'times'>): string {
  return `${args.join(',')}|${site.bits.join(',')}|${site.controls.join(',')}|${site.negControls.join(',')}|${site.inverse ? 1 : 0}`;
}

/** The program of ops[from, to) of one body part with the given context, cached per block. */
function bodyProgram(block: Block, part: string, ops: readonly UnitaryOp[], ctx: Context, target: CompileTarget): Program {
  const key = `${targetKey(target)}|${part}|${siteKey(ctx.params, { ...ctx })}`;
  return cached(blockCache, block, key, () => {
    const out: Step[] = [];
    compileOps(ops, ctx, target, out);
    return finish(out, target);
  });
}

/** Appends the steps of one call of `block` with evaluated `args` to `out` (compiling it on first use). */
export function compileCall(block: Block, args: readonly number[], site: CallSite, target: CompileTarget, out: Step[]): void {
  if (site.times === 0) return;
  const key = `${targetKey(target)}|call|${site.times}|${siteKey(args, site)}`;
  emit(out, cached(blockCache, block, key, () => finish(callSteps(block, args, site, target), target)), 1);
}

function callSteps(block: Block, args: readonly number[], site: CallSite, target: CompileTarget): Step[] {
  const out: Step[] = [];
  const inner: Context = { bits: site.bits, params: args, controls: site.controls, negControls: site.negControls, inverse: site.inverse };
  const bare: Context = { ...inner, controls: [], negControls: [], inverse: false };
  const body = block.body;
  const spec = target.kernels.find(block);
  const work = new Set(block.workQubits ?? []);
  const absentOk = site.bits.every((b, k) => b >= 0 || (spec?.runsWithoutWorkQubits === true && work.has(k)));
  if (spec && absentOk) {
    const around = spec.simulatedCompute?.(block) ?? 0;
    if (around > 0 && body.kind !== 'conjugated') throw new RangeError(`native kernel of ${block.name}: simulatedCompute needs a conjugated block`);
    const prefix = body.kind === 'conjugated' ? body.compute.slice(0, around) : [];
    if (around > 0) emit(out, bodyProgram(block, `prefix${around}`, prefix, bare, target), 1);
    const pass = spec.prepare({
      block, args, qubits: site.bits, controls: site.controls, negControls: site.negControls,
      inverse: site.inverse, power: site.times, stateQubits: target.stateQubits,
      compileOps: (ops, bits, params, stateQubits) => {
        const steps: Step[] = [];
        const sub = { ...target, stateQubits };
        compileOps(ops, { bits, params, controls: [], negControls: [], inverse: false }, sub, steps);
        const program = finish(steps, sub);
        return (state) => runProgram(program, state);
      },
    });
    out.push(makeStep({ code: NATIVE, pass }));
    if (around > 0) emit(out, bodyProgram(block, `prefix${around}`, prefix, { ...bare, inverse: true }, target), 1);
    return out;
  }
  if (body.kind === 'plain') {
    emit(out, bodyProgram(block, 'plain', body.ops, inner, target), site.times);
    return out;
  }
  emit(out, bodyProgram(block, 'compute', body.compute, bare, target), 1);
  emit(out, bodyProgram(block, 'action', body.action, inner, target), site.times);
  emit(out, bodyProgram(block, 'compute', body.compute, { ...bare, inverse: true }, target), 1);
  return out;
}

/**
 * The program of a measurement-free circuit on a state of target.stateQubits qubits (circuit qubit q
 * is state bit q). Throws InputError naming `what` when the circuit measures or resets.
 */
export function compileCircuit(circuit: Circuit, target: CompileTarget, what: string): Program {
  return cached(circuitCache, circuit, targetKey(target), () => {
    const out: Step[] = [];
    const root: Context = { bits: Array.from({ length: target.stateQubits }, (_, q) => q), params: [], controls: [], negControls: [], inverse: false };
    for (const op of circuit.ops) {
      if (op.kind === 'barrier') continue;
      if (op.kind === 'measure' || op.kind === 'reset') {
        throw new InputError(`${what}: the circuit has a ${op.kind} (qubit ${op.qubit}); simulate it with outcomeDistribution`);
      }
      compileOps([op], root, target, out);
    }
    return finish(out, target);
  });
}

