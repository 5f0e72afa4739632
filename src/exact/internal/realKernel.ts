/**
 * realKernel: y = H x for a real H over a range of each block's low rows (diagonal, high-mode hops
 * as a row sweep, low-mode hops as column sweeps). Rows are independent, so any split of them among
 * threads gives the same bytes: each row's sums run in the same order.
 */

/** One block of a sector with its hop tables in CSR form by destination. */
export interface KernelBlock {
  /** High patterns per low row. */
  readonly D: number;
  readonly nLow: number;
  readonly offset: number;
  readonly hStart: Int32Array;
  readonly hSrc: Int32Array;
  readonly hRe: Float64Array;
  readonly lStart: Int32Array;
  readonly lSrc: Int32Array;
  readonly lRe: Float64Array;
}

/** Rows [⌊nLow·part/parts⌋, ⌊nLow·(part+1)/parts⌋) of every block: y there is overwritten. */
export function applyRealRows(
  blocks: readonly KernelBlock[],
  diagonal: Float64Array,
  x: Float64Array,
  y: Float64Array,
  part: number,
  parts: number,
): void {
  for (const b of blocks) {
    const D = b.D;
    const off = b.offset;
    const r0 = Math.floor((b.nLow * part) / parts);
    const r1 = Math.floor((b.nLow * (part + 1)) / parts);
    const hStart = b.hStart;
    const hSrc = b.hSrc;
    const hRe = b.hRe;
    for (let r = r0; r < r1; r++) {
      const base = off + r * D;
      for (let d = 0; d < D; d++) {
        let acc = diagonal[base + d]! * x[base + d]!;
        const end = hStart[d + 1]!;
        for (let e = hStart[d]!; e < end; e++) acc += hRe[e]! * x[base + hSrc[e]!]!;
        y[base + d] = acc;
      }
      const lEnd = b.lStart[r + 1]!;
      for (let e = b.lStart[r]!; e < lEnd; e++) {
        const c = b.lRe[e]!;
        const so = off + b.lSrc[e]! * D;
        for (let t = 0; t < D; t++) y[base + t]! += c * x[so + t]!;
      }
    }
  }
}
