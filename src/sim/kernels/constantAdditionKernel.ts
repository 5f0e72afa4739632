/**
 * The native kernel of fourierConstantAdder: on qubits [register (m), c_0 … c_{K−1}] with integer args
 * [offset, w_0 … w_{K−1}], moves the amplitude of |x>|c> to |x + offset + Σ_k w_k c_k mod 2^m>|c> where the controls match.
 * With pair terms (kernel data `width` [m], `pairs` [a_0, b_0, a_1, b_1 …] and `and` [t], local qubits; args
 * [offset, w_0 … w_{K−1}, v_0 … v_{J−1}]) it also adds Σ_j v_j·(t ⊕ c_{a_j} c_{b_j}) — the decomposition's ccx, phases under
 * t, ccx — and leaves t as it is; t may be absent from the state (a work qubit, then 0).
 */
import type { NativeCall, NativeKernelSpec } from '../NativeKernelSpec.js';
import type { StateVector } from '../StateVector.js';
import { deposit, indexPattern, maskOf } from '../internal/indexPattern.js';

interface AdditionLayout {
  readonly width: number;
  /** State bits of the weighted controls, then of the pair controls (two per pair). */
  readonly weightBits: readonly number[];
  readonly pairBits: readonly number[];
  /** State bit of the AND qubit, −1 when absent or when the block has no pair terms. */
  readonly andBit: number;
}

function layoutOf(c: NativeCall): AdditionLayout {
  const data = c.block.kernelData;
  const bad = (): never => {
    throw new RangeError('constant-addition kernel: expects integer arguments [offset, w_0 … w_{K−1}, v_0 … v_{J−1}] for K control qubits and J pairs');
  };
  if (!c.args.every((a) => Number.isSafeInteger(a))) bad();
  if (data === undefined) {
    const width = c.qubits.length - (c.args.length - 1);
    if (c.args.length < 1 || width < 1 || c.qubits.some((q) => q < 0)) bad();
    return { width, weightBits: c.qubits.slice(width), pairBits: [], andBit: -1 };
  }
  const width = data.width?.[0] ?? 0;
  const pairLocals = data.pairs ?? [];
  const and = data.and?.[0] ?? -1;
  const weights = c.args.length - 1 - pairLocals.length / 2;
  if (width < 1 || pairLocals.length % 2 !== 0 || weights < 0 || and !== c.qubits.length - 1 || weights > and - width) bad();
  if (c.qubits.some((q, k) => q < 0 && k !== and)) bad();
  return { width, weightBits: c.qubits.slice(width, width + weights), pairBits: pairLocals.map((k) => c.qubits[k]!), andBit: c.qubits[and]! };
}

function prepare(c: NativeCall): (state: StateVector) => void {
  const { width, weightBits, pairBits, andBit } = layoutOf(c);
  const size = 2 ** width;
  const sign = c.inverse ? -c.power : c.power;
  const register = c.qubits.slice(0, width);
  const place = new Int32Array(size);
  for (let x = 0; x < size; x++) {
    let offset = 0;
    for (let j = 0; j < width; j++) if ((x >>> j) & 1) offset |= 1 << register[j]!;
    place[x] = offset;
  }
  const reduced = Int32Array.from(c.args, (a) => (((a * sign) % size) + size) % size);
  const weightCount = weightBits.length;
  const pairCount = pairBits.length / 2;
  const bufferRe = new Float64Array(size);
  const bufferIm = new Float64Array(size);
  return (state) => {
    const { re, im } = state;
    const { positions, value, outer, run } = indexPattern(state.qubits, [...c.controls, ...c.negControls, ...register], maskOf(c.controls));
    for (let o = 0; o < outer; o++) {
      const start = deposit(o * run, positions) | value;
      for (let base = start; base < start + run; base++) {
        let shift = reduced[0]!;
        for (let k = 0; k < weightCount; k++) if ((base >>> weightBits[k]!) & 1) shift += reduced[k + 1]!;
        const t = andBit < 0 ? 0 : (base >>> andBit) & 1;
        for (let j = 0; j < pairCount; j++) {
          if ((((base >>> pairBits[2 * j]!) & (base >>> pairBits[2 * j + 1]!) & 1) ^ t) === 1) shift += reduced[1 + weightCount + j]!;
        }
        shift %= size;
        if (shift === 0) continue;
        for (let x = 0; x < size; x++) {
          bufferRe[x] = re[base | place[x]!]!;
          bufferIm[x] = im[base | place[x]!]!;
        }
        for (let x = 0; x < size; x++) {
          const target = base | place[(x + shift) % size]!;
          re[target] = bufferRe[x]!;
          im[target] = bufferIm[x]!;
        }
      }
    }
  };
}

/** The kernel as a spec: tables once per call site; the AND qubit of pair terms may be absent. */
export const constantAdditionKernel: NativeKernelSpec = { prepare, runsWithoutWorkQubits: true };
