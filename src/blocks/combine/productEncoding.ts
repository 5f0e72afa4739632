/**
 * productEncoding: M_1 M_2 ⋯ M_k from encodings of each factor (the rightmost runs first), with the
 * factors' signal registers side by side and one shared pool for their clean registers (sequentialAncillas), and α
 * the product of their α. With separate ancillas the
 * projected block is the product of the factors' projected blocks, so the error bound is the telescoping sum
 * (productErrorBound).
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { call } from '../../circuit/ops.js';
import type { UnitaryOp } from '../../circuit/types.js';
import { memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';
import { matrixMultiply } from '../../linalg/matrixMultiply.js';
import { productErrorBound } from '../internal/productErrorBound.js';
import { sequentialAncillas } from '../internal/sequentialAncillas.js';

export function productEncoding(factors: readonly BlockEncoding[], label?: string): BlockEncoding {
  if (factors.length === 0) throw new RangeError('productEncoding: no factors');
  const n = (factors[0] as BlockEncoding).systemQubits;
  if (factors.some((f) => f.systemQubits !== n)) throw new RangeError('productEncoding: system sizes differ');
  const system = Array.from({ length: n }, (_, k) => k);
  const layout = sequentialAncillas(factors);
  const ops: UnitaryOp[] = [];
  for (let index = factors.length - 1; index >= 0; index--) {
    ops.push(call(factors[index]!.block, [...system, ...layout.offsets[index]!.map((o) => n + o)]));
  }
  const name = label ?? factors.map((f) => f.label).join(' · ');
  return {
    label: name,
    block: defineBlock({ name: 'product', role: `block-encoding of ${name}`, qubits: n + layout.size }, ops),
    systemQubits: n,
    ancillas: layout.ancillas,
    alpha: factors.reduce((a, f) => a * f.alpha, 1),
    exact: memoiseMatrix(() => factors.map((f) => f.exact()).reduce((a, b) => matrixMultiply(a, b))),
    costNotes: factors.flatMap((f) => f.costNotes),
    errorBound: productErrorBound(factors.map((f) => f.errorBound)),
  };
}
