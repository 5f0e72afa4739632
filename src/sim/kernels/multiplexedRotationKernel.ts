/**
 * The native kernel of multiplexedRotation: on qubits [selector (k), target] with the 2^k Gray-code angles θ_i as args,
 * applies R_axis(α_h) to the target for selector value h, α_h = Σ_i (−1)^{|h ∧ g_i|} θ_i (g_i = i ⊕ i>>1, the inverse
 * of the Walsh transform in Möttönen et al., Phys. Rev. Lett. 93, 130502, 2004) — one pass instead of 2^{k+1} gates.
 */
import type { NativeKernel } from '../registerNativeKernel.js';
import { deposit, indexPattern, maskOf } from '../internal/indexPattern.js';

/** Registry ids of the kernel for y- and z-rotations. */

function selectorAngles(thetas: readonly number[], scale: number): Float64Array {
  const size = thetas.length;
  const alphas = new Float64Array(size);
  for (let i = 0; i < size; i++) alphas[i ^ (i >> 1)] = thetas[i]! * scale;
  // In-place fast Walsh–Hadamard transform: alphas[h] = Σ_g (−1)^{|h ∧ g|} φ[g].
  for (let len = 1; len < size; len *= 2) {
    for (let i = 0; i < size; i += 2 * len) {
      for (let j = i; j < i + len; j++) {
        const u = alphas[j]!;
        const v = alphas[j + len]!;
        alphas[j] = u + v;
        alphas[j + len] = u - v;
      }
    }
  }
  return alphas;
}

function multiplexedKernel(axis: 'y' | 'z'): NativeKernel {
  return (state, qubits, args, controls, negControls, inverse, power) => {
    const k = qubits.length - 1;
    if (k < 0 || args.length !== 2 ** k) throw new RangeError(`multiplexed-r${axis} kernel: expects 2^k angles for k selector qubits`);
    const alphas = selectorAngles(args, inverse ? -power : power);
    const cos = alphas.map((a) => Math.cos(a / 2));
    const sin = alphas.map((a) => Math.sin(a / 2));
    const selector = qubits.slice(0, k);
    const target = qubits[k]!;
    const flip = 1 << target;
    const { re, im } = state;
    const { positions, value, outer, run } = indexPattern(state.qubits, [...controls, ...negControls, target], maskOf(controls));
    for (let o = 0; o < outer; o++) {
      const start = deposit(o * run, positions) | value;
      for (let i = start; i < start + run; i++) {
        let h = 0;
        for (let b = 0; b < k; b++) h |= ((i >>> selector[b]!) & 1) << b;
        const c = cos[h]!;
        const s = sin[h]!;
        const j = i | flip;
        const ar = re[i]!;
        const ai = im[i]!;
        const br = re[j]!;
        const bi = im[j]!;
        if (axis === 'y') {
          // ry(α) = [[cos, −sin], [sin, cos]] (α/2 in the entries).
          re[i] = c * ar - s * br;
          im[i] = c * ai - s * bi;
          re[j] = s * ar + c * br;
          im[j] = s * ai + c * bi;
        } else {
          // rz(α) = diag(e^{−iα/2}, e^{iα/2}).
          re[i] = c * ar + s * ai;
          im[i] = c * ai - s * ar;
          re[j] = c * br - s * bi;
          im[j] = c * bi + s * br;
        }
      }
    }
  };
}

export const multiplexedRyKernel: NativeKernel = multiplexedKernel('y');
export const multiplexedRzKernel: NativeKernel = multiplexedKernel('z');
