/**
 * bench-sim (`npx tsx scripts/bench-sim.ts`, not a test): seconds per 1-qubit, controlled and diagonal gate at
 * 20/22/24 qubits vs a copy of both arrays (Float64Array.set), best of N with gate and copy runs interleaved.
 */
import { gate } from '../src/circuit/ops.js';
import type { UnitaryOp } from '../src/circuit/types.js';
import { StateVector } from '../src/sim/StateVector.js';
import { applyUnitaryOps } from '../src/sim/applyUnitaryOps.js';

function seconds(work: () => void): number {
  const start = process.hrtime.bigint();
  work();
  return Number(process.hrtime.bigint() - start) / 1e9;
}

/** Best-of-`reps` seconds of `work` and of `copy`, timed alternately after two warm-up runs. */
function bestOf(reps: number, work: () => void, copy: () => void): [number, number] {
  work();
  work();
  let bestWork = Infinity;
  let bestCopy = Infinity;
  for (let r = 0; r < reps; r++) {
    bestCopy = Math.min(bestCopy, seconds(copy));
    bestWork = Math.min(bestWork, seconds(work));
  }
  return [bestWork, bestCopy];
}

for (const n of [20, 22, 24]) {
  const state = StateVector.zero(n);
  state.re.fill(1 / Math.sqrt(2 ** n));
  const copyRe = new Float64Array(2 ** n);
  const copyIm = new Float64Array(2 ** n);
  const copy = (): void => {
    copyRe.set(state.re);
    copyIm.set(state.im);
  };
  const reps = Math.max(10, 2 ** (26 - n));
  const mid = n >> 1;
  const cases: [string, UnitaryOp][] = [
    [`h q[${mid}] (1-qubit)`, gate('h', [mid])],
    ['h q[0] (1-qubit)', gate('h', [0])],
    [`h q[${n - 1}] (1-qubit)`, gate('h', [n - 1])],
    [`crx q[0], q[${mid}] (controlled)`, gate('crx', [0, mid], [0.3])],
    [`ctrl(2) @ x q[${mid - 1}], q[${mid + 1}], q[${mid}]`, gate('x', [mid], [], { controls: [mid - 1, mid + 1] })],
    [`rz(0.3) q[${mid}] (diagonal)`, gate('rz', [mid], [0.3])],
    [`p(0.3) q[${mid}] (diagonal, phase)`, gate('p', [mid], [0.3])],
  ];
  console.log(`${n} qubits, best of ${reps}`);
  for (const [label, op] of cases) {
    const [gateTime, copyTime] = bestOf(reps, () => applyUnitaryOps(state, [op]), copy);
    console.log(`  ${label.padEnd(36)} ${gateTime.toExponential(3)} s   copy ${copyTime.toExponential(3)} s   ratio ${(gateTime / copyTime).toFixed(2)}`);
  }
}
