/**
 * bench-sim: seconds per 1-qubit, controlled and diagonal gate on 20, 22 and 24 qubits, against a
 * streaming copy of the same two arrays (Float64Array.set into two preallocated arrays) in the same
 * process, and the ratio gate/copy. Run with `npx tsx scripts/bench-sim.ts`; not part of the tests.
 */
import { gate } from '../src/circuit/ops.js';
import type { UnitaryOp } from '../src/circuit/types.js';
import { StateVector } from '../src/sim/StateVector.js';
import { applyUnitaryOps } from '../src/sim/applyUnitaryOps.js';

function secondsPer(reps: number, work: () => void): number {
  for (let r = 0; r < 2; r++) work();
  const start = process.hrtime.bigint();
  for (let r = 0; r < reps; r++) work();
  return Number(process.hrtime.bigint() - start) / 1e9 / reps;
}

function row(label: string, seconds: number, copy: number): string {
  return `  ${label.padEnd(34)} ${seconds.toExponential(3)} s   ${(seconds / copy).toFixed(2)}× copy`;
}

for (const n of [20, 22, 24]) {
  const state = StateVector.zero(n);
  state.re.fill(1 / Math.sqrt(2 ** n));
  const copyRe = new Float64Array(2 ** n);
  const copyIm = new Float64Array(2 ** n);
  const reps = Math.max(10, 2 ** (26 - n));
  const mid = n >> 1;
  const apply = (op: UnitaryOp) => () => applyUnitaryOps(state, [op]);
  const copy = secondsPer(reps, () => {
    copyRe.set(state.re);
    copyIm.set(state.im);
  });
  const cases: [string, UnitaryOp][] = [
    [`h q[${mid}] (1-qubit, general)`, gate('h', [mid])],
    [`h q[0] (1-qubit, general)`, gate('h', [0])],
    [`h q[${n - 1}] (1-qubit, general)`, gate('h', [n - 1])],
    [`crx q[0], q[${mid}] (controlled)`, gate('crx', [0, mid], [0.3])],
    [`cx q[${mid}], q[0] (controlled X)`, gate('cx', [mid, 0])],
    [`rz q[${mid}] (diagonal)`, gate('rz', [mid], [0.3])],
    [`p q[${mid}] (diagonal, target-1 half)`, gate('p', [mid], [0.3])],
  ];
  console.log(`${n} qubits (${reps} repetitions each)`);
  console.log(row('copy of re and im (Float64Array.set)', copy, copy));
  for (const [label, op] of cases) console.log(row(label, secondsPer(reps, apply(op)), copy));
}
