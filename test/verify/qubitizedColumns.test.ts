import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { pauliLcu } from '../../src/blocks/builders/pauliLcu.js';
import { matrixMultiply } from '../../src/linalg/matrixMultiply.js';
import { qsvtEncoding } from '../../src/qsvt/qsvtEncoding.js';
import { resolventEncoding } from '../../src/resolvent/resolventEncoding.js';
import { qsvtSubspaceBlock, subspaceColumns } from '../../src/verify/qubitizedColumns.js';
import { sectorStates } from '../../src/verify/inversionCheckItems.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { subMatrix } from '../helpers/complexMatrixOps.js';
import { hubbard } from '../helpers/models.js';
import { pauliSumArb } from '../helpers/operatorArbitraries.js';
import { projectedBlock } from '../qsvt/projectedBlock.js';

describe('qsvtSubspaceBlock (the qubitized evaluation of a QSVT sequence)', () => {
  it('equals the full gate-level simulation of the sequence on random small encodings, odd and even degree, random phases', () => {
    fc.assert(
      fc.property(pauliSumArb(2, 3), fc.array(fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), { minLength: 2, maxLength: 8 }), (sum, phases) => {
        const U = pauliLcu(sum, 'random Pauli sum');
        const q = qsvtEncoding(U, { phases: Float64Array.from(phases), transform: () => 0 });
        const all = [0, 1, 2, 3];
        const reduced = qsvtSubspaceBlock(q, all, {});
        expect(reduced.leak).toBeLessThan(1e-12);
        expectComplexArrayClose(reduced.block, projectedBlock(q), 1e-10);
      }),
      { numRuns: 20, seed: 3 },
    );
  });

  it('equals the full simulation of both resolvent routes on the Green\'s-function sector of the Hubbard dimer', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 0.5, chemicalPotential: 0.3 });
    const w = { re: 0.37, im: 1.1 };
    const states = sectorStates(4, 3);
    for (const route of ['direct', 'preconditioned'] as const) {
      const encoding = resolventEncoding(model, w, { route, precision: 0.05 });
      const { inverse, fastInverse } = encoding.parts;
      const reduced = qsvtSubspaceBlock(inverse.qsvt, states, {});
      expect(reduced.leak, route).toBeLessThan(1e-12);
      let block = reduced.block;
      if (fastInverse) {
        const F = subspaceColumns(fastInverse, states, {});
        expect(F.leak).toBeLessThan(1e-12);
        block = matrixMultiply(block, F.block);
      }
      expectComplexArrayClose(block, subMatrix(projectedBlock(encoding, states), states), 1e-10, route);
    }
  });

  it('reports the leak when the columns do not span an invariant subspace of the queried block', () => {
    // The dimer's hopping moves an electron between sites, so one basis state of the three-electron sector is not invariant.
    const model = hubbard({ sites: 2, hopping: 1, interaction: 0.5, chemicalPotential: 0.3 });
    const encoding = resolventEncoding(model, { re: 0.37, im: 1.1 }, { route: 'direct', precision: 0.05 });
    const reduced = qsvtSubspaceBlock(encoding.parts.inverse.qsvt, [sectorStates(4, 3)[0]!], {});
    expect(reduced.leak).toBeGreaterThan(1e-3);
    expect(reduced.allowance).toBeGreaterThan(reduced.leak);
  });
});
