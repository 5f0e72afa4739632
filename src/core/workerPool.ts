/**
 * workerPool: worker threads with an explicit lifecycle — createWorkerPool starts them and waits until
 * each has loaded its job module, run splits one job into parts (the calling thread does part 0,
 * worker w part w + 1) and blocks on Atomics.wait until every part is done, close terminates them.
 * Workers are unref'd, so a pool never keeps the process alive; nothing is global.
 * A job module calls serveWorkerPoolJobs (workerPoolWorker.ts) with its handler. Jobs travel by
 * postMessage (typed arrays over SharedArrayBuffers are shared, not copied).
 */
import { createRequire } from 'node:module';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';

/** Longest wait for a worker to load or to finish its part of one job. */
const WAIT_MS = 120_000;

/** Slot states in the shared flags: 0 busy, 1 done, 2 failed. */
const DONE = 1;
const FAILED = 2;

export interface WorkerPoolOptions {
  /**
   * The job module's URL: a .js file, or a .ts file when running from TypeScript sources (tsx's
   * loader is registered in the worker first, as under vitest and tsx).
   */
  readonly module: URL;
  /** Number of worker threads (≥ 1); jobs run on them plus the calling thread. */
  readonly workers: number;
}

export interface WorkerPool {
  /** Threads a job is split over: the workers plus the calling thread. */
  readonly threads: number;
  /** True once close() was called. */
  readonly closed: boolean;
  /**
   * Posts `job` to every worker (worker w handles part w + 1 of `threads`), runs `own` (part 0) on
   * the calling thread, then blocks until every worker is done. Throws Error when a worker failed
   * or did not answer within two minutes, RangeError after close.
   */
  run(job: unknown, own: () => void): void;
  /** Terminates the workers; the pool cannot be used afterwards. */
  close(): Promise<void>;
}

/** Worker bootstrap: import the job module (after tsx's loader for .ts); a failed import flags the slot. */
function bootstrap(module: URL): string {
  const url = JSON.stringify(module.href);
  const fail = `() => { const { workerData } = require('node:worker_threads'); Atomics.store(workerData.flags, workerData.slot, ${FAILED}); Atomics.notify(workerData.flags, workerData.slot); }`;
  if (!module.pathname.endsWith('.ts')) return `import(${url}).catch(${fail});`;
  const api = JSON.stringify(pathToFileURL(createRequire(import.meta.url).resolve('tsx/esm/api')).href);
  return `import(${api}).then((m) => { m.register(); return import(${url}); }).catch(${fail});`;
}

function waitFor(flags: Int32Array, slot: number, what: string): void {
  // A wake-up can be a late notify of an earlier job: wait until the slot really changed.
  while (Atomics.load(flags, slot) === 0) {
    if (Atomics.wait(flags, slot, 0, WAIT_MS) === 'timed-out') throw new Error(`workerPool: worker ${slot + 1} did not ${what} within ${WAIT_MS / 1000} s`);
  }
  if (Atomics.load(flags, slot) !== DONE) throw new Error(`workerPool: worker ${slot + 1} failed to ${what}`);
}

/** Starts `options.workers` workers on the job module and waits until each has loaded it. */
export function createWorkerPool(options: WorkerPoolOptions): WorkerPool {
  const count = options.workers;
  if (!Number.isInteger(count) || count < 1) throw new RangeError(`createWorkerPool: workers must be a positive integer, got ${count}`);
  const flags = new Int32Array(new SharedArrayBuffer(4 * count));
  const code = bootstrap(options.module);
  const workers = Array.from({ length: count }, (_, slot) => {
    const worker = new Worker(code, { eval: true, workerData: { flags, slot } });
    worker.unref();
    return worker;
  });
  let closed = false;
  const close = async (): Promise<void> => {
    if (closed) return;
    closed = true;
    await Promise.all(workers.map((w) => w.terminate()));
  };
  try {
    for (let slot = 0; slot < count; slot++) waitFor(flags, slot, `load its job module ${options.module.href}`);
  } catch (error) {
    void close();
    throw error;
  }
  return {
    threads: count + 1,
    get closed() {
      return closed;
    },
    run(job, own) {
      if (closed) throw new RangeError('workerPool: run after close');
      for (let slot = 0; slot < count; slot++) {
        Atomics.store(flags, slot, 0);
        workers[slot]!.postMessage({ job, part: slot + 1, parts: count + 1 });
      }
      let ownError: unknown = null;
      try {
        own();
      } catch (error) {
        ownError = error;
      }
      for (let slot = 0; slot < count; slot++) waitFor(flags, slot, 'finish its part');
      if (ownError !== null) throw ownError;
    },
    close,
  };
}
