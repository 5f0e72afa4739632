// flagControlLists: an interval's controls are the window qubit and the register bits at or above its level that are set in
// its start, the other bits negative controls; fast inverses sharing a register hull share the lists.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fastInverse } from '../../../src/inversion/fastInverse.js';
import type { RegisterEnergies } from '../../../src/inversion/internal/flagAmplitude.js';
import { controlListsFor } from '../../../src/inversion/internal/flagControlLists.js';
import type { GateOp } from '../../../src/circuit/types.js';
import { verifyEncoding } from '../../../src/verify/verifyEncoding.js';
import { withSpectrum } from '../helpers/referenceResolvent.js';

function energiesWithHull(): RegisterEnergies {
  const none = new Float64Array(1);
  return { top: 0, w: { re: 0, im: 1 }, centre: none, hull: { low: none, high: none }, gap: 1, c: 1, rounding: 0, decomposition: 0, exact: true };
}

describe('controlListsFor(energies, register, gateControls)', () => {
  it('gives the set register bits at or above the level as controls (after the gate controls), the rest as negative controls', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10 }).chain((m) => fc.tuple(fc.constant(m), fc.integer({ min: 0, max: m }))), fc.boolean(), fc.nat(), ([m, level], windowed, seed) => {
        const register = Array.from({ length: m }, (_, k) => 10 + k);
        const gateControls = windowed ? [3] : [];
        const start = (seed % 2 ** (m - level)) * 2 ** level;
        const lists = controlListsFor(energiesWithHull(), register, gateControls)(start, level);
        const bitsAbove = register.map((q, b) => ({ q, b })).filter(({ b }) => b >= level);
        expect(lists.controls).toEqual([...gateControls, ...bitsAbove.filter(({ b }) => Math.floor(start / 2 ** b) % 2 === 1).map(({ q }) => q)]);
        expect(lists.negControls).toEqual(bitsAbove.filter(({ b }) => Math.floor(start / 2 ** b) % 2 === 0).map(({ q }) => q));
      }),
      { numRuns: 200 },
    );
  });

  it('lets two pruned fast inverses (each still within its bound) of one T at different w share the control lists of their common intervals', () => {
    const T = withSpectrum([-0.731, -0.2, 0.377, 1.09], Array.from({ length: 32 }, (_, k) => Math.sin(k + 1)));
    const options = { precision: 1e-4, maxBits: 6, flagRotation: 'pruned' as const, electrons: 2 };
    const first = fastInverse(T, { re: 0.1, im: 0.2 }, options);
    const second = fastInverse(T, { re: -0.4, im: 0.2 }, options);
    const controlsOf = (action: readonly unknown[]): Map<string, GateOp['controls']> =>
      new Map((action as GateOp[]).filter((op) => op.name === 'ry').map((op) => [`${op.controls.join(',')}|${op.negControls.join(',')}`, op.controls]));
    const a = controlsOf(first.block.body.kind === 'conjugated' ? first.block.body.action : []);
    const b = controlsOf(second.block.body.kind === 'conjugated' ? second.block.body.action : []);
    const common = [...a.keys()].filter((key) => b.has(key));
    expect(common.length).toBeGreaterThan(0);
    for (const key of common) expect(b.get(key)).toBe(a.get(key));
    // The second encoding, built from shared lists, still encodes P (w − A)⁻¹ P within its bound.
    expect(verifyEncoding(second, { useNativeKernels: false }).maxError).toBeLessThanOrEqual(second.quantisationBound + 1e-10);
  });
});
