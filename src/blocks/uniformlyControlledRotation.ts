/**
 * uniformlyControlledRotation: for each value h of the control qubits, R_axis(α_h) on the target,
 * as 2^k rotations interleaved with 2^k CNOTs in Gray-code order (Möttönen et al., Phys. Rev. Lett.
 * 93, 130502, 2004; Quantum Inf. Comput. 5, 467, 2005). Control value bit b is qubit controls[b].
 */
import { gate } from '../circuit/ops.js';
import type { GateOp } from '../circuit/types.js';

const grayCode = (i: number): number => i ^ (i >> 1);

function popcountParity(x: number): number {
  let v = x;
  let parity = 0;
  while (v !== 0) {
    parity ^= 1;
    v &= v - 1;
  }
  return parity;
}

/**
 * The rotation angles θ_i applied between the CNOTs: α_h = Σ_i (−1)^{|h ∧ g_i|} θ_i, inverted by the
 * Walsh–Hadamard transform (the Gray-code form of Möttönen et al. 2004).
 */
export function multiplexorAngles(alphas: readonly number[]): Float64Array {
  const size = alphas.length;
  const thetas = new Float64Array(size);
  for (let i = 0; i < size; i++) {
    const g = grayCode(i);
    let sum = 0;
    for (let h = 0; h < size; h++) sum += popcountParity(h & g) === 0 ? (alphas[h] as number) : -(alphas[h] as number);
    thetas[i] = sum / size;
  }
  return thetas;
}

/**
 * Gate list of the multiplexed rotation. `alphas.length` must be 2^controls.length. Returns [] when
 * every angle is zero; rotations with a zero angle are left out (the CNOT pattern stays).
 */
export function uniformlyControlledRotation(
  axis: 'y' | 'z',
  alphas: readonly number[],
  controls: readonly number[],
  target: number,
): GateOp[] {
  const k = controls.length;
  if (alphas.length !== 1 << k) throw new RangeError(`uniformlyControlledRotation: need ${1 << k} angles, got ${alphas.length}`);
  if (alphas.every((a) => a === 0)) return [];
  const name = axis === 'y' ? 'ry' : 'rz';
  if (k === 0) return [gate(name, [target], [alphas[0] as number])];
  const thetas = multiplexorAngles(alphas);
  const ops: GateOp[] = [];
  const size = 1 << k;
  for (let i = 0; i < size; i++) {
    const theta = thetas[i] as number;
    if (theta !== 0) ops.push(gate(name, [target], [theta]));
    const changed = i === size - 1 ? 1 << (k - 1) : grayCode(i) ^ grayCode(i + 1);
    ops.push(gate('cx', [controls[31 - Math.clz32(changed)] as number, target]));
  }
  return ops;
}
