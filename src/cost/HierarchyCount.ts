/**
 * HierarchyCount: what the structured counter returns — gate counts by structured kind for everything not covered by a
 * cost override, and, per override label, how often it was charged and the resources it charged in total.
 */
import { addTally, ZERO_TALLY, type Tally } from './Tally.js';
import { kindKey, type StructuredGateKind } from './structuredGateKind.js';

export interface KindCount {
  readonly kind: StructuredGateKind;
  readonly count: number;
}

export interface OverrideCharge {
  readonly label: string;
  readonly source: string;
  /** Applications of overridden blocks under this label (calls × repeats). */
  readonly applications: number;
  /** Resources charged by those applications together. */
  readonly tally: Tally;
}

export interface HierarchyCount {
  readonly kinds: ReadonlyMap<string, KindCount>;
  readonly charges: ReadonlyMap<string, OverrideCharge>;
}

export const EMPTY_COUNT: HierarchyCount = { kinds: new Map(), charges: new Map() };

function checked(total: number, what: string): number {
  if (!Number.isSafeInteger(total)) throw new RangeError(`count of "${what}" exceeds 2^53`);
  return total;
}

/** Σ factor_i · count_i, as a new value. */
export function sumCounts(parts: readonly (readonly [HierarchyCount, number])[]): HierarchyCount {
  const kinds = new Map<string, KindCount>();
  const charges = new Map<string, OverrideCharge>();
  for (const [part, factor] of parts) {
    if (factor === 0) continue;
    for (const [key, entry] of part.kinds) {
      const total = (kinds.get(key)?.count ?? 0) + entry.count * factor;
      kinds.set(key, { kind: entry.kind, count: checked(total, entry.kind.display) });
    }
    for (const [label, charge] of part.charges) {
      const previous = charges.get(label);
      charges.set(label, {
        label,
        source: charge.source,
        applications: checked((previous?.applications ?? 0) + charge.applications * factor, label),
        tally: addTally(previous?.tally ?? ZERO_TALLY, charge.tally, factor),
      });
    }
  }
  return { kinds, charges };
}

/** A count holding one gate of `kind`. */
export function singleKind(kind: StructuredGateKind): HierarchyCount {
  return { kinds: new Map([[kindKey(kind), { kind, count: 1 }]]), charges: new Map() };
}

/** A count holding one application of an override charging `tally`. */
export function singleCharge(label: string, source: string, charged: Tally): HierarchyCount {
  return { kinds: new Map(), charges: new Map([[label, { label, source, applications: 1, tally: charged }]]) };
}
