/**
 * runProgram: replays a compiled program on a state in place, dispatching each step to its kernel
 * (applyStep), running native passes and repeating sub-programs. With a SimulatorPool and a state of
 * at least PARALLEL_MIN_AMPLITUDES shared amplitudes, each kernel step is split over the pool's
 * threads by index ranges (same arithmetic per amplitude, so the same result bit for bit).
 */
import { PARALLEL_MIN_AMPLITUDES, type SimulatorPool } from '../SimulatorPool.js';
import type { StateVector } from '../StateVector.js';
import { applyStep, partRange, stepWork } from './applyStep.js';
import { NATIVE, REPEAT, TILE, type Program, type Step } from './Program.js';

/** Steps with fewer work units than this run on the calling thread alone (a message costs more). */
const MIN_SPLIT_WORK = 2 ** 14;

export function runProgram(program: Program, state: StateVector, pool?: SimulatorPool): void {
  if (state.qubits !== program.stateQubits) {
    throw new RangeError(`runProgram: the program was compiled for ${program.stateQubits} qubits, the state has ${state.qubits}`);
  }
  if (pool?.workers.closed) throw new RangeError('runProgram: the simulator pool is closed');
  const shared = state.re.buffer instanceof SharedArrayBuffer && state.im.buffer instanceof SharedArrayBuffer;
  replay(program, state, pool && shared && state.re.length >= PARALLEL_MIN_AMPLITUDES ? pool : null);
}

function replay(program: Program, state: StateVector, pool: SimulatorPool | null): void {
  const { re, im } = state;
  for (const step of program.steps) {
    if (step.code === NATIVE) (step.pass as (s: StateVector) => void)(state);
    else if (step.code === REPEAT) for (let r = 0; r < step.times; r++) replay(step.program as Program, state, pool);
    else {
      const work = stepWork(step, re.length);
      if (pool && (step.code === TILE ? work >= pool.threads : work >= MIN_SPLIT_WORK)) split(step, re, im, work, pool);
      else applyStep(step, re, im, 0, work);
    }
  }
}

function split(step: Step, re: Float64Array, im: Float64Array, work: number, pool: SimulatorPool): void {
  // Kernel steps hold no closures (pass is null), so the step itself is posted.
  pool.workers.run({ step, re, im, work }, () => {
    const [from, to] = partRange(step, work, 0, pool.threads);
    applyStep(step, re, im, from, to);
  });
}
