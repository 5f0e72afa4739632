/**
 * applyStep: applies one kernel step of a program (any step but NATIVE and REPEAT) to the part
 * [from, to) of its work range — the same code on the calling thread and in pool workers — and
 * stepWork, the size of that range (pairs for STRIDE, free-bit counter values for pattern steps),
 * and partRange, one thread's share of it.
 */
import { applyAntiDiagonalPairs } from '../kernels/applyAntiDiagonalPairs.js';
import { applyDenseBlock } from '../kernels/applyDenseBlock.js';
import { applyDiagonalPairs } from '../kernels/applyDiagonalPairs.js';
import { applyDiagonalTable } from '../kernels/applyDiagonalTable.js';
import { applyMatrixPairs } from '../kernels/applyMatrixPairs.js';
import { applyMatrixStride } from '../kernels/applyMatrixStride.js';
import { applySwapPairs } from '../kernels/applySwapPairs.js';
import { scaleMatching } from '../kernels/scaleMatching.js';
import type { IndexPattern } from './indexPattern.js';
import { ANTI_DIAGONAL, DENSE, DIAGONAL, DIAGONAL_TABLE, MATRIX, SCALE, STRIDE, SWAP, TILE, type Program, type Step } from './Program.js';

/** The fields of a kernel step that workers need (kernel steps hold no closures; a TILE's program only kernel steps). */
export type KernelStep = Pick<Step, 'code' | 'pattern' | 'stride' | 'other' | 'numbers' | 'targets' | 'dense' | 'offsets' | 'program'>;

/** Number of work units of a kernel step on a state of `size` amplitudes (tiles for TILE). */
export function stepWork(step: KernelStep, size: number): number {
  if (step.code === STRIDE) return size >>> 1;
  if (step.code === TILE) return size / step.stride;
  const pattern = step.pattern as IndexPattern;
  return pattern.outer * pattern.run;
}

/** Parts of amplitude-level steps are cut at multiples of this many work units (whole cache lines of both arrays). */
const PART_ALIGN = 64;

/** The range [from, to) of the step's work units that thread `part` of `parts` handles. */
export function partRange(step: KernelStep, work: number, part: number, parts: number): [number, number] {
  const align = step.code === TILE ? 1 : PART_ALIGN;
  const cut = (k: number): number => (k === parts ? work : Math.min(work, Math.floor((work * k) / parts / align) * align));
  return [cut(part), cut(part + 1)];
}

/** Tiles [from, to): every sub-step on its share of each tile, tile after tile (the tile stays in cache). */
function applyTiles(program: Program, tileSize: number, re: Float64Array, im: Float64Array, from: number, to: number): void {
  const steps = program.steps;
  const tiles = re.length / tileSize;
  const shares = steps.map((sub) => stepWork(sub, re.length) / tiles);
  for (let tile = from; tile < to; tile++) {
    for (let k = 0; k < steps.length; k++) {
      const share = shares[k]!;
      applyStep(steps[k]!, re, im, tile * share, (tile + 1) * share);
    }
  }
}

export function applyStep(step: KernelStep, re: Float64Array, im: Float64Array, from: number, to: number): void {
  const m = step.numbers;
  const pattern = step.pattern as IndexPattern;
  switch (step.code) {
    case SCALE:
      scaleMatching(re, im, pattern, m[0], m[1], from, to);
      break;
    case STRIDE:
      applyMatrixStride(re, im, step.stride, m, from, to);
      break;
    case DIAGONAL:
      applyDiagonalPairs(re, im, pattern, step.stride, m[0], m[1], m[6], m[7], from, to);
      break;
    case ANTI_DIAGONAL:
      applyAntiDiagonalPairs(re, im, pattern, step.stride, m[2], m[3], m[4], m[5], from, to);
      break;
    case MATRIX:
      applyMatrixPairs(re, im, pattern, step.stride, m, from, to);
      break;
    case SWAP:
      applySwapPairs(re, im, pattern, step.stride, step.other, m[0], m[1], from, to);
      break;
    case DENSE:
      applyDenseBlock(re, im, pattern, step.offsets, step.dense, from, to);
      break;
    case DIAGONAL_TABLE:
      applyDiagonalTable(re, im, pattern, step.targets, step.offsets, step.dense, from, to);
      break;
    case TILE:
      applyTiles(step.program as Program, step.stride, re, im, from, to);
      break;
    default:
      throw new RangeError(`applyStep: step code ${step.code} is not a kernel step`);
  }
}
