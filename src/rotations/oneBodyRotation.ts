/**
 * oneBodyRotation: the orbital rotation U(V) that takes the mode basis to the eigenbasis of a one-body matrix T,
 * U(V)† (Σ_k ε_k n_k) U(V) = Σ_ij T_ij a_i† a_j — a Givens network, or per-block fermionic Fourier transforms on rings.
 */
import type { Block } from '../circuit/types.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { diagonalizeOneBody } from './diagonalizeOneBody.js';
import { fermionicFourierTransform } from './fermionicFourierTransform.js';
import { fourierMatrix } from './fourierMatrix.js';
import { checkHermitian } from './internal/checkHermitian.js';
import { circulantSpectrum } from './internal/circulantSpectrum.js';
import { orbitalRotation } from './orbitalRotation.js';
import { spinBlockRotation } from './spinBlockRotation.js';

export interface OneBodyRotationOptions {
  /**
   * `givens`: Givens network of the sorted eigenbasis. `fourier`: fermionic Fourier transform per block (T must be
   * block-diagonal with circulant blocks of 2^k ≥ 2 modes). `auto` (default): `fourier` when T qualifies, else `givens`.
   */
  readonly method?: 'auto' | 'givens' | 'fourier';
  /**
   * Number of equal diagonal blocks the Fourier route looks for: 2 = spin-up modes then spin-down modes (the preset
   * numbering), 1 = one ring on all modes. Default: 2 when it qualifies, else 1.
   */
  readonly fourierBlocks?: 1 | 2;
  /** Name of the top block. Default `orbital_rotation` (Givens), `fermionic_fourier_transform[_per_spin]` (Fourier). */
  readonly name?: string;
  /** Relative tolerance of the Hermitian and circulant checks (times max(1, max |T_ij|)). Default 1e-10. */
  readonly tolerance?: number;
  /** Givens route: the network arrangement passed to orbitalRotation. Default `rectangular`. */
  readonly arrangement?: 'rectangular' | 'triangular';
}

export interface OneBodyRotation {
  readonly block: Block;
  readonly method: 'givens' | 'fourier';
  /**
   * ε_k of the orbital b_k† = Σ_j V_jk a_j†, which U(V) maps to qubit k: sorted ascending for `givens`; for `fourier`
   * the natural momentum order, ε[b·L + k] = Σ_d T_{bL, bL+d} e^{2πi dk/L} (block b, momentum 2πk/L, k = 0 … L−1).
   */
  readonly energies: Float64Array;
  /** The same energies ascending. */
  readonly sortedEnergies: Float64Array;
  /** sortedOrder[r] = the qubit whose energy is sortedEnergies[r] (ties by qubit index). */
  readonly sortedOrder: Int32Array;
  /** Unitary with T = V diag(energies) V†; block-diagonal Fourier matrices for `fourier`. */
  readonly V: ComplexMatrix;
  /**
   * Bound on ‖T − V diag(ε) V†‖₂: the Frobenius norm of the computed difference plus 8n·u·‖T‖_F for the rounding of that
   * computation (u = 2^−53). Non-zero for `fourier` when T is circulant only within the tolerance, and at rounding level
   * for `givens`; a user of the energies adds its effect to any error bound.
   */
  readonly residual: number;
}

/**
 * U(V) with U(V)† a_k† U(V) = Σ_j V_jk a_j† (see orbitalRotation) for T = V diag(ε) V†, so that
 * U(V)† (Σ_k ε_k n_k) U(V) = Σ_ij T_ij a_i† a_j. Rings use the fermionic Fourier transform
 * (Verstraete, Cirac & Latorre, Phys. Rev. A 79, 032316, 2009); everything else the Givens network
 * (Kivlichan et al., Phys. Rev. Lett. 120, 110501, 2018).
 * @throws RangeError when T is not Hermitian, or `fourier` is asked for and T is not block-circulant on 2^k modes.
 */
