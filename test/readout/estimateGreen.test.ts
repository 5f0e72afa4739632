// estimateGreen with honest stand-in resolvents (the direct shift w − H, whose readout a dense Fock-space computation
// gives independently): exact-expectation values, the controlled Hadamard-test probabilities, shot statistics and the
// averaging over a degenerate ground level.
import { describe, expect, it } from 'vitest';
import { directShift } from '../../src/inversion/directShift.js';
import { identityEncoding } from '../../src/blocks/combine/identityEncoding.js';
import { estimateGreen } from '../../src/readout/estimateGreen.js';
import { preparedStates } from '../../src/readout/preparedStates.js';
import { greenParts } from '../../src/readout/greenParts.js';
import { hadamardTests } from '../../src/readout/hadamardTests.js';
import { outcomeDistribution } from '../../src/sim/outcomeDistribution.js';
import { defineBlock } from '../../src/circuit/defineBlock.js';
import { gate } from '../../src/circuit/ops.js';
import { InputError } from '../../src/core/InputError.js';
import { hubbard } from '../helpers/models.js';
import { expectClose, expectComplexClose } from '../helpers/close.js';
import { denseGroundVectors, shiftedReadout } from './helpers/denseFockSpace.js';

const dimer = hubbard({ sites: 2, hopping: 1, interaction: 2, chemicalPotential: 1 });
const ground = denseGroundVectors(dimer);
const states = preparedStates(ground.vectors);
const z = { re: 0.3, im: 0.4 };
const shifted = (w: { re: number; im: number }) => directShift(dimer, w);

describe('estimateGreen (exact expectation)', () => {
  for (const pair of [[0, 0], [0, 1], [1, 2], [3, 0]] as [number, number][]) {
    it(`reproduces the dense <a_i (w⁺ − H) a_j†> − <a_j† (w⁻ − H) a_i> for pair (${pair}) with the direct shift as resolvent`, () => {
      const estimate = estimateGreen({ modes: 4, electrons: 2, groundEnergy: ground.energy, states, pair, z, resolvent: shifted });
      const reference = shiftedReadout(dimer, ground.vectors, ground.energy, pair, z);
      const [particle, hole] = estimate.parts;
      expect(estimate.parts.map((p) => p.part)).toEqual(['particle', 'hole']);
      expectComplexClose([particle!.value.re, particle!.value.im], [reference.particle.re, reference.particle.im], 1e-10, 'particle');
      expectComplexClose([hole!.value.re, hole!.value.im], [reference.hole.re, reference.hole.im], 1e-10, 'hole');
      expectComplexClose(
        [estimate.value.re, estimate.value.im],
        [reference.particle.re + reference.hole.re, reference.particle.im + reference.hole.im],
        1e-10,
      );
      expect(estimate.boundParts.encoding).toBe(0);
      expect(estimate.stdError).toBeNull();
    });
  }

  it('loads the state directly (loadState) to the same value as its preparation circuit', () => {
    const options = { modes: 4, electrons: 2, groundEnergy: ground.energy, states, pair: [1, 0] as [number, number], z, resolvent: shifted };
    const prepared = estimateGreen(options);
    const loaded = estimateGreen({ ...options, loadState: true });
    expectComplexClose([loaded.value.re, loaded.value.im], [prepared.value.re, prepared.value.im], 1e-12);
  });

  it("gives the controlled Hadamard test's P(bit = 0) = (1 + Re or Im <ψ,0|U|ψ,0>)/2 for every test circuit", () => {
    // The Hadamard test: Aharonov, Jones & Landau, STOC 2006; the S† form for Im is CONVENTIONS.md's.
    const estimate = estimateGreen({ modes: 4, electrons: 2, groundEnergy: ground.energy, states, pair: [0, 1], z, resolvent: shifted });
    const tests = hadamardTests(
      greenParts({ modes: 4, electrons: 2, groundEnergy: ground.energy, pair: [0, 1], z, resolvent: shifted }),
      states,
    );
    expect(tests.map((t) => t.name)).toEqual(['particle-re', 'particle-im', 'hole-re', 'hole-im']);
    for (const test of tests) {
      const simulated = outcomeDistribution(test.circuit).outcomes.get('0') ?? 0;
      const reading = estimate.readings.find((r) => r.name === test.name)!;
      expectClose(simulated, reading.probabilityZero, 1e-10, test.name);
    }
  });

  it('averages a degenerate ground level with equal weights (N = 1 dimer: a spin doublet)', () => {
    const doublet = hubbard({ sites: 2, hopping: 1, interaction: 2, chemicalPotential: 1, electrons: 1 });
    const level = denseGroundVectors(doublet);
    expect(level.vectors).toHaveLength(2);
    const estimate = estimateGreen({
      modes: 4, electrons: 1, groundEnergy: level.energy, states: preparedStates(level.vectors), pair: [0, 0], z,
      resolvent: (w) => directShift(doublet, w),
    });
    const reference = shiftedReadout(doublet, level.vectors, level.energy, [0, 0], z);
    expect(estimate.states).toBe(2);
    expectComplexClose([estimate.value.re, estimate.value.im], [reference.particle.re + reference.hole.re, reference.particle.im + reference.hole.im], 1e-10);
  });

  it('leaves out the hole part of an empty state and reads <a_i a_j†> = δ_ij with the identity as resolvent', () => {
    const vacuum = { re: Float64Array.from({ length: 16 }, (_, s) => (s === 0 ? 1 : 0)), im: new Float64Array(16) };
    const estimate = estimateGreen({
      modes: 4, electrons: 0, groundEnergy: 0, states: preparedStates([vacuum]), pair: [2, 2], z, resolvent: () => identityEncoding(4),
    });
    expect(estimate.parts.map((p) => p.part)).toEqual(['particle']);
    // <vac| a_2 a_2† |vac> = 1 (canonical anticommutation, common practice).
    expectComplexClose([estimate.value.re, estimate.value.im], [1, 0], 1e-12);
  });

  it('refuses a readout too large to simulate before allocating, naming the qubit count', () => {
    // The identity with 40 signal ancillas that it touches (z on |0>): with the two ladder ancillas, 46 qubits.
    const touch = Array.from({ length: 40 }, (_, k) => gate('z', [4 + k]));
    const block = defineBlock({ name: 'wide_identity', role: 'identity on 44 qubits', qubits: 44 }, touch);
    const big = { ...identityEncoding(4), block, ancillas: [{ name: 'huge', size: 40, role: 'signal' as const }] };
    expect(() => estimateGreen({ modes: 4, electrons: 2, groundEnergy: 0, states, pair: [0, 0], z, resolvent: () => big })).toThrow(InputError);
    expect(() => estimateGreen({ modes: 4, electrons: 2, groundEnergy: 0, states, pair: [0, 0], z, resolvent: () => big })).toThrow(/46 qubits, 47 in its Hadamard-test circuit\) is too large to simulate/);
  });
});

