// detectForm: tells the four model-file forms apart by their distinguishing keys.
import type { Problem } from './Problem.js';

export type FormKind = 'explicit' | 'hubbard' | 'impurity' | 'continuum';

const MARKERS: readonly [FormKind, readonly string[]][] = [
  ['explicit', ['modes', 'oneBody', 'twoBody']],
  ['hubbard', ['lattice']],
  ['impurity', ['impurity']],
  ['continuum', ['continuum']],
];

export function detectForm(input: object, problems: Problem[]): FormKind | undefined {
  const found = MARKERS.filter(([, keys]) => keys.some((key) => key in input));
  if (found.length === 1) return found[0]![0];
  const message = found.length === 0
    ? 'cannot tell the model form: give "modes" (explicit form), "lattice" (Hubbard preset), "impurity" (Anderson impurity preset) or "continuum" (grid-discretised continuum preset)'
    : `keys of several model forms are mixed (${found.map(([kind]) => kind).join(', ')}); use exactly one form`;
  problems.push({ path: [], message });
  return undefined;
}
