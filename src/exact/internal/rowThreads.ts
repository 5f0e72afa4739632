/**
 * rowThreads: splits realKernel's rows between the calling thread and the workers of the exact solver's pool
 * (src/core/workerPool.ts, job module kernelWorker.ts) sharing the vectors (SharedArrayBuffer). The pool is started on
 * first use (~0.1 s per worker from dist/) and kept for later sectors (a larger thread count starts a larger one); its
 * workers are unref'd, so they never keep the process alive, and closeExactWorkers ends them — a sector whose pool was
 * closed goes on on the calling thread, with the same bytes.
 */
import { createWorkerPool, type WorkerPool } from '../../core/workerPool.js';
import type { KernelJob } from './kernelWorker.js';
import { applyRealRows, applyRowUpdate, type KernelBlock, type RowUpdate, type RowStep } from './realKernel.js';

export interface RowThreads {
  /** y = H x (then `step`, if any) with every vector SharedArrayBuffer-backed. */
  apply(x: Float64Array, y: Float64Array, step: RowStep | null): void;
  /** realKernel's RowUpdate on SharedArrayBuffer-backed vectors, split by the same rows. */
  run(op: RowUpdate): void;
  release(): void;
}

export function isShared(a: Float64Array | Float32Array): boolean {
  return a.buffer instanceof SharedArrayBuffer;
}

/** Job module: the .ts source under tsx/vitest, the compiled .js from dist/. */
function workerModule(): URL {
  const fromSource = import.meta.url.endsWith('.ts');
  return new URL(fromSource ? './kernelWorker.ts' : './kernelWorker.js', import.meta.url);
}

/** Every pool started and not yet closed, largest last (sectors set up on a smaller one keep using it). */
const pools: WorkerPool[] = [];
let nextSectorId = 0;

function poolFor(threads: number): WorkerPool {
  const largest = pools[pools.length - 1];
  if (largest !== undefined && largest.threads >= threads) return largest;
  const pool = createWorkerPool({ module: workerModule(), workers: threads - 1 });
  pools.push(pool);
  return pool;
}

/** Ends the exact solver's workers (a later sector starts new ones). */
export async function closeExactWorkers(): Promise<void> {
  await Promise.all(pools.splice(0).map((pool) => pool.close()));
}

/**
 * `threads` ≥ 2 threads in all: the caller plus threads − 1 workers (a larger pool than needed is used with all its
 * threads; the row split gives the same bytes on any number of threads); `diagonal` must be shared.
 */
export function rowThreads(blocks: readonly KernelBlock[], diagonal: Float64Array, threads: number): RowThreads {
  const workers = poolFor(threads);
  const id = nextSectorId++;
  const parts = workers.threads;
  const post = (job: KernelJob, own: () => void, alone: () => void): void => {
    if (workers.closed) alone();
    else workers.run(job, own);
  };
  post({ kind: 'setup', id, blocks, diagonal }, () => {}, () => {});
  let released = false;
  const live = (): void => {
    if (released) throw new Error('rowThreads: used after release');
  };
  return {
    apply(x: Float64Array, y: Float64Array, step: RowStep | null): void {
      live();
      post(
        { kind: 'product', id, x, y, step },
        () => applyRealRows(blocks, diagonal, x, y, 0, parts, step),
        () => applyRealRows(blocks, diagonal, x, y, 0, 1, step),
      );
    },
    run(op: RowUpdate): void {
      live();
      post(
        { kind: 'update', id, op },
        () => applyRowUpdate(blocks, op, 0, parts),
        () => applyRowUpdate(blocks, op, 0, 1),
      );
    },
    release(): void {
      if (released) return;
      released = true;
      post({ kind: 'forget', id }, () => {}, () => {});
    },
  };
}
