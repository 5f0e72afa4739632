/**
 * The native kernel of fourierConstantAdder: on qubits [register (m), c_0 … c_{K−1}] with integer args
 * [offset, w_0 … w_{K−1}], moves the amplitude of |x>|c> to |x + offset + Σ_k w_k c_k mod 2^m>|c> where the controls match.
 */
import type { NativeKernel } from '../registerNativeKernel.js';
import { deposit, indexPattern, maskOf } from '../internal/indexPattern.js';

/** Registry id of the kernel. */

export const constantAdditionKernel: NativeKernel = (state, qubits, args, controls, negControls, inverse, power) => {
  const weights = args.length - 1;
  const width = qubits.length - weights;
  if (weights < 0 || width < 1 || !args.every((a) => Number.isSafeInteger(a))) {
    throw new RangeError('constant-addition kernel: expects integer arguments [offset, w_0 … w_{K−1}] for K control qubits');
  }
  const size = 2 ** width;
  const sign = inverse ? -power : power;
  const register = qubits.slice(0, width);
  const weightQubits = qubits.slice(width);
  const place = new Int32Array(size);
  for (let x = 0; x < size; x++) {
    let offset = 0;
    for (let j = 0; j < width; j++) if ((x >>> j) & 1) offset |= 1 << register[j]!;
    place[x] = offset;
  }
  const reducedArgs = args.map((a) => (((a * sign) % size) + size) % size);
  const { re, im } = state;
  const bufferRe = new Float64Array(size);
  const bufferIm = new Float64Array(size);
  const { positions, value, outer, run } = indexPattern(state.qubits, [...controls, ...negControls, ...register], maskOf(controls));
  for (let o = 0; o < outer; o++) {
    const start = deposit(o * run, positions) | value;
    for (let base = start; base < start + run; base++) {
      let shift = reducedArgs[0]!;
      for (let k = 0; k < weightQubits.length; k++) if ((base >>> weightQubits[k]!) & 1) shift += reducedArgs[k + 1]!;
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
