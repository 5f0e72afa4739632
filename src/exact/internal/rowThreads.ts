/**
 * rowThreads: splits realKernel's rows between the calling thread and worker threads sharing the
 * vectors (SharedArrayBuffer); the caller blocks on Atomics.wait until every worker has flagged done.
 * The workers form one process-wide pool, started on first use (~0.1 s each from sources) and kept
 * for later sectors; they are unref'd, so they never keep the process alive.
 */
import { createRequire } from 'node:module';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import { applyRealRows, applyRowUpdate, type KernelBlock, type RowUpdate, type RowStep } from './realKernel.js';

/** Longest wait for a worker's share of one product before giving up. */
const WAIT_MS = 120_000;

export interface RowThreads {
  /** y = H x (then `step`, if any) with every vector SharedArrayBuffer-backed. */
  apply(x: Float64Array, y: Float64Array, step: RowStep | null): void;
  /** realKernel's RowUpdate on SharedArrayBuffer-backed vectors, split by the same rows. */
  run(op: RowUpdate): void;
  release(): void;
}

/** Worker bootstrap: from TypeScript sources (tsx, vitest) register tsx's loader first. */
function workerCode(): string {
  const fromSource = import.meta.url.endsWith('.ts');
  const url = new URL(fromSource ? './kernelWorker.ts' : './kernelWorker.js', import.meta.url).href;
  if (!fromSource) return `import(${JSON.stringify(url)});`;
  const api = pathToFileURL(createRequire(import.meta.url).resolve('tsx/esm/api')).href;
  return `import(${JSON.stringify(api)}).then((m) => { m.register(); return import(${JSON.stringify(url)}); });`;
}

export function isShared(a: Float64Array | Float32Array): boolean {
  return a.buffer instanceof SharedArrayBuffer;
}

const pool: Worker[] = [];
let nextSectorId = 0;

function poolWorkers(count: number): Worker[] {
  while (pool.length < count) {
    const worker = new Worker(workerCode(), { eval: true });
    worker.unref();
    pool.push(worker);
  }
  return pool.slice(0, count);
}

/** `threads` ≥ 2 threads in all: the caller plus threads − 1 pool workers; `diagonal` must be shared. */
export function rowThreads(blocks: readonly KernelBlock[], diagonal: Float64Array, threads: number): RowThreads {
  const workers = threads - 1;
  const done = new Int32Array(new SharedArrayBuffer(4 * workers));
  const id = nextSectorId++;
  const team = poolWorkers(workers);
  team.forEach((worker, w) => worker.postMessage({ setup: { id, blocks, diagonal, part: w + 1, parts: threads, done, slot: w } }));
  let released = false;
  const share = (message: object): void => {
    if (released) throw new Error('rowThreads: used after release');
    for (let w = 0; w < workers; w++) {
      Atomics.store(done, w, 0);
      team[w]!.postMessage({ id, ...message });
    }
  };
  const collect = (): void => {
    for (let w = 0; w < workers; w++) {
      // A wake-up can be the late notify of the previous job: wait until the slot really changed.
      while (Atomics.load(done, w) === 0) {
        if (Atomics.wait(done, w, 0, WAIT_MS) === 'timed-out') throw new Error('rowThreads: a worker did not answer');
      }
      if (Atomics.load(done, w) !== 1) throw new Error('rowThreads: a worker failed');
    }
  };
  return {
    apply(x: Float64Array, y: Float64Array, step: RowStep | null): void {
      share({ x, y, step });
      applyRealRows(blocks, diagonal, x, y, 0, threads, step);
      collect();
    },
    run(op: RowUpdate): void {
      share({ op });
      applyRowUpdate(blocks, op, 0, threads);
      collect();
    },
    release(): void {
      if (released) return;
      released = true;
      for (const worker of team) worker.postMessage({ forget: id });
    },
  };
}
