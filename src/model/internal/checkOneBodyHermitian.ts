// checkOneBodyHermitian: T must equal its conjugate transpose; names the offending entries, then symmetrises rounding.
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import { formatComplex } from './formatComplex.js';
import type { Problem } from './Problem.js';

/** Relative tolerance of the Hermiticity checks, times max(1, largest |entry|). */
export const HERMITIAN_TOLERANCE = 1e-12;

/**
 * Pushes one problem per pair (i ≤ j) with |T_ij − conj(T_ji)| above tolerance; `sources(i, j)` lists the
 * input rows that fed entry (i, j). When T passes, replaces it in place by (T + T†)/2 so it is exactly Hermitian.
 */
export function checkOneBodyHermitian(
  t: ComplexMatrix,
  field: string,
  sources: (i: number, j: number) => string,
  problems: Problem[],
): void {
  const n = t.n;
  let scale = 1;
  for (let e = 0; e < n * n; e++) scale = Math.max(scale, Math.hypot(t.re[e]!, t.im[e]!));
  const tol = HERMITIAN_TOLERANCE * scale;
  let bad = false;
  for (let i = 0; i < n; i++) {
    for (let j = i; j < n; j++) {
      const ij = i * n + j;
      const ji = j * n + i;
      const dRe = t.re[ij]! - t.re[ji]!;
      const dIm = t.im[ij]! + t.im[ji]!;
      if (Math.hypot(dRe, dIm) <= tol) continue;
      bad = true;
      const where = i === j ? `T[${i}][${i}] = ${formatComplex(t.re[ij]!, t.im[ij]!)} is not real` :
        `T[${i}][${j}] = ${formatComplex(t.re[ij]!, t.im[ij]!)} but conj(T[${j}][${i}]) = ${formatComplex(t.re[ji]!, -t.im[ji]!)}`;
      problems.push({ path: [field], message: `not Hermitian: ${where} (${sources(i, j)})` });
    }
  }
  if (bad) return;
  for (let i = 0; i < n; i++) {
    for (let j = i; j < n; j++) {
      const ij = i * n + j;
      const ji = j * n + i;
      const re = (t.re[ij]! + t.re[ji]!) / 2;
      const im = (t.im[ij]! - t.im[ji]!) / 2;
      t.re[ij] = re;
      t.im[ij] = im;
      t.re[ji] = re;
      t.im[ji] = 0 - im; // 0 − im, not −im, so a real entry never becomes −0
    }
  }
}
