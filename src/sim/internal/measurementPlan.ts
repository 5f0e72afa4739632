/**
 * measurementPlan: decides whether a circuit's outcome distribution can be read off its final state
 * (every measurement terminal, every reset acting on a still-untouched qubit, i.e. a no-op) and
 * which qubit finally feeds each classical bit, and how many measurements and resets can split the
 * state into branches (an upper bound: the exact enumeration follows at most 2^splits branches).
 */
import type { Circuit, Op } from '../../circuit/types.js';

export interface MeasurementPlan {
  /** True when no operation after a measurement acts on the measured qubit and every reset is a no-op. */
  readonly direct: boolean;
  /** For each classical bit, the qubit of the last measurement into it, or −1 when never measured. */
  readonly bitSources: Int32Array;
  /**
   * Measurements and resets that may split the state: all of them except resets of untouched qubits
   * and those acting on a qubit already collapsed by a measurement or reset with no gate on it since.
   */
  readonly splits: number;
}

function touched(op: Op): readonly number[] {
  if (op.kind === 'gate' || op.kind === 'call') return [...op.qubits, ...op.controls, ...op.negControls];
  if (op.kind === 'reset') return [op.qubit];
  return [];
}

export function measurementPlan(circuit: Circuit, bits: number): MeasurementPlan {
  const bitSources = new Int32Array(bits).fill(-1);
  const measured = new Set<number>();
  const used = new Set<number>();
  const collapsed = new Set<number>();
  let direct = true;
  let splits = 0;
  for (const op of circuit.ops) {
    if (op.kind === 'measure' || op.kind === 'reset') {
      const noOpReset = op.kind === 'reset' && !used.has(op.qubit);
      if (!noOpReset && !collapsed.has(op.qubit)) splits++;
      collapsed.add(op.qubit);
    } else {
      for (const q of touched(op)) collapsed.delete(q);
    }
    if (op.kind === 'measure') {
      measured.add(op.qubit);
      bitSources[op.bit] = op.qubit;
      continue;
    }
    if (op.kind === 'reset') {
      if (!used.has(op.qubit)) continue;
      direct = false;
    }
    for (const q of touched(op)) {
      if (measured.has(q)) direct = false;
      used.add(q);
    }
  }
  return { direct, bitSources, splits };
}
