// Test-only dense Fock-space operators built independently of the rotation code: rotated creation operators and H₁ = Σ T_ij a_i† a_j.
import type { ComplexMatrix } from '../../../src/linalg/ComplexMatrix.js';
import { addFermion } from '../../../src/operators/addFermion.js';
import { ladderSumMatrix } from '../../../src/operators/ladderSumMatrix.js';
import { fermionProduct } from '../../../src/operators/fermionProduct.js';

/** The dense matrix of b_k† = Σ_j V_jk a_j† on the 2^n Fock space. */
export function rotatedCreationMatrix(V: ComplexMatrix, k: number): ComplexMatrix {
  const n = V.n;
  const terms = Array.from({ length: n }, (_, j) => fermionProduct([{ mode: j, dagger: true }], V.re[j * n + k]!, V.im[j * n + k]!));
  return ladderSumMatrix(addFermion(...terms), n);
}

/** The dense matrix of a_k† on n modes. */
export function creationMatrix(n: number, k: number): ComplexMatrix {
  return ladderSumMatrix(fermionProduct([{ mode: k, dagger: true }]), n);
}

/** The dense matrix of Σ_ij T_ij a_i† a_j. */
export function oneBodyMatrix(T: ComplexMatrix): ComplexMatrix {
  const n = T.n;
  const terms = [];
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      terms.push(fermionProduct([{ mode: i, dagger: true }, { mode: j, dagger: false }], T.re[i * n + j]!, T.im[i * n + j]!));
    }
  }
  return ladderSumMatrix(addFermion(...terms), n);
}

/** The dense matrix of Σ_k ε_k n_k. */
export function numberWeightedMatrix(energies: ArrayLike<number>): ComplexMatrix {
  const n = energies.length;
  const dim = 1 << n;
  const re = new Float64Array(dim * dim);
  for (let s = 0; s < dim; s++) {
    for (let k = 0; k < n; k++) if (((s >> k) & 1) === 1) re[s * dim + s]! += energies[k]!;
  }
  return { n: dim, re, im: new Float64Array(dim * dim) };
}

/** Matrix times vector. */
export function applyMatrix(m: ComplexMatrix, v: { re: ArrayLike<number>; im: ArrayLike<number> }): { re: Float64Array; im: Float64Array } {
  const n = m.n;
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const ar = m.re[i * n + j]!;
      const ai = m.im[i * n + j]!;
      re[i]! += ar * v.re[j]! - ai * v.im[j]!;
      im[i]! += ar * v.im[j]! + ai * v.re[j]!;
    }
  }
  return { re, im };
}

/** <a|b>. */
export function innerProduct(a: { re: ArrayLike<number>; im: ArrayLike<number> }, b: { re: ArrayLike<number>; im: ArrayLike<number> }): [number, number] {
  let re = 0;
  let im = 0;
  for (let i = 0; i < a.re.length; i++) {
    re += a.re[i]! * b.re[i]! + a.im[i]! * b.im[i]!;
    im += a.re[i]! * b.im[i]! - a.im[i]! * b.re[i]!;
  }
  return [re, im];
}
