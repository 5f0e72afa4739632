/**
 * realKernel: y = H x for a real H over a range of each block's low rows (diagonal, high-mode hops
 * as a row sweep, low-mode hops as column sweeps). Rows are independent, so any split of them among
 * threads gives the same bytes: each row's sums run in the same order.
 */

/**
 * A Lanczos step fused into the product: after its row of H x, each row does y −= s·z and stores
 * Σ x·y over the row in partials[row] (rows numbered through all blocks), while the row is in cache.
 */
export interface RowStep {
  readonly s: number;
  readonly z: Float64Array;
  readonly partials: Float64Array;
}

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

/**
 * Rows [⌊nLow·part/parts⌋, ⌊nLow·(part+1)/parts⌋) of every block: y there is overwritten. The
 * diagonal and high hops run four rows at a time (one pass over the shared high-hop table serves
 * four rows); how rows are grouped does not change any row's sums. With `step`, each row then
 * finishes as RowStep describes.
 */
export function applyRealRows(
  blocks: readonly KernelBlock[],
  diagonal: Float64Array,
  x: Float64Array,
  y: Float64Array,
  part: number,
  parts: number,
  step: RowStep | null = null,
): void {
  let rows = 0;
  for (const b of blocks) {
    const D = b.D;
    const off = b.offset;
    const r0 = Math.floor((b.nLow * part) / parts);
    const r1 = Math.floor((b.nLow * (part + 1)) / parts);
    const hStart = b.hStart;
    const hSrc = b.hSrc;
    const hRe = b.hRe;
    let r = r0;
    for (; r + 3 < r1; r += 4) {
      const b0 = off + r * D;
      const b1 = b0 + D;
      const b2 = b1 + D;
      const b3 = b2 + D;
      let e = hStart[0]!;
      for (let d = 0; d < D; d++) {
        let a0 = diagonal[b0 + d]! * x[b0 + d]!;
        let a1 = diagonal[b1 + d]! * x[b1 + d]!;
        let a2 = diagonal[b2 + d]! * x[b2 + d]!;
        let a3 = diagonal[b3 + d]! * x[b3 + d]!;
        const end = hStart[d + 1]!;
        for (; e < end; e++) {
          const c = hRe[e]!;
          const s = hSrc[e]!;
          a0 += c * x[b0 + s]!;
          a1 += c * x[b1 + s]!;
          a2 += c * x[b2 + s]!;
          a3 += c * x[b3 + s]!;
        }
        y[b0 + d] = a0;
        y[b1 + d] = a1;
        y[b2 + d] = a2;
        y[b3 + d] = a3;
      }
      for (let q = r; q < r + 4; q++) {
        lowHops(b, x, y, q);
        if (step !== null) finishRow(step, x, y, b0 + (q - r) * D, D, rows + q);
      }
    }
    for (; r < r1; r++) {
      const base = off + r * D;
      let e = hStart[0]!;
      for (let d = 0; d < D; d++) {
        let acc = diagonal[base + d]! * x[base + d]!;
        const end = hStart[d + 1]!;
        for (; e < end; e++) acc += hRe[e]! * x[base + hSrc[e]!]!;
        y[base + d] = acc;
      }
      lowHops(b, x, y, r);
      if (step !== null) finishRow(step, x, y, base, D, rows + r);
    }
    rows += b.nLow;
  }
}

/** y −= s·z over the D entries from base, then partials[row] = Σ x·y there. */
function finishRow(step: RowStep, x: Float64Array, y: Float64Array, base: number, D: number, row: number): void {
  const s = step.s;
  const z = step.z;
  const end = base + D;
  let sum = 0;
  for (let t = base; t < end; t++) {
    const w = y[t]! + -s * z[t]!;
    y[t] = w;
    sum += x[t]! * w;
  }
  step.partials[row] = sum;
}

/**
 * The rest of a Lanczos step over the same rows as applyRealRows: 'subtractNorm' does w −= a·v and
 * stores Σ w² over each row in partials[row]; 'scale' does w *= c.
 */
export type RowOp =
  | { readonly kind: 'subtractNorm'; readonly a: number; readonly v: Float64Array; readonly w: Float64Array; readonly partials: Float64Array }
  | { readonly kind: 'scale'; readonly c: number; readonly w: Float64Array };

export function applyRowOp(blocks: readonly KernelBlock[], op: RowOp, part: number, parts: number): void {
  let rows = 0;
  for (const b of blocks) {
    const D = b.D;
    const r0 = Math.floor((b.nLow * part) / parts);
    const r1 = Math.floor((b.nLow * (part + 1)) / parts);
    const w = op.w;
    if (op.kind === 'scale') {
      const c = op.c;
      const end = b.offset + r1 * D;
      for (let t = b.offset + r0 * D; t < end; t++) w[t]! *= c;
    } else {
      const a = op.a;
      const v = op.v;
      const partials = op.partials;
      for (let r = r0; r < r1; r++) {
        const base = b.offset + r * D;
        const end = base + D;
        let sum = 0;
        for (let t = base; t < end; t++) {
          const u = w[t]! + -a * v[t]!;
          w[t] = u;
          sum += u * u;
        }
        partials[rows + r] = sum;
      }
    }
    rows += b.nLow;
  }
}

/** y_row += Σ c·x_src over the row's low hops, up to four source rows per pass over y_row. */
function lowHops(b: KernelBlock, x: Float64Array, y: Float64Array, row: number): void {
  const D = b.D;
  const off = b.offset;
  const lSrc = b.lSrc;
  const lRe = b.lRe;
  const base = off + row * D;
  const end = b.lStart[row + 1]!;
  let k = b.lStart[row]!;
  for (; k + 3 < end; k += 4) {
    const c0 = lRe[k]!;
    const c1 = lRe[k + 1]!;
    const c2 = lRe[k + 2]!;
    const c3 = lRe[k + 3]!;
    const s0 = off + lSrc[k]! * D;
    const s1 = off + lSrc[k + 1]! * D;
    const s2 = off + lSrc[k + 2]! * D;
    const s3 = off + lSrc[k + 3]! * D;
    for (let t = 0; t < D; t++) y[base + t]! += c0 * x[s0 + t]! + c1 * x[s1 + t]! + c2 * x[s2 + t]! + c3 * x[s3 + t]!;
  }
  for (; k + 1 < end; k += 2) {
    const c0 = lRe[k]!;
    const c1 = lRe[k + 1]!;
    const s0 = off + lSrc[k]! * D;
    const s1 = off + lSrc[k + 1]! * D;
    for (let t = 0; t < D; t++) y[base + t]! += c0 * x[s0 + t]! + c1 * x[s1 + t]!;
  }
  if (k < end) {
    const c = lRe[k]!;
    const s = off + lSrc[k]! * D;
    for (let t = 0; t < D; t++) y[base + t]! += c * x[s + t]!;
  }
}
