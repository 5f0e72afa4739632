// qsvtInverseStructure: the counting circuit has the built QSVT inverse's shape (qubits, registers, queries, gate counts,
// arbitrary rotations) for the same degree, any degree costs constant memory, and it encodes no operator.
import { describe, expect, it } from 'vitest';
import { ancillaQubits } from '../../src/blocks/BlockEncoding.js';
import { pauliLcu } from '../../src/blocks/builders/pauliLcu.js';
import { blockCounts, totalGates } from '../../src/circuit/gateCounts.js';
import { structuredBlockCounts } from '../../src/cost/structuredCounts.js';
import { resourceTotals } from '../../src/cost/resourceTotals.js';
import { qsvtInverse } from '../../src/qsvt/qsvtInverse.js';
import { qsvtInverseStructure } from '../../src/qsvt/qsvtInverseStructure.js';

const M = pauliLcu({ qubits: 2, terms: [{ x: 0n, z: 0n, re: 1, im: 0 }, { x: 1n, z: 2n, re: 0.3, im: 0 }, { x: 0n, z: 3n, re: -0.2, im: 0 }] }, 'M');

describe('qsvtInverseStructure', () => {
  const built = qsvtInverse(M, { conditionBound: 2, polynomialError: 1e-3 });
  const structure = qsvtInverseStructure(M, { degree: built.degree, alpha: built.alpha, errorBound: built.errorBound });

  it('has the built inverse’s qubits, registers, queries and gate counts for the same degree', () => {
    expect(structure.block.qubits).toBe(built.block.qubits);
    expect(ancillaQubits(structure)).toBe(ancillaQubits(built));
    expect(structure.ancillas).toEqual(built.ancillas);
    expect(structure.queries).toEqual(built.queries);
    expect(totalGates(blockCounts(structure.block))).toBe(totalGates(blockCounts(built.block)));
  });

  it('counts every placeholder phase as an arbitrary rotation, as many as the built phases need', () => {
    const rotations = (block: typeof built.block): number => resourceTotals(structuredBlockCounts(block)).rotations;
    expect(rotations(structure.block)).toBeGreaterThanOrEqual(built.degree + 1);
    expect(rotations(structure.block)).toBe(rotations(built.block));
  });

  it('builds a degree of ten million as one repeated step, and its exact() throws', () => {
    const gates = (degree: number): number => totalGates(blockCounts(qsvtInverseStructure(M, { degree, alpha: 1, errorBound: 0 }).block));
    const huge = qsvtInverseStructure(M, { degree: 10_000_001, alpha: 1, errorBound: 0 });
    // Each further step (two degrees) adds the same gates.
    expect(totalGates(blockCounts(huge.block))).toBe(gates(3) + ((10_000_001 - 3) / 2) * (gates(5) - gates(3)));
    expect(() => huge.exact()).toThrow(/placeholder phases/);
    expect(() => qsvtInverseStructure(M, { degree: 0, alpha: 1, errorBound: 0 })).toThrow(/degree 0/);
  });
});
