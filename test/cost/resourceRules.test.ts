// Decomposition, rotation synthesis, shots and the error budget: each rule against its published count.
import { describe, expect, it } from 'vitest';
import { lowerKind } from '../../src/cost/decompositionTable.js';
import { structuredGateKind } from '../../src/cost/structuredGateKind.js';
import { tGatesPerRotation } from '../../src/cost/rotationSynthesis.js';
import { shotCount } from '../../src/cost/shotCount.js';
import { errorBudget } from '../../src/cost/errorBudget.js';
import { varyModelInput } from '../../src/cost/varyModelInput.js';
import { isInputError } from '../../src/core/InputError.js';

const kind = (name: string, params: number[], controls = 0, neg = 0) => structuredGateKind(name, params, controls, neg, false, 1);

describe('lowerKind', () => {
  it('ccx is one Toffoli; C^k X is k − 1 by measured ANDs, 2k − 3 clean, 4(k − 2) dirty', () => {
    // Gidney, Quantum 2, 74 (2018); Nielsen & Chuang Fig. 4.10 (from memory); Barenco et al. PRA 52, 3457 (1995), Lemma 7.2 (from memory).
    expect(lowerKind(kind('ccx', [])).toffoli).toBe(1);
    expect(lowerKind(kind('x', [], 5)).toffoli).toBe(4);
    expect(lowerKind(kind('x', [], 5), { multiControl: 'clean' }).toffoli).toBe(7);
    expect(lowerKind(kind('x', [], 5), { multiControl: 'dirty' }).toffoli).toBe(12);
  });

  it('rotations by multiples of π/2 are Clifford, by odd multiples of π/4 one T, else one rotation', () => {
    // Common practice: S = p(π/2), T = p(π/4) generate the Clifford+T phases.
    expect(lowerKind(kind('p', [Math.PI / 2]))).toMatchObject({ cliffords: 1, tGates: 0, rotations: 0 });
    expect(lowerKind(kind('p', [-Math.PI / 4]))).toMatchObject({ tGates: 1, rotations: 0 });
    expect(lowerKind(kind('rz', [0.3]))).toMatchObject({ rotations: 1 });
    expect(lowerKind(structuredGateKind('ry', [{ op: 'param', index: 0 }], 0, 0, false, 1))).toMatchObject({ rotations: 1 });
  });

  it('a controlled phase is an AND plus one phase; a controlled rotation two half-angle rotations', () => {
    // Gidney 2018 (controlled phase through a temporary AND); Barenco et al. 1995 Lemma 5.4 (from memory).
    expect(lowerKind(kind('cp', [0.3]))).toMatchObject({ toffoli: 1, rotations: 1 });
    expect(lowerKind(kind('cry', [0.3]))).toMatchObject({ toffoli: 0, rotations: 2 });
    expect(lowerKind(kind('gphase', [Math.PI], 1))).toMatchObject({ toffoli: 0, rotations: 0, cliffords: 1 });
  });
});

describe('tGatesPerRotation', () => {
  it('grows as 3·log2(1/ε) (Ross & Selinger 2016)', () => {
    // Ross & Selinger, Quantum Inf. Comput. 16, 901 (2016): T-count 3 log2(1/ε) + O(log log(1/ε)).
    expect(tGatesPerRotation(2 ** -40) - tGatesPerRotation(2 ** -20)).toBeGreaterThanOrEqual(60);
    expect(tGatesPerRotation(2 ** -40) - tGatesPerRotation(2 ** -20)).toBeLessThanOrEqual(62);
  });
});

describe('shotCount', () => {
  it('plain sampling needs α²/ε² runs; amplitude estimation about 2πα/ε iterates', () => {
    // Variance of a ±1 outcome ≤ 1 (common practice); Brassard, Høyer, Mosca & Tapp (2002), Thm. 12.
    const s = shotCount(10, 1e-3);
    expect(s.plainShots).toBe(1e8);
    expect(s.amplitudeEstimationIterates).toBeGreaterThanOrEqual(Math.floor(2 * Math.PI * 1e4));
    expect(s.amplitudeEstimationIterates).toBeLessThanOrEqual(Math.ceil(2 * Math.PI * 1e4 * 1.01));
  });
});

describe('errorBudget', () => {
  it('splits ε so the shares add back to ε', () => {
    const b = errorBudget(0.04);
    expect(2 * b.encodingPerPart + 2 * b.synthesisPerPart + 4 * b.samplingPerEstimate).toBeCloseTo(0.04, 15);
    expect(() => errorBudget(0)).toThrow(RangeError);
  });
});

describe('varyModelInput', () => {
  it('rejects a key the model has not, naming the keys it has', () => {
    const input = { lattice: { shape: 'chain', sites: 4, hopping: 1 }, interaction: 2, electrons: 4 };
    let caught: unknown;
    try {
      varyModelInput(input, 'spin_orbit', 1);
    } catch (error) {
      caught = error;
    }
    expect(isInputError(caught)).toBe(true);
    expect(String((caught as Error).message)).toMatch(/unknown key "spin_orbit".*hopping/);
    expect(varyModelInput(input, 'sites', 8)).toMatchObject({ lattice: { sites: 8 }, electrons: 8 });
  });
});
