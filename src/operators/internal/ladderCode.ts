// ladderCode: a ladder factor packed as one integer, 2·mode + (dagger ? 1 : 0), for keys and fast comparison.
import type { LadderOp } from '../LadderSum.js';

export function ladderCode(op: LadderOp): number {
  return 2 * op.mode + (op.dagger ? 1 : 0);
}

export function ladderFromCode(code: number): LadderOp {
  return { mode: code >> 1, dagger: (code & 1) === 1 };
}
