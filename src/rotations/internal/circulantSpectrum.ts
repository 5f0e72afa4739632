/**
 * circulantSpectrum: recognises T as `blocks` equal-sized diagonal blocks, each circulant (translation-invariant ring),
 * and returns the plane-wave energies ε_k = Σ_d T_{0,d} e^{2πi dk/L} per block (Davis, Circulant Matrices, 1979).
 */
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';

/**
 * Energies in qubit order (block b, momentum k at index b·L + k), or null when T couples different blocks or a
 * block is not circulant (T_{i,j} = T_{0,(j−i) mod L}) within `tolerance` (absolute).
 */
export function circulantSpectrum(T: ComplexMatrix, blocks: number, tolerance: number): Float64Array | null {
  const n = T.n;
  if (blocks < 1 || n % blocks !== 0) return null;
  const L = n / blocks;
  const entry = (i: number, j: number): [number, number] => [T.re[i * n + j]!, T.im[i * n + j]!];
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const bi = Math.floor(i / L);
      const [r, m] = entry(i, j);
      if (bi !== Math.floor(j / L)) {
        if (Math.hypot(r, m) > tolerance) return null;
        continue;
      }
      const origin = bi * L;
      const [r0, m0] = entry(origin, origin + (((j - i) % L) + L) % L);
      if (Math.hypot(r - r0, m - m0) > tolerance) return null;
    }
  }
  const energies = new Float64Array(n);
  for (let b = 0; b < blocks; b++) {
    for (let k = 0; k < L; k++) {
      let sum = 0;
      for (let d = 0; d < L; d++) {
        const angle = (2 * Math.PI * ((d * k) % L)) / L;
        const [r, m] = entry(b * L, b * L + d);
        // Re(T_{0,d} e^{iθ}); the imaginary part cancels for Hermitian T.
        sum += r * Math.cos(angle) - m * Math.sin(angle);
      }
      energies[b * L + k] = sum;
    }
  }
  return energies;
}
