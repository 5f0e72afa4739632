/**
 * tridiagonalEigen: eigenvalues (ascending) of a real symmetric tridiagonal matrix and selected rows
 * of its eigenvector matrix, by the implicit QL method (tql2 of EISPACK, as in the public-domain JAMA
 * library). Tracking only a few rows makes it O(m²) instead of O(m³).
 */

export interface TridiagonalEigen {
  readonly values: Float64Array;
  /** rows[r][k] = component `rowIndices[r]` of the k-th eigenvector (same order as values). */
  readonly rows: Float64Array[];
}

/**
 * @param diag α_0…α_{m−1}
 * @param off β_1…β_{m−1} (off[k] couples k and k+1; extra entries are ignored)
 * @param rowIndices which eigenvector components to return
 */
export function tridiagonalEigen(diag: ArrayLike<number>, off: ArrayLike<number>, rowIndices: readonly number[]): TridiagonalEigen {
  const n = diag.length;
  const d = Float64Array.from(diag);
  const e = new Float64Array(n);
  for (let i = 0; i < n - 1; i++) e[i] = off[i]!;
  const rows = rowIndices.map((r) => {
    const row = new Float64Array(n);
    row[r] = 1;
    return row;
  });
  ql(d, e, rows);
  return { values: d, rows };
}

/**
 * Implicit QL on (d, e) with e[i] = T[i][i+1], e[n−1] = 0; applies the rotations to each row of
 * `rows`; finishes with d ascending and the rows' columns permuted alike.
 */
export function ql(d: Float64Array, e: Float64Array, rows: Float64Array[]): void {
  const n = d.length;
  let f = 0;
  let tst1 = 0;
  const eps = 2 ** -52;
  for (let l = 0; l < n; l++) {
    tst1 = Math.max(tst1, Math.abs(d[l]!) + Math.abs(e[l]!));
    let m = l;
    while (m < n - 1 && Math.abs(e[m]!) > eps * tst1) m++;
    if (m > l) {
      let iter = 0;
      do {
        iter += 1;
        if (iter > 200) throw new Error('tridiagonalEigen: QL did not converge');
        let g = d[l]!;
        let p = (d[l + 1]! - g) / (2 * e[l]!);
        let r = Math.hypot(p, 1);
        if (p < 0) r = -r;
        d[l] = e[l]! / (p + r);
        d[l + 1] = e[l]! * (p + r);
        const dl1 = d[l + 1]!;
        let h = g - d[l]!;
        for (let i = l + 2; i < n; i++) d[i]! -= h;
        f += h;
        p = d[m]!;
        let c = 1;
        let c2 = c;
        let c3 = c;
        const el1 = e[l + 1]!;
        let s = 0;
        let s2 = 0;
        for (let i = m - 1; i >= l; i--) {
          c3 = c2;
          c2 = c;
          s2 = s;
          g = c * e[i]!;
          h = c * p;
          r = Math.hypot(p, e[i]!);
          e[i + 1] = s * r;
          s = e[i]! / r;
          c = p / r;
          p = c * d[i]! - s * g;
          d[i + 1] = h + s * (c * g + s * d[i]!);
          for (const row of rows) {
            h = row[i + 1]!;
            row[i + 1] = s * row[i]! + c * h;
            row[i] = c * row[i]! - s * h;
          }
        }
        p = (-s * s2 * c3 * el1 * e[l]!) / dl1;
        e[l] = s * p;
        d[l] = c * p;
      } while (Math.abs(e[l]!) > eps * tst1);
    }
    d[l] = d[l]! + f;
    e[l] = 0;
  }
  for (let i = 0; i < n - 1; i++) {
    let k = i;
    let p = d[i]!;
    for (let j = i + 1; j < n; j++) {
      if (d[j]! < p) {
        k = j;
        p = d[j]!;
      }
    }
    if (k !== i) {
      d[k] = d[i]!;
      d[i] = p;
      for (const row of rows) {
        const t = row[i]!;
        row[i] = row[k]!;
        row[k] = t;
      }
    }
  }
}