export function oneBodyRotation(T: ComplexMatrix, options: OneBodyRotationOptions = {}): OneBodyRotation {
  const tolerance = options.tolerance ?? 1e-10;
  checkHermitian(T, tolerance, 'oneBodyRotation');
  const method = options.method ?? 'auto';
  if (method !== 'givens') {
    const fourier = fourierRoute(T, options, tolerance);
    if (fourier) return fourier;
    if (method === 'fourier') {
      throw new RangeError('oneBodyRotation: method "fourier" needs T block-diagonal with circulant blocks of 2^k ≥ 2 modes');
    }
  }
  const { energies, V } = diagonalizeOneBody(T, { tolerance });
  const block = orbitalRotation(V, { arrangement: options.arrangement ?? 'rectangular', ...(options.name === undefined ? {} : { name: options.name }) });
  return { block, method: 'givens', energies, V, residual: decompositionResidual(T, V, energies), ...sortedView(energies) };
}

/** ‖T − V diag(ε) V†‖_F (≥ the operator norm) plus 8n·u·‖T‖_F, u = 2^−53, for the rounding of this very computation. */
function decompositionResidual(T: ComplexMatrix, V: ComplexMatrix, energies: Float64Array): number {
  const n = T.n;
  let difference = 0;
  let size = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let re = 0;
      let im = 0;
      for (let k = 0; k < n; k++) {
        // V_ik ε_k conj(V_jk)
        const ar = V.re[i * n + k]!;
        const ai = V.im[i * n + k]!;
        const br = V.re[j * n + k]!;
        const bi = -V.im[j * n + k]!;
        re += energies[k]! * (ar * br - ai * bi);
        im += energies[k]! * (ar * bi + ai * br);
      }
      difference += (T.re[i * n + j]! - re) ** 2 + (T.im[i * n + j]! - im) ** 2;
      size += T.re[i * n + j]! ** 2 + T.im[i * n + j]! ** 2;
    }
  }
  return Math.sqrt(difference) + 8 * n * 2 ** -53 * Math.sqrt(size);
}

function fourierRoute(T: ComplexMatrix, options: OneBodyRotationOptions, tolerance: number): OneBodyRotation | null {
  let scale = 0;
  for (let e = 0; e < T.n * T.n; e++) scale = Math.max(scale, Math.hypot(T.re[e]!, T.im[e]!));
  for (const blocks of options.fourierBlocks === undefined ? [2, 1] : [options.fourierBlocks]) {
    const L = T.n / blocks;
    if (!Number.isInteger(L) || L < 2 || (L & (L - 1)) !== 0) continue;
    const energies = circulantSpectrum(T, blocks, tolerance * Math.max(1, scale));
    if (!energies) continue;
    const block =
      blocks === 1
        ? fermionicFourierTransform(L, options.name === undefined ? {} : { name: options.name })
        : spinBlockRotation(fermionicFourierTransform(L), { up: range(0, L), down: range(L, L) }, options.name === undefined ? {} : { name: options.name });
    const V = blockDiagonal(fourierMatrix(L), blocks);
    return { block, method: 'fourier', energies, V, residual: decompositionResidual(T, V, energies), ...sortedView(energies) };
  }
  return null;
}

function range(start: number, length: number): number[] {
  return Array.from({ length }, (_, k) => start + k);
}

function blockDiagonal(F: ComplexMatrix, blocks: number): ComplexMatrix {
  const L = F.n;
  const n = L * blocks;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let b = 0; b < blocks; b++) {
    for (let i = 0; i < L; i++) {
      for (let j = 0; j < L; j++) {
        re[(b * L + i) * n + b * L + j] = F.re[i * L + j]!;
        im[(b * L + i) * n + b * L + j] = F.im[i * L + j]!;
      }
    }
  }
  return { n, re, im };
}

function sortedView(energies: Float64Array): { sortedEnergies: Float64Array; sortedOrder: Int32Array } {
  const sortedOrder = Int32Array.from(energies.keys()).sort((a, b) => energies[a]! - energies[b]! || a - b);
  return { sortedEnergies: Float64Array.from(sortedOrder, (q) => energies[q]!), sortedOrder };
}
