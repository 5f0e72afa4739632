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

  it('columns: checks exactly the listed system columns, so an error in another column goes unseen', () => {
    const right = pauliLcu(SUM, 's');
    // X0Z1 maps column 0 to row 1 and column 1 to row 0 (flip of qubit 0): a coefficient error shows in every column.
    const wrongSum = { ...SUM, terms: SUM.terms.map((t, k) => (k === 0 ? { ...t, re: 0.6 } : t)) };
    const wrong = { ...right, exact: pauliLcu(wrongSum, 'w').exact };
    const report = verifyEncoding(wrong, { columns: [2, 5] });
    expect(report.method).toBe('columns');
    expect(report.probes).toBe(2);
    expect(report.maxError).toBeCloseTo(0.1 / right.alpha, 12);
    // An encoding exact on column 0 only (the reference altered elsewhere) passes on that column alone.
    const M = right.exact();
    const altered = { n: M.n, re: Float64Array.from(M.re, (x, e) => (e % M.n === 3 ? x + 0.5 : x)), im: M.im };
    const partly = { ...right, exact: () => altered };
    expect(verifyEncoding(partly, { columns: [0] }).maxError).toBeLessThan(1e-12);
    expect(verifyEncoding(partly, { columns: [3] }).maxError).toBeGreaterThan(0.1);
    expect(() => verifyEncoding(right, { columns: [8] })).toThrow(RangeError);
  });

  it('probe: reports a power-iteration estimate that reaches ‖E‖ where the random probes see only part of it', () => {
    const right = pauliLcu(SUM, 's');
    const wrongSum = { ...SUM, terms: SUM.terms.map((t, k) => (k === 0 ? { ...t, re: 0.6 } : t)) };
    const wrong = { ...right, exact: pauliLcu(wrongSum, 'w').exact };
    const report = verifyEncoding(wrong, { exhaustiveLimit: 0 });
    expect(report.method).toBe('probe');
    // E = 0.1·X0Z1/α is 0.1/α times a unitary: every singular value is 0.1/α, so one step of the iteration finds it,
    // while a random unit vector spreads it over 8 entries (hand computation).
    expect(report.powerIteration!.estimate).toBeCloseTo(0.1 / right.alpha, 12);
    expect(report.powerIteration!.iterations).toBeGreaterThanOrEqual(1);
    expect(report.maxError).toBeLessThan(report.powerIteration!.estimate);
    const exact = verifyEncoding(right, { exhaustiveLimit: 0 });
    expect(exact.powerIteration!.estimate).toBeLessThan(1e-12);
  });
});
