/**
 * simulatorWorker: the job module of SimulatorPool's workers — applies its part of one kernel step
 * to amplitudes held in SharedArrayBuffers.
 */
import { serveWorkerPoolJobs } from '../../core/workerPoolWorker.js';
import { applyStep, partRange, type KernelStep } from './applyStep.js';

serveWorkerPoolJobs((job, part, parts) => {
  const { step, re, im, work } = job as { step: KernelStep; re: Float64Array; im: Float64Array; work: number };
  const [from, to] = partRange(step, work, part, parts);
  applyStep(step, re, im, from, to);
});
