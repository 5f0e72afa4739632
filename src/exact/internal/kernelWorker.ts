/**
 * kernelWorker: a pool worker thread that applies realKernel to its share of the rows of vectors held
 * in SharedArrayBuffers, then flags its slot of a shared Int32Array and wakes the caller
 * (Atomics.notify). It keeps the tables of every sector it was set up for until told to forget it.
 */
import { parentPort } from 'node:worker_threads';
import { applyRealRows, applyRowUpdate, type KernelBlock, type RowUpdate, type RowStep } from './realKernel.js';

interface Setup {
  readonly id: number;
  readonly blocks: readonly KernelBlock[];
  readonly diagonal: Float64Array;
  readonly part: number;
  readonly parts: number;
  readonly done: Int32Array;
  readonly slot: number;
}

type Job = { readonly id: number } & ({ op: RowUpdate } | { x: Float64Array; y: Float64Array; step: RowStep | null });

const setups = new Map<number, Setup>();
parentPort!.on('message', (message: { setup: Setup } | { forget: number } | Job) => {
  if ('setup' in message) {
    setups.set(message.setup.id, message.setup);
    return;
  }
  if ('forget' in message) {
    setups.delete(message.forget);
    return;
  }
  const s = setups.get(message.id)!;
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
