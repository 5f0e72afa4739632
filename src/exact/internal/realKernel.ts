/**
 * realKernel: y = H x for a real H over a range of each block's low rows (diagonal, high-mode hops
 * as a row sweep, low-mode hops as column sweeps). Rows are independent, so any split of them among
 * threads gives the same bytes: each row's sums run in the same order.
 */

/**
 * A Lanczos step fused into the product: after its row of H x, each row does y = c·y − s·z and stores
 * Σ x·y over the row in partials[row] (rows numbered through all blocks), while the row is in cache.
 */
export interface RowStep {
  readonly c: number;
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
 * diagonal and high hops run eight rows at a time (one pass over the shared high-hop table serves
 * eight rows; measured ~10% faster than four); how rows are grouped does not change any row's
 * sums. With `step`, each row then finishes as RowStep describes.
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
    for (; r + 7 < r1; r += 8) {
      const b0 = off + r * D;
      let e = hStart[0]!;
      for (let d = 0; d < D; d++) {
        const p = b0 + d;
        let a0 = diagonal[p]! * x[p]!;
        let a1 = diagonal[p + D]! * x[p + D]!;
        let a2 = diagonal[p + 2 * D]! * x[p + 2 * D]!;
        let a3 = diagonal[p + 3 * D]! * x[p + 3 * D]!;
        let a4 = diagonal[p + 4 * D]! * x[p + 4 * D]!;
        let a5 = diagonal[p + 5 * D]! * x[p + 5 * D]!;
        let a6 = diagonal[p + 6 * D]! * x[p + 6 * D]!;
        let a7 = diagonal[p + 7 * D]! * x[p + 7 * D]!;
        const end = hStart[d + 1]!;
        for (; e < end; e++) {
          const c = hRe[e]!;
          const q = b0 + hSrc[e]!;
          a0 += c * x[q]!;
          a1 += c * x[q + D]!;
          a2 += c * x[q + 2 * D]!;
          a3 += c * x[q + 3 * D]!;
          a4 += c * x[q + 4 * D]!;
          a5 += c * x[q + 5 * D]!;
          a6 += c * x[q + 6 * D]!;
          a7 += c * x[q + 7 * D]!;
        }
        y[p] = a0;
        y[p + D] = a1;
        y[p + 2 * D] = a2;
        y[p + 3 * D] = a3;
        y[p + 4 * D] = a4;
        y[p + 5 * D] = a5;
        y[p + 6 * D] = a6;
        y[p + 7 * D] = a7;
      }
      for (let q = r; q < r + 8; q++) {
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

/** y = c·y − s·z over the D entries from base, then partials[row] = Σ x·y there. */
function finishRow(step: RowStep, x: Float64Array, y: Float64Array, base: number, D: number, row: number): void {
  const c = step.c;
  const s = step.s;
  const z = step.z;
  const end = base + D;
  let sum = 0;
  for (let t = base; t < end; t++) {
    const w = c * y[t]! + -s * z[t]!;
    y[t] = w;
    sum += x[t]! * w;
  }
  step.partials[row] = sum;
}

/**
 * The rest of a Lanczos step over the same rows as applyRealRows: w −= Σ_k coefs[k]·vectors[k], then
 * per row partials[row·(1 + J)] = Σ w² and partials[row·(1 + J) + 1 + j] = Σ against[j]·w (J =
 * against.length); with `copy`, w is also written there in single precision. Each row is updated
 * and summed while it is in cache.
 */
export interface RowUpdate {
  readonly coefs: readonly number[];
  readonly vectors: readonly Float64Array[];
  readonly w: Float64Array;
  readonly against: readonly Float64Array[];
  readonly copy: Float32Array | null;
  readonly partials: Float64Array;
}

export function applyRowUpdate(blocks: readonly KernelBlock[], op: RowUpdate, part: number, parts: number): void {
  const { coefs, vectors, w, against, copy, partials } = op;
  const stride = 1 + against.length;
  // The last term is subtracted in the same pass as the sum of squares (the common case is one term).
  const last = coefs.length - 1;
  let rows = 0;
  for (const b of blocks) {
    const D = b.D;
    const r0 = Math.floor((b.nLow * part) / parts);
    const r1 = Math.floor((b.nLow * (part + 1)) / parts);
    for (let r = r0; r < r1; r++) {
      const base = b.offset + r * D;
      const end = base + D;
      for (let k = 0; k < last; k++) {
        const c = coefs[k]!;
        const v = vectors[k]!;
        for (let t = base; t < end; t++) w[t]! += -c * v[t]!;
      }
      let sum = 0;
      if (last >= 0) {
        const c = coefs[last]!;
        const v = vectors[last]!;
        for (let t = base; t < end; t++) {
          const u = w[t]! + -c * v[t]!;
          w[t] = u;
          sum += u * u;
        }
      } else for (let t = base; t < end; t++) sum += w[t]! * w[t]!;
      const slot = (rows + r) * stride;
      partials[slot] = sum;
      for (let j = 0; j < against.length; j++) {
        const q = against[j]!;
        let overlap = 0;
        for (let t = base; t < end; t++) overlap += q[t]! * w[t]!;
        partials[slot + 1 + j] = overlap;
      }
      if (copy !== null) for (let t = base; t < end; t++) copy[t] = w[t]!;
    }
    rows += b.nLow;
  }
}

/** y_row += Σ c·x_src over the row's low hops, up to six source rows per pass over y_row (fewer passes over y). */
function lowHops(b: KernelBlock, x: Float64Array, y: Float64Array, row: number): void {
  const D = b.D;
  const off = b.offset;
  const lSrc = b.lSrc;
  const lRe = b.lRe;
  const base = off + row * D;
  const end = b.lStart[row + 1]!;
  let k = b.lStart[row]!;
  for (; k + 5 < end; k += 6) {
    const c0 = lRe[k]!;
    const c1 = lRe[k + 1]!;
    const c2 = lRe[k + 2]!;
    const c3 = lRe[k + 3]!;
    const c4 = lRe[k + 4]!;
    const c5 = lRe[k + 5]!;
    const s0 = off + lSrc[k]! * D;
    const s1 = off + lSrc[k + 1]! * D;
    const s2 = off + lSrc[k + 2]! * D;
    const s3 = off + lSrc[k + 3]! * D;
    const s4 = off + lSrc[k + 4]! * D;
    const s5 = off + lSrc[k + 5]! * D;
    for (let t = 0; t < D; t++) {
      y[base + t]! += c0 * x[s0 + t]! + c1 * x[s1 + t]! + c2 * x[s2 + t]! + c3 * x[s3 + t]! + c4 * x[s4 + t]! + c5 * x[s5 + t]!;
    }
  }
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
