/**
 * registerOutcomes: an outcome distribution laid out register by register, the layout `polewright run`
 * prints: each outcome gives every classical register's bits as a string with bit 0 first, and the
 * outcomes are sorted by value (descending), then by those strings in register declaration order.
 */
import type { Register } from '../circuit/types.js';
import type { OutcomeDistribution } from './outcomeTypes.js';

export interface RegisterOutcome {
  /** Register name → its bits, bit 0 first (character k is bit k); registers in declaration order. */
  readonly bits: Readonly<Record<string, string>>;
  /** Probability, or count of shots. */
  readonly value: number;
}

/**
 * Splits every outcome key of `distribution` (classical bit g at position bits − 1 − g, registers at
 * their offsets) into the registers' bit strings. Throws RangeError when a register reaches past the
 * distribution's bits.
 */
export function registerOutcomes(distribution: OutcomeDistribution, registers: readonly Register[]): RegisterOutcome[] {
  const bits = distribution.bits;
  for (const r of registers) {
    if (r.offset + r.size > bits) throw new RangeError(`registerOutcomes: register ${r.name} reaches bit ${r.offset + r.size - 1}, the outcomes have ${bits} bits`);
  }
  const rows = [...distribution.outcomes].map(([key, value]) => {
    const split: Record<string, string> = {};
    for (const r of registers) {
      let text = '';
      for (let k = 0; k < r.size; k++) text += key[bits - 1 - (r.offset + k)]!;
      split[r.name] = text;
    }
    return { bits: split, value, order: registers.map((r) => split[r.name]).join(' ') };
  });
  rows.sort((a, b) => b.value - a.value || (a.order < b.order ? -1 : a.order > b.order ? 1 : 0));
  return rows.map(({ bits: split, value }) => ({ bits: split, value }));
}
