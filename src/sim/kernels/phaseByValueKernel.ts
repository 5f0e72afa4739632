/**
 * The native kernel of phaseByValueBlock: multiplies |x> by e^{iθx}, x the unsigned value of the
 * block's register (little-endian), on the indices where the controls match — one pass instead of
 * one phase gate per register qubit.
 */
import type { NativeKernel } from '../registerNativeKernel.js';
import { deposit, indexPattern, maskOf } from '../internal/indexPattern.js';

/** Registry id of the kernel. */
export const PHASE_BY_VALUE_KERNEL = 'phase-by-value';

/** Register widths up to this use a table of the 2^width phases. */
const TABLE_WIDTH = 16;

export const phaseByValueKernel: NativeKernel = (state, qubits, args, controls, negControls, inverse, power) => {
  const theta = (args[0] as number) * (inverse ? -power : power);
  const width = qubits.length;
  const { re, im } = state;
  const pattern = indexPattern(state.qubits, [...controls, ...negControls], maskOf(controls));
  const bits = Int32Array.from(qubits);
  const table = width <= TABLE_WIDTH ? new Float64Array(2 << width) : undefined;
  if (table) {
    for (let x = 0; x < 1 << width; x++) {
      table[2 * x] = Math.cos(theta * x);
      table[2 * x + 1] = Math.sin(theta * x);
    }
  }
  const { positions, value, outer, run } = pattern;
  for (let o = 0; o < outer; o++) {
    const start = deposit(o * run, positions) | value;
    const end = start + run;
    for (let i = start; i < end; i++) {
      let x = 0;
      for (let k = 0; k < width; k++) x |= ((i >>> bits[k]!) & 1) << k;
      const fr = table ? table[2 * x]! : Math.cos(theta * x);
      const fi = table ? table[2 * x + 1]! : Math.sin(theta * x);
      const xr = re[i]!;
      const xi = im[i]!;
      re[i] = fr * xr - fi * xi;
      im[i] = fr * xi + fi * xr;
    }
  }
};
