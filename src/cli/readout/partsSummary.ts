/**
 * partsSummary: what the readout commands report about each part's circuit — sign, shift w, α, the resolvent's QSVT
 * degree (from its construction report), qubits and gate counts of the Hadamard test — as JSON-ready records and as
 * a text table.
 */
import { countsToObject, totalGates } from '../../circuit/gateCounts.js';
import type { PartEstimate } from '../../readout/estimateGreen.js';
import { formatTable } from '../format/formatTable.js';
import { formatComplex } from './formatComplex.js';
import type { RouteResolvent } from './routeResolvent.js';

export interface PartSummary {
  readonly part: string;
  readonly sign: number;
  readonly w: [number, number];
  readonly electrons: number;
  readonly alpha: number;
  readonly encodingErrorBound: number;
  readonly degree: number | null;
  readonly qubits: number;
  readonly totalGates: number;
  readonly gates: Record<string, number>;
  readonly value: [number, number];
}

export function partsSummary(parts: readonly PartEstimate[], resolvent: RouteResolvent): PartSummary[] {
  return parts.map((p) => ({
    part: p.part,
    sign: p.sign,
    w: [p.w.re, p.w.im],
    electrons: p.electrons,
    alpha: p.alpha,
    encodingErrorBound: p.encodingErrorBound,
    degree: resolvent.reportOf(p.resolvent)?.degree ?? null,
    qubits: p.qubits,
    totalGates: totalGates(p.gates),
    gates: countsToObject(p.gates),
    value: [p.value.re, p.value.im],
  }));
}

export function partsTable(summaries: readonly PartSummary[]): string {
  return formatTable(
    ['part', 'sign', 'w', 'alpha', 'degree', 'qubits', 'gates', 'bound', 'value'],
    summaries.map((s) => [
      s.part,
      s.sign > 0 ? '+1' : '-1',
      formatComplex({ re: s.w[0], im: s.w[1] }, 6),
      s.alpha.toPrecision(6),
      s.degree === null ? '-' : String(s.degree),
      String(s.qubits),
      String(s.totalGates),
      s.encodingErrorBound.toExponential(2),
      formatComplex({ re: s.value[0], im: s.value[1] }),
    ]),
    ['left', 'right', 'right', 'right', 'right', 'right', 'right', 'right', 'right'],
  );
}
