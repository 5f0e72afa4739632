/**
 * The native kernel of the fast inverse (src/inversion/fastInverse.ts). Its block is compute =
 * [orbital rotation, energy sum into the register, optional electron counter and window flag],
 * action = flag rotations chosen by the register (and window) value, then the compute undone. The
 * arithmetic is a permutation that never touches the flag, so the whole conjugated arithmetic +
 * action is, on every basis state, one 2×2 matrix M(label) on the flag where label = (register,
 * window) values the compute *would* produce: one pass, no amplitude moves. The simulator applies
 * the orbital rotation's gates around the pass (simulatedCompute). M is tabulated by simulating the
 * block's own action ops on the small (register, window, flag) space, so it is the decomposition's.
 *
 * Kernel data (Block.kernelData, local qubits): system, flag [q], register, weights (integers),
 * offset [−sumMin], counter, window [qubit, min, max] or [], adder [0 = Draper QFT, 1 = ripple],
 * scratch, carry [q] or [], simulatedCompute [number of leading compute ops, the rotation].
 * On every input, register r, counter c, window bit u, scratch s and carry c0 (Draper,
 * arXiv:quant-ph/0008033; Cuccaro et al., arXiv:quant-ph/0410184: b ← a + b + c0 with a, c0 kept):
 *   QFT:    r' = r + offset + Σ_k w_k x_k,   c' = c + Σ_k x_k   (mod 2^width)
 *   ripple: r' = r + Σ_{k: w_k ≢ 0} ((x_k ? s ⊕ w_k : s) + c0) + [offset ≢ 0]((s ⊕ offset) + c0),
 *           c' = c + Σ_k ((x_k ? s_c ⊕ 1 : s_c) + c0)   (s, s_c: the scratch's low m, counter bits)
 *   u' = u ⊕ [min ≤ c' ≤ max];  label = r' + 2^m u'.
 * Work qubits (register, counter, window, scratch, carry) may be absent: they then count as 0.
 */
import type { Block, NativeKernelData, UnitaryOp } from '../../circuit/types.js';
import { standardGate, type Matrix2 } from '../../circuit/standardGates.js';
import { unitaryPower } from '../../circuit/resolveGate.js';
import type { NativeCall, NativeKernelSpec } from '../NativeKernelSpec.js';
import { StateVector } from '../StateVector.js';
import { deposit, indexPattern, maskOf } from '../internal/indexPattern.js';

/** Widest label space (register bits + window bit) the kernel tabulates. */
const MAX_LABEL_BITS = 25;

interface FastInverseData {
  readonly system: readonly number[];
  readonly flag: number;
  readonly register: readonly number[];
  readonly weights: readonly number[];
  readonly offset: number;
  readonly counter: readonly number[];
  readonly window: { readonly qubit: number; readonly min: number; readonly max: number } | null;
  readonly ripple: boolean;
  readonly scratch: readonly number[];
  readonly carry: number | null;
  readonly simulatedCompute: number;
}

function field(data: NativeKernelData, key: string, name: string): readonly number[] {
  const value = data[key];
  if (!value || !value.every((v) => Number.isInteger(v))) throw new RangeError(`fast-inverse kernel of ${name}: kernel data "${key}" must be a list of integers`);
  return value;
}

function readData(block: Block): FastInverseData {
  const data = block.kernelData;
  if (!data) throw new RangeError(`fast-inverse kernel: block ${block.name} has no kernel data`);
  const get = (key: string): readonly number[] => field(data, key, block.name);
  const window = get('window');
  const carry = get('carry');
  const data_: FastInverseData = {
    system: get('system'),
    flag: get('flag')[0] ?? -1,
    register: get('register'),
    weights: get('weights'),
    offset: get('offset')[0] ?? 0,
    counter: get('counter'),
    window: window.length === 3 ? { qubit: window[0]!, min: window[1]!, max: window[2]! } : null,
    ripple: get('adder')[0] === 1,
    scratch: get('scratch'),
    carry: carry.length > 0 ? carry[0]! : null,
    simulatedCompute: get('simulatedCompute')[0] ?? 0,
  };
  if (data_.weights.length !== data_.system.length || data_.register.length < 1 || data_.register.length + (data_.window ? 1 : 0) > MAX_LABEL_BITS) {
    throw new RangeError(`fast-inverse kernel of ${block.name}: inconsistent kernel data`);
  }
  if (data_.ripple && (data_.carry === null || data_.scratch.length < Math.max(data_.register.length, data_.counter.length))) {
    throw new RangeError(`fast-inverse kernel of ${block.name}: the ripple adder needs a carry and a scratch register`);
  }
  return data_;
}

