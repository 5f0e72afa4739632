import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { modelEncodings } from '../../src/blocks/builders/modelEncodings.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { modelHamiltonian } from '../../src/operators/modelHamiltonian.js';
import { verifyEncoding } from '../../src/verify/verifyEncoding.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { randomModel } from '../helpers/models.js';

describe('modelEncodings(model)', () => {
  it('encodes H, A and B of random models (≤ 4 modes) exactly, A + B = H', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1e6 }), fc.integer({ min: 2, max: 4 }), fc.boolean(), (seed, modes, complex) => {
        const model = randomModel(seed, modes, 1, complex, 0.4);
        const { H, A, B } = modelEncodings(model);
        for (const [encoding, part] of [[H, 'all'], [A, 'A'], [B, 'B']] as const) {
          // Independent route: the Fock-space matrix built directly from ladder operators on bit strings.
          expectComplexArrayClose(encoding.exact(), ladderSumMatrix(modelHamiltonian(model, { part }), modes), 1e-10, encoding.label);
          expect(verifyEncoding(encoding).maxError).toBeLessThan(1e-10);
        }
      }),
      { numRuns: 12 },
    );
  });
});
