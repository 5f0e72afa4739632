/**
 * fermionicFourierTransform: the fermionic Fourier transform on n = 2^k modes from fermionic swaps,
 * two-mode Fourier gates and twiddle phases, with the semantics of orbitalRotation(fourierMatrix(n)).
 */
import { defineBlock } from '../circuit/defineBlock.js';
import { call, gate } from '../circuit/ops.js';
import type { Block, UnitaryOp } from '../circuit/types.js';
import { fermionicSwap } from './fermionicSwap.js';
import { adjacentTranspositions } from './internal/adjacentTranspositions.js';
import { twoModeFourier } from './twoModeFourier.js';

export interface FermionicFourierOptions {
  /** Name of the top block; its stages are named `<name>_bit_reversal` and `<name>_stage_<m>`. Default `fermionic_fourier_transform`. */
  readonly name?: string;
}

/**
 * U(F) for F_jk = e^{2πi jk/n}/√n: U(F)† a_k† U(F) = Σ_j F_jk a_j†, U(F)|vac> = |vac>, so its one-particle
 * action is F†: |k> ↦ Σ_j e^{−2πi jk/n}/√n |j> (the momentum-k orbital of the rotated frame sits on qubit k).
 * Iterative radix-2 decimation in time (Cooley & Tukey, Math. Comp. 19, 297, 1965) on the mode register
 * (Verstraete, Cirac & Latorre, Phys. Rev. A 79, 032316, 2009): a bit-reversal permutation by an odd-even
 * transposition network of fermionic swaps, then for m = 2, 4, …, n one stage that interleaves the halves of
 * every m-block with fermionic swaps, applies the twiddles p(−2πt/m) and two-mode Fourier gates to the now
 * adjacent butterfly pairs, and un-interleaves. For n = 2 the body is exactly one `two_mode_fourier`.
 * @throws RangeError when n is not a power of two.
 */
export function fermionicFourierTransform(n: number, options: FermionicFourierOptions = {}): Block {
  if (!Number.isInteger(n) || n < 1 || (n & (n - 1)) !== 0) {
    throw new RangeError(`fermionicFourierTransform: n = ${n} modes is not a power of two`);
  }
  const name = options.name ?? 'fermionic_fourier_transform';
  const bits = Math.log2(n);
  const ops: UnitaryOp[] = [];
  const reversal = Array.from({ length: n }, (_, i) => reverseBits(i, bits));
  ops.push(...section(`${name}_bit_reversal`, `bit-reversal permutation of ${n} modes by fermionic swaps`, n, fswaps(adjacentTranspositions(reversal))));
  for (let m = 2; m <= n; m *= 2) {
    ops.push(...section(`${name}_stage_${m}`, `radix-2 butterflies of size ${m}: interleave, twiddles, F2 gates, un-interleave`, n, stage(n, m)));
  }
  return defineBlock({ name, role: `fermionic Fourier transform of ${n} modes (one-particle action F dagger)`, qubits: n }, ops);
}

function reverseBits(i: number, bits: number): number {
  let out = 0;
  for (let b = 0; b < bits; b++) out |= ((i >> b) & 1) << (bits - 1 - b);
  return out;
}

function fswaps(positions: readonly number[]): UnitaryOp[] {
  return positions.map((p) => call(fermionicSwap, [p, p + 1]));
}

/** One butterfly stage: the pair (s+t, s+t+m/2) of each m-block is brought to (s+2t, s+2t+1). */
function stage(n: number, m: number): UnitaryOp[] {
  const h = m / 2;
  const destination = Array.from({ length: n }, (_, i) => {
    const s = i - (i % m);
    const t = i - s;
    return t < h ? s + 2 * t : s + 2 * (t - h) + 1;
  });
  const interleave = adjacentTranspositions(destination);
  const ops = fswaps(interleave);
  for (let s = 0; s < n; s += m) {
    for (let t = 0; t < h; t++) {
      if (t > 0) ops.push(gate('p', [s + 2 * t + 1], [(-2 * Math.PI * t) / m]));
      ops.push(call(twoModeFourier, [s + 2 * t, s + 2 * t + 1]));
    }
  }
  ops.push(...fswaps([...interleave].reverse()));
  return ops;
}

/** The ops as one named sub-block call, or inline when there are at most one of them (no needless nesting). */
function section(name: string, role: string, qubits: number, ops: UnitaryOp[]): UnitaryOp[] {
  if (ops.length <= 1) return ops;
  const block = defineBlock({ name, role, qubits }, ops);
  return [call(block, Array.from({ length: qubits }, (_, q) => q))];
}
