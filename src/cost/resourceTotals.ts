/**
 * resourceTotals: from a hierarchy count to the logical figures a user compares — Toffolis, T count (Toffolis × 4 or 7,
 * lone T gates, rotations × T per synthesised rotation), rotations, Cliffords, peak extra ancillas — with the override
 * charges listed beside.
 */
import type { HierarchyCount } from './HierarchyCount.js';
import { lowerKinds, type DecompositionOptions } from './decompositionTable.js';
import { tGatesPerRotation } from './rotationSynthesis.js';
import { addTally, type Tally } from './Tally.js';

export interface TotalsOptions extends DecompositionOptions {
  /** T gates per Toffoli: 4 with measurement-based uncomputation (Jones 2013; Gidney 2018, default), 7 (Amy et al. 2013). */
  readonly toffoliT?: 4 | 7;
  /** Synthesis error per rotation; omitted: rotations stay unconverted (tCount then excludes them). */
  readonly rotationError?: number;
}

export interface ResourceTotals {
  readonly toffoli: number;
  /** Lone T gates (not from Toffolis or rotations). */
  readonly tGates: number;
  readonly rotations: number;
  readonly cliffords: number;
  readonly extraAncillas: number;
  readonly tPerRotation: number;
  readonly toffoliT: 4 | 7;
  /** toffoliT·toffoli + tGates + tPerRotation·rotations. */
  readonly tCount: number;
  readonly charges: readonly { readonly label: string; readonly source: string; readonly applications: number; readonly toffoli: number }[];
}

export function resourceTotals(count: HierarchyCount, options: TotalsOptions = {}): ResourceTotals {
  let total: Tally = lowerKinds(count.kinds.values(), options);
  for (const charge of count.charges.values()) total = addTally(total, charge.tally);
  const toffoliT = options.toffoliT ?? 4;
  const tPerRotation = options.rotationError === undefined ? 0 : tGatesPerRotation(options.rotationError);
  return {
    ...total,
    tPerRotation,
    toffoliT,
    tCount: toffoliT * total.toffoli + total.tGates + tPerRotation * total.rotations,
    charges: [...count.charges.values()].map((c) => ({ label: c.label, source: c.source, applications: c.applications, toffoli: c.tally.toffoli })),
  };
}
