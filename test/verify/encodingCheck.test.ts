import { describe, expect, it } from 'vitest';
import { ladderEncoding } from '../../src/blocks/builders/ladderEncoding.js';
import { encodingCheck, judge, skippedRow } from '../../src/verify/encodingCheck.js';

const LIMITS = { tolerance: 1e-10, precision: 1e-3 };

describe('judge(error, bound, unitarityDeviation, { tolerance, precision })', () => {
  it('passes an error within max(tolerance, bound) when the bound is within the precision', () => {
    expect(judge(1e-12, 0, 0, LIMITS).verdict).toBe('pass');
    expect(judge(5e-4, 6e-4, 0, LIMITS).verdict).toBe('pass');
  });

  it('fails an error above max(tolerance, bound), a NaN error, and a unitarity deviation above the tolerance', () => {
    expect(judge(1e-9, 0, 0, LIMITS).verdict).toBe('fail');
    expect(judge(3e-3, 2e-3, 0, LIMITS).verdict).toBe('fail');
    expect(judge(0, 0, 1e-8, LIMITS).verdict).toBe('fail');
    expect(judge(Number.NaN, 0, 0, LIMITS).verdict).toBe('fail');
  });

  it('calls an error within a bound above the precision inconclusive, never a pass (the bound 213 case of the issue)', () => {
    const result = judge(6.63, 213, 0, LIMITS);
    expect(result.verdict).toBe('inconclusive');
    expect(result.reason).toMatch(/exceeds the precision 0.001/);
  });
});

describe('encodingCheck / skippedRow', () => {
  it('reports verdict, passed and method; a skipped row is not a pass and carries its reason', () => {
    const row = encodingCheck(ladderEncoding(0, true, 2), LIMITS);
    expect(row).toMatchObject({ verdict: 'pass', passed: true, method: 'exhaustive' });
    const probed = encodingCheck(ladderEncoding(0, true, 2), LIMITS, { exhaustiveLimit: 0 });
    expect(probed.method).toBe('probe (lower bound)');
    expect(probed.powerIteration!.iterations).toBeGreaterThan(0);
    const skipped = skippedRow(ladderEncoding(0, true, 2), 'too large');
    expect(skipped).toMatchObject({ verdict: 'skipped', passed: false, maxError: null, reason: 'too large' });
  });
});
