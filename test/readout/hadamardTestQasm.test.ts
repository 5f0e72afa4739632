// The Hadamard-test circuits written as OpenQASM 3 and read back: the same P(bit = 0) as the in-memory circuits, and
// recombined by the manifest rule, the same G_ij(z) as the exact-expectation estimate.
import { describe, expect, it } from 'vitest';
import { directShift } from '../../src/inversion/directShift.js';
import { estimateGreen } from '../../src/readout/estimateGreen.js';
import { greenParts } from '../../src/readout/greenParts.js';
import { hadamardTests } from '../../src/readout/hadamardTests.js';
import { preparedStates } from '../../src/readout/preparedStates.js';
import { writeQasm } from '../../src/qasm/writeQasm.js';
import { parseQasm } from '../../src/qasm/parseQasm.js';
import { outcomeDistribution } from '../../src/sim/outcomeDistribution.js';
import { hubbard } from '../helpers/models.js';
import { expectClose, expectComplexClose } from '../helpers/close.js';
import { denseGroundVectors } from './helpers/denseFockSpace.js';

describe('hadamardTests(parts, states) written with writeQasm and read back with parseQasm', () => {
  it('give the in-memory probabilities (≤ 1e-10) and, by Σ s·(2P − 1)·(1 or i), the estimate of G_ij(z)', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 2, chemicalPotential: 1, electrons: 1 });
    const ground = denseGroundVectors(model);
    const states = preparedStates(ground.vectors);
    const z = { re: -0.2, im: 0.3 };
    const options = { modes: 4, electrons: 1, groundEnergy: ground.energy, pair: [1, 0] as [number, number], z, resolvent: (w: { re: number; im: number }) => directShift(model, w) };
    const tests = hadamardTests(greenParts(options), states);
    // Two parts × two states of the doublet × re and im.
    expect(tests).toHaveLength(8);
    const recombined = { re: 0, im: 0 };
    for (const test of tests) {
      const text = writeQasm(test.circuit);
      expect(text).toMatch(/^OPENQASM 3\.0;/);
      expect(text.match(/= measure /g)).toHaveLength(1);
      const inMemory = outcomeDistribution(test.circuit).outcomes.get('0') ?? 0;
      const readBack = outcomeDistribution(parseQasm(text, `${test.name}.qasm`)).outcomes.get('0') ?? 0;
      expectClose(readBack, inMemory, 1e-10, test.name);
      recombined[test.component] += test.scale * (2 * readBack - 1);
    }
    const estimate = estimateGreen({ ...options, states });
    expectComplexClose([recombined.re, recombined.im], [estimate.value.re, estimate.value.im], 1e-9);
  });
});
