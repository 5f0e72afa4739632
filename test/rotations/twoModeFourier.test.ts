import { describe, it } from 'vitest';
import { twoModeFourier } from '../../src/rotations/twoModeFourier.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { blockUnitary } from './helpers/simulateBlock.js';
import { TWO_MODE_FOURIER_MATRIX } from './helpers/twoModeFourierMatrix.js';

describe('twoModeFourier (two_mode_fourier)', () => {
  it('is the two-mode fermionic Fourier gate F2 with |11> → −|11> (Verstraete, Cirac & Latorre 2009)', () => {
    expectComplexArrayClose(blockUnitary(twoModeFourier), TWO_MODE_FOURIER_MATRIX, 1e-15);
  });
});
