/**
 * runProgram: replays a compiled program on a state in place, dispatching each step to its kernel.
 */
import type { StateVector } from '../StateVector.js';
import { applyAntiDiagonalPairs } from '../kernels/applyAntiDiagonalPairs.js';
import { applyDiagonalPairs } from '../kernels/applyDiagonalPairs.js';
import { applyMatrixPairs } from '../kernels/applyMatrixPairs.js';
import { applyMatrixStride } from '../kernels/applyMatrixStride.js';
import { applySwapPairs } from '../kernels/applySwapPairs.js';
import { scaleMatching } from '../kernels/scaleMatching.js';
import type { IndexPattern } from './indexPattern.js';
import { ANTI_DIAGONAL, DIAGONAL, MATRIX, NATIVE, REPEAT, SCALE, STRIDE, SWAP, type Program } from './Program.js';

export function runProgram(program: Program, state: StateVector): void {
  if (state.qubits !== program.stateQubits) {
    throw new RangeError(`runProgram: the program was compiled for ${program.stateQubits} qubits, the state has ${state.qubits}`);
  }
  replay(program, state);
}

function replay(program: Program, state: StateVector): void {
  const { re, im } = state;
  for (const step of program.steps) {
    const m = step.numbers;
    switch (step.code) {
      case SCALE:
        scaleMatching(re, im, step.pattern as IndexPattern, m[0], m[1]);
        break;
      case STRIDE:
        applyMatrixStride(re, im, step.stride, m);
        break;
      case DIAGONAL:
        applyDiagonalPairs(re, im, step.pattern as IndexPattern, step.stride, m[0], m[1], m[6], m[7]);
        break;
      case ANTI_DIAGONAL:
        applyAntiDiagonalPairs(re, im, step.pattern as IndexPattern, step.stride, m[2], m[3], m[4], m[5]);
        break;
      case MATRIX:
        applyMatrixPairs(re, im, step.pattern as IndexPattern, step.stride, m);
        break;
      case SWAP:
        applySwapPairs(re, im, step.pattern as IndexPattern, step.stride, step.other, m[0], m[1]);
        break;
      case NATIVE:
        (step.pass as (s: StateVector) => void)(state);
        break;
      case REPEAT:
        for (let r = 0; r < step.times; r++) replay(step.program as Program, state);
        break;
      default:
        throw new RangeError(`runProgram: unknown step code ${step.code}`);
    }
  }
}
