import { describe, expect, it } from 'vitest';
import { blockCounts } from '../../src/circuit/gateCounts.js';
import { fermionicFourierTransform } from '../../src/rotations/fermionicFourierTransform.js';
import { fourierMatrix } from '../../src/rotations/fourierMatrix.js';
import { orbitalRotation } from '../../src/rotations/orbitalRotation.js';
import { twoModeFourier } from '../../src/rotations/twoModeFourier.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { expectOneParticleAction, expectOperatorRelation, expectRelationOnStates } from './helpers/expectRotationRelation.js';
import { blockUnitary } from './helpers/simulateBlock.js';
import { TWO_MODE_FOURIER_MATRIX } from './helpers/twoModeFourierMatrix.js';

describe('fermionicFourierTransform(n)', () => {
  it('has one-particle action F†: |k> ↦ Σ_j e^{−2πijk/n}/√n |j>, n ∈ {2, 4, 8}', () => {
    for (const n of [2, 4, 8]) expectOneParticleAction(fermionicFourierTransform(n), fourierMatrix(n));
  });

  it('satisfies U† a_k† U = Σ_j F_jk a_j† on the whole Fock space for n ∈ {2, 4} and on random states for n = 8', () => {
    expectOperatorRelation(fermionicFourierTransform(2), fourierMatrix(2));
    expectOperatorRelation(fermionicFourierTransform(4), fourierMatrix(4));
    expectRelationOnStates(fermionicFourierTransform(8), fourierMatrix(8), 2, 7);
  });

  it('is the same many-body unitary as orbitalRotation(F), phases included, n ∈ {4, 8}', () => {
    for (const n of [4, 8]) {
      expectComplexArrayClose(blockUnitary(fermionicFourierTransform(n)), blockUnitary(orbitalRotation(fourierMatrix(n))), 1e-10);
    }
  });

  it('is exactly the two-mode Fourier gate for n = 2 (Verstraete, Cirac & Latorre, PRA 79, 032316, 2009)', () => {
    const block = fermionicFourierTransform(2);
    expect(block.body.kind === 'plain' ? block.body.ops : []).toEqual([
      { kind: 'call', block: twoModeFourier, args: [], qubits: [0, 1], controls: [], negControls: [], inverse: false, power: 1 },
    ]);
    expectComplexArrayClose(blockUnitary(block), TWO_MODE_FOURIER_MATRIX, 1e-15);
  });

  it('uses (n/2)·log2 n two-mode Fourier gates and fermionic swaps only besides twiddle phases', () => {
    for (const n of [2, 4, 8, 16]) {
      const counts = blockCounts(fermionicFourierTransform(n));
      // The only z gate of the network is the one inside each two_mode_fourier.
      expect(blockCounts(twoModeFourier).get('z')).toBe(1);
      expect(counts.get('z')).toBe((n / 2) * Math.log2(n));
      expect([...counts.keys()].sort()).toEqual(n === 2 ? ['cry', 'cx', 'z'] : ['cry', 'cx', 'cz', 'p', 'swap', 'z']);
    }
  });

  it('throws a RangeError when n is not a power of two', () => {
    for (const n of [0, 3, 6, 2.5]) expect(() => fermionicFourierTransform(n)).toThrow(/fermionicFourierTransform: n = .* not a power of two/);
  });
});
