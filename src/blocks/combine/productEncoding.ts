/**
 * productEncoding: M_1 M_2 ⋯ M_k from encodings of each factor (the rightmost runs first), with the
 * factors' ancilla registers side by side (roles kept) and α the product of their α. With separate ancillas the
 * projected block is the product of the factors' projected blocks, so the error bound is the telescoping sum
 * (productErrorBound).
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { call } from '../../circuit/ops.js';
import type { UnitaryOp } from '../../circuit/types.js';
import { ancillaQubits, memoiseMatrix, type AncillaRegister, type BlockEncoding } from '../BlockEncoding.js';
import { matrixMultiply } from '../../linalg/matrixMultiply.js';
import { productErrorBound } from '../internal/productErrorBound.js';

export function productEncoding(factors: readonly BlockEncoding[], label?: string): BlockEncoding {
  if (factors.length === 0) throw new RangeError('productEncoding: no factors');
  const n = (factors[0] as BlockEncoding).systemQubits;
  if (factors.some((f) => f.systemQubits !== n)) throw new RangeError('productEncoding: system sizes differ');
  const system = Array.from({ length: n }, (_, k) => k);
  const ancillas: AncillaRegister[] = [];
  const offsets: number[] = [];
  let next = n;
  for (const [index, f] of factors.entries()) {
    offsets.push(next);
    for (const r of f.ancillas) ancillas.push({ name: `${r.name}_${index}`, size: r.size, role: r.role });
    next += ancillaQubits(f);
  }
  const ops: UnitaryOp[] = [];
  for (let index = factors.length - 1; index >= 0; index--) {
    const f = factors[index] as BlockEncoding;
    const own = Array.from({ length: ancillaQubits(f) }, (_, k) => (offsets[index] as number) + k);
    ops.push(call(f.block, [...system, ...own]));
  }
  const name = label ?? factors.map((f) => f.label).join(' · ');
  return {
    label: name,
    block: defineBlock({ name: 'product', role: `block-encoding of ${name}`, qubits: next }, ops),
    systemQubits: n,
    ancillas,
    alpha: factors.reduce((a, f) => a * f.alpha, 1),
    exact: memoiseMatrix(() => factors.map((f) => f.exact()).reduce((a, b) => matrixMultiply(a, b))),
    costNotes: factors.flatMap((f) => f.costNotes),
    errorBound: productErrorBound(factors.map((f) => f.errorBound)),
  };
}
