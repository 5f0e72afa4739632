// buildExplicit: the explicit form — T and V listed entry by entry; repeated entries add, no implicit h.c.
import type { TwoBodyTerm } from '../FermionModel.js';
import type { BuiltHamiltonian } from './BuiltHamiltonian.js';
import { checkIndexEntry } from './checkIndexEntry.js';
import { checkOneBodyHermitian } from './checkOneBodyHermitian.js';
import { checkTwoBodyHermitian, type PositionedTwoBody } from './checkTwoBodyHermitian.js';
import { addToEntry, zeroComplexMatrix } from './complexMatrix.js';
import type { ExplicitInput } from './modelSchemas.js';
import type { Problem } from './Problem.js';

export function buildExplicit(input: ExplicitInput, problems: Problem[]): BuiltHamiltonian {
  const modes = input.modes;
  const oneBody = zeroComplexMatrix(modes);
  const oneBodySources = new Map<number, number[]>();
  (input.oneBody ?? []).forEach((row, position) => {
    const entry = checkIndexEntry(row, 'oneBody', position, 2, modes, problems);
    if (entry === undefined) return;
    const [i, j] = entry.indices as [number, number];
    addToEntry(oneBody, i, j, entry.re, entry.im);
    const key = i * modes + j;
    oneBodySources.set(key, [...(oneBodySources.get(key) ?? []), position]);
  });
  const sources = (i: number, j: number): string => {
    const rows = [...(oneBodySources.get(i * modes + j) ?? []), ...(i === j ? [] : oneBodySources.get(j * modes + i) ?? [])];
    return rows.length === 0 ? 'no entries' : `from ${rows.sort((a, b) => a - b).map((r) => `oneBody[${r}]`).join(', ')}`;
  };
  checkOneBodyHermitian(oneBody, 'oneBody', sources, problems);

  const positioned: PositionedTwoBody[] = [];
  (input.twoBody ?? []).forEach((row, position) => {
    const entry = checkIndexEntry(row, 'twoBody', position, 4, modes, problems);
    if (entry === undefined) return;
    const [i, j, k, l] = entry.indices as [number, number, number, number];
    positioned.push({ i, j, k, l, re: entry.re, im: entry.im, position });
  });
  checkTwoBodyHermitian(positioned, 'twoBody', problems);
  return { form: { kind: 'explicit' }, modes, oneBody, twoBody: sumTwoBody(positioned) };
}

function sumTwoBody(entries: readonly PositionedTwoBody[]): TwoBodyTerm[] {
  const sums = new Map<string, { i: number; j: number; k: number; l: number; re: number; im: number }>();
  for (const { i, j, k, l, re, im } of entries) {
    const key = `${i},${j},${k},${l}`;
    const sum = sums.get(key);
    if (sum === undefined) sums.set(key, { i, j, k, l, re, im });
    else {
      sum.re += re;
      sum.im += im;
    }
  }
  return [...sums.values()].filter((t) => t.re !== 0 || t.im !== 0);
}
