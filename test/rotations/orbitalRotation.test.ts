import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { blockCounts } from '../../src/circuit/gateCounts.js';
import type { Block } from '../../src/circuit/types.js';
import { adjointMatrix } from '../../src/linalg/adjointMatrix.js';
import { matrixMultiply } from '../../src/linalg/matrixMultiply.js';
import { orbitalRotation } from '../../src/rotations/orbitalRotation.js';
import { phasedGivensRotation } from '../../src/rotations/phasedGivensRotation.js';
import { expectComplexArrayClose, expectComplexClose } from '../helpers/close.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';
import { expectOneParticleAction, expectOperatorRelation, expectRelationOnStates } from './helpers/expectRotationRelation.js';
import { sequence } from './helpers/inverseBlock.js';
import { randomUnitary } from './helpers/randomMatrices.js';
import { basisState, blockUnitary, simulateBlock } from './helpers/simulateBlock.js';

const unitaryArb = (maxN: number) =>
  fc.record({ n: fc.integer({ min: 1, max: maxN }), seed: fc.integer() }).map(({ n, seed }) => randomUnitary(n, seed));
const arrangementArb = fc.constantFrom('rectangular' as const, 'triangular' as const);

/** Rotation layers when every rotation starts as soon as both its modes are free. */
function rotationLayers(block: Block): number {
  const free = new Array<number>(block.qubits).fill(0);
  for (const op of block.body.kind === 'plain' ? block.body.ops : []) {
    if (op.kind !== 'call') continue;
    const layer = Math.max(free[op.qubits[0]!]!, free[op.qubits[1]!]!) + 1;
    free[op.qubits[0]!] = free[op.qubits[1]!] = layer;
  }
  return Math.max(0, ...free);
}

function givensCalls(block: Block): number {
  return block.body.kind === 'plain' ? block.body.ops.filter((op) => op.kind === 'call' && op.block === phasedGivensRotation).length : -1;
}

describe('orbitalRotation(V)', () => {
  it('has one-particle action V† on |k> = a_k†|vac> for Haar-random V, n ≤ 6', () => {
    fc.assert(
      fc.property(unitaryArb(6), arrangementArb, (V, arrangement) => expectOneParticleAction(orbitalRotation(V, { arrangement }), V)),
      { numRuns: 40 },
    );
  });

  it('satisfies U† a_k† U = Σ_j V_jk a_j† on the whole Fock space and fixes the vacuum, n ≤ 6', () => {
    fc.assert(
      fc.property(unitaryArb(6), arrangementArb, (V, arrangement) => expectOperatorRelation(orbitalRotation(V, { arrangement }), V)),
      { numRuns: 12 },
    );
  });

  it('satisfies the relation on random many-particle states', () => {
    expectRelationOnStates(orbitalRotation(randomUnitary(5, 11)), randomUnitary(5, 11), 3, 100);
    expectRelationOnStates(orbitalRotation(randomUnitary(5, 12), { arrangement: 'triangular' }), randomUnitary(5, 12), 2, 200);
  });

  it('maps two particles on modes p < q to the 2×2 minors of V† (determinant rule)', () => {
    const V = randomUnitary(4, 5);
    const u = adjointMatrix(V);
    const at = (i: number, j: number): [number, number] => [u.re[i * 4 + j]!, u.im[i * 4 + j]!];
    const out = simulateBlock(orbitalRotation(V), basisState(4, 0b0101));
    for (let i = 0; i < 4; i++) {
      for (let j = i + 1; j < 4; j++) {
        // |modes 0, 2> = a_0† a_2† |vac> (JW order) ↦ Σ_{i<j} (u_i0 u_j2 − u_j0 u_i2) a_i† a_j† |vac>.
        const [a, b, c, d] = [at(i, 0), at(j, 2), at(j, 0), at(i, 2)];
        const minor: [number, number] = [a[0] * b[0] - a[1] * b[1] - (c[0] * d[0] - c[1] * d[1]), a[0] * b[1] + a[1] * b[0] - (c[0] * d[1] + c[1] * d[0])];
        const s = (1 << i) | (1 << j);
        expectComplexClose([out.re[s]!, out.im[s]!], minor, 1e-12, `amplitude of modes ${i},${j}`);
      }
    }
  });

  it('composes as U(V2)·U(V1) = U(V1 V2) (one-particle matrices multiply last-on-the-left)', () => {
    const V1 = randomUnitary(3, 21);
    const V2 = randomUnitary(3, 22);
    const composed = blockUnitary(sequence([orbitalRotation(V1), orbitalRotation(V2)]));
    expectComplexArrayClose(composed, blockUnitary(orbitalRotation(matrixMultiply(V1, V2))), 1e-10);
  });

  it('uses exactly n(n−1)/2 nearest-neighbour rotations (Reck et al., PRL 73, 58, 1994; Clements et al., Optica 3, 1460, 2016)', () => {
    for (let n = 1; n <= 8; n++) {
      for (const arrangement of ['rectangular', 'triangular'] as const) {
        const block = orbitalRotation(randomUnitary(n, n), { arrangement });
        expect(givensCalls(block)).toBe((n * (n - 1)) / 2);
        // Each rotation holds one cry, and nothing else in the network does.
        expect(blockCounts(block).get('cry') ?? 0).toBe((n * (n - 1)) / 2);
        for (const op of block.body.kind === 'plain' ? block.body.ops : []) {
          if (op.kind === 'call') expect(op.qubits[1]! - op.qubits[0]!).toBe(1);
        }
      }
    }
  });

  it('has n rotation layers in the rectangular mesh (Clements 2016) and 2n − 3 in the triangle (Reck 1994)', () => {
    for (let n = 3; n <= 9; n++) {
      expect(rotationLayers(orbitalRotation(randomUnitary(n, n)))).toBe(n);
      expect(rotationLayers(orbitalRotation(randomUnitary(n, n), { arrangement: 'triangular' }))).toBe(2 * n - 3);
    }
  });

  it('keeps the identity rotations so the identity matrix still gives n(n−1)/2 rotations and the identity circuit', () => {
    const I = matrixFromRows([[1, 0, 0], [0, 1, 0], [0, 0, 1]]);
    const block = orbitalRotation(I);
    expect(givensCalls(block)).toBe(3);
    const identity = blockUnitary(block);
    identity.re.forEach((_, e) => expect([identity.re[e], identity.im[e]]).toEqual([e % 9 === 0 ? 1 : 0, 0]));
  });

  it('throws a RangeError for a non-unitary or malformed V', () => {
    expect(() => orbitalRotation(matrixFromRows([[1, 1], [0, 1]]))).toThrow(/orbitalRotation: V is not unitary/);
    expect(() => orbitalRotation({ n: 2, re: new Float64Array(3), im: new Float64Array(4) })).toThrow(RangeError);
    expect(() => orbitalRotation(matrixFromRows([[Number.NaN]]))).toThrow(RangeError);
  });
});
