import { describe, expect, it } from 'vitest';
import { ladderEncoding } from '../../src/blocks/builders/ladderEncoding.js';
import { linearCombination } from '../../src/blocks/combine/linearCombination.js';
import { productEncoding } from '../../src/blocks/combine/productEncoding.js';
import { ancillaQubits, type BlockEncoding } from '../../src/blocks/BlockEncoding.js';
import { tensorEncoding } from '../../src/blocks/combine/tensorEncoding.js';
import { verifyEncoding } from '../../src/verify/verifyEncoding.js';
import { fastInverse } from '../../src/inversion/fastInverse.js';
import { cleanRegisterLeak } from '../../src/verify/cleanRegisterLeak.js';

const T = { n: 2, re: new Float64Array([0.5, 0.25, 0.25, -0.5]), im: new Float64Array(4) };

describe('cleanRegisterLeak(encoding)', () => {
  it('finds no leak in the registers the fast inverse marks clean (QFT and ripple adders, with a window)', () => {
    for (const adder of ['qft', 'ripple'] as const) {
      const f = fastInverse(T, { re: 0.3, im: 0.2 }, { adder, electrons: 1, maxBits: 4, precision: 0.1 });
      expect(f.ancillas.filter((r) => r.role === 'signal').map((r) => r.name)).toEqual(['flag']);
      expect(cleanRegisterLeak(f)).toBeLessThan(1e-10);
    }
  });

  it('keeps clean registers clean through products and linear combinations', () => {
    const f = fastInverse(T, { re: -0.2, im: 0.3 }, { maxBits: 4, precision: 0.1 });
    const product = productEncoding([ladderEncoding(1, false, 2), f]);
    const lcu = linearCombination([{ coefficient: { re: 1, im: 0 }, encoding: f }, { coefficient: { re: 0, im: 1 }, encoding: ladderEncoding(0, true, 2) }], 'lcu');
    expect(product.ancillas.some((r) => r.role === 'clean')).toBe(true);
    expect(lcu.ancillas.some((r) => r.role === 'clean')).toBe(true);
    expect(cleanRegisterLeak(product)).toBeLessThan(1e-10);
    expect(cleanRegisterLeak(lcu)).toBeLessThan(1e-10);
  });

  it('shares one clean pool between the factors of a product and of a tensor product, and it still comes back to |0>', () => {
    const f = fastInverse(T, { re: 0.1, im: 0.4 }, { maxBits: 4, precision: 0.1 });
    const g = fastInverse(T, { re: -0.3, im: 0.25 }, { maxBits: 3, precision: 0.1 });
    const cleanOf = (e: BlockEncoding) => e.ancillas.filter((r) => r.role === 'clean').reduce((s, r) => s + r.size, 0);
    const product = productEncoding([f, g]);
    expect(cleanOf(product)).toBe(Math.max(cleanOf(f), cleanOf(g)));
    expect(ancillaQubits(product)).toBe(2 + Math.max(cleanOf(f), cleanOf(g)));
    expect(cleanRegisterLeak(product)).toBeLessThan(1e-10);
    expect(verifyEncoding(product).maxError).toBeLessThanOrEqual(product.errorBound + 1e-12);
    const one = { n: 1, re: new Float64Array([0.375]), im: new Float64Array(1) };
    const tensor = tensorEncoding(fastInverse(one, { re: 0.2, im: 0.5 }, { maxBits: 3 }), fastInverse(one, { re: -0.1, im: 0.5 }, { maxBits: 2 }));
    expect(cleanRegisterLeak(tensor)).toBeLessThan(1e-10);
    expect(verifyEncoding(tensor).maxError).toBeLessThanOrEqual(tensor.errorBound + 1e-12);
  });

  it('detects a register wrongly marked clean (the ladder ancilla is a signal qubit)', () => {
    const ladder = ladderEncoding(0, false, 2);
    const mislabelled: BlockEncoding = { ...ladder, ancillas: [{ name: 'ladder', size: 1, role: 'clean' }] };
    expect(cleanRegisterLeak(mislabelled)).toBeGreaterThan(0.1);
  });
});
