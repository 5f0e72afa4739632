import { describe, expect, it } from 'vitest';
import { pauliLcu } from '../../src/blocks/builders/pauliLcu.js';
import { verifyEncoding } from '../../src/verify/verifyEncoding.js';

const SUM = {
  qubits: 3,
  terms: [
    { x: 1n, z: 2n, re: 0.7, im: 0 },
    { x: 0n, z: 5n, re: -0.2, im: 0.4 },
    { x: 6n, z: 6n, re: 0.1, im: 0 },
  ],
};

describe('verifyEncoding(encoding)', () => {
  it('finds a correct encoding exact, by columns and by random probes alike', () => {
    const e = pauliLcu(SUM, 's');
    const full = verifyEncoding(e);
    const probe = verifyEncoding(e, { exhaustiveLimit: 0, probes: 4 });
    expect(full.method).toBe('exhaustive');
    expect(probe.method).toBe('probe');
    expect(full.maxError).toBeLessThan(1e-12);
    expect(probe.maxError).toBeLessThan(1e-12);
    expect(full.unitarityDeviation).toBeLessThan(1e-12);
  });

  it('reports the error of an encoding whose exact operator is wrong, in both modes', () => {
    const right = pauliLcu(SUM, 's');
    const wrongSum = { ...SUM, terms: SUM.terms.map((t, k) => (k === 0 ? { ...t, re: 0.6 } : t)) };
    const wrong = { ...right, exact: pauliLcu(wrongSum, 'w').exact };
    // The encoded operator differs by 0.1·X0Z1 (norm 0.1); relative to α the entry error is 0.1/α.
    const expected = 0.1 / right.alpha;
    expect(verifyEncoding(wrong).maxError).toBeCloseTo(expected, 12);
    expect(verifyEncoding(wrong, { exhaustiveLimit: 0 }).maxError).toBeGreaterThan(expected / 10);
  });
});
