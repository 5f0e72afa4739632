// Test-only reference statevector simulator for one block: flattens it and applies each resolved gate, plus the dense unitary.
import { flattenBlock } from '../../../src/circuit/flatten.js';
import { resolveGate } from '../../../src/circuit/resolveGate.js';
import type { Block } from '../../../src/circuit/types.js';
import type { ComplexMatrix } from '../../../src/model/FermionModel.js';

export interface State {
  re: Float64Array;
  im: Float64Array;
}

function active(index: number, controls: readonly number[], negControls: readonly number[]): boolean {
  return controls.every((q) => ((index >> q) & 1) === 1) && negControls.every((q) => ((index >> q) & 1) === 0);
}

/** The block (with numeric `args`) applied to `input` on qubits 0 … block.qubits−1 (little-endian). */
export function simulateBlock(block: Block, input: State, args: readonly number[] = []): State {
  const re = Float64Array.from(input.re);
  const im = Float64Array.from(input.im);
  const dim = re.length;
  for (const flat of flattenBlock(block, args)) {
    if (flat.kind !== 'gate') throw new Error('reference simulator: native blocks are not expected');
    const g = resolveGate(flat);
    if (g.kind === 'phase') {
      const c = Math.cos(g.angle);
      const s = Math.sin(g.angle);
      for (let i = 0; i < dim; i++) {
        if (!active(i, g.controls, g.negControls)) continue;
        const r = re[i]!;
        re[i] = c * r - s * im[i]!;
        im[i] = s * r + c * im[i]!;
      }
    } else if (g.kind === 'swap') {
      if (g.phaseRe !== -1 || g.phaseIm > 1e-12) throw new Error('reference simulator: only whole swaps');
      for (let i = 0; i < dim; i++) {
        const j = i ^ (1 << g.a) ^ (1 << g.b);
        if (((i >> g.a) & 1) === 1 && ((i >> g.b) & 1) === 0 && active(i, g.controls, g.negControls)) {
          [re[i], re[j]] = [re[j]!, re[i]!];
          [im[i], im[j]] = [im[j]!, im[i]!];
        }
      }
    } else {
      const [a0, a1, b0, b1, c0, c1, d0, d1] = g.matrix;
      const bit = 1 << g.target;
      for (let i = 0; i < dim; i++) {
        if ((i & bit) !== 0 || !active(i, g.controls, g.negControls)) continue;
        const j = i | bit;
        const xr = re[i]!, xi = im[i]!, yr = re[j]!, yi = im[j]!;
        re[i] = a0 * xr - a1 * xi + b0 * yr - b1 * yi;
        im[i] = a0 * xi + a1 * xr + b0 * yi + b1 * yr;
        re[j] = c0 * xr - c1 * xi + d0 * yr - d1 * yi;
        im[j] = c0 * xi + c1 * xr + d0 * yi + d1 * yr;
      }
    }
  }
  return { re, im };
}

/** The computational basis state |index> on `qubits` qubits. */
export function basisState(qubits: number, index: number): State {
  const re = new Float64Array(1 << qubits);
  re[index] = 1;
  return { re, im: new Float64Array(1 << qubits) };
}

/** The full 2^q × 2^q unitary of the block, column c = block applied to |c>. */
export function blockUnitary(block: Block, args: readonly number[] = []): ComplexMatrix {
  const dim = 1 << block.qubits;
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  for (let c = 0; c < dim; c++) {
    const out = simulateBlock(block, basisState(block.qubits, c), args);
    for (let r = 0; r < dim; r++) {
      re[r * dim + c] = out.re[r]!;
      im[r * dim + c] = out.im[r]!;
    }
  }
  return { n: dim, re, im };
}

/** The one-particle matrix u of a mode-register block: u_jk = <j| U |k> with |k> = a_k†|vac> = basis index 2^k. */
export function oneParticleMatrix(block: Block): ComplexMatrix {
  const n = block.qubits;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let k = 0; k < n; k++) {
    const out = simulateBlock(block, basisState(n, 1 << k));
    for (let j = 0; j < n; j++) {
      re[j * n + k] = out.re[1 << j]!;
      im[j * n + k] = out.im[1 << j]!;
    }
  }
  return { n, re, im };
}
