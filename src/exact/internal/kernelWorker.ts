/**
 * kernelWorker: the job module of the exact solver's worker pool (src/core/workerPool.ts) — applies realKernel to its
 * part of the rows of vectors held in SharedArrayBuffers. It keeps the tables of every sector it was set up for until
 * told to forget it, so a product posts only its vectors.
 */
import { serveWorkerPoolJobs } from '../../core/workerPoolWorker.js';
import { applyRealRows, applyRowUpdate, type KernelBlock, type RowUpdate, type RowStep } from './realKernel.js';

export type KernelJob =
  | { readonly kind: 'setup'; readonly id: number; readonly blocks: readonly KernelBlock[]; readonly diagonal: Float64Array }
  | { readonly kind: 'forget'; readonly id: number }
  | { readonly kind: 'update'; readonly id: number; readonly op: RowUpdate }
  | { readonly kind: 'product'; readonly id: number; readonly x: Float64Array; readonly y: Float64Array; readonly step: RowStep | null };

interface Setup {
  readonly blocks: readonly KernelBlock[];
  readonly diagonal: Float64Array;
}

const setups = new Map<number, Setup>();

serveWorkerPoolJobs((message, part, parts) => {
  const job = message as KernelJob;
  if (job.kind === 'setup') setups.set(job.id, { blocks: job.blocks, diagonal: job.diagonal });
  else if (job.kind === 'forget') setups.delete(job.id);
  else {
    const setup = setups.get(job.id);
    if (!setup) throw new Error(`kernelWorker: sector ${job.id} was not set up`);
    if (job.kind === 'update') applyRowUpdate(setup.blocks, job.op, part, parts);
    else applyRealRows(setup.blocks, setup.diagonal, job.x, job.y, part, parts, job.step);
  }
});
