/**
 * greenTables: the exact solver's outputs as text. greenJson is the one JSON object of
 * `polewright exact --json` and green.json; greenCsv has the columns omega,i,j,re,im (one row per
 * frequency and computed entry, frequencies outermost), numbers in shortest round-trip form.
 */
import type { ExactSolution } from '../exact/solveExact.js';

export interface GreenJson {
  readonly groundEnergy: number;
  readonly degeneracy: number;
  readonly gap: number | null;
  readonly electrons: number;
  readonly modes: number;
  readonly broadening: number;
  readonly frequencies: number[];
  readonly entries: { readonly i: number; readonly j: number; readonly values: [number, number][] }[];
}

export function greenJson(solution: ExactSolution): GreenJson {
  return {
    groundEnergy: solution.groundEnergy,
    degeneracy: solution.degeneracy,
    gap: solution.gap,
    electrons: solution.sector.electrons,
    modes: solution.modes,
    broadening: solution.broadening,
    frequencies: Array.from(solution.frequencies),
    entries: solution.green.map((e) => ({
      i: e.i,
      j: e.j,
      values: Array.from(e.re, (re, k): [number, number] => [re, e.im[k]!]),
    })),
  };
}

export function greenCsv(solution: ExactSolution): string {
  const lines = ['omega,i,j,re,im'];
  solution.frequencies.forEach((w, k) => {
    for (const e of solution.green) lines.push(`${w},${e.i},${e.j},${e.re[k]!},${e.im[k]!}`);
  });
  return `${lines.join('\n')}\n`;
}
