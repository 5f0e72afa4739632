// Test-only random matrices from a seed: complex Gaussian, Haar-ish unitaries (Gram–Schmidt QR with phase fix), Hermitian.
import { seededRandom, type RandomSource } from '../../../src/core/seededRandom.js';
import type { ComplexMatrix } from '../../../src/linalg/ComplexMatrix.js';

function gaussian(random: RandomSource): number {
  // Box–Muller.
  const u = 1 - random.next();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random.next());
}

export function randomComplexGaussian(n: number, seed: number): ComplexMatrix {
  const random = seededRandom(seed);
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let e = 0; e < n * n; e++) {
    re[e] = gaussian(random);
    im[e] = gaussian(random);
  }
  return { n, re, im };
}

/**
 * Q of the QR decomposition of a complex Gaussian matrix with R's diagonal made positive, which is Haar
 * distributed (Mezzadri, Notices AMS 54, 592, 2007, from memory; modified Gram–Schmidt gives that Q directly).
 */
export function randomUnitary(n: number, seed: number): ComplexMatrix {
  const { re, im } = randomComplexGaussian(n, seed);
  for (let k = 0; k < n; k++) {
    // Two passes of projections ("twice is enough": Giraud et al., Numer. Math. 101, 87, 2005; from memory).
    for (let pass = 0; pass < 2 * k; pass++) {
      const j = pass % k;
      let dr = 0;
      let di = 0;
      for (let r = 0; r < n; r++) {
        // <q_j, a_k> = Σ conj(q_j) a_k
        dr += re[r * n + j]! * re[r * n + k]! + im[r * n + j]! * im[r * n + k]!;
        di += re[r * n + j]! * im[r * n + k]! - im[r * n + j]! * re[r * n + k]!;
      }
      for (let r = 0; r < n; r++) {
        re[r * n + k]! -= dr * re[r * n + j]! - di * im[r * n + j]!;
        im[r * n + k]! -= dr * im[r * n + j]! + di * re[r * n + j]!;
      }
    }
    let norm = 0;
    for (let r = 0; r < n; r++) norm += re[r * n + k]! ** 2 + im[r * n + k]! ** 2;
    norm = Math.sqrt(norm);
    for (let r = 0; r < n; r++) {
      re[r * n + k]! /= norm;
      im[r * n + k]! /= norm;
    }
  }
  return { n, re, im };
}

/** (G + G†)/2 for a complex Gaussian G. */
export function randomHermitian(n: number, seed: number): ComplexMatrix {
  const g = randomComplexGaussian(n, seed);
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      re[i * n + j] = (g.re[i * n + j]! + g.re[j * n + i]!) / 2;
      im[i * n + j] = (g.im[i * n + j]! - g.im[j * n + i]!) / 2;
    }
  }
  return { n, re, im };
}
