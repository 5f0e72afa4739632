// chooseBasis: the Lanczos basis mode follows from the inputs and the planned memory limit only;
// os.freemem is mocked to throw, so any read of the machine's free memory fails the test.
import { describe, expect, it, vi } from 'vitest';

vi.mock('node:os', async (importOriginal) => {
  const os = await importOriginal<typeof import('node:os')>();
  return {
    ...os,
    freemem: () => {
      throw new Error('os.freemem must not be read by algorithm choices');
    },
  };
});

const { chooseBasis, KEEP_BASIS_DIMENSION } = await import('../../../src/exact/internal/chooseBasis.js');
const { PLANNING_MEMORY_LIMIT } = await import('../../../src/core/memoryBudget.js');

describe('chooseBasis(dimension, complex, maxSteps, memoryLimit)', () => {
  it('keeps the basis up to KEEP_BASIS_DIMENSION, then compact or rerun by the planned limit, never reading os.freemem', () => {
    const saved = process.env.POLEWRIGHT_MEMORY_LIMIT;
    delete process.env.POLEWRIGHT_MEMORY_LIMIT;
    try {
      expect(chooseBasis(KEEP_BASIS_DIMENSION, false, 400).mode).toBe('full');
      // Default plan: min(1 GiB, PLANNING_MEMORY_LIMIT/4) of single-precision vectors.
      expect(PLANNING_MEMORY_LIMIT / 4).toBeGreaterThanOrEqual(2 ** 30);
      const compact = chooseBasis(1e6, false, 400);
      expect(compact).toEqual({ mode: 'compact', stepsPerCycle: 268, storedVectors: 134 });
      expect(chooseBasis(1e6, false, 400, 1e8).mode).toBe('rerun');
      process.env.POLEWRIGHT_MEMORY_LIMIT = '1e8';
      expect(chooseBasis(1e6, false, 400).mode).toBe('rerun');
      expect(chooseBasis(1e6, false, 400, undefined, 'full').mode).toBe('full');
    } finally {
      if (saved === undefined) delete process.env.POLEWRIGHT_MEMORY_LIMIT;
      else process.env.POLEWRIGHT_MEMORY_LIMIT = saved;
    }
  });
});
