// flagControlLists: the controls of the pruned flag rotation of a dyadic interval of register values — the window qubit and
// the register bits at or above the interval's level set, the other bits as negative controls — made once per register
// hull and qubit layout: the fast inverses that share a hull (B' as Pauli LCU and as arithmetic: same energies, other w)
// share their tens of thousands of lists. The lists are read-only, like every op's.
import type { RegisterEnergies } from './flagAmplitude.js';
import type { RegisterHull } from './registerHull.js';

export interface ControlLists {
  readonly controls: readonly number[];
  readonly negControls: readonly number[];
}

const listsPerHull = new WeakMap<RegisterHull, Map<string, Map<number, ControlLists>>>();

/** The lists of the interval start … start + 2^level − 1 (start a multiple of 2^level, level ≤ register width ≤ 24). */
export function controlListsFor(energies: RegisterEnergies, register: readonly number[], gateControls: readonly number[]): (start: number, level: number) => ControlLists {
  let byLayout = listsPerHull.get(energies.hull);
  if (!byLayout) listsPerHull.set(energies.hull, (byLayout = new Map()));
  const layout = `${register.join(',')}|${gateControls.join(',')}`;
  let byInterval = byLayout.get(layout);
  if (!byInterval) byLayout.set(layout, (byInterval = new Map()));
  const known = byInterval;
  const m = register.length;
  // Gathered in scratch lists, kept as exact-length copies.
  const positive: number[] = [];
  const negative: number[] = [];
  return (start, level) => {
    const key = start * 32 + level;
    let lists = known.get(key);
    if (!lists) {
      positive.length = 0;
      negative.length = 0;
      positive.push(...gateControls);
      for (let b = level; b < m; b++) {
        if (((start >>> b) & 1) === 1) positive.push(register[b]!);
        else negative.push(register[b]!);
      }
      lists = { controls: positive.slice(), negControls: negative.slice() };
      known.set(key, lists);
    }
    return lists;
  };
}
