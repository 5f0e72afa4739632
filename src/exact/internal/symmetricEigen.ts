/**
 * symmetricEigen: all eigenpairs of a dense real symmetric matrix by Householder tridiagonalisation
 * (tred2) and implicit QL (tql2), after EISPACK as given in the public-domain JAMA library.
 */
import { ql } from './tridiagonalEigen.js';

export interface SymmetricEigen {
  /** Ascending. */
  readonly values: Float64Array;
  /** Row-major n×n; column k is the eigenvector of values[k]. */
  readonly vectors: Float64Array;
}

/** `a` is row-major n×n and symmetric (only its lower triangle is read). */
export function symmetricEigen(a: Float64Array, n: number): SymmetricEigen {
  const V: Float64Array[] = [];
  for (let i = 0; i < n; i++) V.push(a.slice(i * n, i * n + n));
  const d = new Float64Array(n);
  const e = new Float64Array(n);
  if (n > 0) tred2(V, d, e, n);
  for (let i = 1; i < n; i++) e[i - 1] = e[i]!;
  if (n > 0) e[n - 1] = 0;
  ql(d, e, V);
  const vectors = new Float64Array(n * n);
  for (let i = 0; i < n; i++) vectors.set(V[i]!, i * n);
  return { values: d, vectors };
}

function tred2(V: Float64Array[], d: Float64Array, e: Float64Array, n: number): void {
  for (let j = 0; j < n; j++) d[j] = V[n - 1]![j]!;
  for (let i = n - 1; i > 0; i--) {
    let scale = 0;
    let h = 0;
    for (let k = 0; k < i; k++) scale += Math.abs(d[k]!);
    if (scale === 0) {
      e[i] = d[i - 1]!;
      for (let j = 0; j < i; j++) {
        d[j] = V[i - 1]![j]!;
        V[i]![j] = 0;
        V[j]![i] = 0;
      }
    } else {
      for (let k = 0; k < i; k++) {
        d[k]! /= scale;
        h += d[k]! * d[k]!;
      }
      let f = d[i - 1]!;
      let g = Math.sqrt(h);
      if (f > 0) g = -g;
      e[i] = scale * g;
      h -= f * g;
      d[i - 1] = f - g;
      for (let j = 0; j < i; j++) e[j] = 0;
      for (let j = 0; j < i; j++) {
        f = d[j]!;
        V[j]![i] = f;
        g = e[j]! + V[j]![j]! * f;
        for (let k = j + 1; k <= i - 1; k++) {
          g += V[k]![j]! * d[k]!;
          e[k]! += V[k]![j]! * f;
        }
        e[j] = g;
      }
      f = 0;
      for (let j = 0; j < i; j++) {
        e[j]! /= h;
        f += e[j]! * d[j]!;
      }
      const hh = f / (h + h);
      for (let j = 0; j < i; j++) e[j]! -= hh * d[j]!;
      for (let j = 0; j < i; j++) {
        f = d[j]!;
        g = e[j]!;
        for (let k = j; k <= i - 1; k++) V[k]![j]! -= f * e[k]! + g * d[k]!;
        d[j] = V[i - 1]![j]!;
        V[i]![j] = 0;
      }
    }
    d[i] = h;
  }
  for (let i = 0; i < n - 1; i++) {
    V[n - 1]![i] = V[i]![i]!;
    V[i]![i] = 1;
    const h = d[i + 1]!;
    if (h !== 0) {
      for (let k = 0; k <= i; k++) d[k] = V[k]![i + 1]! / h;
      for (let j = 0; j <= i; j++) {
        let g = 0;
        for (let k = 0; k <= i; k++) g += V[k]![i + 1]! * V[k]![j]!;
        for (let k = 0; k <= i; k++) V[k]![j]! -= g * d[k]!;
      }
    }
    for (let k = 0; k <= i; k++) V[k]![i + 1] = 0;
  }
  for (let j = 0; j < n; j++) {
    d[j] = V[n - 1]![j]!;
    V[n - 1]![j] = 0;
  }
  V[n - 1]![n - 1] = 1;
  e[0] = 0;
}
