// checkIndexEntry: validates one [indices..., re, im?] row of oneBody / twoBody and reads it.
import { MAX_ENERGY } from '../modelLimits.js';
import type { Problem } from './Problem.js';

export interface IndexEntry {
  readonly indices: readonly number[];
  readonly re: number;
  readonly im: number;
}

/** Returns the entry, or undefined after pushing a problem per mistake (bad length, non-integer, out of range). */
export function checkIndexEntry(
  row: readonly number[],
  field: string,
  position: number,
  indexCount: number,
  modes: number,
  problems: Problem[],
): IndexEntry | undefined {
  if (row.length !== indexCount + 1 && row.length !== indexCount + 2) {
    const shape = indexCount === 2 ? '[i, j, re] or [i, j, re, im]' : '[i, j, k, l, re] or [i, j, k, l, re, im]';
    problems.push({ path: [field, position], message: `expected ${shape}, got ${row.length} numbers` });
    return undefined;
  }
  let ok = true;
  for (let slot = 0; slot < indexCount; slot++) {
    const index = row[slot]!;
    if (!Number.isInteger(index)) {
      problems.push({ path: [field, position, slot], message: `index ${index} is not an integer` });
      ok = false;
    } else if (index < 0 || index >= modes) {
      problems.push({ path: [field, position, slot], message: `index ${index} out of range 0..${modes - 1}` });
      ok = false;
    }
  }
  for (let slot = indexCount; slot < row.length; slot++) {
    if (!(Math.abs(row[slot]!) <= MAX_ENERGY)) {
      problems.push({ path: [field, position, slot], message: `must lie within ±${MAX_ENERGY}, got ${row[slot]}` });
      ok = false;
    }
  }
  if (!ok) return undefined;
  return { indices: row.slice(0, indexCount), re: row[indexCount]!, im: row[indexCount + 1] ?? 0 };
}
