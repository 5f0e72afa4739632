/** nonInteractingGreen: G0(z) = (z − T)⁻¹ for the one-body matrix T (chemical potential included). */
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { Complex } from './greensFunction.js';
import { complexInverse } from './internal/complexInverse.js';

/** @throws RangeError when z is an eigenvalue of T */
export function nonInteractingGreen(oneBody: ComplexMatrix, z: Complex): ComplexMatrix {
  return complexInverse(zMinus(oneBody, z));
}

/** z·1 − T. */
export function zMinus(oneBody: ComplexMatrix, z: Complex): ComplexMatrix {
  const n = oneBody.n;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let k = 0; k < n * n; k++) {
    re[k] = -oneBody.re[k]!;
    im[k] = -oneBody.im[k]!;
  }
  for (let i = 0; i < n; i++) {
    re[i * n + i]! += z.re;
    im[i * n + i]! += z.im;
  }
  return { n, re, im };
}