/** Throws unless every gate of `ops` (recursively) has only `flag` as its non-control operand: the ops then keep labels. */
function checkActsOnFlagOnly(ops: readonly UnitaryOp[], bits: readonly number[], flag: number, name: string): void {
  for (const op of ops) {
    if (op.kind === 'gate') {
      const builtInControls = standardGate(op.name)?.controls ?? 0;
      if (op.qubits.slice(builtInControls).some((q) => bits[q] !== flag)) {
        throw new RangeError(`fast-inverse kernel of ${name}: the action's gate ${op.name} acts on a qubit other than the flag`);
      }
      continue;
    }
    const inner = op.qubits.map((q) => bits[q] as number);
    const body = op.block.body;
    if (body.kind === 'plain') checkActsOnFlagOnly(body.ops, inner, flag, name);
    else {
      checkActsOnFlagOnly(body.compute, inner, flag, name);
      checkActsOnFlagOnly(body.action, inner, flag, name);
    }
  }
}

/** M(label) for every label (8 numbers each), tabulated by simulating the action on (register, window, flag). */
function actionTable(call: NativeCall, data: FastInverseData): Float64Array {
  const { block, args } = call;
  if (block.body.kind !== 'conjugated') throw new RangeError(`fast-inverse kernel: block ${block.name} is not conjugated`);
  const m = data.register.length;
  const labelBits = m + (data.window ? 1 : 0);
  const small = labelBits + 1;
  const bits = new Array<number>(block.qubits).fill(-1);
  data.register.forEach((q, j) => (bits[q] = j));
  if (data.window) bits[data.window.qubit] = m;
  bits[data.flag] = labelBits;
  checkActsOnFlagOnly(block.body.action, bits, labelBits, block.name);
  const apply = call.compileOps(block.body.action, bits, args, small);
  const labels = 2 ** labelBits;
  const columns = [0, 1].map((input) => {
    const state = StateVector.zero(small);
    state.re.fill(0);
    state.re.fill(1, input * labels, (input + 1) * labels);
    apply(state);
    return state;
  });
  const table = new Float64Array(8 * labels);
  const [s0, s1] = columns as [StateVector, StateVector];
  for (let l = 0; l < labels; l++) {
    table.set([s0.re[l]!, s0.im[l]!, s1.re[l]!, s1.im[l]!, s0.re[l + labels]!, s0.im[l + labels]!, s1.re[l + labels]!, s1.im[l + labels]!], 8 * l);
  }
  return table;
}

/** T[256·b + v] = Σ weights[j] over the j whose state bit bits[j] (≥ 0) lies in byte b and is set in v. */
function byteTable(bits: readonly number[], weights: readonly number[]): Int32Array {
  const table = new Int32Array(4 * 256);
  bits.forEach((bit, j) => {
    if (bit < 0) return;
    const base = 256 * (bit >>> 3);
    const mask = 1 << (bit & 7);
    for (let v = 0; v < 256; v++) if (v & mask) table[base + v]! += weights[j]!;
  });
  return table;
}

function lookup(table: Int32Array, i: number): number {
  return table[i & 255]! + table[256 + ((i >>> 8) & 255)]! + table[512 + ((i >>> 16) & 255)]! + table[768 + (i >>> 24)]!;
}

const modulo = (value: number, size: number): number => ((value % size) + size) % size;

