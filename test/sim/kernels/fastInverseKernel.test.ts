// The fast-inverse native kernel equals the block's gate decomposition (nativeKernelAgreement: random states, so
// nonzero register, counter, window, scratch and carry inputs too) for random small T, both adders, window on and
// off, pruned and multiplexed flag rotations, with controls, inverse and powers; corrupted kernel data is caught.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fastInverse } from '../../../src/inversion/fastInverse.js';
import { nativeKernelAgreement } from '../../../src/sim/nativeKernelAgreement.js';
import { hermitianArb } from '../../inversion/helpers/referenceResolvent.js';

const modifiers = fc.record({
  controls: fc.integer({ min: 0, max: 1 }),
  negControls: fc.integer({ min: 0, max: 1 }),
  inverse: fc.boolean(),
  power: fc.constantFrom(1, 1, 2, -1, -3),
});

describe('fastInverseKernel against the fast_inverse block decomposition', () => {
  it('agrees to 1e-12 on random T, adders, windows, flag rotations and modifiers', () => {
    const shape = fc.integer({ min: 1, max: 3 }).chain((n) =>
      fc.record({
        T: hermitianArb(n),
        adder: fc.constantFrom('qft' as const, 'ripple' as const),
        window: fc.boolean(),
        flagRotation: fc.constantFrom('pruned' as const, 'multiplexed' as const),
        w: fc.record({ re: fc.double({ min: -1, max: 1, noNaN: true }), im: fc.double({ min: 0.2, max: 1, noNaN: true }) }),
        call: modifiers,
        seed: fc.integer({ min: 1, max: 1000 }),
      }),
    );
    fc.assert(
      fc.property(shape, ({ T, adder, window, flagRotation, w, call, seed }) => {
        const electrons: [number, number] | undefined = window && T.n > 1 ? [1, T.n - 1] : undefined;
        const encoding = fastInverse(T, w, { adder, electrons, flagRotation, maxBits: adder === 'qft' ? 3 : 2, precision: 0.1 });
        expect(encoding.block.nativeKernel).toBe('fast-inverse');
        expect(nativeKernelAgreement(encoding.block, { ...call, seed })).toBeLessThanOrEqual(1e-12);
      }),
      { numRuns: 24, seed: 31 },
    );
  });

  it('detects a kernel whose data adds the wrong offset', () => {
    const T = { n: 2, re: new Float64Array([0.3, 0.1, 0.1, -0.7]), im: new Float64Array(4) };
    const encoding = fastInverse(T, { re: 0.1, im: 0.4 }, { maxBits: 3, precision: 0.1, flagRotation: 'multiplexed' });
    const data = encoding.block.kernelData!;
    const wrong = { ...encoding.block, kernelData: { ...data, offset: [data.offset![0]! + 1] } };
    expect(nativeKernelAgreement(wrong, { seed: 5 })).toBeGreaterThan(1e-3);
  });
});
