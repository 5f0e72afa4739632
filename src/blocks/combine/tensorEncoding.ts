/**
 * tensorEncoding: M_high ⊗ M_low, with `low` on system qubits 0 … n_low−1 and `high` above them;
 * ancilla registers side by side (roles kept), α multiplied. The projected block is Ũ_high ⊗ Ũ_low = (Ũ_high ⊗ I)(I ⊗ Ũ_low),
 * so the error bound is the product's telescoping bound.
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { call } from '../../circuit/ops.js';
import { ancillaQubits, memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';
import { kronMatrices } from '../../linalg/kronMatrices.js';
import { productErrorBound } from '../internal/productErrorBound.js';

const span = (start: number, size: number): number[] => Array.from({ length: size }, (_, k) => start + k);

export function tensorEncoding(high: BlockEncoding, low: BlockEncoding, label = `${high.label} ⊗ ${low.label}`): BlockEncoding {
  const nLow = low.systemQubits;
  const nHigh = high.systemQubits;
  const n = nLow + nHigh;
  const aLow = ancillaQubits(low);
  const aHigh = ancillaQubits(high);
  return {
    label,
    block: defineBlock({ name: 'tensor', role: `block-encoding of ${label}`, qubits: n + aLow + aHigh }, [
      call(low.block, [...span(0, nLow), ...span(n, aLow)]),
      call(high.block, [...span(nLow, nHigh), ...span(n + aLow, aHigh)]),
    ]),
    systemQubits: n,
    ancillas: [
      ...low.ancillas.map((r) => ({ name: `${r.name}_low`, size: r.size, role: r.role })),
      ...high.ancillas.map((r) => ({ name: `${r.name}_high`, size: r.size, role: r.role })),
    ],
    alpha: low.alpha * high.alpha,
    exact: memoiseMatrix(() => kronMatrices(high.exact(), low.exact())),
    costNotes: [...low.costNotes, ...high.costNotes],
    errorBound: productErrorBound([high.errorBound, low.errorBound]),
  };
}
