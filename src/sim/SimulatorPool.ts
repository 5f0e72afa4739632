/**
 * SimulatorPool: worker threads that share the simulator's gate passes on large states. Create one
 * with createSimulatorPool, pass it as SimulationOptions.pool, and close it when done (its workers
 * never keep the process alive, but they hold memory until closed). A pass is split over index
 * ranges; every amplitude is computed by the same arithmetic as on one thread, so results are
 * identical bit for bit. Only states of at least PARALLEL_MIN_AMPLITUDES amplitudes (held in
 * SharedArrayBuffers) are split; native block passes run on the calling thread.
 */
import { createWorkerPool, type WorkerPool } from '../core/workerPool.js';

/** States with at least this many amplitudes are allocated in SharedArrayBuffers and split between threads. */
export const PARALLEL_MIN_AMPLITUDES = 2 ** 18;

export interface SimulatorPool {
  /** Threads a pass is split over (the calling thread included). */
  readonly threads: number;
  /** The underlying worker pool. */
  readonly workers: WorkerPool;
  /** Terminates the workers. */
  close(): Promise<void>;
}

/** Worker module: the .ts source under tsx/vitest, the compiled .js from dist/ (as the exact solver's rowThreads). */
function workerModule(): URL {
  const fromSource = import.meta.url.endsWith('.ts');
  return new URL(fromSource ? './internal/simulatorWorker.ts' : './internal/simulatorWorker.js', import.meta.url);
}

/**
 * Starts threads − 1 workers (the calling thread is the other one); blocks until they are ready
 * (about 0.1 s each from dist/, longer from TypeScript sources). Throws RangeError unless threads ≥ 2.
 */
export function createSimulatorPool(threads: number): SimulatorPool {
  if (!Number.isInteger(threads) || threads < 2) throw new RangeError(`createSimulatorPool: threads must be an integer ≥ 2, got ${threads}`);
  const workers = createWorkerPool({ module: workerModule(), workers: threads - 1 });
  return { threads, workers, close: () => workers.close() };
}
