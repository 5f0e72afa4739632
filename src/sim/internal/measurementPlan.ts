/**
 * measurementPlan: decides whether a circuit's outcome distribution can be read off its final state
 * (every measurement terminal, every reset acting on a still-untouched qubit, i.e. a no-op) and
 * which qubit finally feeds each classical bit.
 */
import type { Circuit, Op } from '../../circuit/types.js';

export interface MeasurementPlan {
  /** True when no operation after a measurement acts on the measured qubit and every reset is a no-op. */
  readonly direct: boolean;
  /** For each classical bit, the qubit of the last measurement into it, or −1 when never measured. */
  readonly bitSources: Int32Array;
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
  let direct = true;
  for (const op of circuit.ops) {
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
  return { direct, bitSources };
}
