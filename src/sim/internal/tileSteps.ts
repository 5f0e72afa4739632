/**
 * tileSteps: groups runs of consecutive kernel steps that touch only bits below TILE_BITS into TILE
 * steps, which apply the whole run to one block of 2^TILE_BITS amplitudes (cache-resident)
 * before moving to the next — one pass over memory instead of one per step, the same arithmetic per
 * amplitude in the same order (so the result is identical bit for bit), and tiles are independent,
 * so threads split them with no synchronisation inside the run. States of at most TILE_BITS qubits
 * are left alone (they are one tile). Native passes and repeats end a run.
 */
import { ANTI_DIAGONAL, DENSE, DIAGONAL, DIAGONAL_TABLE, MATRIX, SCALE, STRIDE, SWAP, TILE, makeProgram, makeStep, type Step } from './Program.js';

/** log2 of the tile size in amplitudes (2^14 amplitudes: 256 KiB, within a core's L2 cache). */
export const TILE_BITS = 14;

const TILEABLE = new Set([SCALE, STRIDE, DIAGONAL, ANTI_DIAGONAL, MATRIX, SWAP, DENSE, DIAGONAL_TABLE]);

/** Highest state bit the step reads or writes at a fixed position (−1 for none). */
function highestBit(step: Step): number {
  let high = -1;
  for (const t of step.targets) high = Math.max(high, t);
  if (step.pattern) for (const p of step.pattern.positions) high = Math.max(high, p);
  return high;
}

export function tileSteps(steps: readonly Step[], n: number): Step[] {
  if (n <= TILE_BITS) return [...steps];
  const out: Step[] = [];
  let run: Step[] = [];
  const flush = (): void => {
    if (run.length >= 2) out.push(makeStep({ code: TILE, stride: 2 ** TILE_BITS, program: makeProgram(run, n) }));
    else out.push(...run);
    run = [];
  };
  for (const step of steps) {
    if (TILEABLE.has(step.code) && highestBit(step) < TILE_BITS) run.push(step);
    else {
      flush();
      out.push(step);
    }
  }
  flush();
  return out;
}