function prepare(call: NativeCall): (state: StateVector) => void {
  const { block, qubits } = call;
  const data = readData(block);
  const at = (local: number): number => qubits[local] ?? -1;
  const flagBit = at(data.flag);
  if (flagBit < 0 || data.system.some((q) => at(q) < 0)) throw new RangeError(`fast-inverse kernel of ${block.name}: the flag and system qubits must be present`);
  const m = data.register.length;
  const size = 2 ** m;
  const counterBits = data.counter.length;
  const counterSize = 2 ** counterBits;
  const n = data.system.length;
  const weights = data.weights.map((w) => modulo(w, size));
  const offset = modulo(data.offset, size);
  const addersUsed = data.ripple ? weights.filter((w) => w !== 0).length + (offset !== 0 ? 1 : 0) : 0;
  const systemBits = data.system.map(at);
  const registerBits = data.register.map(at);
  const counterBitsAt = data.counter.map(at);
  const carryBit = data.carry === null ? -1 : at(data.carry);
  const powers = (count: number): number[] => Array.from({ length: count }, (_, j) => 2 ** j);
  // Additive parts (exact whenever the scratch holds 0): register/counter bits, weights, carry per adder.
  const registerSum = byteTable([...registerBits, ...systemBits, carryBit], [...powers(m), ...weights, addersUsed % size]);
  const counterSum = byteTable([...counterBitsAt, ...systemBits, carryBit], [...powers(counterBits), ...systemBits.map(() => 1), data.ripple ? n % counterSize : 0]);
  const scratchBits = data.ripple ? data.scratch.map(at) : [];
  const hasScratch = scratchBits.some((b) => b >= 0);
  const scratchValue = byteTable(scratchBits, powers(scratchBits.length));
  const registerValue = byteTable(registerBits, powers(m));
  const counterValue = byteTable(counterBitsAt, powers(counterBits));
  const systemValue = byteTable(systemBits, powers(n));
  const windowBit = data.window ? at(data.window.qubit) : -1;
  const inWindow = new Uint8Array(Math.max(1, counterSize));
  if (data.window) for (let c = data.window.min; c <= Math.min(data.window.max, counterSize - 1); c++) inWindow[c] = 1;
  const actions = actionTable(call, data);
  const exponent = call.inverse ? -call.power : call.power;
  for (let l = 0; l < actions.length / 8; l++) {
    const entry = Array.from(actions.subarray(8 * l, 8 * l + 8)) as unknown as Matrix2;
    actions.set(unitaryPower(entry, exponent), 8 * l);
  }
  const ripplePath = (i: number): [number, number] => {
    const s = lookup(scratchValue, i);
    const x = lookup(systemValue, i);
    const c0 = carryBit >= 0 ? (i >>> carryBit) & 1 : 0;
    const sr = s & (size - 1);
    let r = lookup(registerValue, i);
    weights.forEach((w, k) => {
      if (w !== 0) r += (((x >>> k) & 1) === 1 ? sr ^ w : sr) + c0;
    });
    if (offset !== 0) r += (sr ^ offset) + c0;
    const sc = s & (counterSize - 1);
    let c = lookup(counterValue, i);
    for (let k = 0; k < n; k++) c += (((x >>> k) & 1) === 1 ? sc ^ 1 : sc) + c0;
    return [r % size, c % counterSize];
  };
  const fixed = [...call.controls, ...call.negControls, flagBit];
  const flip = 2 ** flagBit;
  const window = data.window !== null;
  return (state) => {
    const { re, im } = state;
    const { positions, value, outer, run } = indexPattern(state.qubits, fixed, maskOf(call.controls));
    for (let o = 0; o < outer; o++) {
      const start = deposit(o * run, positions) | value;
      const end = start + run;
      for (let i = start; i < end; i++) {
        let r: number;
        let c: number;
        if (hasScratch && lookup(scratchValue, i) !== 0) [r, c] = ripplePath(i);
        else {
          r = (lookup(registerSum, i) + offset) & (size - 1);
          c = lookup(counterSum, i) & (counterSize - 1);
        }
        let label = r;
        if (window) label += size * ((windowBit >= 0 ? (i >>> windowBit) & 1 : 0) ^ inWindow[c]!);
        const e = 8 * label;
        const j = i + flip;
        const xr = re[i]!;
        const xi = im[i]!;
        const yr = re[j]!;
        const yi = im[j]!;
        const ar = actions[e]!, ai = actions[e + 1]!, br = actions[e + 2]!, bi = actions[e + 3]!;
        const cr = actions[e + 4]!, ci = actions[e + 5]!, dr = actions[e + 6]!, di = actions[e + 7]!;
        re[i] = ar * xr - ai * xi + br * yr - bi * yi;
        im[i] = ar * xi + ai * xr + br * yi + bi * yr;
        re[j] = cr * xr - ci * xi + dr * yr - di * yi;
        im[j] = cr * xi + ci * xr + dr * yi + di * yr;
      }
    }
  };
}

export const fastInverseKernel: NativeKernelSpec = {
  prepare,
  runsWithoutWorkQubits: true,
  simulatedCompute: (block) => readData(block).simulatedCompute,
};