describe('estimateGreen (shots)', () => {
  it('lies within 4 standard errors of the exact expectation for 20 seeds', () => {
    // Binomial sampling of each Hadamard test; 4σ covers 99.99 % of a normal law (common practice).
    const options = { modes: 4, electrons: 2, groundEnergy: ground.energy, states, pair: [0, 1] as [number, number], z, resolvent: shifted };
    const exact = estimateGreen(options).value;
    for (let seed = 1; seed <= 20; seed++) {
      const sampled = estimateGreen({ ...options, shots: { count: 4000, seed } });
      expect(sampled.stdError).not.toBeNull();
      expect(Math.abs(sampled.value.re - exact.re)).toBeLessThanOrEqual(4 * sampled.stdError!.re);
      expect(Math.abs(sampled.value.im - exact.im)).toBeLessThanOrEqual(4 * sampled.stdError!.im);
    }
  });

  it('is reproducible for a seed and reports the shots needed for a precision as ⌈Σ s²/ε²⌉', () => {
    const options = { modes: 4, electrons: 2, groundEnergy: ground.energy, states, pair: [0, 0] as [number, number], z, resolvent: shifted, targetPrecision: 0.01 };
    const a = estimateGreen({ ...options, shots: { count: 500, seed: 7 } });
    const b = estimateGreen({ ...options, shots: { count: 500, seed: 7 } });
    expect(a.value).toEqual(b.value);
    const [particle, hole] = a.parts;
    const sumSquares = particle!.alpha ** 2 + hole!.alpha ** 2;
    expect(a.shotPlan.shotsPerTest).toBe(Math.ceil(sumSquares / 0.01 ** 2));
    expect(a.shotPlan.tests).toBe(4);
  });
});
