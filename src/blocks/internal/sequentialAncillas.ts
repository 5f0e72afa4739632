/**
 * sequentialAncillas: the ancilla layout of encodings applied one after another (a product or a tensor product). Signal
 * registers stay separate, one set per factor (`name_k`); clean registers are shared, since each factor returns them
 * to |0> before the next one starts: one pool `shared_clean` as wide as the widest factor's clean part.
 */
import { ancillaRoles, type AncillaRegister, type BlockEncoding } from '../BlockEncoding.js';

export interface SequentialAncillas {
  readonly ancillas: AncillaRegister[];
  /** For factor k, the offset (from the first ancilla qubit) of each of its local ancilla qubits. */
  readonly offsets: number[][];
  readonly size: number;
}

export function sequentialAncillas(factors: readonly BlockEncoding[]): SequentialAncillas {
  const ancillas: AncillaRegister[] = [];
  let signalSize = 0;
  const signalStarts: number[] = [];
  for (const [k, f] of factors.entries()) {
    signalStarts.push(signalSize);
    for (const r of f.ancillas) {
      if (r.role !== 'signal') continue;
      ancillas.push({ name: `${r.name}_${k}`, size: r.size, role: 'signal' });
      signalSize += r.size;
    }
  }
  const pool = Math.max(0, ...factors.map((f) => ancillaRoles(f).filter((r) => r === 'clean').length));
  if (pool > 0) ancillas.push({ name: 'shared_clean', size: pool, role: 'clean' });
  const offsets = factors.map((f, k) => {
    let signal = signalStarts[k]!;
    let clean = signalSize;
    return ancillaRoles(f).map((role) => (role === 'signal' ? signal++ : clean++));
  });
  return { ancillas, offsets, size: signalSize + pool };
}
