// kronMatrices: the Kronecker product high ⊗ low, with `low` on the low-order bits of the index (little-endian qubits).
import type { ComplexMatrix } from './ComplexMatrix.js';
import { zeroMatrix } from './zeroMatrix.js';

/** high ⊗ low: `low` acts on the low-order bits of the index. */
export function kronMatrices(high: ComplexMatrix, low: ComplexMatrix): ComplexMatrix {
  const n = high.n * low.n;
  const out = zeroMatrix(n);
  for (let hi = 0; hi < high.n; hi++) {
    for (let hj = 0; hj < high.n; hj++) {
      const hr = high.re[hi * high.n + hj] as number;
      const him = high.im[hi * high.n + hj] as number;
      if (hr === 0 && him === 0) continue;
      for (let li = 0; li < low.n; li++) {
        for (let lj = 0; lj < low.n; lj++) {
          const lr = low.re[li * low.n + lj] as number;
          const lim = low.im[li * low.n + lj] as number;
          const e = (hi * low.n + li) * n + hj * low.n + lj;
          out.re[e] = hr * lr - him * lim;
          out.im[e] = hr * lim + him * lr;
        }
      }
    }
  }
  return out;
}
