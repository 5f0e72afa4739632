import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { diagonalizeOneBody } from '../../src/rotations/diagonalizeOneBody.js';
import { slaterDeterminant } from '../../src/rotations/slaterDeterminant.js';
import { expectClose, expectComplexArrayClose } from '../helpers/close.js';
import { hubbard } from '../helpers/models.js';
import { applyMatrix, innerProduct, oneBodyMatrix, rotatedCreationMatrix } from './helpers/fockOperators.js';
import { randomHermitian, randomUnitary } from './helpers/randomMatrices.js';
import { basisState, simulateBlock } from './helpers/simulateBlock.js';

function energy(block: ReturnType<typeof slaterDeterminant>, T: ReturnType<typeof randomHermitian>): number {
  const psi = simulateBlock(block, basisState(T.n, 0));
  const [re, im] = innerProduct(psi, applyMatrix(oneBodyMatrix(T), psi));
  expect(Math.abs(im)).toBeLessThan(1e-12);
  return re;
}

describe('slaterDeterminant(source, occupation)', () => {
  it('has <ψ|H₁|ψ> = Σ_{k∈occ} ε_k for random Hermitian T and random occupations (Szabo & Ostlund, Modern Quantum Chemistry, ch. 3)', () => {
    const arb = fc
      .record({ n: fc.integer({ min: 1, max: 6 }), seed: fc.integer() })
      .chain(({ n, seed }) => fc.record({ n: fc.constant(n), seed: fc.constant(seed), occ: fc.subarray([...Array(n).keys()]) }));
    fc.assert(
      fc.property(arb, ({ n, seed, occ }) => {
        const T = randomHermitian(n, seed);
        const { energies } = diagonalizeOneBody(T);
        const expected = occ.reduce((sum, k) => sum + energies[k]!, 0);
        expectClose(energy(slaterDeterminant({ oneBody: T }, occ), T), expected, 1e-10);
      }),
      { numRuns: 30 },
    );
  });

  it('occupies the lowest orbitals for an electron count, giving the non-interacting ground energy', () => {
    const T = randomHermitian(5, 8);
    const { energies } = diagonalizeOneBody(T);
    expectClose(energy(slaterDeterminant({ oneBody: T }, 2), T), energies[0]! + energies[1]!, 1e-10);
  });

  it('prepares b_{k1}† ⋯ b_{km}† |vac> (k1 < … < km) exactly, sign included, from given orbitals V', () => {
    const V = randomUnitary(4, 9);
    const vacuum = basisState(4, 0);
    const expected = applyMatrix(rotatedCreationMatrix(V, 1), applyMatrix(rotatedCreationMatrix(V, 3), vacuum));
    expectComplexArrayClose(simulateBlock(slaterDeterminant({ orbitals: V }, [3, 1]), vacuum), expected, 1e-12);
    const first = applyMatrix(rotatedCreationMatrix(V, 0), applyMatrix(rotatedCreationMatrix(V, 1), vacuum));
    expectComplexArrayClose(simulateBlock(slaterDeterminant({ orbitals: V }, 2), vacuum), first, 1e-12);
  });

  it('fills the lowest momenta of a 4-site ring via the Fourier route: energy Σ of the lowest −2t cos(2πk/L) − μ', () => {
    const T = hubbard({ sites: 4, hopping: 1, interaction: 0, chemicalPotential: 0.1, ring: true }).oneBody;
    // Tight-binding ring levels −2cos(2πk/4) − 0.1 (common practice): −2.1, −0.1, −0.1, 1.9 per spin; 3 electrons take −2.1, −2.1, −0.1.
    expectClose(energy(slaterDeterminant({ oneBody: T }, 3), T), -2.1 - 2.1 - 0.1, 1e-10);
  });

  it('throws RangeErrors for bad occupations', () => {
    const T = randomHermitian(3, 1);
    expect(() => slaterDeterminant({ oneBody: T }, 4)).toThrow(/slaterDeterminant: electron count/);
    expect(() => slaterDeterminant({ oneBody: T }, [0, 0])).toThrow(/slaterDeterminant: occupied orbitals/);
    expect(() => slaterDeterminant({ oneBody: T }, [3])).toThrow(RangeError);
  });
});
