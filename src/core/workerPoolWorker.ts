/**
 * workerPoolWorker: the worker side of workerPool — a job module calls serveWorkerPoolJobs with its
 * handler; each job's part runs it, then the worker flags its slot done (or failed) and wakes the caller.
 */
import { parentPort, workerData } from 'node:worker_threads';

/** Handles one part (1 … parts − 1; the caller does part 0) of each job posted to this worker. */
export function serveWorkerPoolJobs(handler: (job: unknown, part: number, parts: number) => void): void {
  if (!parentPort) throw new RangeError('serveWorkerPoolJobs: not running in a worker thread');
  const { flags, slot } = workerData as { flags: Int32Array; slot: number };
  parentPort.on('message', (message: { job: unknown; part: number; parts: number }) => {
    let state = 1;
    try {
      handler(message.job, message.part, message.parts);
    } catch {
      state = 2;
    }
    Atomics.store(flags, slot, state);
    Atomics.notify(flags, slot);
  });
  Atomics.store(flags, slot, 1);
  Atomics.notify(flags, slot);
}
