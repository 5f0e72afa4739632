/**
 * tensorEncoding: M_high ⊗ M_low, with `low` on system qubits 0 … n_low−1 and `high` above them;
 * signal registers side by side (factor 0 = low, 1 = high) and clean registers shared (sequentialAncillas), α multiplied. The projected block is Ũ_high ⊗ Ũ_low = (Ũ_high ⊗ I)(I ⊗ Ũ_low),
 * so the error bound is the product's telescoping bound.
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { call } from '../../circuit/ops.js';
import { memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';
import { kronMatrices } from '../../linalg/kronMatrices.js';
import { productErrorBound } from '../internal/productErrorBound.js';
import { sequentialAncillas } from '../internal/sequentialAncillas.js';

const span = (start: number, size: number): number[] => Array.from({ length: size }, (_, k) => start + k);

export function tensorEncoding(high: BlockEncoding, low: BlockEncoding, label = `${high.label} ⊗ ${low.label}`): BlockEncoding {
  const nLow = low.systemQubits;
  const nHigh = high.systemQubits;
  const n = nLow + nHigh;
  const layout = sequentialAncillas([low, high]);
  const [lowOffsets, highOffsets] = layout.offsets as [number[], number[]];
  return {
    label,
    block: defineBlock({ name: 'tensor', role: `block-encoding of ${label}`, qubits: n + layout.size }, [
      call(low.block, [...span(0, nLow), ...lowOffsets.map((o) => n + o)]),
      call(high.block, [...span(nLow, nHigh), ...highOffsets.map((o) => n + o)]),
    ]),
    systemQubits: n,
    ancillas: layout.ancillas,
    alpha: low.alpha * high.alpha,
    exact: memoiseMatrix(() => kronMatrices(high.exact(), low.exact())),
    costNotes: [...low.costNotes, ...high.costNotes],
    errorBound: productErrorBound([high.errorBound, low.errorBound]),
  };
}
