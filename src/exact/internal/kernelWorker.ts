/**
 * kernelWorker: a worker thread that applies realKernel to its share of the rows of vectors held in
 * SharedArrayBuffers, then flags its slot of a shared Int32Array and wakes the caller (Atomics.notify).
 */
import { parentPort } from 'node:worker_threads';
import { applyRealRows, applyRowUpdate, type KernelBlock, type RowUpdate, type RowStep } from './realKernel.js';

interface Setup {
  readonly blocks: readonly KernelBlock[];
  readonly diagonal: Float64Array;
  readonly part: number;
  readonly parts: number;
  readonly done: Int32Array;
  readonly slot: number;
}

let setup: Setup | null = null;
parentPort!.on('message', (message: { setup: Setup } | { op: RowUpdate } | { x: Float64Array; y: Float64Array; step: RowStep | null }) => {
  if ('setup' in message) {
    setup = message.setup;
    return;
  }
  const s = setup!;
  let state = 1;
  try {
    if ('op' in message) applyRowUpdate(s.blocks, message.op, s.part, s.parts);
    else applyRealRows(s.blocks, s.diagonal, message.x, message.y, s.part, s.parts, message.step);
  } catch {
    state = 2;
  }
  Atomics.store(s.done, s.slot, state);
  Atomics.notify(s.done, s.slot);
});
