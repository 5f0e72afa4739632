// workerPool: explicit lifecycle (create waits for the job module, close ends the workers), clear failures for a
// module that does not load and for a part that throws, refusal of bad sizes and of use after close. Jobs run on
// the simulator's worker module (the one job module in the code base).
import { describe, expect, it } from 'vitest';
import { createWorkerPool } from '../../src/core/workerPool.js';
import { indexPattern } from '../../src/sim/internal/indexPattern.js';

const simulatorWorker = new URL('../../src/sim/internal/simulatorWorker.ts', import.meta.url);

describe('createWorkerPool', () => {
  it('runs each part of a job on its own thread over shared memory, and refuses use after close', async () => {
    const pool = createWorkerPool({ module: simulatorWorker, workers: 1 });
    expect(pool.threads).toBe(2);
    const re = new Float64Array(new SharedArrayBuffer(8 * 256)).fill(1);
    const im = new Float64Array(new SharedArrayBuffer(8 * 256));
    // A SCALE step (code 0) by 2 over all 256 amplitudes; the worker does part 1 of 2 (counters 128 … 255), the caller nothing.
    const step = { code: 0, pattern: indexPattern(8, [], 0), stride: 0, other: 0, numbers: [2, 0, 0, 0, 0, 0, 0, 0], dense: new Float64Array(0), offsets: new Int32Array(0) };
    pool.run({ step, re, im, work: 256 }, () => undefined);
    expect(Array.from(re)).toEqual([...new Array(128).fill(1), ...new Array(128).fill(2)]);
    await pool.close();
    expect(pool.closed).toBe(true);
    expect(() => pool.run({ step, re, im, work: 256 }, () => undefined)).toThrow(RangeError);
  });

  it('reports a part that throws in a worker as a failed worker', async () => {
    const pool = createWorkerPool({ module: simulatorWorker, workers: 1 });
    try {
      const bad = { code: 99, pattern: null, stride: 0, other: 0, numbers: [], dense: new Float64Array(0), offsets: new Int32Array(0) };
      expect(() => pool.run({ step: bad, re: new Float64Array(2), im: new Float64Array(2), work: 1 }, () => undefined)).toThrow(/worker 1 failed to finish its part/);
    } finally {
      await pool.close();
    }
  });

  it('fails clearly when the job module does not load, and refuses a worker count below one', () => {
    expect(() => createWorkerPool({ module: new URL('./noSuchJobModule.js', import.meta.url), workers: 1 })).toThrow(/failed to load its job module/);
    expect(() => createWorkerPool({ module: simulatorWorker, workers: 0 })).toThrow(RangeError);
  });
});
