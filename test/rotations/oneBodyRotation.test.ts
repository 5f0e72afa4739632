import { describe, expect, it } from 'vitest';
import { oneBodyRotation } from '../../src/rotations/oneBodyRotation.js';
import { expectClose, expectComplexArrayClose } from '../helpers/close.js';
import { conjTranspose, matMul, matrixFromRows } from '../helpers/complexMatrixOps.js';
import { hubbard } from '../helpers/models.js';
import { numberWeightedMatrix, oneBodyMatrix } from './helpers/fockOperators.js';
import { randomHermitian } from './helpers/randomMatrices.js';
import { blockUnitary } from './helpers/simulateBlock.js';

function expectDiagonalises(T: ReturnType<typeof randomHermitian>, result: ReturnType<typeof oneBodyRotation>): void {
  const U = blockUnitary(result.block);
  const lhs = matMul(conjTranspose(U), matMul(numberWeightedMatrix(result.energies), U));
  expectComplexArrayClose(lhs, oneBodyMatrix(T), 1e-10, 'U† (Σ ε_k n_k) U vs Σ T_ij a_i† a_j');
}

const ring = (sites: number, t: number, mu: number) => hubbard({ sites, hopping: t, interaction: 0, chemicalPotential: mu, ring: true }).oneBody;

describe('oneBodyRotation(T)', () => {
  it('gives U† (Σ_k ε_k n_k) U = Σ_ij T_ij a_i† a_j with sorted energies for random Hermitian T (Givens route)', () => {
    for (const [n, seed] of [[1, 1], [3, 2], [5, 3]] as const) {
      const T = randomHermitian(n, seed);
      const result = oneBodyRotation(T);
      expect(result.method).toBe('givens');
      expect([...result.energies]).toEqual([...result.sortedEnergies]);
      expectDiagonalises(T, result);
    }
  });

  it('uses the fermionic Fourier transform per spin block on a 4-site ring and still diagonalises T', () => {
    const T = ring(4, 1, 0.3);
    const result = oneBodyRotation(T);
    expect(result.method).toBe('fourier');
    expect(result.block.name).toBe('fermionic_fourier_transform_per_spin');
    expectDiagonalises(T, result);
  });

  it('returns ring energies −2t cos(2πk/L) − μ in momentum order k = 0 … L−1 per spin block (textbook tight binding)', () => {
    for (const L of [4, 8]) {
      const [t, mu] = [0.7, 0.25];
      const result = oneBodyRotation(ring(L, t, mu));
      for (let b = 0; b < 2; b++) {
        // Tight-binding dispersion on a ring (e.g. Ashcroft & Mermin, ch. 10; common practice).
        for (let k = 0; k < L; k++) expectClose(result.energies[b * L + k]!, -2 * t * Math.cos((2 * Math.PI * k) / L) - mu, 1e-13, `ε(b=${b}, k=${k})`);
      }
      const sorted = [...result.energies].sort((x, y) => x - y);
      [...result.sortedEnergies].forEach((e, r) => {
        expect(e).toBe(sorted[r]);
        expect(result.energies[result.sortedOrder[r]!]).toBe(e);
      });
    }
  });

  it('treats all modes as one ring with fourierBlocks: 1 and falls back to Givens for a chain', () => {
    const single = matrixFromRows([[0.1, -1, 0, -1], [-1, 0.1, -1, 0], [0, -1, 0.1, -1], [-1, 0, -1, 0.1]]);
    const result = oneBodyRotation(single, { fourierBlocks: 1 });
    expect(result.method).toBe('fourier');
    expect(result.block.name).toBe('fermionic_fourier_transform');
    expectDiagonalises(single, result);
    const chain = hubbard({ sites: 4, hopping: 1, interaction: 0, chemicalPotential: 0 }).oneBody;
    expect(oneBodyRotation(chain).method).toBe('givens');
    expect(oneBodyRotation(ring(4, 1, 0), { method: 'givens' }).method).toBe('givens');
  });

  it('reports residual ≥ ‖T − V diag(ε) V†‖: rounding level when exact, the deviation when T is circulant only within tolerance', () => {
    for (const [n, seed] of [[3, 2], [5, 3]] as const) {
      const T = randomHermitian(n, seed);
      const result = oneBodyRotation(T);
      expect(result.residual).toBeGreaterThan(0);
      expect(result.residual).toBeLessThan(1e-12);
    }
    expect(oneBodyRotation(ring(4, 1, 0.3)).residual).toBeLessThan(1e-12);
    // One bond of a 4-site ring changed by 4e-11 (both T_01 and T_10): ‖T − C‖_F = 4e-11·√2 for the circulant C of row 0.
    const near = matrixFromRows([[0, -1 - 4e-11, 0, -1], [-1 - 4e-11, 0, -1, 0], [0, -1, 0, -1], [-1, 0, -1, 0]]);
    const result = oneBodyRotation(near, { fourierBlocks: 1 });
    expect(result.method).toBe('fourier');
    expect(result.residual).toBeGreaterThanOrEqual(4e-11 * Math.SQRT2 * (1 - 1e-3));
  });

  it('throws RangeErrors for non-Hermitian T and for method "fourier" on a non-ring', () => {
    expect(() => oneBodyRotation(matrixFromRows([[0, [0, 1]], [[0, 1], 0]]))).toThrow(/oneBodyRotation: T is not Hermitian/);
    const chain = hubbard({ sites: 4, hopping: 1, interaction: 0, chemicalPotential: 0 }).oneBody;
    expect(() => oneBodyRotation(chain, { method: 'fourier' })).toThrow(/oneBodyRotation: method "fourier"/);
    expect(() => oneBodyRotation(randomHermitian(3, 1), { method: 'fourier' })).toThrow(RangeError);
  });
});
