// End to end on the demo scenario (circuits/double-dot-nanowire.json, one-body energies on the 1/8 grid): the Hadamard-
// test readout of the QSVT resolvent (both routes) equals G_ij(z) part by part within the reported rigorous bound and
// within 1e-6, against dense resolvents computed independently (mathjs inverse of the Jordan–Wigner Hamiltonian).
import { describe, expect, it } from 'vitest';
import { fileURLToPath } from 'node:url';
import { loadModelFile } from '../../src/model/loadModelFile.js';
import { resolventEncoding } from '../../src/resolvent/resolventEncoding.js';
import { estimateGreen } from '../../src/readout/estimateGreen.js';
import { preparedStates } from '../../src/readout/preparedStates.js';
import { expectComplexClose } from '../helpers/close.js';
import { denseGreen } from '../helpers/denseFock.js';
import { denseGreenParts, denseGroundVectors } from './helpers/denseFockSpace.js';

type Case = { route: 'preconditioned' | 'direct'; pair: [number, number]; z: { re: number; im: number } };

function endToEnd(file: string, cases: readonly Case[]): void {
  const model = loadModelFile(fileURLToPath(new URL(`../../circuits/${file}`, import.meta.url)));
  const ground = denseGroundVectors(model);
  const states = preparedStates(ground.vectors);
  for (const { route, pair, z } of cases) {
    it(`${file}, ${route} route, G_${pair[0]}${pair[1]}(${z.re} + ${z.im}i): each part within its bound and 1e-6 of the dense resolvent`, () => {
      const estimate = estimateGreen({
        modes: model.modes, electrons: model.electrons, groundEnergy: ground.energy, states, pair, z,
        resolvent: (w) => resolventEncoding(model, w, { route, precision: 1e-6 }),
      });
      const reference = denseGreenParts(model, ground.vectors, ground.energy, pair, z);
      expect(estimate.errorBound).toBeLessThanOrEqual(1e-4);
      for (const part of estimate.parts) {
        const expected = reference[part.part];
        const gap = Math.hypot(part.value.re - expected.re, part.value.im - expected.im);
        expect(gap, part.part).toBeLessThanOrEqual(part.alpha * part.encodingErrorBound + 1e-9);
        expect(gap, part.part).toBeLessThanOrEqual(1e-6);
      }
      // The whole G_ij against the sector-by-sector dense reference of the exact-solver tests.
      const g = denseGreen(model, z)[pair[0]]![pair[1]]!;
      const gap = Math.hypot(estimate.value.re - g.re, estimate.value.im - g.im);
      expect(gap).toBeLessThanOrEqual(estimate.errorBound);
      expectComplexClose([estimate.value.re, estimate.value.im], [g.re, g.im], 1e-6);
    });
  }
}

describe('estimateGreen with resolventEncoding on the double-dot demo scenario', () => {
  endToEnd('double-dot-nanowire.json', [
    { route: 'preconditioned', pair: [0, 0], z: { re: -0.5, im: 0.5 } },
    { route: 'preconditioned', pair: [0, 1], z: { re: 1.25, im: 0.5 } },
    { route: 'direct', pair: [1, 1], z: { re: 0.25, im: 0.5 } },
    { route: 'direct', pair: [1, 0], z: { re: -1.5, im: 0.5 } },
  ]);
});

// The Hubbard dimer (U = 4, one-body energies ±1 − μ on the register grid) at Im z = 1, where the preconditioned
// route's a-priori degree is about 1,300 (at the file's η = 0.1 it would exceed the degree cap).
describe('estimateGreen with resolventEncoding on the Hubbard dimer', () => {
  endToEnd('hubbard-dimer.json', [
    { route: 'preconditioned', pair: [0, 0], z: { re: 0.5, im: 1 } },
    { route: 'preconditioned', pair: [0, 1], z: { re: -0.75, im: 1 } },
    { route: 'direct', pair: [0, 0], z: { re: 0.5, im: 1 } },
    { route: 'direct', pair: [1, 0], z: { re: -0.75, im: 1 } },
  ]);
});
